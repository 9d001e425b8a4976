/** How many generated cases each kind of fuzz test runs, and its fixed seed: the README quotes these numbers. */

/** Section files broken at the byte and JSON level, each loaded once. */
export const LOADER_RUNS = 5000;
/** Generated documents of the older format versions, each loaded, compared with its migrated form and saved again. */
export const MIGRATION_RUNS = 2000;
/** Random sequences of 1 to 20 steps (edits, drags, undos, redos, opened files) through the app's checked store. */
export const EDIT_SEQUENCE_RUNS = 800;
/** Random edges and outlines through the geometry kernel, by property. */
export const GEOMETRY_RUNS = { flatten: 1200, area: 800, crossings: 1200, fillets: 800 } as const;

/** All of them: issue 11 asks for 10,000 or more. */
export const TOTAL_RUNS = LOADER_RUNS + MIGRATION_RUNS + EDIT_SEQUENCE_RUNS + Object.values(GEOMETRY_RUNS).reduce((a, b) => a + b, 0);

/** One fixed seed per kind, so every run checks the same cases and a failure reproduces. */
export const SEEDS = { loader: 20261205, migrations: 20261206, edits: 20261207, geometry: 20261208 } as const;

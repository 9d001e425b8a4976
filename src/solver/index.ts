/** Public face of the field solver (pure TypeScript, no DOM) for callers outside src/solver: the domain and result types, the solve and its errors. */
export * from './types.ts';
export { FlowSetupError } from './errors.ts';
export { solveFlow, SolveSupersededError, DEFAULT_TOLERANCE, DEFAULT_MAX_ITERATIONS } from './solve.ts';
export { thinWallNote, type GridChoice, type ThinWallNoteOptions } from './thin-wall-note.ts';

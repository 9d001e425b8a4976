/** Public API of the section document: types, loading and saving files, errors, schema and limits. */

export * from './types.ts';
export { loadDocument, readDocument, saveDocument, type ReadResult } from './load.ts';
export { DocumentError, type DocumentProblem } from './errors.ts';
export { documentSchema, sectionSchema, variantSchema } from './schema.ts';
export { benchInputsSchema } from './bench-schema.ts';
export { widthProfileSchema } from './width-schema.ts';
export { partsSchema, valvePartSchema, seatPartSchema, borePartSchema, portPartSchema } from './parts-schema.ts';
export { DEFAULT_SETTINGS, MIGRATIONS, V1_VARIANT_NAME } from './migrations.ts';
export * from './limits.ts';

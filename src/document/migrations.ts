/**
 * Older section formats and how each becomes the next. A file is checked against the schema of its own version
 * (so problems are named by the paths in the file as written), then lifted one version at a time.
 */

import { z } from 'zod';
import { FORMAT_NAME, type Section, type Settings, type Units } from './types.ts';
import { documentV2Schema, documentV3Schema, documentV4Schema, sectionSchemaBeforeParts, titleSchema, unitsSchema } from './schema.ts';

/** Format version 1: one section at the top level, no variants, no settings. */
export const documentV1Schema = z.strictObject(
  {
    format: z.literal(FORMAT_NAME, { error: `must be "${FORMAT_NAME}"` }),
    version: z.literal(1, { error: 'must be 1' }),
    title: titleSchema,
    units: unitsSchema,
    section: sectionSchemaBeforeParts,
  },
  { error: 'must be a section document (an object)' },
);

/** Name of the single variant a version-1 file becomes. */
export const V1_VARIANT_NAME = 'base';
/** Settings given to files from before settings existed. */
export const DEFAULT_SETTINGS: Settings = { gridDetail: 'standard' };

/** The version-2 document a version-1 file becomes (validated again by the loader). */
export interface DocumentV2Shape {
  format: typeof FORMAT_NAME;
  version: 2;
  title: string;
  units: Units;
  activeVariant: string;
  settings: Settings;
  variants: { name: string; section: Section }[];
}

function v1ToV2(doc: z.output<typeof documentV1Schema>): DocumentV2Shape {
  return {
    format: FORMAT_NAME,
    version: 2,
    title: doc.title,
    units: doc.units,
    activeVariant: V1_VARIANT_NAME,
    settings: { ...DEFAULT_SETTINGS },
    variants: [{ name: V1_VARIANT_NAME, section: doc.section }],
  };
}

/**
 * Version 2 to 3: variants may carry parametric parts and outlines anchor corners, both optional,
 * so a version-2 document is already a version-3 one once its version says so.
 */
function v2ToV3(doc: z.output<typeof documentV2Schema>): unknown {
  return { ...doc, version: 3 };
}

/**
 * Version 3 to 4: variants may carry the bench panel's inputs (`bench`), optional, so a version-3 document is
 * already a version-4 one once its version says so. The grid detail has been saved in `settings` since version 2.
 *
 * Later steps follow the same pattern, one optional key each with its own version and an identity lift like this one:
 * `variants[].benchSheet` (bench rows) and a document-level `underlay` (photo).
 */
function v3ToV4(doc: z.output<typeof documentV3Schema>): unknown {
  return { ...doc, version: 4 };
}

/**
 * Version 4 to 5: variants may carry a width profile (`width`), optional, so a version-4 document is already a
 * version-5 one (every variant solved per unit depth, as before) once its version says so.
 */
function v4ToV5(doc: z.output<typeof documentV4Schema>): unknown {
  return { ...doc, version: 5 };
}

/** One step: the schema of version `from` and the lift to version `from + 1`. */
export interface Migration {
  readonly from: number;
  readonly schema: z.ZodType;
  readonly up: (doc: never) => unknown;
}

/** Every older version in order; MIGRATIONS[i].from === i + 1. */
export const MIGRATIONS: readonly Migration[] = [
  { from: 1, schema: documentV1Schema, up: v1ToV2 },
  { from: 2, schema: documentV2Schema, up: v2ToV3 },
  { from: 3, schema: documentV3Schema, up: v3ToV4 },
  { from: 4, schema: documentV4Schema, up: v4ToV5 },
];

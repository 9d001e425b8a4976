/**
 * The zod schema of the current section file (format version 2), mirroring types.ts field for field.
 * Unknown fields are refused, not stripped: a misspelt "filetRadius" silently dropped would load a section
 * that differs from the file without a word, and a field this version does not know belongs to a newer format.
 * Every message is a plain requirement ("must be ..."); errors are worded from it by issues.ts.
 */

import { z } from 'zod';
import { FORMAT_NAME, FORMAT_VERSION, type PortDocument } from './types.ts';
import {
  MAX_COORDINATE, MAX_FILLET_RADIUS, MAX_ISLANDS, MAX_NAME_LENGTH, MAX_NOTE_LENGTH, MAX_SECTION_VERTICES,
  MAX_TITLE_LENGTH, MAX_VARIANTS, MAX_VIA_POINTS,
} from './limits.ts';

/** A bounded finite number; NaN and Infinity are refused by z.number() itself. */
function boundedNumber(min: number, max: number, requirement: string) {
  const error = `must be ${requirement}`;
  return z.number({ error }).min(min, { error }).max(max, { error });
}

const CONTROL_CHARACTER = /[\u0000-\u001f\u007f]/;

/** One-line text that is not blank (names and the title are labels in the view and the command output). */
function label(maxLength: number, what: string) {
  const error = `must be ${what} of 1 to ${maxLength} characters on one line`;
  return z
    .string({ error })
    .min(1, { error })
    .max(maxLength, { error })
    .refine((s) => s.trim().length > 0 && !CONTROL_CHARACTER.test(s), { error });
}

/** A list whose too-short / too-long errors say the allowed count. */
function list<T extends z.ZodType>(item: T, min: number, max: number, what: string) {
  const error = `must be a list of ${min} to ${max} ${what}`;
  return z.array(item, { error }).min(min, { error }).max(max, { error });
}

const coordinate = boundedNumber(-MAX_COORDINATE, MAX_COORDINATE, `a number from -${MAX_COORDINATE} to ${MAX_COORDINATE}`);
export const pointSchema = z.tuple([coordinate, coordinate], { error: 'must be a point [x, y] of two numbers' });

const name = label(MAX_NAME_LENGTH, 'a name');
const edgeRole = z.enum(['wall', 'inlet', 'outlet'], { error: 'must be "wall", "inlet" or "outlet"' });

const lineEdge = z.strictObject({ kind: z.literal('line'), role: edgeRole, wallName: name.optional() });
const arcEdge = z.strictObject({ kind: z.literal('arc'), role: edgeRole, wallName: name.optional(), through: pointSchema });
const curveEdge = z.strictObject({
  kind: z.literal('curve'),
  role: edgeRole,
  wallName: name.optional(),
  via: list(pointSchema, 0, MAX_VIA_POINTS, 'points [x, y]'),
});
export const edgeSchema = z.discriminatedUnion('kind', [lineEdge, arcEdge, curveEdge], {
  error: 'must be an edge whose kind is "line", "arc" or "curve"',
});

export const vertexSchema = z.strictObject(
  {
    at: pointSchema,
    filletRadius: boundedNumber(0, MAX_FILLET_RADIUS, `a number >= 0 and <= ${MAX_FILLET_RADIUS}`).optional(),
  },
  { error: 'must be a vertex { at: [x, y] }' },
);

export const outlineSchema = z
  .strictObject(
    {
      vertices: list(vertexSchema, 3, MAX_SECTION_VERTICES, 'vertices'),
      edges: list(edgeSchema, 3, MAX_SECTION_VERTICES, 'edges'),
    },
    { error: 'must be an outline { vertices, edges }' },
  )
  .superRefine((outline, ctx) => {
    if (outline.edges.length !== outline.vertices.length) {
      ctx.addIssue({
        code: 'custom',
        path: ['edges'],
        message: `must hold one edge per vertex: ${outline.vertices.length} vertices but ${outline.edges.length} edges`,
      });
    }
  });

export const islandSchema = z
  .strictObject({ name, outline: outlineSchema }, { error: 'must be an island { name, outline }' })
  .superRefine((island, ctx) => {
    island.outline.edges.forEach((edge, i) => {
      if (edge.role !== 'wall') {
        ctx.addIssue({
          code: 'custom',
          path: ['outline', 'edges', i, 'role'],
          message: `must be "wall": every edge of an island is a wall (got "${edge.role}")`,
        });
      }
    });
  });

export const sectionSchema = z
  .strictObject(
    { outline: outlineSchema, islands: list(islandSchema, 0, MAX_ISLANDS, 'islands') },
    { error: 'must be a section { outline, islands }' },
  )
  .superRefine((section, ctx) => {
    const total = section.islands.reduce((n, island) => n + island.outline.vertices.length, section.outline.vertices.length);
    if (total > MAX_SECTION_VERTICES) {
      ctx.addIssue({
        code: 'custom',
        path: [],
        message: `has ${total} vertices in its outline and islands together; at most ${MAX_SECTION_VERTICES} are allowed`,
      });
    }
  });

export const unitsSchema = z.enum(['mm', 'inch'], { error: 'must be "mm" or "inch"' });
export const titleSchema = label(MAX_TITLE_LENGTH, 'a title');

export const variantSchema = z.strictObject(
  {
    name,
    note: z
      .string({ error: `must be text of at most ${MAX_NOTE_LENGTH} characters` })
      .max(MAX_NOTE_LENGTH, { error: `must be text of at most ${MAX_NOTE_LENGTH} characters` })
      .optional(),
    section: sectionSchema,
  },
  { error: 'must be a variant { name, section }' },
);

export const settingsSchema = z.strictObject(
  { gridDetail: z.enum(['preview', 'standard', 'fine'], { error: 'must be "preview", "standard" or "fine"' }) },
  { error: 'must be the settings { gridDetail }' },
);

/** The whole file. Key order here is the order saveDocument writes. */
export const documentSchema = z
  .strictObject(
    {
      format: z.literal(FORMAT_NAME, { error: `must be "${FORMAT_NAME}"` }),
      version: z.literal(FORMAT_VERSION, { error: `must be ${FORMAT_VERSION}` }),
      title: titleSchema,
      units: unitsSchema,
      activeVariant: name,
      settings: settingsSchema,
      variants: list(variantSchema, 1, MAX_VARIANTS, 'variants'),
    },
    { error: 'must be a section document (an object)' },
  )
  .superRefine((doc, ctx) => {
    const seen = new Set<string>();
    doc.variants.forEach((variant, i) => {
      if (seen.has(variant.name)) {
        ctx.addIssue({ code: 'custom', path: ['variants', i, 'name'], message: `"${variant.name}" is used by an earlier variant; variant names must differ` });
      }
      seen.add(variant.name);
    });
    if (!seen.has(doc.activeVariant)) {
      ctx.addIssue({ code: 'custom', path: ['activeVariant'], message: `must name one of the variants (got "${doc.activeVariant}")` });
    }
  });

/** Compile-time proof that the schema and types.ts describe the same document, in both directions. */
type DeepReadonly<T> = T extends readonly (infer U)[]
  ? T extends readonly [infer A, infer B] ? readonly [DeepReadonly<A>, DeepReadonly<B>] : readonly DeepReadonly<U>[]
  : T extends object ? { readonly [K in keyof T]: DeepReadonly<T[K]> } : T;
type Parsed = DeepReadonly<z.output<typeof documentSchema>>;
type Mirror<A, B> = (<T>() => T extends A ? 1 : 2) extends <T>() => T extends B ? 1 : 2 ? true : false;
const schemaMirrorsTypes: Mirror<Parsed, PortDocument> = true;
void schemaMirrorsTypes;

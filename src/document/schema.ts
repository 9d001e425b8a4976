/**
 * The zod schema of the current section file (format version 5), mirroring types.ts field for field.
 * Unknown fields are refused, not stripped: a misspelt "filetRadius" silently dropped would load a section
 * that differs from the file without a word, and a field this version does not know belongs to a newer format.
 * Every message is a plain requirement ("must be ..."); errors are worded from it by issues.ts.
 */

import { z } from 'zod';
import { FORMAT_NAME, FORMAT_VERSION, type PortDocument } from './types.ts';
import { benchInputsSchema } from './bench-schema.ts';
import { checkParts, partsSchema } from './parts-schema.ts';
import { boundedNumber, coordinateSchema } from './schema-numbers.ts';
import { checkWidthObstructions, widthProfileSchema } from './width-schema.ts';
import { axisymmetricSchema, checkAxisymmetric } from './axisymmetric-schema.ts';
import {
  CONTROL_CHARACTER, MAX_FILLET_RADIUS, MAX_ISLANDS, MAX_NAME_LENGTH, MAX_NOTE_LENGTH, MAX_SECTION_VERTICES,
  MAX_TITLE_LENGTH, MAX_VARIANTS, MAX_VIA_POINTS,
} from './limits.ts';

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

export const pointSchema = z.tuple([coordinateSchema, coordinateSchema], { error: 'must be a point [x, y] of two numbers' });

const name = label(MAX_NAME_LENGTH, 'a name');
export const edgeRoleSchema = z.enum(['wall', 'inlet', 'outlet'], { error: 'must be "wall", "inlet" or "outlet"' });

const lineEdge = z.strictObject({ kind: z.literal('line'), role: edgeRoleSchema, wallName: name.optional() });
const arcEdge = z.strictObject({ kind: z.literal('arc'), role: edgeRoleSchema, wallName: name.optional(), through: pointSchema });
const curveEdge = z.strictObject({
  kind: z.literal('curve'),
  role: edgeRoleSchema,
  wallName: name.optional(),
  via: list(pointSchema, 0, MAX_VIA_POINTS, 'points [x, y]'),
});
export const edgeSchema = z.discriminatedUnion('kind', [lineEdge, arcEdge, curveEdge], {
  error: 'must be an edge whose kind is "line", "arc" or "curve"',
});

const filletRadius = boundedNumber(0, MAX_FILLET_RADIUS, `a number >= 0 and <= ${MAX_FILLET_RADIUS}`).optional();
const anchorMark = z
  .literal(true, { error: 'must be true (a corner where the generated seat and bore join the outline) or left out' })
  .optional();

export const vertexSchema = z.strictObject({ at: pointSchema, filletRadius, anchor: anchorMark }, { error: 'must be a vertex { at: [x, y] }' });
/** A corner of a section outline before format version 3: no anchor mark. */
const plainVertexSchema = z.strictObject({ at: pointSchema, filletRadius }, { error: 'must be a vertex { at: [x, y] }' });

function outlineSchemaOf<V extends z.ZodType<{ at: readonly [number, number]; anchor?: true }>>(vertex: V) {
  return z
    .strictObject(
      {
        vertices: list(vertex, 3, MAX_SECTION_VERTICES, 'vertices'),
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
      const marked = outline.vertices.flatMap((v, i) => (v.anchor ? [i] : []));
      if (marked.length !== 0 && marked.length !== 2) {
        ctx.addIssue({
          code: 'custom',
          path: ['vertices', marked[marked.length === 1 ? 0 : 2], 'anchor'],
          message: `is one of ${marked.length} anchor corners; an outline has none or exactly two (one each side of the valve)`,
        });
      }
    });
}

export const outlineSchema = outlineSchemaOf(vertexSchema);
const plainOutlineSchema = outlineSchemaOf(plainVertexSchema);

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
    island.outline.vertices.forEach((vertex, i) => {
      if (vertex.anchor) {
        ctx.addIssue({
          code: 'custom',
          path: ['outline', 'vertices', i, 'anchor'],
          message: 'cannot be set on an island: only corners of the section outline are anchors',
        });
      }
    });
  });

/** Outline and islands together stay within the vertex limit. */
function checkSectionSize(section: { outline: { vertices: readonly unknown[] }; islands: readonly { outline: { vertices: readonly unknown[] } }[] }, ctx: z.core.$RefinementCtx): void {
  const total = section.islands.reduce((n, island) => n + island.outline.vertices.length, section.outline.vertices.length);
  if (total > MAX_SECTION_VERTICES) {
    ctx.addIssue({
      code: 'custom',
      path: [],
      message: `has ${total} vertices in its outline and islands together; at most ${MAX_SECTION_VERTICES} are allowed`,
    });
  }
}

const islands = list(islandSchema, 0, MAX_ISLANDS, 'islands');
const sectionError = { error: 'must be a section { outline, islands }' };

export const sectionSchema = z.strictObject({ outline: outlineSchema, islands }, sectionError).superRefine(checkSectionSize);
/** The section as format versions 1 and 2 wrote it: no anchor corners. */
export const sectionSchemaBeforeParts = z.strictObject({ outline: plainOutlineSchema, islands }, sectionError).superRefine(checkSectionSize);

export const unitsSchema = z.enum(['mm', 'inch'], { error: 'must be "mm" or "inch"' });
export const titleSchema = label(MAX_TITLE_LENGTH, 'a title');

const noteSchema = z
  .string({ error: `must be text of at most ${MAX_NOTE_LENGTH} characters` })
  .max(MAX_NOTE_LENGTH, { error: `must be text of at most ${MAX_NOTE_LENGTH} characters` })
  .optional();

const variantError = { error: 'must be a variant { name, section }' };
const checkVariantParts = (variant: { parts?: z.output<typeof partsSchema>; section: z.output<typeof sectionSchema> }, ctx: z.core.$RefinementCtx) => {
  if (variant.parts) checkParts(variant.parts, variant.section.outline, ctx);
};

/**
 * A variant of the current format: key order here is the order saveDocument writes (the short bench, width
 * profile and round model before the long section).
 */
export const variantSchema = z
  .strictObject(
    { name, note: noteSchema, parts: partsSchema.optional(), bench: benchInputsSchema.optional(), width: widthProfileSchema.optional(),
      axisymmetric: axisymmetricSchema.optional(), section: sectionSchema },
    variantError,
  )
  .superRefine((variant, ctx) => {
    checkVariantParts(variant, ctx);
    checkWidthObstructions(variant, ctx);
    checkAxisymmetric(variant, ctx);
  });

/** The variant of format version 4: parts and bench inputs, but no width profile. */
export const variantSchemaBeforeWidth = z
  .strictObject({ name, note: noteSchema, parts: partsSchema.optional(), bench: benchInputsSchema.optional(), section: sectionSchema }, variantError)
  .superRefine(checkVariantParts);

/** The variant of format version 3: parts, but no bench inputs. */
export const variantSchemaBeforeBench = z
  .strictObject({ name, note: noteSchema, parts: partsSchema.optional(), section: sectionSchema }, variantError)
  .superRefine(checkVariantParts);

/** The variant of format version 2: no parts. */
export const variantSchemaBeforeParts = z.strictObject(
  { name, note: noteSchema, section: sectionSchemaBeforeParts },
  { error: 'must be a variant { name, section }' },
);

export const settingsSchema = z.strictObject(
  { gridDetail: z.enum(['preview', 'standard', 'fine'], { error: 'must be "preview", "standard" or "fine"' }) },
  { error: 'must be the settings { gridDetail }' },
);

/** The file at `version` with variants of `variant`'s shape. Key order here is the order saveDocument writes. */
function documentSchemaOf<V extends z.ZodType<{ name: string }>, N extends number>(version: N, variant: V) {
  return z
    .strictObject(
      {
        format: z.literal(FORMAT_NAME, { error: `must be "${FORMAT_NAME}"` }),
        version: z.literal(version, { error: `must be ${version}` }),
        title: titleSchema,
        units: unitsSchema,
        activeVariant: name,
        settings: settingsSchema,
        variants: list(variant, 1, MAX_VARIANTS, 'variants'),
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
}

/** The whole file, current version. */
export const documentSchema = documentSchemaOf(FORMAT_VERSION, variantSchema);
/** Format version 4: variants without a width profile. */
export const documentV4Schema = documentSchemaOf(4, variantSchemaBeforeWidth);
/** Format version 3: variants without bench inputs. */
export const documentV3Schema = documentSchemaOf(3, variantSchemaBeforeBench);
/** Format version 2: variants without parts, outlines without anchor corners. */
export const documentV2Schema = documentSchemaOf(2, variantSchemaBeforeParts);

/** Compile-time proof that the schema and types.ts describe the same document, in both directions. */
type DeepReadonly<T> = T extends readonly (infer U)[]
  ? T extends readonly [infer A, infer B] ? readonly [DeepReadonly<A>, DeepReadonly<B>] : readonly DeepReadonly<U>[]
  : T extends object ? { readonly [K in keyof T]: DeepReadonly<T[K]> } : T;
type Parsed = DeepReadonly<z.output<typeof documentSchema>>;
type Mirror<A, B> = (<T>() => T extends A ? 1 : 2) extends <T>() => T extends B ? 1 : 2 ? true : false;
const schemaMirrorsTypes: Mirror<Parsed, PortDocument> = true;
void schemaMirrorsTypes;

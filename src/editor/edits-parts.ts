/**
 * Edits of a variant's parametric parts (valve, seat, test bore, measured port area) and its lift. Each one
 * regenerates the parts' geometry into the section, so changing a number changes the shape; regenerateParts does
 * the same after any other edit, so generated geometry follows its anchors and cannot be dragged off its numbers.
 */

import { z } from 'zod';
import type { Parts, PortDocument, Section, Variant } from '../document/types.ts';
import { formatPath } from '../document/errors.ts';
import { borePartSchema, partsSchema, portPartSchema, seatPartSchema, valvePartSchema } from '../document/parts-schema.ts';
import { variantSchema } from '../document/schema.ts';
import { applyParts } from '../parts/apply.ts';
import { PartsError } from '../parts/errors.ts';
import { EditError } from './errors.ts';
import { replaceAt, variantIndex } from './section-access.ts';

const PART_SCHEMAS = { valve: valvePartSchema, seat: seatPartSchema, bore: borePartSchema, port: portPartSchema } as const;
type PartName = keyof typeof PART_SCHEMAS;

/** The variant to change; absent: the active one. */
const variantName = z.string().optional();

/** First zod issue as "path: requirement", the path written as in file errors (`section.islands[0].name`). */
function firstIssue(error: z.ZodError, prefix: string): string {
  const issue = error.issues[0];
  return `${formatPath(prefix === '' ? issue.path : [prefix, ...issue.path])}: ${issue.message}`;
}

/** The document with variant `index` given `parts` and their regenerated geometry; `doc` itself if nothing changed. */
function withParts(doc: PortDocument, index: number, parts: Parts | undefined, edit: string): PortDocument {
  const variant = doc.variants[index];
  if (JSON.stringify(variant.parts) === JSON.stringify(parts)) return doc;
  const section = regenerate(variant.section, parts, edit);
  const next: Variant = { ...variant, parts, section };
  const checked = variantSchema.safeParse(next);
  if (!checked.success) throw new EditError(edit, firstIssue(checked.error, ''));
  return { ...doc, variants: replaceAt(doc.variants, index, next) };
}

function regenerate(section: Section, parts: Parts | undefined, edit: string): Section {
  try {
    return applyParts(section, parts);
  } catch (error) {
    if (error instanceof PartsError) throw new EditError(edit, error.message);
    throw error;
  }
}

export const setPartArgs = z.strictObject({
  variant: variantName,
  part: z.enum(['valve', 'seat', 'bore', 'port']),
  values: z.record(z.string(), z.unknown()),
});
export type SetPartArgs = z.infer<typeof setPartArgs>;

/** Changes some numbers of one part (a new part needs all of them); `values.axis` may give part of the axis. */
export function setPart(doc: PortDocument, { variant, part, values }: SetPartArgs): PortDocument {
  const edit = 'setPart';
  const index = variantIndex(doc, variant ?? doc.activeVariant, edit);
  const parts = doc.variants[index].parts ?? {};
  const old = parts[part as PartName] as Record<string, unknown> | undefined;
  const merged: Record<string, unknown> = { ...old, ...values };
  if (part === 'valve' && old && isRecord(values.axis)) merged.axis = { ...(old.axis as object), ...values.axis };
  const parsed = PART_SCHEMAS[part as PartName].safeParse(merged);
  if (!parsed.success) throw new EditError(edit, firstIssue(parsed.error, part));
  return withParts(doc, index, { ...parts, [part]: parsed.data }, edit);
}

export const setPartsArgs = z.strictObject({ variant: variantName, parts: z.unknown() });
export type SetPartsArgs = z.infer<typeof setPartsArgs>;

/** Gives a variant a whole new set of parts at once (adding a seat and bore together needs this). */
export function setParts(doc: PortDocument, { variant, parts }: SetPartsArgs): PortDocument {
  const edit = 'setParts';
  const index = variantIndex(doc, variant ?? doc.activeVariant, edit);
  const parsed = partsSchema.safeParse(parts);
  if (!parsed.success) throw new EditError(edit, firstIssue(parsed.error, 'parts'));
  return withParts(doc, index, parsed.data, edit);
}

export const setLiftArgs = z.strictObject({ variant: variantName, lift: z.number() });
export type SetLiftArgs = z.infer<typeof setLiftArgs>;

/** Moves the valve to `lift` (document units) along its axis. */
export function setLift(doc: PortDocument, { variant, lift }: SetLiftArgs): PortDocument {
  const edit = 'setLift';
  const index = variantIndex(doc, variant ?? doc.activeVariant, edit);
  const valve = doc.variants[index].parts?.valve;
  if (!valve) throw new EditError(edit, `"${doc.variants[index].name}" has no valve part to lift; add a valve first.`);
  return setPart(doc, { variant: doc.variants[index].name, part: 'valve', values: { lift } });
}

export const removePartsArgs = z.strictObject({ variant: variantName });
export type RemovePartsArgs = z.infer<typeof removePartsArgs>;

/**
 * Drops a variant's parts; their last geometry stays in the section as if drawn by hand, and a round model about the
 * valve's axis keeps that axis as its own.
 */
export function removeParts(doc: PortDocument, { variant }: RemovePartsArgs): PortDocument {
  const index = variantIndex(doc, variant ?? doc.activeVariant, 'removeParts');
  const { parts, ...rest } = doc.variants[index];
  if (!parts) return doc;
  const round = rest.axisymmetric;
  const kept = round && !round.axis && parts.valve ? { ...rest, axisymmetric: { axis: { ...parts.valve.axis }, keep: round.keep } } : rest;
  return { ...doc, variants: replaceAt(doc.variants, index, kept) };
}

/**
 * After edit `edit` turned `before` into `after`: regenerates the parts of every variant whose section is a new
 * object (not one `before` had), so a moved anchor moves the seat and a hand edit of generated geometry is undone.
 */
export function regenerateParts(before: PortDocument, after: PortDocument, edit: string): PortDocument {
  if (after === before) return after;
  const known = new Set(before.variants.map((v) => v.section));
  let variants = after.variants;
  after.variants.forEach((variant, i) => {
    if (!variant.parts || known.has(variant.section)) return;
    const section = regenerate(variant.section, variant.parts, edit);
    variants = replaceAt(variants, i, { ...variant, section });
  });
  return variants === after.variants ? after : { ...after, variants };
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

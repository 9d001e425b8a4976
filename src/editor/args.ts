/** Argument schemas shared by the edits, and the one place that turns a bad argument into an EditError. */

import { z } from 'zod';
import { formatPath } from '../document/errors.ts';
import { MAX_COORDINATE } from '../document/limits.ts';
import { EditError } from './errors.ts';

/** A finite number (zod 4 rejects NaN and infinities). */
export const finite = z.number();

/** A coordinate the file can hold, document units: a point beyond it would make a document that cannot be saved. */
const coordinate = finite
  .min(-MAX_COORDINATE, `A point must lie within ${MAX_COORDINATE} of the origin.`)
  .max(MAX_COORDINATE, `A point must lie within ${MAX_COORDINATE} of the origin.`);

/** [x, y] in document units. */
export const pointSchema = z.tuple([coordinate, coordinate]).readonly();

/** A 0-based position in a list. */
export const indexSchema = z.number().int().min(0);

/** Absent: the section outline; otherwise the island's index. */
export const islandSchema = indexSchema.optional();

export const pointRefSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('vertex'), vertex: indexSchema, island: islandSchema }),
  z.strictObject({ kind: z.literal('through'), edge: indexSchema, island: islandSchema }),
  z.strictObject({ kind: z.literal('via'), edge: indexSchema, via: indexSchema, island: islandSchema }),
]);

/** Arguments naming one vertex. */
export const vertexArgs = { vertex: indexSchema, island: islandSchema };

/** Arguments naming one edge. */
export const edgeArgs = { edge: indexSchema, island: islandSchema };

/** Parses `raw` or throws an EditError naming the first bad argument. */
export function parseArgs<T>(schema: z.ZodType<T>, edit: string, raw: unknown): T {
  const result = schema.safeParse(raw);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  const path = formatPath(issue.path);
  throw new EditError(edit, path === '' ? `${edit}: ${issue.message}` : `${edit}: ${path}: ${issue.message}`);
}


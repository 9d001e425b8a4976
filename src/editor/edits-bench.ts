/** The edit of a variant's bench inputs: what the porter typed and chose in the "Air and bench" panel, kept in the file. */

import { z } from 'zod';
import { benchInputsSchema } from '../document/bench-schema.ts';
import type { BenchInputs, PortDocument } from '../document/types.ts';
import { namedOrActiveVariant, withVariantKey } from './section-access.ts';

export const setBenchArgs = z.strictObject({
  /** The new inputs (SI, see BenchInputs); left out to clear them, so the panel shows its defaults again. */
  bench: benchInputsSchema.optional(),
  /** The variant whose inputs change; the active one when left out. */
  variant: z.string().optional(),
});
export type SetBenchArgs = z.infer<typeof setBenchArgs>;

/**
 * Sets (or clears) one variant's bench inputs. The section is untouched, so nothing is regenerated or solved again.
 * Returns `doc` itself when the inputs are the same number for number (no undo step for a value typed again).
 */
export function setBench(doc: PortDocument, { bench, variant }: SetBenchArgs): PortDocument {
  const edit = 'setBench';
  const { index, variant: before } = namedOrActiveVariant(doc, variant, edit);
  return sameBench(before.bench, bench) ? doc : withVariantKey(doc, index, 'bench', bench);
}

/** The same inputs: the same keys with the same values (both absent counts as the same). */
export function sameBench(a: BenchInputs | undefined, b: BenchInputs | undefined): boolean {
  if (a === undefined || b === undefined) return a === b;
  const keysA = presentKeys(a), keysB = presentKeys(b);
  return keysA.length === keysB.length && keysA.every((key) => Object.is(a[key], b[key]));
}

function presentKeys(bench: BenchInputs): (keyof BenchInputs)[] {
  return (Object.keys(bench) as (keyof BenchInputs)[]).filter((key) => bench[key] !== undefined);
}

/**
 * True when `after` differs from `before` in bench inputs and nothing else (no shape, part, name, unit or setting):
 * such a change has nothing to solve again. Objects are compared by identity, as edits share what they leave alone.
 */
export function benchOnlyChange(before: PortDocument, after: PortDocument): boolean {
  if (before === after || before.variants.length !== after.variants.length) return false;
  const { variants: _a, ...restBefore } = before;
  const { variants: _b, ...restAfter } = after;
  if ((Object.keys(restAfter) as (keyof typeof restAfter)[]).some((key) => restBefore[key] !== restAfter[key])) return false;
  let benchChanged = false;
  for (let i = 0; i < after.variants.length; i++) {
    const a = before.variants[i], b = after.variants[i];
    if (a === b) continue;
    if (a.name !== b.name || a.note !== b.note || a.parts !== b.parts || a.section !== b.section) return false;
    if (!sameBench(a.bench, b.bench)) benchChanged = true;
  }
  return benchChanged;
}

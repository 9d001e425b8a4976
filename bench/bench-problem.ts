/** The benchmark's port section: the tight short-side street-port sample, as the solver's flow domain. */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { loadDocument } from '../src/document/index.ts';
import { defaultTolerance, sectionToDomain } from '../src/geometry/index.ts';
import type { FlowDomain } from '../src/solver/types.ts';

export const SAMPLE = 'samples/street-tight-short-side.json';

/** The active variant of the sample, flattened to the geometry kernel's default tolerance. */
export function benchDomain(): FlowDomain {
  const path = fileURLToPath(new URL(`../${SAMPLE}`, import.meta.url));
  const doc = loadDocument(readFileSync(path, 'utf8'));
  const variant = doc.variants.find((v) => v.name === doc.activeVariant) ?? doc.variants[0];
  return sectionToDomain(variant.section, defaultTolerance(variant.section), doc.units);
}

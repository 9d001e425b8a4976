/** The benchmark's port section: the tight short-side street-port sample, set up by the study pipeline as the app and command set it up. */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { loadDocument } from '../src/document/index.ts';
import type { FlowDomain } from '../src/solver/types.ts';
import { caseSetup } from '../src/study/index.ts';

export const SAMPLE = 'samples/street-tight-short-side.json';

/** The active variant of the sample as the solver's domain for a grid of about `cells` cells. */
export function benchDomain(cells: number): FlowDomain {
  const path = fileURLToPath(new URL(`../${SAMPLE}`, import.meta.url));
  return caseSetup(loadDocument(readFileSync(path, 'utf8')), { targetCells: cells }).domain;
}

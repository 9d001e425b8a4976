/** A variant's flow domain as `solve` solves it and `check` judges it: parts regenerated, default chordal tolerance. */

import type { Variant } from '../document/types.ts';
import { defaultTolerance, sectionToDomain } from '../geometry/index.ts';
import { sectionForSolver } from '../parts/index.ts';
import type { FlowDomain } from '../solver/types.ts';

/** Throws GeometryError or PartsError (both the porter's to fix); anything else is a fault. */
export function variantDomain(variant: Variant, units: string): FlowDomain {
  // Regenerate the parts: a hand-edited file's stored geometry may no longer match its numbers.
  const section = sectionForSolver(variant);
  return sectionToDomain(section, defaultTolerance(section), units);
}

/** One case pipeline: (document, variant, lift, grid) -> the flow domain the solver solves, for the app and the command alike. */

import type { PortDocument, Section, Variant } from '../document/types.ts';
import { sectionBounds, sectionToDomain } from '../geometry/index.ts';
import { deckLine, sectionForSolver } from '../parts/index.ts';
import type { ReadingOptions } from '../solver/reading/index.ts';
import { gridFrame } from '../solver/rasterise/frame.ts';
import type { FlowDomain } from '../solver/types.ts';
import { StudyError } from './errors.ts';

/** What to solve. */
export interface CaseSpec {
  /** Variant name; default the document's active variant. */
  readonly variant?: string;
  /** Valve lift, document units, in place of the variant's own; ignored when the variant has no valve part. */
  readonly lift?: number;
  /** Target grid cells over the section's bounding box (see CELLS_BY_DETAIL). */
  readonly targetCells: number;
}

/** A case ready for the solver. */
export interface CaseSetup {
  /** The variant as solved (the lift applied). */
  readonly variant: Variant;
  /** Its section with the parts regenerated from their numbers. */
  readonly section: Section;
  readonly domain: FlowDomain;
  readonly targetCells: number;
  /** Chordal tolerance the curved edges were flattened within, document units. */
  readonly flattenTolerance: number;
  /** The reading options that come from the document (units, and the deck past which nothing is judged); a caller
   * adds its own settings (slow share, inlet speed) on top. */
  readonly reading: ReadingOptions;
}

/**
 * Sets up one case. Parts are always regenerated from their numbers (a hand-edited file's stored geometry may no
 * longer match them), and curved edges are flattened within a tolerance tied to this grid's cell size, so
 * the same file on the same grid is the same problem wherever it is solved.
 * Throws StudyError (no such variant), GeometryError or PartsError: all the porter's to fix.
 */
export function caseSetup(doc: PortDocument, spec: CaseSpec): CaseSetup {
  const variant = withLift(findVariant(doc, spec.variant ?? doc.activeVariant), spec.lift);
  const section = sectionForSolver(variant);
  const flattenTolerance = solveFlattenTolerance(section, spec.targetCells);
  const domain = sectionToDomain(section, flattenTolerance, doc.units);
  const reading: ReadingOptions = { units: doc.units, deck: deckLine(variant) ?? undefined };
  return { variant, section, domain, targetCells: spec.targetCells, flattenTolerance, reading };
}

/**
 * The chordal tolerance for solving `section` on about `targetCells` cells: h^2 / D, with h the cell size and D the
 * box's diagonal. The chords lie inside an arc, so a tolerance in proportion to h would shift curved walls by a
 * first-order amount and spoil the scheme's second order; h^2 / D shrinks as fast as the discretisation error
 * (on the standard grid of a 100 mm port it is about h / 700, and an arc a few cells in radius still gets
 * hundreds of chords a turn).
 */
export function solveFlattenTolerance(section: Section, targetCells: number): number {
  const b = sectionBounds(section);
  const { h } = gridFrame([b.minX, b.minY, b.maxX, b.maxY], targetCells);
  const diagonal = Math.hypot(b.maxX - b.minX, b.maxY - b.minY);
  const tolerance = (h * h) / (10 * diagonal);
  // An empty or degenerate box gives no cell size; sectionToDomain then reports the real problem.
  return Number.isFinite(tolerance) && tolerance > 0 ? tolerance : 1;
}

function findVariant(doc: PortDocument, name: string): Variant {
  const variant = doc.variants.find((v) => v.name === name);
  if (variant !== undefined) return variant;
  throw new StudyError('no-variant', `There is no variant "${name}"; the variants are: ${doc.variants.map((v) => `"${v.name}"`).join(', ')}.`);
}

function withLift(variant: Variant, lift: number | undefined): Variant {
  const valve = variant.parts?.valve;
  if (lift === undefined || valve === undefined) return variant;
  if (!(lift >= 0) || !Number.isFinite(lift)) throw new StudyError('bad-lift', `A lift must be zero or more; got ${lift}.`);
  return { ...variant, parts: { ...variant.parts, valve: { ...valve, lift } } };
}

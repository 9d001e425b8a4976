/** One case pipeline: (document, variant, lift, grid) -> the flow domain the solver solves, for the app and the command alike. */

import type { PortDocument, Section, Variant } from '../document/types.ts';
import { sectionToDomain } from '../geometry/index.ts';
import { deckLine, sectionForSolver } from '../parts/index.ts';
import type { ReadingOptions } from '../solver/reading/index.ts';
import type { FlowDomain } from '../solver/types.ts';
import { StudyError } from './errors.ts';
import { solveFlattenTolerance } from './flatten-tolerance.ts';
import { variantWidthDepth } from './width-depth.ts';
import { axisymmetricDomain } from './axisymmetric-domain.ts';


/** What to solve. */
export interface CaseSpec {
  /** Variant name; default the document's active variant. */
  readonly variant?: string;
  /** Valve lift, document units, in place of the variant's own; ignored when the variant has no valve part. */
  readonly lift?: number;
  /** Target grid cells over the section's bounding box (see CELLS_BY_DETAIL). */
  readonly targetCells: number;
}

/** Which depth a case is solved with. */
export type CaseModel = 'plane' | 'width' | 'axisymmetric';

/** A case ready for the solver. */
export interface CaseSetup {
  /** The variant as solved (the lift applied). */
  readonly variant: Variant;
  /** Its section with the parts regenerated from their numbers. */
  readonly section: Section;
  /**
   * With a width profile, `domain.depth` is the sampled width (src/study/width-depth.ts); with a round model the
   * domain is the kept side of the axis and the depth b = 2 pi r about it (src/study/axisymmetric-domain.ts).
   */
  readonly domain: FlowDomain;
  /** 'plane': per unit depth; 'width': the variant's width profile gives the passage depth; 'axisymmetric': round. */
  readonly model: CaseModel;
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
 * With a width profile the depth is built from a plane solve of the section on a coarse grid (width-depth.ts); a
 * round variant is clipped to the kept side of its axis (axisymmetric-domain.ts).
 * Throws StudyError (no such variant, a width profile on a section that does not solve, a round variant without a
 * usable side of its axis), GeometryError or
 * PartsError: all the porter's to fix.
 */
export function caseSetup(doc: PortDocument, spec: CaseSpec): CaseSetup {
  const variant = withLift(findVariant(doc, spec.variant ?? doc.activeVariant), spec.lift);
  const section = sectionForSolver(variant);
  const flattenTolerance = solveFlattenTolerance(section, spec.targetCells);
  const plane = sectionToDomain(section, flattenTolerance, doc.units);
  const { domain, model } = modelDomain(variant, section, plane, doc.units);
  const reading: ReadingOptions = { units: doc.units, deck: deckLine(variant) ?? undefined };
  return { variant, section, domain, model, targetCells: spec.targetCells, flattenTolerance, reading };
}

function modelDomain(variant: Variant, section: Section, plane: FlowDomain, units: string): { domain: FlowDomain; model: CaseModel } {
  if (variant.axisymmetric !== undefined) return { domain: axisymmetricDomain(variant, plane), model: 'axisymmetric' };
  const depth = variantWidthDepth(variant, section, units);
  return depth === undefined ? { domain: plane, model: 'plane' } : { domain: { ...plane, depth }, model: 'width' };
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

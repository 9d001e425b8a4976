/** The chordal tolerance curved edges are flattened within for a solve on a given grid. */

import type { Section } from '../document/types.ts';
import { sectionBounds } from '../geometry/index.ts';
import { gridFrame } from '../solver/rasterise/frame.ts';

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

/** Snapping a dragged point to a grid and into line with its neighbours, saying what it snapped to. */

import type { Point, Section, Units } from '../document/types.ts';
import type { PointRef } from './refs.ts';
import { findOutline, wrap } from './section-access.ts';

/** Grid steps a porter expects, document units: half a millimetre, or twenty thou. [practice] */
export const DEFAULT_GRID_STEP: Readonly<Record<Units, number>> = { mm: 0.5, inch: 0.02 };

export interface SnapSettings {
  /** Grid step, document units; 0 or absent: no grid. */
  readonly gridStep?: number;
  /** How near (document units) a coordinate must come to a neighbour's to line up with it; 0 or absent: never. */
  readonly alignTolerance?: number;
}

/** What one coordinate snapped to. `aligned`: it took the coordinate of `with`, so a guide runs from there. */
export type AxisSnap =
  | { readonly kind: 'free' }
  | { readonly kind: 'grid'; readonly step: number }
  | { readonly kind: 'aligned'; readonly with: Point };

export interface SnapResult {
  /** The snapped point, document units. */
  readonly at: Point;
  /** x snapped: `aligned` means straight above or below `with` (a vertical guide). */
  readonly x: AxisSnap;
  /** y snapped: `aligned` means level with `with` (a horizontal guide). */
  readonly y: AxisSnap;
}

/**
 * Snaps `p` (document units). Each coordinate lines up with the nearest neighbour's within `alignTolerance`;
 * failing that it goes to the nearest grid line. Lining up wins because it is what the porter is aiming at.
 * Example: p (10.23, 4.9), step 0.5, neighbour (12, 5.1), tolerance 0.3 -> (10, 5.1): x grid, y aligned.
 */
export function snapPoint(p: Point, settings: SnapSettings, neighbours: readonly Point[] = []): SnapResult {
  const x = snapAxis(p[0], 0, settings, neighbours);
  const y = snapAxis(p[1], 1, settings, neighbours);
  return { at: [x.value, y.value], x: x.snap, y: y.snap };
}

function snapAxis(value: number, axis: 0 | 1, settings: SnapSettings, neighbours: readonly Point[]): { value: number; snap: AxisSnap } {
  const tolerance = settings.alignTolerance ?? 0;
  let best: Point | null = null;
  for (const n of neighbours) {
    const gap = Math.abs(n[axis] - value);
    if (gap <= tolerance && tolerance > 0 && (best === null || gap < Math.abs(best[axis] - value))) best = n;
  }
  if (best !== null) return { value: best[axis], snap: { kind: 'aligned', with: best } };
  const step = settings.gridStep ?? 0;
  if (step > 0) return { value: roundToStep(value, step), snap: { kind: 'grid', step } };
  return { value, snap: { kind: 'free' } };
}

/** `value` to the nearest multiple of `step`, tidied to 12 significant digits (0.02 * 15 is 0.3, not 0.30000000000000004). */
export function roundToStep(value: number, step: number): number {
  return Number((Math.round(value / step) * step).toPrecision(12));
}

/**
 * The points a dragged point lines up with: a corner's two neighbouring corners; an arc's through point's
 * two ends; a via point's edge ends and neighbouring vias. Empty for a reference that does not exist.
 */
export function snapNeighbours(section: Section, ref: PointRef): Point[] {
  const outline = findOutline(section, ref.island);
  if (outline === undefined) return [];
  const n = outline.vertices.length;
  const corner = (k: number) => outline.vertices[wrap(k, n)].at;
  if (ref.kind === 'vertex') return ref.vertex < n ? [corner(ref.vertex - 1), corner(ref.vertex + 1)] : [];
  const edge = outline.edges[ref.edge];
  if (edge === undefined) return [];
  const ends = [corner(ref.edge), corner(ref.edge + 1)];
  if (ref.kind === 'through' || edge.kind !== 'curve') return ends;
  return [...ends, ...[edge.via[ref.via - 1], edge.via[ref.via + 1]].filter((p) => p !== undefined)];
}

/** Flattened edges for picking and corner directions, through the geometry kernel so they match what is drawn. */

import type { Outline, Point } from '../document/types.ts';
import { flattenEdge } from '../geometry/flatten-edge.ts';
import { edgeEnds } from './edge-shape.ts';
import { distance, nearestOnSegment } from './vec.ts';

/** The parts of the kernel's flattened edge the editor uses. */
export interface FlatEdge {
  /** x0, y0, x1, y1, ... document units, from the edge's vertex to the next. */
  readonly xy: Float64Array;
  /** Unit direction leaving the start vertex along the edge. */
  readonly startDir: readonly [number, number];
  /** Unit direction leaving the end vertex back along the edge. */
  readonly endDir: readonly [number, number];
}

/**
 * Edge `index` of `outline` as a polyline within `tol` (document units) of the true edge.
 * An edge the kernel refuses (e.g. an arc through one of its ends) comes back as its straight chord:
 * picking must keep working while the porter fixes it.
 */
export function flatEdge(outline: Outline, index: number, tol: number): FlatEdge {
  const [start, end] = edgeEnds(outline, index);
  try {
    return flattenEdge(start, outline.edges[index], end, tol, { edgeIndex: index });
  } catch {
    const len = distance(start, end) || 1;
    const dir: [number, number] = [(end[0] - start[0]) / len, (end[1] - start[1]) / len];
    return { xy: Float64Array.of(start[0], start[1], end[0], end[1]), startDir: dir, endDir: [-dir[0], -dir[1]] };
  }
}

/** A chordal tolerance fine enough for directions at the ends of edge `index`: 1e-4 of its chord. */
export function directionTolerance(outline: Outline, index: number): number {
  const [start, end] = edgeEnds(outline, index);
  return Math.max(1e-4 * distance(start, end), 1e-12);
}

/** Nearest point to `p` on a polyline (x, y pairs), with its distance. */
export function nearestOnPolyline(xy: Float64Array, p: Point): { at: Point; distance: number } {
  let best: Point = [xy[0], xy[1]];
  let bestDistance = distance(best, p);
  for (let k = 0; k + 3 < xy.length; k += 2) {
    const { at } = nearestOnSegment(p, [xy[k], xy[k + 1]], [xy[k + 2], xy[k + 3]]);
    const d = distance(at, p);
    if (d < bestDistance) { best = at; bestDistance = d; }
  }
  return { at: best, distance: bestDistance };
}

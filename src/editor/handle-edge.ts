/** Edges as handles: the nearest point of an edge to the pointer, and an edge's middle. */

import type { Outline, Point } from '../document/types.ts';
import { directionTolerance, flatEdge, nearestOnPolyline } from './edge-flat.ts';
import { arcThroughPoints } from '../geometry/circle-arc.ts';
import { arcFractionNearest, arcPointAt, edgeEnds } from './edge-shape.ts';
import { distance, nearestOnSegment } from './vec.ts';

/**
 * The point of edge `index` nearest `p`, and its distance: exact for lines and arcs; for curves on a polyline
 * within `tol` (document units) of the curve.
 */
export function nearestOnEdge(outline: Outline, index: number, p: Point, tol: number): { at: Point; distance: number } {
  const edge = outline.edges[index];
  const [start, end] = edgeEnds(outline, index);
  if (edge.kind === 'curve' && edge.via.length > 0) return nearestOnPolyline(flatEdge(outline, index, tol).xy, p);
  const arc = edge.kind === 'arc' ? arcThroughPoints(start, edge.through, end) : null;
  const at = arc === null ? nearestOnSegment(p, start, end).at : arcPointAt(arc, arcFractionNearest(arc, p));
  return { at, distance: distance(at, p) };
}

/** The point halfway along edge `index`, by length. */
export function edgeMiddle(outline: Outline, index: number): Point {
  const xy = flatEdge(outline, index, 100 * directionTolerance(outline, index)).xy;
  let total = 0;
  for (let k = 0; k + 3 < xy.length; k += 2) total += Math.hypot(xy[k + 2] - xy[k], xy[k + 3] - xy[k + 1]);
  let left = total / 2;
  for (let k = 0; k + 3 < xy.length; k += 2) {
    const len = Math.hypot(xy[k + 2] - xy[k], xy[k + 3] - xy[k + 1]);
    if (left <= len && len > 0) return [xy[k] + ((xy[k + 2] - xy[k]) * left) / len, xy[k + 1] + ((xy[k + 3] - xy[k + 1]) * left) / len];
    left -= len;
  }
  return [xy[xy.length - 2], xy[xy.length - 1]];
}

/** Joining the two edges at a corner into one when the corner is deleted: the geometry behind deleteVertex. */

import type { Edge, Point } from '../document/types.ts';
import { arcThroughPoints } from '../geometry/circle-arc.ts';
import { arcPointAt, innerPoints } from './edge-shape.ts';
import { arcLike, curveLike, lineLike } from './edge-kinds.ts';

/** Relative tolerance for two arcs to count as one circle (a split leaves them equal to rounding). */
const SAME_CIRCLE = 1e-6;

/**
 * The edge from `start` to `end` replacing `first` (start -> corner) and `second` (corner -> end).
 * It keeps `first`'s role and wall name. Two lines give a line; two arcs on one circle give that circle's arc
 * through its middle (so a split arc joins back); anything else gives a curve through the points of both
 * edges and the old corner, so the outline keeps close to its shape.
 */
export function mergeEdges(start: Point, first: Edge, corner: Point, second: Edge, end: Point): Edge {
  if (first.kind === 'line' && second.kind === 'line') return lineLike(first);
  if (first.kind === 'arc' && second.kind === 'arc') {
    const joined = joinArcs(start, first.through, corner, second.through, end);
    if (joined !== null) return arcLike(first, joined);
  }
  return curveLike(first, [...innerPoints(first), corner, ...innerPoints(second)]);
}

/** Middle of the joined arc when both arcs lie on one circle; otherwise null. */
function joinArcs(start: Point, through1: Point, corner: Point, through2: Point, end: Point): Point | null {
  const a = arcThroughPoints(start, through1, corner), b = arcThroughPoints(corner, through2, end);
  if (a === null || b === null) return null;
  const r = Math.max(a.r, b.r);
  if (Math.hypot(a.cx - b.cx, a.cy - b.cy) > SAME_CIRCLE * r || Math.abs(a.r - b.r) > SAME_CIRCLE * r) return null;
  if (Math.sign(a.sweep) !== Math.sign(b.sweep)) return null;
  const joined = arcThroughPoints(start, corner, end);
  return joined === null ? null : arcPointAt(joined, 0.5);
}

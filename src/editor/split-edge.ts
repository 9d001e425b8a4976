/** Splitting an edge in two at a point on it, keeping its shape: the geometry behind insertVertex. */

import type { ArcEdge, CurveEdge, Edge, Point } from '../document/types.ts';
import { arcThroughPoints } from '../geometry/circle-arc.ts';
import { arcFractionNearest, arcPointAt } from './edge-shape.ts';
import { arcLike, curveLike, lineLike } from './edge-kinds.ts';
import { distance, lerp, nearestOnSegment } from './vec.ts';

/** The new corner and the two edges that replace the split one (first from the old start, second to the old end). */
export interface EdgeSplit {
  readonly vertex: Point;
  readonly first: Edge;
  readonly second: Edge;
}

/**
 * Splits the edge running `start` -> `end` at the point of it nearest `near`.
 * - line: two lines meeting at the nearest point of the segment;
 * - arc: two arcs on the same circle, each through its own middle;
 * - curve: cut at the via point nearest `near`, which becomes the corner; a piece left with no via is a line;
 *   a curve with no via is straight and splits like a line.
 * Both pieces keep the edge's role and wall name.
 */
export function splitEdge(start: Point, edge: Edge, end: Point, near: Point): EdgeSplit {
  if (edge.kind === 'arc') return splitArc(start, edge, end, near);
  if (edge.kind === 'curve' && edge.via.length > 0) return splitCurve(edge, near);
  const vertex = nearestOnSegment(near, start, end).at;
  return { vertex, first: lineLike(edge), second: lineLike(edge) };
}

function splitArc(start: Point, edge: ArcEdge, end: Point, near: Point): EdgeSplit {
  const arc = arcThroughPoints(start, edge.through, end);
  if (arc === null) {
    // Through point in line with the ends: a straight arc; keep each piece straight through its middle.
    const { at, t } = nearestOnSegment(near, start, end);
    return { vertex: at, first: arcLike(edge, lerp(start, end, t / 2)), second: arcLike(edge, lerp(start, end, (1 + t) / 2)) };
  }
  const t = arcFractionNearest(arc, near);
  return {
    vertex: arcPointAt(arc, t),
    first: arcLike(edge, arcPointAt(arc, t / 2)),
    second: arcLike(edge, arcPointAt(arc, (1 + t) / 2)),
  };
}

function splitCurve(edge: CurveEdge, near: Point): EdgeSplit {
  let cut = 0;
  for (let k = 1; k < edge.via.length; k++) {
    if (distance(edge.via[k], near) < distance(edge.via[cut], near)) cut = k;
  }
  const before = edge.via.slice(0, cut), after = edge.via.slice(cut + 1);
  return {
    vertex: edge.via[cut],
    first: before.length > 0 ? curveLike(edge, before) : lineLike(edge),
    second: after.length > 0 ? curveLike(edge, after) : lineLike(edge),
  };
}

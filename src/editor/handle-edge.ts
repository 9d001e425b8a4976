/** Edges as handles: the nearest point of an edge to the pointer, and an edge's middle. */

import type { Outline, Point } from '../document/types.ts';
import { polylineLength, pointAtLength } from '../geometry/arc-length.ts';
import { arcThroughPoints } from '../geometry/circle-arc.ts';
import { directionTolerance, flatEdge, nearestOnPolyline } from './edge-flat.ts';
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
  const middle = pointAtLength(xy, polylineLength(xy) / 2);
  return [middle.x, middle.y];
}

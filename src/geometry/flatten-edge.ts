/** Flattening one whole outline edge (line, arc through three points, smooth curve) within a chordal tolerance. */

import type { Edge, Point } from '../document/types.ts';
import { edgePath, type EdgePath, type EdgePlace } from './edge-path.ts';

/** A flattened edge. */
export interface FlatEdge {
  /** x0, y0, x1, y1, ... length units; first point is the edge's vertex, last the next vertex, both exact. */
  readonly xy: Float64Array;
  /** Path parameter of each point, 0 at the first vertex and 1 at the next. */
  readonly t: Float64Array;
  /** Unit direction leaving the start vertex along the edge. */
  readonly startDir: [number, number];
  /** Unit direction leaving the end vertex back along the edge. */
  readonly endDir: [number, number];
}

/**
 * Flattens the edge from `start` to `end` so that every chord lies within `tol` (length units) of the true edge:
 * arcs by equal chords of sagitta <= tol, curves by halving each piece until its quarter points lie within tol.
 * A curve with no `via` points, or an arc with `through` in line between its ends, is a straight line.
 * Throws GeometryError 'bad-arc' or 'zero-length' (see edgePath). The caller checks start !== end beforehand.
 */
export function flattenEdge(start: Point, edge: Edge, end: Point, tol: number, place: EdgePlace): FlatEdge {
  return flattenPath(edgePath(start, edge, end, place), tol);
}

/** The whole of `path` flattened, with its end directions. */
export function flattenPath(path: EdgePath, tol: number): FlatEdge {
  const { xy, t } = path.flatten(0, 1, tol);
  const d0 = path.derivative(0), d1 = path.derivative(1);
  return { xy, t, startDir: unit(d0[0], d0[1]), endDir: unit(-d1[0], -d1[1]) };
}

function unit(x: number, y: number): [number, number] {
  const len = Math.hypot(x, y);
  return [x / len, y / len];
}

export type { EdgePlace } from './edge-path.ts';

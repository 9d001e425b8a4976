/** Flattening one outline edge (line, arc through three points, smooth curve) into a polyline within a chordal tolerance. */

import type { Edge, Point } from '../document/types.ts';
import { arcPoints, arcSegmentCount, arcTangent, arcThroughPoints, type CircleArc } from './circle-arc.ts';
import { catmullRomSpans, flattenSpan } from './catmull-rom.ts';
import { GeometryError, outlineLabel } from './errors.ts';

/** Which edge is being flattened, for error messages. */
export interface EdgePlace {
  readonly edgeIndex: number;
  /** Absent for the section outline. */
  readonly islandName?: string;
}

/** A flattened edge. */
export interface FlatEdge {
  /** x0, y0, x1, y1, ... length units; first point is the edge's vertex, last the next vertex, both exact. */
  readonly xy: Float64Array;
  /** Unit direction leaving the start vertex along the edge. */
  readonly startDir: [number, number];
  /** Unit direction leaving the end vertex back along the edge. */
  readonly endDir: [number, number];
}

/**
 * Flattens the edge from `start` to `end` so that every chord lies within `tol` (length units) of the true edge.
 * Throws GeometryError 'bad-arc' for an arc whose `through` point sits on an end or on the line outside the ends,
 * and 'zero-length' for a curve with two consecutive points alike.
 * The caller checks start !== end beforehand.
 */
export function flattenEdge(start: Point, edge: Edge, end: Point, tol: number, place: EdgePlace): FlatEdge {
  if (edge.kind === 'arc') return flattenArcEdge(start, edge.through, end, tol, place);
  if (edge.kind === 'curve' && edge.via.length > 0) return flattenCurveEdge([start, ...edge.via, end], tol, place);
  return lineEdge(start, end);
}

function lineEdge(start: Point, end: Point): FlatEdge {
  const dx = end[0] - start[0], dy = end[1] - start[1];
  const len = Math.hypot(dx, dy);
  return {
    xy: Float64Array.of(start[0], start[1], end[0], end[1]),
    startDir: [dx / len, dy / len],
    endDir: [-dx / len, -dy / len],
  };
}

/** The arc of an arc edge, or null when its three points are collinear (then the edge is a line). */
export function arcOfEdge(start: Point, through: Point, end: Point, place: EdgePlace): CircleArc | null {
  const chord = Math.hypot(end[0] - start[0], end[1] - start[1]);
  const near = 1e-9 * chord;
  if (Math.hypot(through[0] - start[0], through[1] - start[1]) <= near || Math.hypot(through[0] - end[0], through[1] - end[1]) <= near) {
    throw badArc('its middle point sits on one of its ends', through, place);
  }
  const arc = arcThroughPoints(start, through, end);
  if (arc !== null) return arc;
  const along = (through[0] - start[0]) * (end[0] - start[0]) + (through[1] - start[1]) * (end[1] - start[1]);
  if (along < 0 || along > chord * chord) throw badArc('its middle point lies in line with its ends but outside them', through, place);
  return null;
}

function flattenArcEdge(start: Point, through: Point, end: Point, tol: number, place: EdgePlace): FlatEdge {
  const arc = arcOfEdge(start, through, end, place);
  if (arc === null) return lineEdge(start, end);
  const xy = arcPoints(arc, arcSegmentCount(arc, tol));
  snapEnds(xy, start, end);
  const t0 = arcTangent(arc, 0), t1 = arcTangent(arc, 1);
  return { xy, startDir: t0, endDir: [-t1[0], -t1[1]] };
}

function flattenCurveEdge(points: readonly Point[], tol: number, place: EdgePlace): FlatEdge {
  for (let k = 0; k + 1 < points.length; k++) {
    const a = points[k], b = points[k + 1];
    if (a[0] === b[0] && a[1] === b[1]) {
      throw new GeometryError('zero-length',
        `Edge ${place.edgeIndex + 1} of ${outlineLabel(place.islandName)} is a curve with two consecutive points at the same place; remove one.`,
        { where: a, edgeIndex: place.edgeIndex, islandName: place.islandName });
    }
  }
  const spans = catmullRomSpans(points);
  const out: number[] = [points[0][0], points[0][1]];
  for (const s of spans) flattenSpan(s, tol, out);
  const xy = Float64Array.from(out);
  snapEnds(xy, points[0], points[points.length - 1]);
  const first = spans[0], last = spans[spans.length - 1];
  return { xy, startDir: unit(first.d0x, first.d0y), endDir: unit(-last.d1x, -last.d1y) };
}

function snapEnds(xy: Float64Array, start: Point, end: Point): void {
  xy[0] = start[0]; xy[1] = start[1];
  xy[xy.length - 2] = end[0]; xy[xy.length - 1] = end[1];
}

function unit(x: number, y: number): [number, number] {
  const len = Math.hypot(x, y);
  return [x / len, y / len];
}

function badArc(why: string, through: Point, place: EdgePlace): GeometryError {
  return new GeometryError('bad-arc',
    `Edge ${place.edgeIndex + 1} of ${outlineLabel(place.islandName)} is an arc but ${why}; move it off the line between the ends.`,
    { where: through, edgeIndex: place.edgeIndex, islandName: place.islandName });
}

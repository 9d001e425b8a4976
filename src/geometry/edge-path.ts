/** An outline edge as a parametric path on t in [0, 1] (vertex to next vertex): evaluation and flattening of any part. */

import type { Edge, Point } from '../document/types.ts';
import { arcPoints, arcSegmentCount, arcThroughPoints, type CircleArc } from './circle-arc.ts';
import { catmullRomSpans, flattenSpan, spanDerivative, spanPoint, type FlattenSink, type HermiteSpan } from './catmull-rom.ts';
import { GeometryError, outlineLabel } from './errors.ts';

/** Which edge, for error messages. */
export interface EdgePlace {
  readonly edgeIndex: number;
  /** Absent for the section outline. */
  readonly islandName?: string;
}

/** A flattened stretch of an edge. */
export interface PathPolyline {
  /** x0, y0, x1, y1, ... length units. */
  readonly xy: Float64Array;
  /** Path parameter t of each point, increasing. */
  readonly t: Float64Array;
}

export interface EdgePath {
  readonly kind: Edge['kind'];
  /** Point at t (t may stray a little outside [0, 1]: the path's natural continuation). */
  point(t: number): [number, number];
  /** Derivative d(point)/dt at t, length units per unit t. */
  derivative(t: number): [number, number];
  /** Flattened part from t0 to t1 (t0 < t1) within chordal tolerance `tol`; t = 0 and t = 1 land exactly on the vertices. */
  flatten(t0: number, t1: number, tol: number): PathPolyline;
}

/**
 * The path of `edge` from `start` to `end` (which must differ).
 * Throws GeometryError 'bad-arc' for an arc whose `through` point sits on an end or in line outside the ends,
 * and 'zero-length' for a curve with two consecutive points alike.
 */
export function edgePath(start: Point, edge: Edge, end: Point, place: EdgePlace): EdgePath {
  if (edge.kind === 'arc') {
    const arc = arcOfEdge(start, edge.through, end, place);
    return arc === null ? linePath(start, end) : arcPath(arc, start, end);
  }
  if (edge.kind === 'curve' && edge.via.length > 0) return curvePath([start, ...edge.via, end], place);
  return linePath(start, end);
}

function linePath(a: Point, b: Point): EdgePath {
  return new LinePath(a, b);
}

class LinePath implements EdgePath {
  readonly kind = 'line';
  constructor(private readonly a: Point, private readonly b: Point) {}

  point(t: number): [number, number] {
    const { a, b } = this;
    return t === 1 ? [b[0], b[1]] : [a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])];
  }

  derivative(): [number, number] {
    return [this.b[0] - this.a[0], this.b[1] - this.a[1]];
  }

  flatten(t0: number, t1: number): PathPolyline {
    const p = this.point(t0), q = this.point(t1);
    return { xy: Float64Array.of(p[0], p[1], q[0], q[1]), t: Float64Array.of(t0, t1) };
  }
}

function arcPath(arc: CircleArc, start: Point, end: Point): EdgePath {
  return new ArcPath(arc, start, end);
}

class ArcPath implements EdgePath {
  readonly kind = 'arc';
  constructor(private readonly arc: CircleArc, private readonly start: Point, private readonly end: Point) {}

  point(t: number): [number, number] {
    const { cx, cy, r, startAngle, sweep } = this.arc;
    const angle = startAngle + sweep * t;
    return [cx + r * Math.cos(angle), cy + r * Math.sin(angle)];
  }

  derivative(t: number): [number, number] {
    const { r, startAngle, sweep } = this.arc;
    const angle = startAngle + sweep * t;
    return [-r * sweep * Math.sin(angle), r * sweep * Math.cos(angle)];
  }

  flatten(t0: number, t1: number, tol: number): PathPolyline {
    const { arc, start, end } = this;
    const part: CircleArc = { ...arc, startAngle: arc.startAngle + arc.sweep * t0, sweep: arc.sweep * (t1 - t0) };
    const count = arcSegmentCount(part, tol);
    const xy = arcPoints(part, count);
    if (t0 === 0) { xy[0] = start[0]; xy[1] = start[1]; }
    if (t1 === 1) { xy[2 * count] = end[0]; xy[2 * count + 1] = end[1]; }
    const t = new Float64Array(count + 1);
    for (let k = 0; k <= count; k++) t[k] = t0 + ((t1 - t0) * k) / count;
    return { xy, t };
  }
}

function curvePath(points: readonly Point[], place: EdgePlace): EdgePath {
  for (let k = 0; k + 1 < points.length; k++) {
    const a = points[k], b = points[k + 1];
    if (a[0] === b[0] && a[1] === b[1]) {
      throw new GeometryError('zero-length',
        `Edge ${place.edgeIndex + 1} of ${outlineLabel(place.islandName)} is a curve with two consecutive points at the same place; remove one.`,
        { where: a, edgeIndex: place.edgeIndex, islandName: place.islandName });
    }
  }
  return new CurvePath(points, catmullRomSpans(points));
}

/** Span k of m covers t in [k / m, (k + 1) / m]. */
class CurvePath implements EdgePath {
  readonly kind = 'curve';
  constructor(private readonly points: readonly Point[], private readonly spans: readonly HermiteSpan[]) {}

  /** [span index, u within the span] at t; outside [0, 1] the end spans continue. */
  private locate(t: number): [number, number] {
    const m = this.spans.length;
    const k = Math.min(m - 1, Math.max(0, Math.floor(t * m)));
    return [k, t * m - k];
  }

  point(t: number): [number, number] {
    const [k, u] = this.locate(t);
    return spanPoint(this.spans[k], u, [0, 0]);
  }

  derivative(t: number): [number, number] {
    const [k, u] = this.locate(t);
    const m = this.spans.length, d = spanDerivative(this.spans[k], u, [0, 0]);
    return [d[0] * m, d[1] * m];
  }

  flatten(t0: number, t1: number, tol: number): PathPolyline {
    const { spans, points } = this;
    const m = spans.length;
    const [k0, u0] = this.locate(t0);
    let [k1, u1] = t1 >= 1 ? [m - 1, 1] : this.locate(t1);
    if (u1 === 0 && k1 > k0) { k1 -= 1; u1 = 1; } // ending on a span boundary: finish the span before
    const first = spanPoint(spans[k0], u0, [0, 0]);
    const sink: FlattenSink = { xy: [first[0], first[1]], u: [t0 * m] };
    for (let k = k0; k <= k1; k++) {
      const before = sink.u.length;
      flattenSpan(spans[k], tol, sink, k === k0 ? u0 : 0, k === k1 ? u1 : 1);
      for (let j = before; j < sink.u.length; j++) sink.u[j] += k; // span u to curve parameter x m
    }
    const xy = Float64Array.from(sink.xy);
    if (t0 === 0) { xy[0] = points[0][0]; xy[1] = points[0][1]; }
    if (t1 >= 1) { xy[xy.length - 2] = points[m][0]; xy[xy.length - 1] = points[m][1]; }
    const t = Float64Array.from(sink.u);
    for (let j = 0; j < t.length; j++) t[j] /= m;
    return { xy, t };
  }
}

/** The arc of an arc edge, or null when its three points are collinear with `through` between the ends (a line). */
function arcOfEdge(start: Point, through: Point, end: Point, place: EdgePlace): CircleArc | null {
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

function badArc(why: string, through: Point, place: EdgePlace): GeometryError {
  return new GeometryError('bad-arc',
    `Edge ${place.edgeIndex + 1} of ${outlineLabel(place.islandName)} is an arc but ${why}; move it off the line between the ends.`,
    { where: through, edgeIndex: place.edgeIndex, islandName: place.islandName });
}

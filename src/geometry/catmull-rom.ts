/**
 * Centripetal Catmull-Rom curves through a list of points, written span by span as cubic Hermite pieces.
 * Centripetal knots (spacing sqrt of chord length) keep the curve free of cusps and self-loops inside a span
 * (Yuksel, Schaefer & Keyser, "Parameterization and applications of Catmull-Rom curves", CAD 43, 2011).
 */

import type { Point } from '../document/types.ts';

/** One span as a cubic Hermite piece on u in [0, 1]: ends p0, p1 and end derivatives d0, d1 (length units). */
export interface HermiteSpan {
  readonly p0x: number; readonly p0y: number;
  readonly p1x: number; readonly p1y: number;
  readonly d0x: number; readonly d0y: number;
  readonly d1x: number; readonly d1y: number;
}

/**
 * Spans of the centripetal Catmull-Rom curve through `points` (at least 2, no two consecutive alike).
 * The missing neighbours beyond each end are mirror images of the second point, so the curve leaves
 * each end aimed straight at the next point along: easy to predict when placing via points.
 */
export function catmullRomSpans(points: readonly Point[]): HermiteSpan[] {
  const n = points.length;
  const at = (k: number): Point => {
    if (k < 0) return mirror(points[0], points[1]);
    if (k >= n) return mirror(points[n - 1], points[n - 2]);
    return points[k];
  };
  const spans: HermiteSpan[] = [];
  for (let k = 0; k + 1 < n; k++) spans.push(span(at(k - 1), at(k), at(k + 1), at(k + 2)));
  return spans;
}

function mirror(end: Point, inner: Point): Point {
  return [2 * end[0] - inner[0], 2 * end[1] - inner[1]];
}

/** Knot spacing: square root of chord length (centripetal). */
function knotStep(a: Point, b: Point): number {
  return Math.sqrt(Math.hypot(b[0] - a[0], b[1] - a[1]));
}

/** Hermite form of the span p1 -> p2 with neighbours p0, p3 (non-uniform Catmull-Rom tangents). */
function span(p0: Point, p1: Point, p2: Point, p3: Point): HermiteSpan {
  const t01 = knotStep(p0, p1), t12 = knotStep(p1, p2), t23 = knotStep(p2, p3);
  // Tangents per unit knot, then scaled by the span's knot length t12 for u in [0, 1].
  const m1 = (c: 0 | 1): number =>
    ((p1[c] - p0[c]) / t01 - (p2[c] - p0[c]) / (t01 + t12) + (p2[c] - p1[c]) / t12) * t12;
  const m2 = (c: 0 | 1): number =>
    ((p2[c] - p1[c]) / t12 - (p3[c] - p1[c]) / (t12 + t23) + (p3[c] - p2[c]) / t23) * t12;
  return {
    p0x: p1[0], p0y: p1[1], p1x: p2[0], p1y: p2[1],
    d0x: m1(0), d0y: m1(1), d1x: m2(0), d1y: m2(1),
  };
}

/** Point of the span at u in [0, 1], written into `out` as [x, y]. */
export function spanPoint(s: HermiteSpan, u: number, out: [number, number]): [number, number] {
  const u2 = u * u, u3 = u2 * u;
  const h00 = 2 * u3 - 3 * u2 + 1, h10 = u3 - 2 * u2 + u, h01 = -2 * u3 + 3 * u2, h11 = u3 - u2;
  out[0] = h00 * s.p0x + h10 * s.d0x + h01 * s.p1x + h11 * s.d1x;
  out[1] = h00 * s.p0y + h10 * s.d0y + h01 * s.p1y + h11 * s.d1y;
  return out;
}

/** Derivative of the span with respect to u at u, written into `out` (length units per unit u). */
export function spanDerivative(s: HermiteSpan, u: number, out: [number, number]): [number, number] {
  const u2 = u * u;
  const g00 = 6 * u2 - 6 * u, g10 = 3 * u2 - 4 * u + 1, g01 = -g00, g11 = 3 * u2 - 2 * u;
  out[0] = g00 * s.p0x + g10 * s.d0x + g01 * s.p1x + g11 * s.d1x;
  out[1] = g00 * s.p0y + g10 * s.d0y + g01 * s.p1y + g11 * s.d1y;
  return out;
}

/** Where flattened points go: x, y pairs and the span parameter u of each. */
export interface FlattenSink {
  readonly xy: number[];
  readonly u: number[];
}

/**
 * Flattens the span between u0 and u1 into `sink` (the point at u0 excluded, the point at u1 included) so that
 * no chord strays more than `tol` (length units) from the curve. Each piece is checked at its quarter points;
 * the range is first cut in four so an S-bend cannot hide between checks.
 */
export function flattenSpan(s: HermiteSpan, tol: number, sink: FlattenSink, u0 = 0, u1 = 1): void {
  const p: [number, number] = [0, 0];
  spanPoint(s, u0, p);
  let ax = p[0], ay = p[1];
  for (let q = 1; q <= 4; q++) {
    const ua = u0 + ((u1 - u0) * (q - 1)) / 4, ub = u0 + ((u1 - u0) * q) / 4;
    spanPoint(s, ub, p);
    const bx = p[0], by = p[1];
    refine(s, ua, ub, ax, ay, bx, by, tol, sink, 0);
    ax = bx; ay = by;
  }
}

const MAX_DEPTH = 24;

/**
 * How far past the largest of its quarter-point distances a cubic piece can stray from its chord: about 5.4% (an
 * offset f^2 (1 - f) peaks at 4/27 between samples that see 0.1406; the geometry fuzz found 3.7% over 1,200 curves). A piece is accepted when its quarter points lie within
 * tol / QUARTER_POINT_EXCESS, so every chord stays within tol as flattenEdge promises.
 */
const QUARTER_POINT_EXCESS = 1.054;

function refine(
  s: HermiteSpan, u0: number, u1: number, ax: number, ay: number, bx: number, by: number,
  tol: number, sink: FlattenSink, depth: number,
): void {
  const p: [number, number] = [0, 0];
  let worst = 0;
  for (const f of [0.25, 0.5, 0.75]) {
    spanPoint(s, u0 + (u1 - u0) * f, p);
    worst = Math.max(worst, distanceToChord(p[0], p[1], ax, ay, bx, by));
  }
  if (worst * QUARTER_POINT_EXCESS <= tol || depth >= MAX_DEPTH) {
    sink.xy.push(bx, by);
    sink.u.push(u1);
    return;
  }
  const um = 0.5 * (u0 + u1);
  spanPoint(s, um, p);
  const mx = p[0], my = p[1];
  refine(s, u0, um, ax, ay, mx, my, tol, sink, depth + 1);
  refine(s, um, u1, mx, my, bx, by, tol, sink, depth + 1);
}

function distanceToChord(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax, dy = by - ay;
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.min(1, Math.max(0, ((px - ax) * dx + (py - ay) * dy) / len2)) : 0;
  return Math.hypot(px - ax - t * dx, py - ay - t * dy);
}

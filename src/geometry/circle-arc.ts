/** Circular arcs: the circle through three points, chordal flattening, whether an angle lies on an arc. */

import type { Point } from '../document/types.ts';

/** An arc of a circle; angles in radians from +x, sweep signed (counter-clockwise positive). */
export interface CircleArc {
  readonly cx: number;
  readonly cy: number;
  /** Radius, length units. */
  readonly r: number;
  readonly startAngle: number;
  readonly sweep: number;
}

/**
 * The arc from `a` through `m` to `b`, or null when the three points are collinear.
 * Collinear means the sine of the angle at `a` between `m` and `b` is below 1e-12:
 * the radius would exceed about 1e12 times the chord, which flattens to the chord anyway.
 */
export function arcThroughPoints(a: Point, m: Point, b: Point): CircleArc | null {
  const ux = m[0] - a[0], uy = m[1] - a[1];
  const vx = b[0] - a[0], vy = b[1] - a[1];
  const cross = ux * vy - uy * vx;
  if (Math.abs(cross) <= 1e-12 * Math.hypot(ux, uy) * Math.hypot(vx, vy)) return null;
  // Circumcentre relative to a (perpendicular bisectors of a-m and a-b).
  const uu = ux * ux + uy * uy, vv = vx * vx + vy * vy;
  const ox = (vy * uu - uy * vv) / (2 * cross);
  const oy = (ux * vv - vx * uu) / (2 * cross);
  const cx = a[0] + ox, cy = a[1] + oy;
  const r = Math.hypot(ox, oy);
  const startAngle = Math.atan2(a[1] - cy, a[0] - cx);
  const endAngle = Math.atan2(b[1] - cy, b[0] - cx);
  // a, m, b counter-clockwise (cross > 0) means the arc runs counter-clockwise about the centre.
  let sweep = endAngle - startAngle;
  if (cross > 0) { if (sweep <= 0) sweep += 2 * Math.PI; } else if (sweep >= 0) sweep -= 2 * Math.PI;
  return { cx, cy, r, startAngle, sweep };
}

/** Largest angle step (radians) whose chord stays within `tol` of a circle of radius `r`: sagitta r(1 - cos(step/2)) = tol. */
function arcStepAngle(r: number, tol: number): number {
  return 2 * Math.acos(Math.max(-1, 1 - tol / r));
}

/** Number of equal chords that keep the arc within `tol`; at least `minimum`. */
export function arcSegmentCount(arc: CircleArc, tol: number, minimum = 1): number {
  return Math.max(minimum, Math.ceil(Math.abs(arc.sweep) / arcStepAngle(arc.r, tol) - 1e-9));
}

/**
 * Points x0, y0, x1, y1, ... (length units) of `count` equal chords along the arc, both ends included.
 * The ends are computed from the angles; callers snap them to exact vertices when they have them.
 */
export function arcPoints(arc: CircleArc, count: number): Float64Array {
  const out = new Float64Array(2 * (count + 1));
  for (let k = 0; k <= count; k++) {
    const angle = arc.startAngle + (arc.sweep * k) / count;
    out[2 * k] = arc.cx + arc.r * Math.cos(angle);
    out[2 * k + 1] = arc.cy + arc.r * Math.sin(angle);
  }
  return out;
}

/** Whether `angle` lies within the arc's sweep. */
export function arcContainsAngle(arc: CircleArc, angle: number): boolean {
  const turn = 2 * Math.PI;
  const along = arc.sweep >= 0 ? angle - arc.startAngle : arc.startAngle - angle;
  return ((along % turn) + turn) % turn <= Math.abs(arc.sweep);
}

/** Small plane-vector helpers on document points ([x, y], document units). */

import type { Point } from '../document/types.ts';

export function sub(a: Point, b: Point): Point {
  return [a[0] - b[0], a[1] - b[1]];
}

export function add(a: Point, b: Point): Point {
  return [a[0] + b[0], a[1] + b[1]];
}

export function scale(a: Point, k: number): Point {
  return [a[0] * k, a[1] * k];
}

export function dot(a: Point, b: Point): number {
  return a[0] * b[0] + a[1] * b[1];
}

/** z of the 3D cross product: positive when b turns counter-clockwise from a. */
export function cross(a: Point, b: Point): number {
  return a[0] * b[1] - a[1] * b[0];
}

export function distance(a: Point, b: Point): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}

export function lerp(a: Point, b: Point, t: number): Point {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
}

export function unit(a: Point): Point {
  const len = Math.hypot(a[0], a[1]);
  return [a[0] / len, a[1] / len];
}

/** Nearest point to `p` on segment a-b, with its parameter t in [0, 1] from a. */
export function nearestOnSegment(p: Point, a: Point, b: Point): { at: Point; t: number } {
  const d = sub(b, a);
  const len2 = dot(d, d);
  const t = len2 > 0 ? Math.min(1, Math.max(0, dot(sub(p, a), d) / len2)) : 0;
  return { at: lerp(a, b, t), t };
}

/**
 * Whether two points are the same place, to 1e-9 of their size (at least 1e-9 document units):
 * closer than that, an edge between them has no length worth the name.
 */
export function samePlace(a: Point, b: Point): boolean {
  const size = Math.max(1, Math.abs(a[0]), Math.abs(a[1]), Math.abs(b[0]), Math.abs(b[1]));
  return distance(a, b) <= 1e-9 * size;
}

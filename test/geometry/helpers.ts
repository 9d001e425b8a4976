/** Small builders and checks shared by the geometry tests. */

import { expect } from 'vitest';
import type { Edge, Outline, Point, Section } from '../../src/document/types.ts';

/** Asserts |actual - expected| <= delta, with the numbers in the failure message. */
export function assertInDelta(actual: number, expected: number, delta: number): void {
  expect(Math.abs(actual - expected), `${actual} vs ${expected} (delta ${delta})`).toBeLessThanOrEqual(delta);
}

export const wall = (wallName?: string): Edge => (wallName === undefined ? { kind: 'line', role: 'wall' } : { kind: 'line', role: 'wall', wallName });

/** A straight-edged outline through `points`, edges given or all unnamed walls. */
export function polygon(points: readonly Point[], edges?: readonly Edge[], fillets?: readonly number[]): Outline {
  return {
    vertices: points.map((at, i) => (fillets?.[i] ? { at, filletRadius: fillets[i] } : { at })),
    edges: edges ?? points.map(() => wall()),
  };
}

export function section(outline: Outline, islands: Section['islands'] = []): Section {
  return { outline, islands };
}

/** A circle of radius r about (cx, cy): corners at 0, 120 and 240 degrees, arc edges through 60, 180 and 300 degrees. */
export function circleOutline(cx: number, cy: number, r: number): Outline {
  const on = (deg: number): Point => [cx + r * Math.cos((deg * Math.PI) / 180), cy + r * Math.sin((deg * Math.PI) / 180)];
  return {
    vertices: [{ at: on(0) }, { at: on(120) }, { at: on(240) }],
    edges: [60, 180, 300].map((deg): Edge => ({ kind: 'arc', role: 'wall', through: on(deg) })),
  };
}

/** Largest distance of any point of `xy` from the circle (cx, cy, r). */
export function worstOffCircle(xy: Float64Array, cx: number, cy: number, r: number): number {
  let worst = 0;
  for (let k = 0; k < xy.length; k += 2) worst = Math.max(worst, Math.abs(Math.hypot(xy[k] - cx, xy[k + 1] - cy) - r));
  return worst;
}

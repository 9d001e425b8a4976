/** Shared helpers for the boundary-layer tests: evenly spaced samples and one approximate-equality check. */

import { expect } from 'vitest';

/** n evenly spaced values from a to b inclusive. */
export function linspace(n: number, a: number, b: number): Float64Array {
  return Float64Array.from({ length: n }, (_, i) => a + ((b - a) * i) / (n - 1));
}

/** Asserts |actual - expected| <= delta, with a message that shows both numbers. */
export function assertInDelta(actual: number, expected: number, delta: number): void {
  expect(Number.isFinite(actual), `${actual} is not finite`).toBe(true);
  expect(Math.abs(actual - expected), `${actual} vs ${expected} (allowed ${delta})`).toBeLessThanOrEqual(delta);
}

/** Asserts actual is within `share` (e.g. 0.005 for 0.5%) of expected. */
export function assertRelative(actual: number, expected: number, share: number): void {
  assertInDelta(actual, expected, Math.abs(expected) * share);
}

/** Root of f on [lo, hi] by bisection (f(lo) and f(hi) of opposite sign). */
export function bisect(f: (x: number) => number, lo: number, hi: number): number {
  const flo = f(lo);
  if (Math.sign(flo) === Math.sign(f(hi))) throw new Error(`no sign change on [${lo}, ${hi}]`);
  for (let k = 0; k < 200; k++) {
    const mid = 0.5 * (lo + hi);
    if (Math.sign(f(mid)) === Math.sign(flo)) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

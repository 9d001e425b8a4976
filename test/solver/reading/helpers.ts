/** One approximate-equality check for the reading tests. */
import { expect } from 'vitest';

/** Asserts |actual - expected| <= delta, with a message that shows both numbers. */
export function assertInDelta(actual: number, expected: number, delta: number, what = ''): void {
  expect(Number.isFinite(actual), `${what} ${actual} is not finite`).toBe(true);
  expect(Math.abs(actual - expected), `${what} ${actual} vs ${expected} (allowed ${delta})`).toBeLessThanOrEqual(delta);
}

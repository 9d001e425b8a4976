/** One tolerance helper for the breathing tests: compare against a check value to a stated number of decimals. */

import { expect } from 'vitest';

/** Passes when |actual - expected| <= half a unit in the last of `decimals` places (i.e. it rounds to `expected`). */
export function expectRoundsTo(actual: number, expected: number, decimals: number): void {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-15);
}

/** Passes when actual is within `relTol` of expected, relatively. */
export function expectRelClose(actual: number, expected: number, relTol: number): void {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relTol * Math.abs(expected));
}

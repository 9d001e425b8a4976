/** Checks wall samples and gives the speed gradient the integral methods need. */

import { BoundaryLayerInputError } from './errors.ts';

/**
 * Throws BoundaryLayerInputError unless arc length strictly increases, both arrays have the same length,
 * and every speed is finite and >= 0.
 * @param sM arc length along the wall, m, one per sample
 * @param speedMs edge speed, m/s, one per sample
 */
export function checkWallSamples(sM: Float64Array, speedMs: Float64Array): void {
  if (sM.length !== speedMs.length) {
    throw new BoundaryLayerInputError(
      'length-mismatch',
      `The wall has ${sM.length} positions but ${speedMs.length} speeds; each position needs one speed.`,
    );
  }
  for (let i = 0; i < sM.length; i++) {
    if (!Number.isFinite(sM[i])) {
      throw new BoundaryLayerInputError('arc-not-increasing', `Wall position ${i} is not a number.`);
    }
    if (i > 0 && !(sM[i] > sM[i - 1])) {
      throw new BoundaryLayerInputError(
        'arc-not-increasing',
        `Wall positions must run forward along the wall: position ${i} (${sM[i]} m) ` +
          `is not past position ${i - 1} (${sM[i - 1]} m).`,
      );
    }
    if (!Number.isFinite(speedMs[i]) || speedMs[i] < 0) {
      throw new BoundaryLayerInputError(
        'bad-speed',
        `The speed at wall position ${i} is ${speedMs[i]} m/s; speeds along a wall must be zero or more.`,
      );
    }
  }
}

/** Throws BoundaryLayerInputError unless `value` is finite and inside [min, max]. */
export function checkSetting(name: string, value: number, min: number, max: number): void {
  if (!Number.isFinite(value) || value < min || value > max) {
    throw new BoundaryLayerInputError(
      'bad-setting',
      `The ${name} is ${value}; it must lie between ${min} and ${max}.`,
    );
  }
}

/**
 * Speed gradient dU/ds at each sample, 1/s: three-point second-order differences on the uneven spacing,
 * one-sided at the ends (first order when there are only two samples; zero for a single sample).
 * @returns Float64Array, one per sample
 */
export function speedGradient(sM: Float64Array, speedMs: Float64Array): Float64Array {
  const n = sM.length;
  const out = new Float64Array(n);
  if (n < 2) return out;
  if (n === 2) {
    out[0] = out[1] = (speedMs[1] - speedMs[0]) / (sM[1] - sM[0]);
    return out;
  }
  for (let i = 0; i < n; i++) {
    const j = i === 0 ? 1 : i === n - 1 ? n - 2 : i;
    out[i] = quadraticSlope(sM[j - 1], sM[j], sM[j + 1], speedMs[j - 1], speedMs[j], speedMs[j + 1], sM[i]);
  }
  return out;
}

/** Slope at x of the parabola through (a, fa), (b, fb), (c, fc). */
function quadraticSlope(a: number, b: number, c: number, fa: number, fb: number, fc: number, x: number): number {
  return (
    (fa * (2 * x - b - c)) / ((a - b) * (a - c)) +
    (fb * (2 * x - a - c)) / ((b - a) * (b - c)) +
    (fc * (2 * x - a - b)) / ((c - a) * (c - b))
  );
}

/** First sample index with sM[i] >= s (the last sample when s is past the end). */
export function firstSampleAtOrAfter(sM: Float64Array, s: number): number {
  let lo = 0;
  let hi = sM.length - 1;
  if (hi < 0 || sM[hi] < s) return Math.max(hi, 0);
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sM[mid] < s) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

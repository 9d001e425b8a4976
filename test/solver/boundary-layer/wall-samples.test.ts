/** Wall samples: the three-point speed gradient and the first sample at or after an arc length. */
import { describe, expect, it } from 'vitest';
import { firstSampleAtOrAfter, speedGradient } from '../../../src/solver/boundary-layer/wall-samples.ts';
import { assertInDelta } from './helpers.ts';

describe('wall samples', () => {
  it('differentiates a parabola exactly on uneven spacing, ends included', () => {
    // [derived] three-point differences are exact for quadratics.
    const sM = Float64Array.of(0, 0.01, 0.035, 0.04, 0.1, 0.17);
    const u = sM.map((s) => 5 + 300 * s - 900 * s * s);
    const g = speedGradient(sM, u);
    sM.forEach((s, i) => assertInDelta(g[i], 300 - 1800 * s, 1e-9));
  });

  it('finds the first sample at or after an arc length', () => {
    const sM = Float64Array.of(0, 0.1, 0.2, 0.3);
    expect([-1, 0, 0.05, 0.1, 0.25, 0.3, 9].map((s) => firstSampleAtOrAfter(sM, s))).toEqual([0, 0, 1, 1, 3, 3, 3]);
  });
});

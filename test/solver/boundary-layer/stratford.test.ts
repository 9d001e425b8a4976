/** Stratford's turbulent separation criterion against its worked examples. */
import { describe, expect, it } from 'vitest';
import { stratfordLimit, stratfordSeparation } from '../../../src/solver/boundary-layer/stratford.ts';
import { assertInDelta, assertRelative, bisect, linspace } from './helpers.ts';

/** A flat plate of length x0 (the peak at its end) and then a pressure rise Cp(x), sampled on n points. */
function plateThenRise(x0: number, cp: (x: number) => number, n: number, reX0: number) {
  const peakSpeed = 20;
  const sM = linspace(n, 0, 1.9 * x0);
  const speedMs = sM.map((s) => peakSpeed * Math.sqrt(1 - (s > x0 ? cp(s) : 0)));
  const nuM2s = (peakSpeed * x0) / reX0;
  return { sM, speedMs, nuM2s, run: sM.slice() };
}

describe("Stratford's criterion (Stratford 1959, J. Fluid Mech. 5)", () => {
  it('has the limit 0.39 (1e-6 R)^0.1, 0.35 where d2p/dx2 < 0', () => {
    assertInDelta(stratfordLimit(1e6, false), 0.39, 1e-15);
    assertInDelta(stratfordLimit(1e6, true), 0.35, 1e-15);
    assertRelative(stratfordLimit(1e8, false), 0.39 * 10 ** 0.2, 1e-14);
  });

  it.each([
    // [derived] REFERENCES.md 2d worked example: linear ramp Cp = (x - x0)/x0 after a flat plate of length x0.
    [1e5, 1.281, 0.281],
    [1e6, 1.346, 0.346],
    [1e7, 1.426, 0.426],
  ])('Re_x0 = %f separates at x/x0 = %f with Cp = %f', (reX0, xi, cpSep) => {
    const x0 = 0.12;
    const ramp = plateThenRise(x0, (x) => (x - x0) / x0, 4001, reX0);
    const found = stratfordSeparation(ramp.sM, ramp.speedMs, ramp.nuM2s, ramp.run);
    const measured = (found?.sM ?? NaN) / x0;
    assertRelative(measured, xi, 0.005);
    assertRelative(measured - 1, cpSep, 0.005);
    // and against the root of (xi - 1) sqrt(xi) = 0.39 (Re_x0 xi / 1e6)^0.1 itself
    const root = bisect((r) => (r - 1) * Math.sqrt(r) - 0.39 * ((reX0 * r) / 1e6) ** 0.1, 1, 2);
    assertRelative(measured, root, 2e-4);
  });

  it('uses 0.35 on a pressure rise that eases off (d2p/dx2 < 0)', () => {
    // [derived] Cp = 0.8 (1 - exp(-(x - x0)/(0.5 x0))): Cp'' < 0 throughout, so separation where
    // Cp sqrt(x Cp') = 0.35 (R/1e6)^0.1, at x/x0 = 1.2639; the 0.39 form would give 1.3231.
    const x0 = 0.1;
    const reX0 = 1e6;
    const cp = (x: number) => 0.8 * (1 - Math.exp(-(x - x0) / (0.5 * x0)));
    const dcp = (x: number) => (0.8 / (0.5 * x0)) * Math.exp(-(x - x0) / (0.5 * x0));
    const rise = plateThenRise(x0, cp, 4001, reX0);
    const found = stratfordSeparation(rise.sM, rise.speedMs, rise.nuM2s, rise.run);
    const criterion = (limit: number) => (x: number) =>
      cp(x) * Math.sqrt(x * dcp(x)) - limit * ((reX0 * x) / x0 / 1e6) ** 0.1;
    const expected = bisect(criterion(0.35), x0 * 1.0001, 1.9 * x0);
    const withUpperLimit = bisect(criterion(0.39), x0 * 1.0001, 1.9 * x0);
    expect(cp(expected)).toBeLessThan(4 / 7);
    assertRelative(found?.sM ?? NaN, expected, 5e-4);
    expect(withUpperLimit / x0 - (found?.sM ?? NaN) / x0).toBeGreaterThan(0.05);
  });

  it('gives no verdict without a pressure rise', () => {
    const sM = linspace(50, 0, 1);
    expect(stratfordSeparation(sM, sM.map(() => 10), 1.5e-5, sM.slice())).toBeNull();
    expect(stratfordSeparation(sM, sM.map((s) => 10 + s), 1.5e-5, sM.slice())).toBeNull();
  });
});

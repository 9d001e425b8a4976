/** Michel's transition criterion, alone and inside the laminar march. */
import { describe, expect, it } from 'vitest';
import { marchWall } from '../../../src/solver/boundary-layer/march.ts';
import { michelTransitionReTheta } from '../../../src/solver/boundary-layer/michel.ts';
import { assertInDelta, assertRelative, bisect, linspace } from './helpers.ts';

const NU = 1.5e-5;

describe("Michel's transition criterion (Michel 1951; Cebeci & Smith form 1974)", () => {
  it('gives Re_theta,tr = 1.174 (1 + 22400/Re_x) Re_x^0.46', () => {
    // [derived] from the formula in REFERENCES.md 2b (22400, not 224000).
    assertInDelta(michelTransitionReTheta(1e5), 1.174 * 1.224 * 1e5 ** 0.46, 1e-9); // 286.71
    assertInDelta(michelTransitionReTheta(1e5), 286.71, 0.005);
    assertInDelta(michelTransitionReTheta(1e6), 1.174 * 1.0224 * 1e6 ** 0.46, 1e-9); // 690.70
    assertInDelta(michelTransitionReTheta(1e6), 690.70, 0.005);
  });

  it('has no transition before the layer has any run', () => {
    expect(michelTransitionReTheta(0)).toBe(Infinity);
    expect(michelTransitionReTheta(-5)).toBe(Infinity);
  });

  it('turns a laminar flat-plate layer turbulent where Thwaites meets Michel', () => {
    // [derived] flat plate from a sharp leading edge: Re_theta = sqrt(0.45 Re_x) (Thwaites) meets Michel at
    // Re_x = 1.666e6, i.e. 0.833 m at 30 m/s.
    const u = 30;
    const reXtr = bisect((r) => Math.sqrt(0.45 * r) - michelTransitionReTheta(r), 1e5, 1e8);
    const sM = linspace(1001, 0, 1);
    const speedMs = sM.map(() => u);
    const march = marchWall({ sM, speedMs, nuM2s: NU, start: 'laminar', initialThetaM: 0, initialRunM: 0 });
    expect(march.transitionSM).not.toBeNull();
    assertRelative(march.transitionSM ?? 0, (reXtr * NU) / u, 1e-3); // measured 0.8328 m
    expect(march.detachment).toBeNull();
    // after transition theta carries over and H drops from the laminar 2.61 to the turbulent start value 1.4
    const i = sM.findIndex((s) => s >= (march.transitionSM ?? 0));
    assertInDelta(march.shapeFactor[i - 1], 2.61, 1e-9);
    assertInDelta(march.shapeFactor[i], 1.4, 0.01);
    assertRelative(march.theta[i], march.theta[i - 1], 0.01);
  });
});

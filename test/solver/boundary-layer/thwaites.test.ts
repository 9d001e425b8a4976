/** Thwaites' laminar method: its fits and classical solutions (flat plate, stagnation, Howarth, cylinder). */
import { describe, expect, it } from 'vitest';
import { marchLaminar } from '../../../src/solver/boundary-layer/laminar-march.ts';
import { marchWall } from '../../../src/solver/boundary-layer/march.ts';
import {
  STAGNATION_LAMBDA,
  THWAITES_SEPARATION_LAMBDA,
  speedFifthIntegral,
  thwaitesShapeFactor,
  thwaitesShear,
} from '../../../src/solver/boundary-layer/thwaites.ts';
import { prepareWallFlow } from '../../../src/solver/boundary-layer/wall-flow.ts';
import { assertInDelta, assertRelative, linspace } from './helpers.ts';

const NU = 1.5e-5;

/** Laminar march with transition switched off, from a sharp leading edge unless theta0 is given. */
function laminarOnly(sM: Float64Array, speedMs: Float64Array, separationLambda?: number) {
  const theta = new Float64Array(sM.length);
  const shape = new Float64Array(sM.length);
  const wall = prepareWallFlow(sM, speedMs, NU);
  const run = marchLaminar(wall, { thetaM: 0, runM: 0 }, theta, shape, separationLambda, false);
  return { run, theta, shape };
}

describe('Thwaites fits (Cebeci & Bradshaw 1977)', () => {
  it('puts laminar separation where the shear l is zero, about lambda = -0.09', () => {
    // REFERENCES.md 2a: separation where l = 0, about -0.09 [pub: Cebeci & Bradshaw 1977].
    expect(Math.abs(thwaitesShear(THWAITES_SEPARATION_LAMBDA))).toBeLessThan(1e-12);
    assertInDelta(THWAITES_SEPARATION_LAMBDA, -0.09, 0.0005); // measured -0.08982
  });

  it('has both branches meet at lambda = 0', () => {
    // Both fits give l = 0.22 at lambda = 0; H 2.610 vs 2.088 + 0.0731/0.14 = 2.612 [derived from the fits].
    assertInDelta(thwaitesShear(-1e-12), thwaitesShear(0), 1e-9);
    assertInDelta(thwaitesShapeFactor(-1e-12), thwaitesShapeFactor(0), 0.003);
  });

  it('integrates U^5 exactly over a linear segment', () => {
    // [derived] integral of (u0 + (u1 - u0) s/h)^5 ds over [0, h] = h (u1^6 - u0^6) / (6 (u1 - u0)).
    assertRelative(speedFifthIntegral(3, 7, 0.2), (0.2 * (7 ** 6 - 3 ** 6)) / (6 * 4), 1e-14);
    assertRelative(speedFifthIntegral(5, 5, 0.3), 0.3 * 5 ** 5, 1e-14);
  });
});

describe("Thwaites' method against classical solutions", () => {
  it('flat plate: theta = 0.671 x / sqrt(Re_x), 1% above Blasius 0.664', () => {
    // [derived] Thwaites with U constant: theta^2 = 0.45 nu x / U. Blasius 1908 exact: 0.664 [pub, via any BL text].
    const sM = linspace(101, 0, 0.5);
    const { theta } = laminarOnly(sM, sM.map(() => 20));
    for (let i = 1; i < sM.length; i++) {
      const reX = (20 * sM[i]) / NU;
      const coefficient = (theta[i] * Math.sqrt(reX)) / sM[i];
      assertInDelta(coefficient, Math.sqrt(0.45), 1e-12);
      assertRelative(coefficient, 0.664, 0.011); // measured 0.6708, +1.03%
    }
  });

  it('stagnation flow U = K s: lambda = 0.075 everywhere', () => {
    // [derived] REFERENCES.md 2a: lambda = 0.45 / 6 = 0.075 for U = K x.
    const K = 400;
    const sM = linspace(101, 0, 0.02);
    const { theta, shape } = laminarOnly(sM, sM.map((s) => K * s));
    for (let i = 0; i < sM.length; i++) {
      assertInDelta((theta[i] ** 2 * K) / NU, 0.075, 1e-12);
      assertInDelta(shape[i], thwaitesShapeFactor(STAGNATION_LAMBDA), 1e-12);
    }
  });

  it("Howarth's retarded flow U = U0 (1 - x/L) separates at x/L = 0.1231 with lambda_sep = -0.09", () => {
    // [derived] (1 - x/L)^-6 = 1 + 0.09/0.075 gives x/L = 0.12314.
    // Exact 0.1199 [pub: Howarth, Proc. R. Soc. A 164, 1938; 4th digit from memory].
    const L = 0.5;
    const sM = linspace(4001, 0, 0.2 * L);
    const speeds = sM.map((s) => 12 * (1 - s / L));
    const fixed = laminarOnly(sM, speeds, -0.09).run.end;
    expect(fixed.kind).toBe('separation');
    assertRelative(fixed.sM / L, 1 - 2.2 ** (-1 / 6), 1e-4); // measured 0.12314
    assertInDelta(fixed.sM / L, 0.1231, 0.00005);
    const shearZero = laminarOnly(sM, speeds).run.end;
    assertInDelta(shearZero.sM / L, 0.1230, 0.0001); // measured 0.12298 with l = 0 at -0.0898
    assertRelative(shearZero.sM / L, 0.1199, 0.03); // Thwaites sits 2.6% late against the exact solution
  });

  it('circular cylinder U = 2 U_inf sin(phi) separates at 103.1 degrees', () => {
    // [pub] Thwaites gives 103.1 deg; exact boundary-layer value 104.5 deg (Terrill 1960). Low Re: stays laminar.
    const R = 0.05;
    const sM = linspace(3001, 0, Math.PI * R);
    const march = marchWall({ sM, speedMs: sM.map((s) => 2 * 1 * Math.sin(s / R)), nuM2s: NU, start: 'laminar' });
    expect(march.transitionSM).toBeNull();
    expect(march.detachment?.method).toBe('thwaites');
    const degrees = ((march.detachment?.sM ?? 0) / R) * (180 / Math.PI);
    assertInDelta(degrees, 103.1, 0.05); // measured 103.09
    assertInDelta(degrees, 104.5, 1.5);
  });
});

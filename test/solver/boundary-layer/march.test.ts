/** The wall march: input checks, awkward walls, off-wall stretches and random physical walls. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BoundaryLayerInputError } from '../../../src/solver/boundary-layer/errors.ts';
import { marchWall, type WallMarch, type WallMarchInput } from '../../../src/solver/boundary-layer/march.ts';
import { assertInDelta, linspace } from './helpers.ts';

const NU = 1.5e-5;

/** Every number in a march result is finite and the flags are consistent. */
function expectWellFormed(march: WallMarch, input: WallMarchInput): void {
  const n = input.sM.length;
  expect(march.theta.length).toBe(n);
  expect(march.shapeFactor.length).toBe(n);
  expect(march.offWall.length).toBe(n);
  for (let i = 0; i < n; i++) {
    expect(Number.isFinite(march.theta[i]) && march.theta[i] >= 0).toBe(true);
    expect(Number.isFinite(march.shapeFactor[i]) && march.shapeFactor[i] > 1).toBe(true);
    expect(march.offWall[i] === 0 || march.offWall[i] === 1).toBe(true);
  }
  const d = march.detachment;
  if (d) {
    expect(Number.isFinite(d.sM) && Number.isFinite(d.shapeFactor)).toBe(true);
    expect(d.sM).toBeGreaterThanOrEqual(input.sM[0]);
    expect(input.sM[d.index]).toBeGreaterThanOrEqual(d.sM);
    expect(march.offWall[d.index]).toBe(1);
  } else {
    expect(march.offWall.every((v) => v === 0)).toBe(true);
  }
  for (const s of [march.transitionSM, march.stratford?.sM]) if (s != null) expect(Number.isFinite(s)).toBe(true);
}

function rejects(input: WallMarchInput, problem: string): void {
  try {
    marchWall(input);
  } catch (error) {
    expect(error).toBeInstanceOf(BoundaryLayerInputError);
    expect((error as BoundaryLayerInputError).problem).toBe(problem);
    return;
  }
  throw new Error('expected a BoundaryLayerInputError');
}

describe('marchWall input checks', () => {
  const s = linspace(5, 0, 0.1);
  const u = new Float64Array(5).fill(20);
  it('rejects arrays that cannot describe a wall', () => {
    rejects({ sM: s, speedMs: u.slice(1), nuM2s: NU }, 'length-mismatch');
    rejects({ sM: Float64Array.of(0, 0.1, 0.1, 0.2, 0.3), speedMs: u, nuM2s: NU }, 'arc-not-increasing');
    rejects({ sM: Float64Array.of(0, 0.2, 0.1, 0.3, 0.4), speedMs: u, nuM2s: NU }, 'arc-not-increasing');
    rejects({ sM: s, speedMs: Float64Array.of(20, 20, -1, 20, 20), nuM2s: NU }, 'bad-speed');
    rejects({ sM: s, speedMs: Float64Array.of(20, NaN, 20, 20, 20), nuM2s: NU }, 'bad-speed');
  });
  it('rejects settings outside their range', () => {
    rejects({ sM: s, speedMs: u, nuM2s: 0 }, 'bad-setting');
    rejects({ sM: s, speedMs: u, nuM2s: NU, shapeFactorLimit: 1.2 }, 'bad-setting');
    rejects({ sM: s, speedMs: u, nuM2s: NU, initialRunM: -1 }, 'bad-setting');
  });
});

describe('marchWall on awkward but physical walls', () => {
  it('handles empty, single-sample and very short walls', () => {
    for (const input of [
      { sM: new Float64Array(0), speedMs: new Float64Array(0), nuM2s: NU },
      { sM: Float64Array.of(0.3), speedMs: Float64Array.of(25), nuM2s: NU },
      { sM: Float64Array.of(0, 1e-9), speedMs: Float64Array.of(25, 24), nuM2s: NU },
      { sM: Float64Array.of(0, 1e-9, 2e-9), speedMs: Float64Array.of(25, 0, 25), nuM2s: NU, start: 'laminar' as const },
    ]) {
      const march = marchWall(input);
      expectWellFormed(march, input);
    }
  });

  it('handles still air and a wall that starts at a stagnation point', () => {
    const sM = linspace(51, 0, 0.05);
    const still = { sM, speedMs: new Float64Array(51), nuM2s: NU };
    expectWellFormed(marchWall(still), still);
    expect(marchWall(still).detachment).toBeNull();
    const faint = { sM, speedMs: sM.map((_, i) => (i === 9 ? 5e-324 : 0)), nuM2s: NU };
    expectWellFormed(marchWall(faint), faint);
    for (const start of ['turbulent', 'laminar'] as const) {
      const input = { sM, speedMs: sM.map((s) => 1000 * s), nuM2s: NU, start };
      const march = marchWall(input);
      expectWellFormed(march, input);
      expect(march.detachment).toBeNull(); // accelerating all the way: nothing to lift the flow off
    }
  });

  it('takes the flow off the wall where the speed drops to zero mid-wall, even between coarse samples', () => {
    const input = { sM: Float64Array.of(0, 0.1, 0.2), speedMs: Float64Array.of(30, 0, 40), nuM2s: NU };
    for (const start of ['turbulent', 'laminar'] as const) {
      const march = marchWall({ ...input, start });
      expectWellFormed(march, input);
      expect(march.detachment?.sM).toBeLessThanOrEqual(0.1);
      // off from the detachment sample (0 if the layer separates at once) until the speed passes 30 m/s again
      expect(Array.from(march.offWall.slice(1))).toEqual([1, 0]);
    }
  });

  it('ends the off-wall stretch where the speed first rises above its value at detachment', () => {
    // decelerate hard, then accelerate back to the start speed
    const sM = linspace(401, 0, 1);
    const speedMs = sM.map((s) => (s < 0.6 ? 30 * (1 - s) : 12 + 60 * (s - 0.6)));
    const march = marchWall({ sM, speedMs, nuM2s: NU });
    const d = march.detachment;
    expect(d?.method).toBe('head');
    const speedThere = 30 * (1 - (d?.sM ?? 0));
    const back = speedMs.findIndex((u, i) => i > (d?.index ?? 0) && u > speedThere);
    expect(back).toBeGreaterThan(d?.index ?? 0);
    for (let i = 0; i < sM.length; i++) expect(march.offWall[i]).toBe(i >= (d?.index ?? 0) && i < back ? 1 : 0);
    // downstream of detachment theta and H hold their values at detachment
    assertInDelta(march.shapeFactor[400], 2.4, 1e-12);
    expect(march.theta[400]).toBe(march.theta[d?.index ?? 0]);
  });

  it('gives Stratford as a second opinion, a little earlier than Head on the same deceleration', () => {
    // Stratford (1959) notes his criterion tends to predict separation early.
    const sM = linspace(401, 0, 1);
    const march = marchWall({ sM, speedMs: sM.map((s) => 30 * (1 - 0.8 * s)), nuM2s: NU });
    expect(march.stratford).not.toBeNull();
    expect(march.stratford?.sM).toBeLessThan(march.detachment?.sM ?? 0); // measured 0.367 m vs Head 0.532 m
  });

  it('never throws or returns NaN on random physical walls', () => {
    const wall = fc.record({
      steps: fc.array(fc.double({ min: 1e-6, max: 0.05, noNaN: true }), { minLength: 1, maxLength: 40 }),
      speeds: fc.array(fc.oneof(fc.constant(0), fc.double({ min: 0, max: 300, noNaN: true })), {
        minLength: 41,
        maxLength: 41,
      }),
      nu: fc.double({ min: 1e-6, max: 1e-4, noNaN: true }),
      start: fc.constantFrom('turbulent' as const, 'laminar' as const),
      limit: fc.double({ min: 1.5, max: 4, noNaN: true }),
    });
    fc.assert(
      fc.property(wall, ({ steps, speeds, nu, start, limit }) => {
        const sM = new Float64Array(steps.length + 1);
        steps.forEach((h, i) => (sM[i + 1] = sM[i] + h));
        const speedMs = Float64Array.from(speeds.slice(0, sM.length));
        const input = { sM, speedMs, nuM2s: nu, start, shapeFactorLimit: limit };
        expectWellFormed(marchWall(input), input);
      }),
      { numRuns: 300, seed: 20240611 },
    );
  });
});

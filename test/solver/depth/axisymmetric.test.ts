/** Axisymmetric flow through the depth b = 2 pi r: a round pipe and a sphere on the axis of a pipe. */
import { describe, expect, it } from 'vitest';
import { solveFlow } from '../../../src/solver/solve.ts';
import { readFlow } from '../../../src/solver/reading/index.ts';
import type { SolveResult } from '../../../src/solver/types.ts';
import { expectRelative, wallNamed } from '../solver-shapes.ts';
import { roundPipe, sphereInPipe } from './depth-shapes.ts';

describe('round pipe of radius R and length L [derived]', () => {
  // Uniform flow along the pipe: flux = speed x pi R^2, so the conductance is pi R^2 / L and every cross-section
  // (equipotential station) has the area pi R^2.
  const lengthL = 4, radiusR = 1;
  const result = solveFlow(roundPipe(lengthL, radiusR), { targetCells: 128 * 32, tolerance: 1e-11 });

  it('has conductance pi R^2 / L and speed ratio 1 everywhere, the axis cells included', () => {
    expectRelative(result.conductance, (Math.PI * radiusR * radiusR) / lengthL, 1e-9);
    expectRelative(result.inletMeanSpeed, 1 / lengthL, 1e-9);
    let worst = 0;
    for (const s of result.speedRatio) if (Number.isFinite(s)) worst = Math.max(worst, Math.abs(s - 1));
    expect(worst).toBeLessThan(1e-8);
    expect(result.fluxImbalance).toBeLessThan(1e-8);
  });

  it('carries no flux across the axis: the faces on it have no conductance, and nothing is NaN in the fluid', () => {
    const { nx, conductanceY, openY, cellFraction } = result.grid;
    const axisRow = 1; // the box's lower edge (the axis) is grid line 1
    for (let i = 0; i < nx; i++) expect(conductanceY![i + axisRow * nx]).toBe(0);
    for (let k = 0; k < cellFraction.length; k++) {
      if (cellFraction[k] > 0) expect(Number.isFinite(result.speedRatio[k])).toBe(true);
    }
    expect(openY.some((o, f) => o > 0 && !(conductanceY![f] > 0))).toBe(false);
  });

  it('reads every station with the area pi R^2 and the mean inlet speed', () => {
    const reading = readFlow(roundPipe(lengthL, radiusR), result, { stationCount: 10 });
    expect(reading.stations).toHaveLength(10);
    for (const station of reading.stations) {
      expectRelative(station.area, Math.PI * radiusR * radiusR, 1e-9);
      expectRelative(station.meanSpeedRatio, 1, 1e-8);
    }
  });
});

describe('sphere of radius a on the axis of a pipe of radius R >= 8a [Lamb, Hydrodynamics, sphere in a uniform stream]', () => {
  // In an unbounded uniform stream U the surface speed is 1.5 U sin(theta): 1.5 U at the equator, and on the
  // equatorial line U (1 + a^3 / (2 r^3)). U here is the pipe's mean speed (the mean inlet speed).
  // Blockage: the pipe wall speeds the flow past the sphere up by a share that falls as (a / R)^3 (the far field of
  // the sphere is a dipole; the wind-tunnel solid-blockage correction goes the same way [memory]). The test solves
  // R = 8a and R = 12a on the same cells near the sphere, checks the difference has that sign and that size
  // (coefficient c in 1.5 (1 + c (a/R)^3) between 0.2 and 2; about 0.8 measured), and extrapolates to R = infinity.
  const radiusA = 1;
  const h = radiusA / 40;
  const solve = (radiusR: number) =>
    solveFlow(sphereInPipe(radiusA, radiusR, radiusR), { targetCells: Math.round(((2 * radiusR) / h) * (radiusR / h)), tolerance: 1e-10 });
  const runs = [8, 12].map((radiusR) => ({ radiusR, result: solve(radiusR) }));
  const equator = runs.map(({ result }) => equatorSpeed(result));

  it('has the equator surface speed 1.5 U within 0.5%, the pipe raising it by about (a / R)^3', () => {
    const [s8, s12] = equator;
    const cube = (r: number) => (radiusA / r) ** 3;
    const coefficient = (s8 - s12) / (1.5 * (cube(8) - cube(12)));
    const unbounded = s12 - 1.5 * coefficient * cube(12);
    console.log(`sphere: equator speed ratio ${s8.toFixed(5)} (R = 8a), ${s12.toFixed(5)} (R = 12a); blockage coefficient ` +
      `${coefficient.toFixed(2)}; R -> infinity ${unbounded.toFixed(5)}; PCG iterations ${runs.map((r) => r.result.iterations).join(', ')}`);
    for (const s of equator) expectRelative(s, 1.5, 0.005);
    expect(coefficient).toBeGreaterThan(0.2);
    expect(coefficient).toBeLessThan(2);
    expectRelative(unbounded, 1.5, 0.003);
  });

  it('has the speed U (1 + a^3 / (2 r^3)) up the line through the equator within 0.3% (R = 12a)', () => {
    const { result } = runs[1];
    const { nx, ny, h: cell, x0, y0 } = result.grid;
    let worst = 0;
    for (let j = 0; j < ny; j++) {
      for (const i of [Math.floor(-x0 / cell) - 1, Math.floor(-x0 / cell)]) {
        const x = x0 + (i + 0.5) * cell, y = y0 + (j + 0.5) * cell;
        const r = Math.hypot(x, y);
        if (r < radiusA + 2 * cell || r > 3 * radiusA) continue;
        worst = Math.max(worst, Math.abs(result.speedRatio[i + j * nx] / unboundedSpeed(x, y, radiusA) - 1));
      }
    }
    expect(worst).toBeLessThan(0.003);
    expect(result.fluxImbalance).toBeLessThan(1e-6);
  });
});

/** Speed ratio on the sphere's wall at the sample nearest its equator (x = 0). */
function equatorSpeed(result: SolveResult): number {
  const samples = wallNamed(result.walls, 'sphere').samples;
  let best = NaN, distance = Infinity;
  for (let q = 0; q < samples.length; q += 4) {
    if (Math.abs(samples[q]) < distance) {
      distance = Math.abs(samples[q]);
      best = samples[q + 3];
    }
  }
  return best;
}

/** |u| / U of the unbounded stream past a sphere of radius a at the origin: u_r = U cos t (1 - a^3/r^3), u_t = -U sin t (1 + a^3/(2 r^3)). */
function unboundedSpeed(x: number, y: number, a: number): number {
  const r = Math.hypot(x, y);
  const cos = x / r, sin = y / r;
  const q = (a / r) ** 3;
  return Math.hypot(cos * (1 - q), sin * (1 + q / 2));
}

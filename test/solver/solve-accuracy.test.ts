/** Accuracy of the whole solve against exact and published potential flows (REFERENCES.md section 1). */
import { describe, expect, it } from 'vitest';
import { solveFlow } from '../../src/solver/solve.ts';
import { bend, channel } from './rasterise/shapes.ts';
import { cylinderInChannel, expectRelative, meanWallRatio, observedOrders, wallNamed, wallPeak } from './solver-shapes.ts';

/** Cells for `across` cells over the bend's width 1; its bounding box is 2 x 2. */
const bendCells = (across: number) => 4 * across * across;
/** Polar angles kept clear of the bend's radial cuts (the corner ends), radians. */
const CLEAR = 0.3;

describe('concentric bend r2/r1 = 2, 90 degrees (REFERENCES.md 1a, exact free vortex)', () => {
  // [derived] G = ln(r2/r1) / alpha; inner (short side) ratio (r2-r1)/(r1 ln 2), outer half of it.
  const exactConductance = Math.log(2) / (Math.PI / 2);
  const exactInner = 1 / Math.log(2);
  const exactOuter = 1 / (2 * Math.log(2));
  const runs = [16, 32, 64, 128].map((across) => ({ across, result: solveFlow(bend(1, 2, 4096), { targetCells: bendCells(across) }) }));

  it('matches the exact values within 0.5% at 64 cells across', () => {
    expect(exactConductance).toBeCloseTo(0.4413, 4);
    const at64 = runs[2].result;
    expectRelative(at64.conductance, exactConductance, 0.005);
    expectRelative(meanWallRatio(wallNamed(at64.walls, 'short side'), CLEAR, Math.PI / 2 - CLEAR), exactInner, 0.005);
    expectRelative(meanWallRatio(wallNamed(at64.walls, 'long side'), CLEAR, Math.PI / 2 - CLEAR), exactOuter, 0.005);
  });

  it('converges at second order in conductance and at least first order in wall speed', () => {
    const conductance = runs.map((r) => r.result.conductance / exactConductance - 1);
    const inner = runs.map((r) => meanWallRatio(wallNamed(r.result.walls, 'short side'), CLEAR, Math.PI / 2 - CLEAR) / exactInner - 1);
    const outer = runs.map((r) => meanWallRatio(wallNamed(r.result.walls, 'long side'), CLEAR, Math.PI / 2 - CLEAR) / exactOuter - 1);
    const table = runs.map((r, k) => `${r.across} across: G ${conductance[k].toExponential(2)}, inner ${inner[k].toExponential(2)}, outer ${outer[k].toExponential(2)}, ${r.result.iterations} iterations`);
    console.log(`bend relative errors\n  ${table.join('\n  ')}\n  orders G ${fmt(observedOrders(conductance))}, inner ${fmt(observedOrders(inner))}, outer ${fmt(observedOrders(outer))}`);
    for (const order of observedOrders(conductance)) expect(order).toBeGreaterThan(1.7);
    for (const order of [...observedOrders(inner), ...observedOrders(outer)]) expect(order).toBeGreaterThanOrEqual(1);
  });

  it('passes the whole flux through every equipotential station', () => {
    const tight = solveFlow(bend(1, 2, 4096), { targetCells: bendCells(64), tolerance: 1e-11 });
    expect(tight.fluxImbalance).toBeLessThan(1e-6);
  });
});

describe('straight channel L x W (REFERENCES.md 1b)', () => {
  it('has conductance W / L and uniform speed ratio 1', () => {
    const result = solveFlow(channel(4, 1), { targetCells: 40_000, tolerance: 1e-11 });
    expectRelative(result.conductance, 1 / 4, 1e-6);
    let worst = 0;
    for (const s of result.speedRatio) if (Number.isFinite(s)) worst = Math.max(worst, Math.abs(s - 1));
    expect(worst).toBeLessThan(1e-6);
    expect(result.fluxImbalance).toBeLessThan(1e-6);
  });
});

describe('cylinder centred between parallel walls (REFERENCES.md 1c)', () => {
  // [derived: converged image-multipole collocation; published benchmark: E. B. Hansen, ZAMM 1985]
  const cases = [
    { dOverH: 0.2, exact: 2.0694 },
    { dOverH: 0.4, exact: 2.32872 },
  ];
  for (const { dOverH, exact } of cases) {
    it(`d/H = ${dOverH}: peak surface speed ratio within 1.5% at 40 cells per diameter`, () => {
      const domain = cylinderInChannel(dOverH, 6);
      const width = 1 / dOverH;
      const h = 1 / 40;
      const result = solveFlow(domain, { targetCells: (12 * width * width) / (h * h), tolerance: 1e-10 });
      const peak = wallPeak(wallNamed(result.walls, 'cylinder'));
      console.log(`cylinder d/H = ${dOverH}: peak ${peak.toFixed(5)} vs ${exact} (${((peak / exact - 1) * 100).toFixed(2)}%), ` +
        `${result.iterations} iterations, station imbalance ${result.fluxImbalance.toExponential(1)}`);
      expectRelative(peak, exact, 0.015);
      expect(result.fluxImbalance).toBeLessThan(1e-6);
    });
  }
});

function fmt(values: readonly number[]): string {
  return values.map((v) => v.toFixed(2)).join(', ');
}

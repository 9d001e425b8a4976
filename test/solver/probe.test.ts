/** The probe: bilinear reading of potential and speed ratio on hand-made fields and a solved bend. */
import { describe, expect, it } from 'vitest';
import { probeFlow } from '../../src/solver/probe.ts';
import { solveFlow } from '../../src/solver/solve.ts';
import { channelGrid } from './hand-grids.ts';
import { bend } from './rasterise/shapes.ts';

/** A hand grid carrying the field f at every cell centre, as phi and (doubled) as speed ratio. */
function fieldOn(nx: number, ny: number, h: number, f: (x: number, y: number) => number) {
  const grid = channelGrid(nx, ny, h);
  const phi = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) phi[i + j * nx] = f((i + 0.5) * h, (j + 0.5) * h);
  return { grid, phi, speedRatio: phi.map((v) => 2 * v) };
}

describe('probeFlow on hand-made fields', () => {
  it('reads a linear field exactly anywhere between cell centres (bilinear interpolation is exact for it)', () => {
    const linear = (x: number, y: number) => 0.3 + 0.05 * x - 0.02 * y;
    const flow = fieldOn(8, 5, 2, linear);
    for (const [x, y] of [[1, 1], [3.3, 4.9], [7.25, 2.6], [14.9, 8.99], [10, 5]]) {
      const read = probeFlow(flow, x, y);
      expect(read.potential).toBeCloseTo(linear(x, y), 12);
      expect(read.speedRatio).toBeCloseTo(2 * linear(x, y), 12);
    }
  });

  it('reads a bilinear field exactly and hits cell-centre values on the centres', () => {
    const f = (x: number, y: number) => 1 + x * y;
    const flow = fieldOn(4, 4, 1, f);
    expect(probeFlow(flow, 1.5, 2.5).potential).toBe(f(1.5, 2.5));
    expect(probeFlow(flow, 2.1, 1.7).potential).toBeCloseTo(f(2.1, 1.7), 12);
  });

  it('leaves out cells that are not solved and rescales the others', () => {
    // 2 x 2 cells of size 1: centres (0.5, 0.5) = 1, (1.5, 0.5) = 2, (0.5, 1.5) = 3, (1.5, 1.5) solid.
    const flow = fieldOn(2, 2, 1, () => 0);
    flow.phi.set([1, 2, 3, NaN]);
    // At (0.75, 0.75): weights 0.5625, 0.1875, 0.1875 and 0.0625 on the solid cell, so
    // (0.5625 * 1 + 0.1875 * 2 + 0.1875 * 3) / 0.9375 = 1.5 / 0.9375 = 1.6.
    expect(probeFlow(flow, 0.75, 0.75).potential).toBeCloseTo(1.6, 12);
    // On the solid cell's centre only it has weight: nothing to read.
    expect(probeFlow(flow, 1.5, 1.5).potential).toBeNaN();
  });

  it('reads NaN off the grid', () => {
    const flow = fieldOn(3, 3, 1, () => 0.5);
    expect(probeFlow(flow, -1, 1).potential).toBeNaN();
    expect(probeFlow(flow, 1, 3.6).speedRatio).toBeNaN();
    expect(probeFlow(flow, 3.4, 2.9).potential).toBe(0.5); // past the last centre but inside the grid's edge cells
  });
});

describe('probeFlow on a solved concentric bend', () => {
  // Exact flow [derived; REFERENCES.md 1a]: phi = 1 - theta / (pi / 2) from the inlet (theta = 0) to the outlet,
  // speed K / r, mean inlet speed K ln(r2 / r1) / (r2 - r1), so speed ratio (r2 - r1) / (r ln(r2 / r1)).
  const r1 = 1, r2 = 2;
  const result = solveFlow(bend(r1, r2, 512), { targetCells: 60_000 });

  it.each([[1.25, 20], [1.5, 45], [1.8, 70], [1.05, 10]])('at r = %s, theta = %s deg the probe reads the exact potential and speed', (r, deg) => {
    const theta = (deg * Math.PI) / 180;
    const read = probeFlow(result, r * Math.cos(theta), r * Math.sin(theta));
    expect(Math.abs(read.potential - (1 - theta / (Math.PI / 2)))).toBeLessThan(2e-5);
    const exactRatio = (r2 - r1) / (r * Math.log(r2 / r1));
    expect(Math.abs(read.speedRatio / exactRatio - 1)).toBeLessThan(2e-4);
  });
});

/** Warm starts from an earlier potential on the same, a coarser or an unrelated grid. */
import { describe, expect, it } from 'vitest';
import { solveFlow, solveOnGrid } from '../../src/solver/solve.ts';
import type { PotentialField, SolveResult } from '../../src/solver/types.ts';
import { warmStartGuess } from '../../src/solver/warm-start.ts';
import { channelGrid, fluidMask } from './hand-grids.ts';
import { bend } from './rasterise/shapes.ts';

const fieldOf = (r: Pick<SolveResult, 'grid' | 'phi'>): PotentialField => ({ ...r.grid, phi: r.phi });

describe('warmStartGuess', () => {
  it('reproduces a linear potential exactly from a coarser grid (bilinear), clamps to 0..1, zeroes excluded cells', () => {
    const coarse: PotentialField = { nx: 4, ny: 2, h: 2, x0: 0, y0: 0, phi: Float64Array.from([0.875, 0.625, 0.375, 0.125, 0.875, 0.625, 0.375, 0.125]) };
    const grid = channelGrid(8, 4);
    const mask = fluidMask(grid);
    mask[7] = 0;
    const x = new Float64Array(32).fill(-1);
    warmStartGuess(coarse, grid, mask, x);
    // Inside the coarse centres the old field is 1 - X / 8; outside them it is held (renormalised weights).
    for (let i = 1; i < 7; i++) expect(x[i + 8]).toBeCloseTo(1 - (i + 0.5) / 8, 14);
    expect(x[7]).toBe(0);
    expect(x.every((v) => v >= 0 && v <= 1)).toBe(true);
  });

  it('skips NaN cells of the old field and falls back to 0.5 far from any valid cell', () => {
    const old: PotentialField = { nx: 2, ny: 1, h: 1, x0: 0, y0: 0, phi: Float64Array.from([0.3, NaN]) };
    const grid = channelGrid(20, 1);
    const x = new Float64Array(20);
    warmStartGuess(old, grid, fluidMask(grid), x);
    expect(x[0]).toBeCloseTo(0.3, 14);
    expect(x[1]).toBeCloseTo(0.3, 14);
    expect(x[19]).toBe(0.5);
  });
});

describe('warm-started solve', () => {
  const domain = bend(1, 2, 1024);
  const cold = solveFlow(domain, { targetCells: 16_384 });

  it('needs no iteration from its own converged answer', () => {
    const again = solveFlow(domain, { targetCells: 16_384, warmStart: fieldOf(cold) });
    expect(again.iterations).toBe(0);
    expect(again.conductance).toBeCloseTo(cold.conductance, 8);
  });

  // The cold solve starts from the full-multigrid guess (the coarse levels' own solution), which on this bend is
  // as good as the interpolated coarser answer: both take 8 iterations at 64 across.
  it('needs no more iterations from a coarser answer (the refine-after-drag path) than a cold start, same result', () => {
    const coarse = solveFlow(domain, { targetCells: 1024 });
    const warm = solveFlow(domain, { targetCells: 16_384, warmStart: fieldOf(coarse) });
    console.log(`bend 64 across: cold ${cold.iterations} iterations, warm from 16 across ${warm.iterations}`);
    expect(warm.iterations).toBeLessThanOrEqual(cold.iterations);
    expect(warm.conductance).toBeCloseTo(cold.conductance, 7);
  });

  it('accepts a field from an unrelated grid without harm', () => {
    const grid = channelGrid(30, 10);
    const unrelated = solveOnGrid(grid, { inletLength: 10 });
    const warm = solveFlow(domain, { targetCells: 16_384, warmStart: fieldOf(unrelated) });
    expect(warm.conductance).toBeCloseTo(cold.conductance, 7);
  });
});

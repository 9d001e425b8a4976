/** MG-preconditioned conjugate gradients: convergence rate, iteration cap, supersession, trivial systems. */
import { describe, expect, it } from 'vitest';
import { assemble, writeRhs } from '../../../src/solver/assemble.ts';
import { buildMultigrid } from '../../../src/solver/multigrid/multigrid.ts';
import { pcg, type PcgOptions, type PcgReport } from '../../../src/solver/pcg/pcg.ts';
import { paddedVector } from '../../../src/solver/pcg/operator.ts';
import type { CutGrid } from '../../../src/solver/types.ts';
import { channelGrid, fluidMask } from '../hand-grids.ts';

/** `guess` is the starting potential in every cell (0 unless a test needs a start that is not already the answer). */
function solve(grid: CutGrid, options: Partial<PcgOptions>, coarseScale?: number, guess = 0): { report: PcgReport; phi: Float64Array; history: number[] } {
  const { nx, ny } = grid;
  const mask = fluidMask(grid);
  const s = assemble(grid, mask);
  const phi = new Float64Array(nx * ny).fill(guess);
  const r = new Float64Array(nx * ny);
  const bNorm = writeRhs(grid, mask, r);
  const history: number[] = [];
  const report = pcg(s, buildMultigrid(s, { coarseScale }), phi, r, bNorm, { p: paddedVector(nx, ny), z: paddedVector(nx, ny) }, {
    tolerance: 1e-8, maxIterations: 200, onIteration: (_, rel) => history.push(rel), ...options,
  });
  return { report, phi, history };
}

describe('pcg', () => {
  it('gains about a decade of residual per one to two iterations on rectangles of any size (printed)', () => {
    for (const n of [64, 256, 512]) {
      const { report, history } = solve(channelGrid(n, n), {});
      console.log(`rectangle ${n} x ${n}: ${report.iterations} iterations to ${report.residual.toExponential(1)}; ` +
        `residual ${history.map((v) => v.toExponential(0)).join(' ')}`);
      expect(report.converged).toBe(true);
      expect(report.iterations).toBeLessThanOrEqual(16); // 8 decades at <= 2 iterations each
    }
  });

  it('needs the fewest iterations with the coarse scale 1/2 (the rediscretised coarse operator; printed)', () => {
    const scales = [0.35, 0.5, 0.65];
    const counts = scales.map((scale) => solve(channelGrid(256, 256), {}, scale).report.iterations);
    console.log(`iterations on a 256 x 256 channel with coarse scale ${scales.join(', ')}: ${counts.join(', ')}`);
    expect(counts[1]).toBeLessThan(counts[0]);
    expect(counts[1]).toBeLessThan(counts[2]);
  });

  it('solves the 1D chain exactly: phi linear from inlet to outlet', () => {
    const { phi, report } = solve(channelGrid(8, 3), { tolerance: 1e-13 });
    // 8 cells, Dirichlet half a cell beyond each end: phi at centre i is 1 - (i + 0.5) / 8.
    for (let j = 0; j < 3; j++) for (let i = 0; i < 8; i++) expect(phi[i + j * 8]).toBeCloseTo(1 - (i + 0.5) / 8, 12);
    expect(report.residual).toBeLessThan(1e-13);
  });

  it('stops at the iteration cap without converging', () => {
    const { report } = solve(channelGrid(128, 128, 1, (i, j) => i === 40 && j > 10), { maxIterations: 3, tolerance: 1e-14 });
    expect(report.iterations).toBe(3);
    expect(report.converged).toBe(false);
    expect(report.residual).toBeGreaterThan(1e-14);
  });

  it('checks shouldStop before every iteration and stops when told', () => {
    let asked = 0;
    const { report } = solve(channelGrid(64, 64), { shouldStop: () => ++asked > 2 });
    expect(report.stopped).toBe(true);
    expect(report.iterations).toBe(2);
    expect(asked).toBe(3);
  });

  it('returns zero at once for a zero right-hand side, whatever the starting guess', () => {
    const grid = channelGrid(6, 6);
    grid.inletCoupling.fill(0);
    // A start of 0 would already be the answer, and the check below could not fail.
    const { report, phi } = solve(grid, {}, undefined, 0.7);
    expect(report.iterations).toBe(0);
    expect(phi.every((v) => v === 0)).toBe(true);
  });
});

/** The solve orchestrator: supersession, the iteration cap, the result's shape. */
import { describe, expect, it } from 'vitest';
import { connectedCells } from '../../src/solver/connectivity.ts';
import { SolveSupersededError, solveFlow, solveOnGrid } from '../../src/solver/solve.ts';
import { channelGrid } from './hand-grids.ts';
import { bend } from './rasterise/shapes.ts';
import { benchDomain } from '../../bench/bench-problem.ts';

describe('solveFlow', () => {
  it('stops with a typed "superseded" error as soon as shouldStop says so', () => {
    // Asked after rasterising, then before every iteration: the fourth answer stops it after two iterations.
    let calls = 0;
    const attempt = () => solveFlow(bend(1, 2, 256), { targetCells: 16_384, shouldStop: () => ++calls >= 4 });
    expect(attempt).toThrow(SolveSupersededError);
    calls = 0;
    const error = catchError(attempt) as SolveSupersededError;
    expect(error.code).toBe('superseded');
    expect(error.iterations).toBe(2);
    expect(calls).toBe(4);
  });

  it('stops before connecting and solving when superseded during rasterisation', () => {
    const error = catchError(() => solveFlow(bend(1, 2, 256), { targetCells: 16_384, shouldStop: () => true })) as SolveSupersededError;
    expect(error).toBeInstanceOf(SolveSupersededError);
    expect(error.iterations).toBe(0);
  });

  it('returns within the iteration cap, reporting the residual it reached', () => {
    const result = solveFlow(bend(1, 2, 256), { targetCells: 16_384, maxIterations: 2, tolerance: 1e-14 });
    expect(result.iterations).toBe(2);
    expect(result.residual).toBeGreaterThan(1e-14);
    expect(result.residual).toBeLessThan(1);
  });

  it('gives one value per cell, NaN exactly outside the solved cells, and wall samples', () => {
    const result = solveFlow(bend(1, 2, 256), { targetCells: 4096 });
    const { nx, ny, cellFraction } = result.grid;
    const solved = connectedCells(result.grid);
    expect(result.phi.length).toBe(nx * ny);
    expect(result.speedRatio.length).toBe(nx * ny);
    for (let k = 0; k < nx * ny; k++) {
      if (cellFraction[k] === 0) expect(result.phi[k]).toBeNaN();
      // finite in exactly the solved cells, potential and speed alike
      expect(Number.isFinite(result.phi[k])).toBe(solved[k] === 1);
      expect(Number.isFinite(result.speedRatio[k])).toBe(solved[k] === 1);
      if (Number.isFinite(result.phi[k])) {
        expect(result.phi[k]).toBeGreaterThanOrEqual(0);
        expect(result.phi[k]).toBeLessThanOrEqual(1);
      }
    }
    expect(result.walls.map((w) => w.name).sort()).toEqual(['long side', 'short side']);
  });

  it('skips the wall speeds when asked, leaving the rest of the result as it was', () => {
    const full = solveFlow(bend(1, 2, 256), { targetCells: 4096 });
    const quick = solveFlow(bend(1, 2, 256), { targetCells: 4096, wallSpeeds: false });
    expect(quick.walls).toEqual([]);
    expect(quick.phi).toEqual(full.phi);
    expect(quick.conductance).toBe(full.conductance);
  });
});

function catchError(run: () => unknown): unknown {
  try {
    run();
  } catch (error) {
    return error;
  }
  throw new Error('expected an error');
}

describe('solveOnGrid', () => {
  it('refuses a non-positive inlet length (a caller bug, not a user error)', () => {
    expect(() => solveOnGrid(channelGrid(4, 2), { inletLength: 0 })).toThrow(RangeError);
  });
});

describe('the tight short-side street-port sample (bench problem)', () => {
  it('solves in a grid-independent number of iterations and passes its flux through every station', () => {
    const runs = [65_536, 262_144].map((cells) => solveFlow(benchDomain(cells), { targetCells: cells }));
    console.log(`sample: ${runs.map((r) => `${r.grid.nx} x ${r.grid.ny}: ${r.iterations} iterations, conductance ${r.conductance.toFixed(5)}, ` +
      `station imbalance ${r.fluxImbalance.toExponential(1)}, peak ${r.peak.speedRatio.toFixed(2)}`).join('; ')}`);
    for (const r of runs) {
      expect(r.iterations).toBeLessThanOrEqual(15);
      expect(r.residual).toBeLessThanOrEqual(1e-8);
      expect(r.fluxImbalance).toBeLessThan(1e-5);
    }
    // Self-convergence of the conductance between the two grids.
    expect(Math.abs(runs[1].conductance / runs[0].conductance - 1)).toBeLessThan(0.002);
  });
});

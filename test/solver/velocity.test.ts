/** Velocity read-outs: speed ratio, conductance, station fluxes and the corner-safe peak. */
import { describe, expect, it } from 'vitest';
import { solveFlow, solveOnGrid } from '../../src/solver/solve.ts';
import { stationFluxes, worstImbalance } from '../../src/solver/stations-flux.ts';
import { assemble } from '../../src/solver/assemble.ts';
import { CORNER_CLEARANCE_CELLS, CORNER_CLEARANCE_SHARE, sharpConvexCorners } from '../../src/solver/velocity-peak.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../src/solver/types.ts';
import { channelGrid, fluidMask } from './hand-grids.ts';
import { domainOf, ringOf, type Pt } from './rasterise/shapes.ts';

/** A channel with a square step up in the floor: inlet left, outlet right; the step's top corners are convex. */
function stepChannel(): ReturnType<typeof domainOf> {
  const pts: Pt[] = [[0, 0], [2, 0], [2, 0.5], [3, 0.5], [3, 0], [6, 0], [6, 1], [0, 1]];
  const marks = [MARK_WALL, MARK_WALL, MARK_WALL, MARK_WALL, MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_INLET];
  return domainOf(ringOf(pts, marks), []);
}

describe('speed ratio and conductance on a hand-built channel', () => {
  it('gives ratio 1 everywhere, conductance W / L and NaN outside the fluid', () => {
    // 10 x 4 cells of size 0.5 with a solid row carved off the top: the fluid is 5 x 1.5.
    const grid = channelGrid(10, 4, 0.5, (_i, j) => j === 3);
    const result = solveOnGrid(grid, { inletLength: 1.5, tolerance: 1e-12 });
    expect(result.conductance).toBeCloseTo(1.5 / 5, 11);
    expect(result.inletMeanSpeed).toBeCloseTo(1 / 5, 11);
    for (let k = 0; k < 40; k++) {
      if (k >= 30) {
        expect(result.speedRatio[k]).toBeNaN();
        expect(result.phi[k]).toBeNaN();
      } else {
        expect(result.speedRatio[k]).toBeCloseTo(1, 10);
      }
    }
    expect(result.inletFlux).toBeCloseTo(result.outletFlux, 11);
  });
});

describe('station fluxes', () => {
  it('pass the total flux through each of 20 equipotentials, including inlet and outlet couplings', () => {
    const grid = channelGrid(40, 12, 1, (i, j) => i > 15 && i < 20 && j < 8);
    const mask = fluidMask(grid);
    const result = solveOnGrid(grid, { inletLength: 12, tolerance: 1e-12, mask });
    const phi = result.phi.map((v) => (Number.isNaN(v) ? 0 : v));
    const fluxes = stationFluxes(assemble(grid, mask), grid, phi);
    expect(fluxes.length).toBe(20);
    expect(worstImbalance(fluxes, result.conductance)).toBeLessThan(1e-9);
    expect(result.fluxImbalance).toBeLessThan(1e-9);
  });
});

describe('peak speed near a sharp convex corner', () => {
  it('finds the two convex corners of a floor step and none of its concave ones', () => {
    const corners = Array.from(sharpConvexCorners(stepChannel()));
    expect(corners).toEqual([2, 0.5, 3, 0.5]);
  });

  it('keeps the singular corners out of the peak, which then converges instead of growing with the grid', () => {
    const runs = [16_000, 64_000, 256_000].map((cells) => solveFlow(stepChannel(), { targetCells: cells }));
    const peaks = runs.map((r) => r.peak.speedRatio);
    console.log(`step peak speed ratio by grid: ${runs.map((r) => `${r.peak.speedRatio.toFixed(4)} at (${r.peak.x.toFixed(3)}, ${r.peak.y.toFixed(3)})`).join('; ')}`);
    for (const r of runs) {
      const clearance = Math.max(CORNER_CLEARANCE_CELLS * r.grid.h, CORNER_CLEARANCE_SHARE * r.grid.h * Math.hypot(r.grid.nx, r.grid.ny));
      for (const cx of [2, 3]) expect(Math.hypot(r.peak.x - cx, r.peak.y - 0.5)).toBeGreaterThan(clearance);
      // The gap over the step is half the channel: well above the inlet speed.
      expect(r.peak.speedRatio).toBeGreaterThan(1.5);
    }
    // Self-convergence: the changes shrink and stay under 1% (the singular corner cell itself would grow by
    // 2^(1/3), 26%, with each halving of the cell size).
    expect(Math.abs(peaks[2] - peaks[1])).toBeLessThan(Math.abs(peaks[1] - peaks[0]));
    expect(Math.abs(peaks[2] / peaks[1] - 1)).toBeLessThan(0.01);
  });
});

/** Finite-volume assembly: conservation, symmetry, Dirichlet couplings and excluded cells on hand-made grids. */
import { describe, expect, it } from 'vitest';
import { assemble, writeRhs } from '../../src/solver/assemble.ts';
import { paddedVector, residual } from '../../src/solver/pcg/operator.ts';
import type { CutGrid } from '../../src/solver/types.ts';
import { channelGrid, fluidMask } from './hand-grids.ts';
import { connectedCells } from '../../src/solver/connectivity.ts';
import { rasterise } from '../../src/solver/rasterise/rasterise.ts';
import { bend } from './rasterise/shapes.ts';

/** The dense matrix of the stencil, by applying the solver's own residual b - A x with b = 0 to unit vectors. */
function denseOf(grid: CutGrid, mask: Uint8Array): number[][] {
  const s = assemble(grid, mask);
  const n = grid.nx * grid.ny;
  const rows: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const unit = paddedVector(grid.nx, grid.ny);
  const zero = new Float64Array(n);
  const out = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    unit.fill(0);
    unit[c + grid.nx] = 1;
    residual(s, unit, zero, out);
    for (let r = 0; r < n; r++) rows[r][c] = 0 - out[r]; // 0 - v: a zero entry is +0, not -0
  }
  return rows;
}

describe('assemble', () => {
  it('builds the 1D finite-volume chain on a one-row channel: 2 at the ends, faces of 1, Dirichlet 2', () => {
    const grid = channelGrid(3, 1);
    const a = denseOf(grid, fluidMask(grid));
    expect(a).toEqual([
      [3, -1, 0],
      [-1, 2, -1],
      [0, -1, 3],
    ]);
    const b = new Float64Array(3);
    expect(writeRhs(grid, fluidMask(grid), b)).toBe(2);
    expect(Array.from(b)).toEqual([2, 0, 0]);
  });

  it('is symmetric with rows summing to the Dirichlet coupling, on a grid with partial faces', () => {
    const grid = channelGrid(4, 3);
    grid.openX[2 + 1 * 5] = 0.3; // a partly closed face
    grid.openY[1 + 2 * 4] = 0.6;
    const mask = fluidMask(grid);
    const a = denseOf(grid, mask);
    for (let r = 0; r < a.length; r++) {
      for (let c = 0; c < a.length; c++) expect(a[r][c]).toBe(a[c][r]);
      const rowSum = a[r].reduce((sum, v) => sum + v, 0);
      expect(rowSum).toBeCloseTo(grid.inletCoupling[r] + grid.outletCoupling[r], 14);
    }
  });

  it('gives excluded cells zero rows and seals every face that touches them', () => {
    const grid = channelGrid(3, 2);
    const mask = fluidMask(grid);
    mask[1 + 1 * 3] = 0; // leave out the middle top cell although its faces are open
    const s = assemble(grid, mask);
    expect(s.faceX).not.toBe(grid.openX); // a masked copy, the grid is left as it was
    expect(grid.openX[1 + 1 * 4]).toBe(1);
    expect(s.faceX[1 + 1 * 4]).toBe(0);
    expect(s.faceX[2 + 1 * 4]).toBe(0);
    expect(s.faceY[1 + 1 * 3]).toBe(0);
    const a = denseOf(grid, mask);
    expect(a[4]).toEqual([0, 0, 0, 0, 0, 0]);
    expect(Array.from(s.dirichlet.cells)).toEqual([0, 2, 3, 5].filter((k) => k !== 4));
    expect(a[0][0]).toBe(2 + 1 + 1); // inlet 2, east face, north face
  });

  it('uses the grid face arrays as they are when already sealed', () => {
    const grid = channelGrid(5, 4, 1, (i, j) => i === 2 && j < 3);
    const s = assemble(grid, fluidMask(grid));
    expect(s.faceX).toBe(grid.openX);
    expect(s.faceY).toBe(grid.openY);
  });
});

describe('assemble and writeRhs with the list of coupled cells', () => {
  it('give the same Dirichlet list and right-hand side as a scan of the whole coupling arrays', () => {
    const grid = rasterise(bend(1, 2, 64), 4096);
    expect(grid.coupledCells?.length).toBeGreaterThan(0);
    const scanned: CutGrid = { ...grid, coupledCells: undefined };
    const mask = connectedCells(grid);
    const listed = assemble(grid, mask);
    const whole = assemble(scanned, mask);
    expect(Array.from(listed.dirichlet.cells)).toEqual(Array.from(whole.dirichlet.cells));
    expect(Array.from(listed.dirichlet.coupling)).toEqual(Array.from(whole.dirichlet.coupling));
    const b1 = new Float64Array(grid.nx * grid.ny).fill(7); // writeRhs must clear what was there
    const b2 = new Float64Array(grid.nx * grid.ny);
    expect(writeRhs(grid, mask, b1)).toBe(writeRhs(scanned, mask, b2));
    expect(Array.from(b1)).toEqual(Array.from(b2));
    const each = new Set(grid.coupledCells);
    grid.inletCoupling.forEach((c, k) => { if (c + grid.outletCoupling[k] > 0) expect(each.has(k)).toBe(true); });
  });
});

/** Connectivity: blocked passages and where they close, dead pockets, baffles and a port with its valve. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { connectedCells } from '../../src/solver/connectivity.ts';
import { FlowSetupError } from '../../src/solver/errors.ts';
import { rasterise } from '../../src/solver/rasterise/rasterise.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../src/solver/types.ts';
import type { CutGrid } from '../../src/solver/types.ts';
import { channelGrid } from './hand-grids.ts';
import { domainOf, portSection, ringOf } from './rasterise/shapes.ts';
import type { Pt } from './rasterise/shapes.ts';

const W = MARK_WALL;
const IN = MARK_INLET;
const OUT = MARK_OUTLET;

function blockedError(grid: CutGrid): FlowSetupError {
  try {
    connectedCells(grid);
  } catch (error) {
    if (error instanceof FlowSetupError) return error;
    throw error;
  }
  throw new Error('expected the passage to be reported blocked');
}

/**
 * Room A [0, 4] x [0, 4] and room B [6, 10] x [0, 4], the wall between them (2 thick) crossed only by
 * a zero-width slit at height `slitY` (like a valve face sitting on its seat). Inlet on x = 0, outlet on x = 10.
 */
function twoRooms(slitY: number) {
  const pts: Pt[] = [[0, 0], [4, 0], [4, slitY], [6, slitY], [6, 0], [10, 0], [10, 4], [6, 4], [6, slitY], [4, slitY], [4, 4], [0, 4]];
  const marks = [W, W, W, W, W, OUT, W, W, W, W, W, IN];
  return domainOf(ringOf(pts, marks));
}

describe('connectedCells: blocked passages', () => {
  for (const slitY of [2.3, 2]) {
    it(`two rooms joined by a zero-width slit (at y = ${slitY}) are blocked, with a place between them`, () => {
      const grid = rasterise(twoRooms(slitY), 640);
      const error = blockedError(grid);
      expect(error.code).toBe('blocked');
      expect(error.message).toMatch(/passage closes near x = -?\d+\.\d, y = -?\d+\.\d/);
      const [x, y] = error.where!;
      expect(x).toBeGreaterThan(4);
      expect(x).toBeLessThan(6);
      expect(y).toBeGreaterThan(0);
      expect(y).toBeLessThan(4);
    });
  }

  it('a roof that comes down to touch the floor at a grid node is blocked there', () => {
    // Left triangle (0,0) (5,0) (0,4) and right triangle (5,0) (10,0) (10,4) share only the point (5, 0);
    // at 640 cells h = 0.25 and (5, 0) is a grid node.
    const pts: Pt[] = [[0, 0], [10, 0], [10, 4], [5, 0], [0, 4]];
    const grid = rasterise(domainOf(ringOf(pts, [W, OUT, W, W, IN])), 640);
    expect(grid.h).toBe(0.25);
    const error = blockedError(grid);
    expect(error.code).toBe('blocked');
    const [x, y] = error.where!;
    expect(Math.hypot(x - 5, y - 0)).toBeLessThan(2 * grid.h);
  });
});

describe('connectedCells: mask of solved cells', () => {
  it('leaves out a dead pocket joined to the channel only by a zero-width slit', () => {
    // Channel [0, 10] x [0, 2] (inlet x = 0, outlet x = 10) and a side room [3, 7] x [3, 5] above its roof wall,
    // reached only through a zero-width slit at x = 5.1.
    const pts: Pt[] = [[0, 0], [10, 0], [10, 2], [5.1, 2], [5.1, 3], [7, 3], [7, 5], [3, 5], [3, 3], [5.1, 3], [5.1, 2], [0, 2]];
    const marks = [W, OUT, W, W, W, W, W, W, W, W, W, IN];
    const grid = rasterise(domainOf(ringOf(pts, marks)), 2000);
    const mask = connectedCells(grid);
    let channelCells = 0;
    let pocketCells = 0;
    for (let j = 0; j < grid.ny; j++) {
      for (let i = 0; i < grid.nx; i++) {
        const c = i + j * grid.nx;
        const y = grid.y0 + (j + 0.5) * grid.h;
        if (grid.cellFraction[c] === 0) {
          expect(mask[c]).toBe(0);
        } else if (y < 2.5) {
          channelCells++;
          expect(mask[c]).toBe(1);
        } else {
          pocketCells++;
          expect(mask[c]).toBe(0);
        }
      }
    }
    expect(channelCells).toBeGreaterThan(100);
    expect(pocketCells).toBeGreaterThan(100);
  });

  it('a zero-thickness baffle on a grid line closes the faces it lies on; the flow goes round its end', () => {
    // Square [0, 4]^2 at h = 1 with a baffle up the line x = 2 from the floor to y = 3 (out and back along it).
    const pts: Pt[] = [[0, 0], [2, 0], [2, 3], [2, 0], [4, 0], [4, 4], [0, 4]];
    const grid = rasterise(domainOf(ringOf(pts, [W, W, W, W, OUT, W, IN])), 16);
    expect(grid.h).toBe(1);
    const face = (x: number, y: number) => grid.openX[x + 1 + (y + 1) * (grid.nx + 1)];
    expect([face(2, 0), face(2, 1), face(2, 2), face(2, 3), face(1, 0), face(3, 2)]).toEqual([0, 0, 0, 1, 1, 1]);
    const mask = connectedCells(grid);
    expect(mask.reduce((a, b) => a + b, 0)).toBe(16);
  });
});

describe('connectedCells: a port with its valve', () => {
  it('shut on its seat is blocked, and the place given is at the valve edge', () => {
    const grid = rasterise(portSection(0), 200_000);
    const error = blockedError(grid);
    expect(error.code).toBe('blocked');
    const [x, y] = error.where!;
    const nearEdge = (x > 50 && x < 65) || (x > 95 && x < 110);
    expect(nearEdge).toBe(true);
    expect(Math.abs(y)).toBeLessThan(4);
  });

  it('lifted 1 mm, the port, gap and bore are one passage', () => {
    const grid = rasterise(portSection(-1), 200_000);
    const mask = connectedCells(grid);
    let fluid = 0;
    let solved = 0;
    for (let c = 0; c < mask.length; c++) {
      if (grid.cellFraction[c] > 0) fluid++;
      solved += mask[c];
    }
    expect(solved).toBe(fluid);
  });
});

/** Plain cell-by-cell flood over open faces: the definition connectedCells' scanline fill must agree with. */
function referenceMask(grid: CutGrid): Uint8Array {
  const { nx, ny, openX, openY } = grid;
  const reach = (seed: Float64Array): Uint8Array => {
    const seen = new Uint8Array(nx * ny);
    const stack: number[] = [];
    seed.forEach((v, c) => { if (v > 0) { seen[c] = 1; stack.push(c); } });
    while (stack.length > 0) {
      const c = stack.pop()!;
      const i = c % nx;
      const j = (c - i) / nx;
      const steps: [boolean, number][] = [
        [i > 0 && openX[c + j] > 0, c - 1], [i < nx - 1 && openX[c + j + 1] > 0, c + 1],
        [j > 0 && openY[c] > 0, c - nx], [j < ny - 1 && openY[c + nx] > 0, c + nx],
      ];
      for (const [open, next] of steps) if (open && seen[next] === 0) { seen[next] = 1; stack.push(next); }
    }
    return seen;
  };
  const a = reach(grid.inletCoupling);
  const b = reach(grid.outletCoupling);
  return a.map((v, c) => v & b[c]);
}

describe('connectedCells: the scanline fill', () => {
  it('marks the same cells as a cell-by-cell flood on random mazes, or both find no passage', () => {
    // Mazes: a random share of solid cells and of closed faces (baffles) in a channel; many have dead pockets,
    // forks and blocked passages.
    const maze = fc.record({
      nx: fc.integer({ min: 2, max: 24 }), ny: fc.integer({ min: 1, max: 24 }),
      solidShare: fc.double({ min: 0, max: 0.5, noNaN: true }), closedShare: fc.double({ min: 0, max: 0.7, noNaN: true }), seed: fc.integer({ min: 1, max: 2 ** 30 }),
    });
    fc.assert(
      fc.property(maze, ({ nx, ny, solidShare, closedShare, seed }) => {
        let state = seed;
        const random = () => ((state = (state * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
        const solid = Array.from({ length: nx * ny }, () => random() < solidShare);
        const grid = channelGrid(nx, ny, 1, (i, j) => solid[i + j * nx]);
        grid.openX.forEach((_, f) => { if (random() < closedShare) grid.openX[f] = 0; });
        grid.openY.forEach((_, f) => { if (random() < closedShare / 4) grid.openY[f] = 0; });
        const expected = referenceMask(grid);
        if (expected.every((v) => v === 0)) {
          expect(() => connectedCells(grid)).toThrow(FlowSetupError);
        } else {
          expect(Array.from(connectedCells(grid))).toEqual(Array.from(expected));
        }
      }),
      { seed: 20261205, numRuns: 300 },
    );
  });
});

/** Cells split by a wall thinner than a cell: pieces counted, the largest kept, faces and couplings by hand, no fallbacks. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellFractions } from '../../../src/solver/rasterise/area.ts';
import { bounds } from '../../../src/solver/rasterise/checks.ts';
import { gridFrame, toGridRings } from '../../../src/solver/rasterise/frame.ts';
import { rasterise } from '../../../src/solver/rasterise/rasterise.ts';
import { findSplitCells, type SplitScan } from '../../../src/solver/rasterise/split-cells.ts';
import { cellsToResolve } from '../../../src/solver/rasterise/thin-wall-report.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../../src/solver/types.ts';
import type { FlowDomain } from '../../../src/solver/types.ts';
import { bend, channel, domainOf, portSection, ringOf } from './shapes.ts';
import type { Pt } from './shapes.ts';

/**
 * A 4 x 4 box with a divider of solid from x = 0 to `reach` between y = `low` and y = `low` + `thickness`:
 * inlet on x = 0 below the divider, outlet on x = 0 above it, so the air turns round the divider's end.
 * Counter-clockwise: floor, end wall, roof, outlet, divider (top, end, bottom), inlet.
 */
function dividedBox(low: number, thickness: number, reach = 3, turn = 0): FlowDomain {
  const high = low + thickness;
  const local: Pt[] = [[0, 0], [4, 0], [4, 4], [0, 4], [0, high], [reach, high], [reach, low], [0, low]];
  const c = Math.cos(turn);
  const s = Math.sin(turn);
  const pts = local.map(([x, y]): Pt => [2 + (x - 2) * c - (y - 2) * s, 2 + (x - 2) * s + (y - 2) * c]);
  const W = MARK_WALL;
  return domainOf(ringOf(pts, [W, W, W, MARK_OUTLET, W, W, W, MARK_INLET], [0, 1, 2, -1, 3, 3, 3, -1]), [], ['floor', 'end wall', 'roof', 'divider']);
}

function scanOf(domain: FlowDomain, targetCells: number): SplitScan {
  const frame = gridFrame(bounds(domain), targetCells);
  const rings = toGridRings(domain, frame);
  return findSplitCells(rings, cellFractions(rings, frame.nx, frame.ny), frame.nx, frame.ny);
}

describe('split cells: a divider 0.1 thick inside one row of unit cells', () => {
  // 16 target cells over the 4 x 4 box: h = 1, cell (i, j) covers x in [i - 1, i], y in [j - 1, j].
  // The divider (y 2.2..2.3, x 0..3) crosses cells (1..3, 3); each holds 0.2 below it and 0.7 above it. [derived]
  // Cell (3, 3) holds the divider's end on its right face: both its pieces open onto the whole cell (4, 3), where the
  // air turns round the end anyway, so they are joined and that cell stays whole (0.9).
  const domain = dividedBox(2.2, 0.1);
  const grid = rasterise(domain, 16);
  const nx = grid.nx;
  const cell = (i: number, j: number) => i + j * nx;
  const xFace = (k: number, j: number) => grid.openX[k + j * (nx + 1)];
  const yFace = (i: number, m: number) => grid.openY[i + m * nx];

  it('counts two pieces in each of the two cells and keeps the larger', () => {
    const scan = scanOf(domain, 16);
    expect(scan.fallbacks).toBe(0);
    expect([...scan.cells.keys()].sort((a, b) => a - b)).toEqual([cell(1, 3), cell(2, 3)]);
    for (const split of scan.cells.values()) {
      expect(split.pieces.map((p) => p.area).sort()).toEqual([expect.closeTo(0.2, 12), expect.closeTo(0.7, 12)]);
      expect(split.pieces[split.kept].area).toBeCloseTo(0.7, 12);
    }
    for (const i of [1, 2]) expect(grid.cellFraction[cell(i, 3)]).toBeCloseTo(0.7, 12);
    expect(grid.cellFraction[cell(3, 3)]).toBeCloseTo(0.9, 12);
  });

  it('opens a face only where the kept pieces on both sides touch it', () => {
    // Between two split cells: both keep y 2.3..3 of the face, 0.7 of it (whole-line winding would give 0.9).
    expect(xFace(2, 3)).toBeCloseTo(0.7, 12);
    // Between split (2, 3) and whole (3, 3): only the kept piece's 0.7.
    expect(xFace(3, 3)).toBeCloseTo(0.7, 12);
    // At the divider's end, between two whole cells: as measured, 0.2 + 0.7.
    expect(xFace(4, 3)).toBeCloseTo(0.9, 12);
    // Below the kept (upper) pieces the faces close; above them they stay whole.
    for (const i of [1, 2]) {
      expect(yFace(i, 3)).toBe(0);
      expect(yFace(i, 4)).toBe(1);
    }
    // Cells away from the divider keep their measures.
    expect(grid.cellFraction[cell(4, 3)]).toBe(1);
    expect(yFace(3, 3)).toBe(1);
  });

  it('drops the inlet coupling of the dropped piece and keeps the outlet coupling of the kept one', () => {
    // Cell (1, 3): inlet piece y 2..2.2 bounds the dropped piece; outlet piece y 2.3..3, 0.7 long, 0.5 from the centre.
    expect(grid.inletCoupling[cell(1, 3)]).toBe(0);
    expect(grid.outletCoupling[cell(1, 3)]).toBeCloseTo(0.7 / 0.5, 12);
  });

  it('names the wall once, with its thickness, the cells it split and the grid that would resolve it', () => {
    expect(grid.thinWalls).toHaveLength(1);
    const [wall] = grid.thinWalls;
    expect(wall.wallName).toBe('divider');
    expect(wall.cellCount).toBe(2);
    expect(wall.thickness).toBeCloseTo(0.1, 9);
    expect(wall.y).toBe(2.5);
    expect([0.5, 1.5]).toContain(wall.x);
    // h = sqrt(16 / N) <= 0.05 from N = 16 / 0.05^2 = 6400. [derived]
    expect(wall.resolvingCells).toBe(6400);
  });

  it('gives the same measures when the outline runs clockwise', () => {
    const reversed = [...Array(8).keys()].reverse();
    const xy = (k: number): Pt => [domain.outer.xy[2 * k], domain.outer.xy[2 * k + 1]];
    // Segment k of the reversed ring runs from old point k + 1 to old point k, so it keeps old segment k's mark.
    const pts = reversed.map(xy);
    const marks = reversed.map((k) => domain.outer.marks[(k + 7) % 8]);
    const ids = reversed.map((k) => domain.outer.wallIds[(k + 7) % 8]);
    const flipped = rasterise(domainOf(ringOf(pts, marks, ids), [], domain.wallNames), 16);
    for (const key of ['cellFraction', 'openX', 'openY', 'inletCoupling', 'outletCoupling'] as const) {
      flipped[key].forEach((v, k) => expect(v, `${key}[${k}]`).toBeCloseTo(grid[key][k], 12));
    }
    expect(flipped.thinWalls.map((w) => [w.wallName, w.cellCount])).toEqual([['divider', 2]]);
  });
});

describe('split cells: what is not a split', () => {
  it('a divider whose underside lies on a grid line leaves every cell whole (faces.ts closes the line)', () => {
    const grid = rasterise(dividedBox(2, 0.1), 16);
    expect(grid.thinWalls).toEqual([]);
    expect(scanOf(dividedBox(2, 0.1), 16).fallbacks).toBe(0);
  });

  it('a divider of no thickness (its two faces on one line) splits the cells it crosses, with no fallback', () => {
    // Mid-row, then at 45 degrees through grid nodes (h = sqrt(16 / 128) = 0.354, nodes every 0.354 along x and y).
    for (const [domain, target] of [[dividedBox(2.1, 0, 3), 256], [dividedBox(2, 0, 3, Math.PI / 4), 128]] as const) {
      const scan = scanOf(domain, target);
      expect(scan.fallbacks).toBe(0);
      const walls = rasterise(domain, target).thinWalls;
      expect(walls.map((w) => w.wallName)).toEqual(['divider']);
      expect(walls[0].thickness).toBe(0);
      expect(walls[0].resolvingCells).toBe(Infinity);
      expect(walls[0].cellCount).toBe(scan.cells.size);
    }
  });

  it('a divider thicker than a cell splits nothing', () => {
    expect(rasterise(dividedBox(1.3, 1.4), 16).thinWalls).toEqual([]);
  });

  it('the hand-made sections have no split cells and need no fallback at grids finer than their walls', () => {
    const shapes = [channel(4, 1), bend(1, 2, 24), portSection(-1), portSection(-0.2)];
    for (const shape of shapes) {
      for (const target of [50, 5000, 60_000].filter((t) => t !== 50 || shape.islands.length === 0)) {
        const scan = scanOf(shape, target);
        expect(scan.fallbacks).toBe(0);
        expect(scan.cells.size).toBe(0);
      }
    }
  });

  it("the port section's 3 mm valve head on 4.6 mm cells is a thin wall, named once", () => {
    const walls = rasterise(portSection(-1), 777).thinWalls;
    expect(walls.map((w) => [w.wallName, w.cellCount])).toEqual([['valve head', 8]]);
    // The head is 3 mm thick between its flat face and its chamfered underside. [derived from shapes.ts]
    expect(walls[0].thickness).toBeCloseTo(3, 9);
  });

  it('a divider turned off the axes, thinner than a quarter cell: named every time, never a fallback', () => {
    const thin = fc.record({
      low: fc.double({ min: 1.5, max: 2.5, noNaN: true }),
      thickness: fc.double({ min: 1e-4, max: 0.02, noNaN: true }),
      // Off the grid's axes, so that the divider crosses grid lines and cannot lie between two rows all along.
      turn: fc.tuple(fc.double({ min: 0.1, max: Math.PI / 2 - 0.1, noNaN: true }), fc.integer({ min: 0, max: 3 })).map(([a, q]) => a + (q * Math.PI) / 2),
      target: fc.integer({ min: 64, max: 1500 }),
    });
    let fallbacks = 0;
    fc.assert(
      fc.property(thin, ({ low, thickness, turn, target }) => {
        const domain = dividedBox(low, thickness, 3, turn);
        const scan = scanOf(domain, target);
        fallbacks += scan.fallbacks;
        const grid = rasterise(domain, target);
        const walls = grid.thinWalls;
        expect(walls.map((w) => w.wallName)).toEqual(['divider']);
        expect(walls[0].thickness).toBeGreaterThan(0);
        expect(walls[0].thickness).toBeLessThanOrEqual(thickness * (1 + 1e-6));
        for (const f of grid.cellFraction) expect(f >= 0 && f <= 1).toBe(true);
      }),
      { seed: 2024, numRuns: 80 },
    );
    expect(fallbacks).toBe(0);
  });
});

describe('split cells: dividers on the lattice of the grid (ends, faces and corners on grid lines and nodes)', () => {
  it('never falls back to the single-piece measures', () => {
    let fallbacks = 0;
    let splits = 0;
    for (let eighth = 0; eighth < 8; eighth++) {
      for (const target of [16, 128, 1024]) {
        for (let quarter = 4; quarter <= 12; quarter += 2) {
          for (const thickness of [0, 0.01, 0.125]) {
            for (const reach of [3, 3.25]) {
              const scan = scanOf(dividedBox(quarter / 4, thickness, reach, (eighth * Math.PI) / 4), target);
              fallbacks += scan.fallbacks;
              splits += scan.cells.size;
            }
          }
        }
      }
    }
    expect(fallbacks).toBe(0);
    // Not a vacuous pass: plenty of those cells are split.
    expect(splits).toBeGreaterThan(1000);
  });
});

describe('cellsToResolve', () => {
  it('is 4 box area / thickness^2 rounded up, and Infinity for no thickness [derived from frame.ts h = sqrt(area / cells)]', () => {
    expect(cellsToResolve(100, 0.1)).toBe(40_000);
    expect(cellsToResolve(10, 0.3)).toBe(Math.ceil(40 / 0.09));
    expect(cellsToResolve(10, 0)).toBe(Infinity);
  });
});

/** The rasteriser on random triangles: total area, fractions in 0..1 and open length along grid lines. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rasterise } from '../../../src/solver/rasterise/rasterise.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../../src/solver/types.ts';
import type { CutGrid } from '../../../src/solver/types.ts';
import { domainOf, fluidArea, polygonArea, ringOf } from './shapes.ts';
import type { Pt } from './shapes.ts';

/** Counter-clockwise triangle with its longest edge as inlet and the next as outlet. */
function triangleGrid(tri: Pt[], targetCells: number): CutGrid {
  const pts = polygonArea(tri) > 0 ? tri : [...tri].reverse();
  const lengths = pts.map((p, k) => Math.hypot(pts[(k + 1) % 3][0] - p[0], pts[(k + 1) % 3][1] - p[1]));
  const order = [0, 1, 2].sort((a, b) => lengths[b] - lengths[a]);
  const marks = [MARK_WALL, MARK_WALL, MARK_WALL];
  marks[order[0]] = MARK_INLET;
  marks[order[1]] = MARK_OUTLET;
  return rasterise(domainOf(ringOf(pts, marks)), targetCells);
}

/** Length of the vertical line x = c inside a triangle (a convex polygon). */
function chordLength(tri: readonly Pt[], c: number): number {
  const ys: number[] = [];
  for (let k = 0; k < 3; k++) {
    const [x0, y0] = tri[k];
    const [x1, y1] = tri[(k + 1) % 3];
    if ((x0 - c) * (x1 - c) <= 0 && x0 !== x1) ys.push(y0 + ((c - x0) * (y1 - y0)) / (x1 - x0));
  }
  return ys.length < 2 ? 0 : Math.max(...ys) - Math.min(...ys);
}

const coord = fc.double({ min: -10, max: 10, noNaN: true });
const point = fc.tuple(coord, coord);
const triangle = fc.tuple(point, point, point).filter((t) => Math.abs(polygonArea(t)) > 0.5);
/** Vertices on a lattice of step 1/4, so that with h = 1/4 they fall on grid nodes and edges often run along grid lines. */
const latticePoint = fc.tuple(fc.integer({ min: 0, max: 16 }), fc.integer({ min: 0, max: 16 })).map(([a, b]): Pt => [a / 4, b / 4]);
const latticeTriangle = fc.tuple(latticePoint, latticePoint, latticePoint).filter((t) => Math.abs(polygonArea(t)) > 0.5);

describe('rasterise: property checks on random triangles', () => {
  it('total fluid area equals the triangle area', () => {
    fc.assert(
      fc.property(triangle, fc.integer({ min: 4, max: 5000 }), (tri, target) => {
        const grid = triangleGrid(tri, target);
        expect(Math.abs(fluidArea(grid) / Math.abs(polygonArea(tri)) - 1)).toBeLessThan(1e-9);
      }),
      { seed: 20260301, numRuns: 300 },
    );
  });

  it('with vertices on grid nodes too, and every fraction stays in 0..1', () => {
    fc.assert(
      fc.property(latticeTriangle, (tri) => {
        const xs = tri.map((p) => p[0]);
        const ys = tri.map((p) => p[1]);
        const box = (Math.max(...xs) - Math.min(...xs)) * (Math.max(...ys) - Math.min(...ys));
        const grid = triangleGrid(tri, box * 16);
        expect(grid.h).toBe(0.25);
        expect(Math.abs(fluidArea(grid) / Math.abs(polygonArea(tri)) - 1)).toBeLessThan(1e-9);
        for (const arr of [grid.cellFraction, grid.openX, grid.openY]) {
          expect(Math.min(...arr)).toBeGreaterThanOrEqual(0);
          expect(Math.max(...arr)).toBeLessThanOrEqual(1);
        }
      }),
      { seed: 7, numRuns: 300 },
    );
  });

  it('open length of each vertical grid line equals the triangle chord there', () => {
    fc.assert(
      fc.property(fc.oneof(triangle, latticeTriangle), fc.integer({ min: 16, max: 2000 }), (tri, target) => {
        const grid = triangleGrid(tri, target);
        const { nx, ny, h } = grid;
        for (let k = 0; k <= nx; k++) {
          let open = 0;
          for (let j = 0; j < ny; j++) open += grid.openX[k + j * (nx + 1)];
          const x = grid.x0 + k * h;
          // A line along a triangle edge is a wall, never an opening (within the rasteriser's 1e-9 h snap).
          const near = (p: Pt) => Math.abs(p[0] - x) < 1e-9 * h;
          const onEdge = tri.some((p, e) => near(p) && near(tri[(e + 1) % 3]));
          const expected = onEdge ? 0 : chordLength(tri, x);
          expect(Math.abs(open * h - expected)).toBeLessThan(1e-5 * h);
        }
      }),
      { seed: 99, numRuns: 200 },
    );
  });
});

/** Wall speed reconstruction: exact flows sampled on the cells, wall runs and their names, points away from the fluid left out. */
import { describe, expect, it } from 'vitest';
import { rasterise } from '../../src/solver/rasterise/rasterise.ts';
import { wallSpeeds } from '../../src/solver/wall-speeds.ts';
import type { CutGrid, FlowDomain, WallSpeeds } from '../../src/solver/types.ts';
import { bend, channel, domainOf, portSection, ringOf } from './rasterise/shapes.ts';
import { connectedCells } from '../../src/solver/connectivity.ts';
import type { Pt } from './rasterise/shapes.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../src/solver/types.ts';

/** An exact potential sampled at the centres of the cells holding fluid; NaN elsewhere. */
function sampleOnCells(grid: CutGrid, potential: (x: number, y: number) => number): Float64Array {
  const phi = new Float64Array(grid.nx * grid.ny).fill(NaN);
  for (let j = 0; j < grid.ny; j++) {
    for (let i = 0; i < grid.nx; i++) {
      const c = i + j * grid.nx;
      if (grid.cellFraction[c] > 0) phi[c] = potential(grid.x0 + (i + 0.5) * grid.h, grid.y0 + (j + 0.5) * grid.h);
    }
  }
  return phi;
}

function wall(walls: readonly WallSpeeds[], name: string): WallSpeeds {
  const found = walls.find((w) => w.name === name);
  if (!found) throw new Error(`no wall named ${name}: ${walls.map((w) => w.name).join(', ')}`);
  return found;
}

/** Worst |ratio / exact - 1| over samples at least `margin` from both ends. */
function worstError(w: WallSpeeds, exact: (s: number) => number, margin: number): number {
  const n = w.samples.length / 4;
  const total = w.samples[4 * (n - 1) + 2];
  let worst = 0;
  for (let q = 0; q < n; q++) {
    const s = w.samples[4 * q + 2];
    if (s < margin || s > total - margin) continue;
    worst = Math.max(worst, Math.abs(w.samples[4 * q + 3] / exact(s) - 1));
  }
  return worst;
}

describe('wallSpeeds: concentric bend, exact potential on the cells (REFERENCES.md 1a)', () => {
  // Annulus r1 = 1, r2 = 2, 90 degrees, inlet on theta = 0: phi = 1 - theta / (pi / 2), speed = (2 / pi) / r.
  // Mean inlet speed = flux / inlet length = (2 / pi) ln 2, so inner wall ratio = 1 / ln 2 = 1.4427 and
  // outer wall ratio = 1 / (2 ln 2) = 0.7213. [derived]
  const meanSpeed = (2 / Math.PI) * Math.LN2;
  const innerExact = (r2: number, r1: number) => (r2 - r1) / (r1 * Math.log(r2 / r1));
  const potential = (x: number, y: number) => 1 - Math.atan2(y, x) / (Math.PI / 2);
  const across = [16, 32, 64];
  const errors = across.map((n) => {
    // Arcs cut in 2048 chords so that flattening (sag 3e-7) stays far below the reconstruction error.
    const domain = bend(1, 2, 2048);
    const grid = rasterise(domain, 4 * n * n); // box 2 x 2, so h = 1 / n
    const walls = wallSpeeds(domain, grid, sampleOnCells(grid, potential), meanSpeed);
    const margin = 3 * grid.h; // away from the two corner ends
    return {
      inner: worstError(wall(walls, 'short side'), () => innerExact(2, 1), margin),
      outer: worstError(wall(walls, 'long side'), () => innerExact(2, 1) / 2, margin),
      walls,
      h: grid.h,
    };
  });

  it('the REFERENCES value 1.4427 is the formula the test uses', () => {
    expect(innerExact(2, 1)).toBeCloseTo(1.4427, 4);
  });

  it('matches inner and outer wall speed ratios within 0.5% at 64 cells across', () => {
    const at64 = errors[2];
    expect(at64.inner).toBeLessThan(0.005);
    expect(at64.outer).toBeLessThan(0.005);
  });

  it('converges at about second order (observed order printed)', () => {
    const order = (key: 'inner' | 'outer', k: number) => Math.log2(errors[k][key] / errors[k + 1][key]);
    for (const key of ['inner', 'outer'] as const) {
      const line = across.map((n, k) => `${n}: ${errors[k][key].toExponential(2)}`).join(', ');
      console.log(`bend ${key} wall speed error by cells across: ${line}; observed order ${order(key, 0).toFixed(2)}, ${order(key, 1).toFixed(2)}`);
      expect(order(key, 0)).toBeGreaterThan(1.5);
      expect(order(key, 1)).toBeGreaterThan(1.5);
    }
  });

  it('is smooth along the wall: dU/ds on the inner wall (exactly 0) stays below 0.5% of U per passage width', () => {
    const w = wall(errors[2].walls, 'short side');
    const n = w.samples.length / 4;
    let worst = 0;
    for (let q = 4; q < n - 4; q++) {
      const dUds = (w.samples[4 * (q + 1) + 3] - w.samples[4 * (q - 1) + 3]) / (w.samples[4 * (q + 1) + 2] - w.samples[4 * (q - 1) + 2]);
      worst = Math.max(worst, Math.abs(dUds) / innerExact(2, 1));
    }
    expect(worst).toBeLessThan(0.005);
  });
});

/** Rectangle [a, b] x [0, width] in rotated coordinates (x', y'), turned by `angle` about the origin. */
function rotatedRectangle(a: number, b: number, width: number, angle: number): FlowDomain {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const pts: Pt[] = [[a, 0], [b, 0], [b, width], [a, width]].map(([x, y]): Pt => [x * c - y * s, x * s + y * c]);
  const marks = [MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_INLET];
  return domainOf(ringOf(pts, marks, [0, -1, 1, -1]), [], ['floor', 'roof']);
}

describe('wallSpeeds: flows the reconstruction must reproduce exactly', () => {
  it('uniform channel flow gives a constant wall speed ratio of 1 on both walls', () => {
    for (const [domain, potential] of [
      [channel(4, 1), (x: number) => 1 - x / 4],
      [rotatedRectangle(0, 4, 1, 0.4), (x: number, y: number) => 1 - (x * Math.cos(0.4) + y * Math.sin(0.4)) / 4],
    ] as const) {
      const grid = rasterise(domain, 3000);
      const walls = wallSpeeds(domain, grid, sampleOnCells(grid, potential), 1 / 4);
      expect(walls.map((w) => w.name)).toEqual(['floor', 'roof']);
      for (const w of walls) expect(worstError(w, () => 1, 0)).toBeLessThan(1e-9);
    }
  });

  it('stagnation-type flow phi = (x^2 - y^2) / 2 along a wall cut at an angle gives U = x and dU/ds = 1', () => {
    // In the rotated frame the floor y' = 0 is a streamline of phi = (x'^2 - y'^2) / 2 with speed x'. [derived]
    const angle = 0.4;
    const domain = rotatedRectangle(1, 3, 1, angle);
    const grid = rasterise(domain, 5000);
    const potential = (x: number, y: number) => {
      const xr = x * Math.cos(angle) + y * Math.sin(angle);
      const yr = -x * Math.sin(angle) + y * Math.cos(angle);
      return (xr * xr - yr * yr) / 2;
    };
    const floor = wall(wallSpeeds(domain, grid, sampleOnCells(grid, potential), 1), 'floor');
    expect(worstError(floor, (s) => 1 + s, 0)).toBeLessThan(1e-9);
    const n = floor.samples.length / 4;
    for (let q = 1; q < n - 1; q++) {
      const dUds = (floor.samples[4 * (q + 1) + 3] - floor.samples[4 * (q - 1) + 3]) / (floor.samples[4 * (q + 1) + 2] - floor.samples[4 * (q - 1) + 2]);
      expect(dUds).toBeCloseTo(1, 8);
    }
  });
});

describe('wallSpeeds: walls, names and samples', () => {
  // Outline starting in the middle of the "roof": its two ends join into one run. Unnamed runs are numbered;
  // the island is named by wallNames; a name used twice gets "(2)".
  const pts: Pt[] = [[5, 4], [0, 4], [0, 0], [4, 0], [6, 0], [10, 0], [10, 4]];
  const marks = [MARK_WALL, MARK_INLET, MARK_WALL, MARK_WALL, MARK_WALL, MARK_OUTLET, MARK_WALL];
  const ids = [0, -1, -1, 1, -1, -1, 0];
  const island = ringOf([[4, 1.5], [4, 2.5], [6, 2.5], [6, 1.5]], undefined, [2, 2, 2, 2]);
  const domain = domainOf(ringOf(pts, marks, ids), [island], ['roof', 'floor', 'roof']);
  const grid = rasterise(domain, 4000);
  const phi = sampleOnCells(grid, (x) => 1 - x / 10);
  const walls = wallSpeeds(domain, grid, phi, 0.1, 0.5);

  it('groups consecutive segments by wall, in ring order', () => {
    expect(walls.map((w) => w.name)).toEqual(['wall 1', 'floor', 'wall 2', 'roof', 'roof (2)']);
  });

  it('samples every `spacing` along the arc length, ends included, on the wall', () => {
    const roof = wall(walls, 'roof');
    const n = roof.samples.length / 4;
    expect(n).toBe(21); // 10 long at spacing 0.5
    expect(Array.from(roof.samples.subarray(0, 3))).toEqual([10, 4, 0]);
    expect(Array.from(roof.samples.subarray(4 * (n - 1), 4 * n - 1))).toEqual([0, 4, 10]);
    for (let q = 0; q < n; q++) expect(roof.samples[4 * q + 1]).toBe(4);
    // The island is a closed run: it starts and ends at its first point, 6 around.
    const isle = wall(walls, 'roof (2)');
    const m = isle.samples.length / 4;
    expect(m).toBe(13);
    expect(isle.samples[4 * (m - 1) + 2]).toBeCloseTo(6, 12);
    expect(isle.samples[4 * (m - 1)]).toBeCloseTo(4, 12);
    expect(isle.samples[4 * (m - 1) + 1]).toBeCloseTo(1.5, 12);
  });

  it('gives a finite speed at every sample of a port section, corners and valve gap included', () => {
    const port = portSection(-1);
    const portGrid = rasterise(port, 100_000);
    const mask = connectedCells(portGrid);
    const field = sampleOnCells(portGrid, (x, y) => x - 2 * y).map((v, c) => (mask[c] ? v : NaN));
    const portWalls = wallSpeeds(port, portGrid, field, 1);
    expect(portWalls.map((w) => w.name)).toEqual(['floor', 'short side', 'throat', 'bore wall', 'bore wall (2)', 'roof', 'valve head']);
    for (const w of portWalls) {
      for (let q = 0; q < w.samples.length / 4; q++) expect(Number.isFinite(w.samples[4 * q + 3])).toBe(true);
    }
  });

  it('leaves out points with no solved cell near: with none solved, every wall is listed with no samples', () => {
    const blank = new Float64Array(phi.length).fill(NaN);
    const blankWalls = wallSpeeds(domain, grid, blank, 0.1);
    expect(blankWalls.map((w) => w.name)).toEqual(walls.map((w) => w.name));
    for (const w of blankWalls) expect(w.samples.length).toBe(0);
  });

  it('reads the tip of a sliver narrower than a cell (a wall leaving the inlet corner at 4.4 degrees)', () => {
    // outline (0,20), (0,0), (1,13), (100,0), (100,20): the fluid between the inlet and the first wall narrows to a
    // point at (0,0), thinner than a cell for the first 4 mm; the inward step from the tip lands past the inlet.
    const wedge = domainOf(ringOf([[0, 20], [0, 0], [1, 13], [100, 0], [100, 20]],
      [MARK_INLET, MARK_WALL, MARK_WALL, MARK_OUTLET, MARK_WALL], [-1, -1, -1, -1, -1]), []);
    const wedgeGrid = rasterise(wedge, 20_000);
    const mask = connectedCells(wedgeGrid);
    const field = sampleOnCells(wedgeGrid, (x) => 1 - x / 100).map((v, c) => (mask[c] ? v : NaN));
    const first = wallSpeeds(wedge, wedgeGrid, field, 0.01)[0];
    expect(Array.from(first.samples.subarray(0, 3))).toEqual([0, 0, 0]);
    for (let q = 0; q < first.samples.length / 4; q++) expect(Number.isFinite(first.samples[4 * q + 3])).toBe(true);
  });
});

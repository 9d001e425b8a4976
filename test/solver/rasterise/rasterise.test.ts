/** The rasteriser on hand-made sections: grid frame, exact area and face fractions, couplings, set-up errors. */
import { describe, expect, it } from 'vitest';
import { FlowSetupError, MAX_CELLS } from '../../../src/solver/errors.ts';
import { rasterise } from '../../../src/solver/rasterise/rasterise.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../../src/solver/types.ts';
import type { FlowDomain } from '../../../src/solver/types.ts';
import { channel, domainOf, fluidArea, polygonArea, portSection, ringOf } from './shapes.ts';
import type { Pt } from './shapes.ts';

const W = MARK_WALL;
const IN = MARK_INLET;
const OUT = MARK_OUTLET;

/** A polygon with one inlet and one outlet edge (edges 0 and 1), the rest walls. */
function withPorts(points: readonly Pt[], islands: readonly (readonly Pt[])[] = []): FlowDomain {
  const marks = points.map((_, k) => (k === 0 ? IN : k === 1 ? OUT : W));
  return domainOf(ringOf(points, marks), islands.map((p) => ringOf(p)));
}

function rotatedSquare(cx: number, cy: number, side: number, angle: number): Pt[] {
  return [[-1, -1], [1, -1], [1, 1], [-1, 1]].map(([a, b]): Pt => {
    const x = (a * side) / 2;
    const y = (b * side) / 2;
    return [cx + x * Math.cos(angle) - y * Math.sin(angle), cy + x * Math.sin(angle) + y * Math.cos(angle)];
  });
}

describe('rasterise: grid frame', () => {
  it('uses square cells of sqrt(box area / target) with one spare cell around the box', () => {
    const grid = rasterise(channel(4, 1), 64);
    expect(grid.h).toBe(0.25);
    expect([grid.nx, grid.ny, grid.x0, grid.y0]).toEqual([18, 6, -0.25, -0.25]);
    expect(grid.cellFraction.length).toBe(18 * 6);
    expect(grid.openX.length).toBe(19 * 6);
    expect(grid.openY.length).toBe(18 * 7);
  });
});

describe('rasterise: exact area fractions (sum of fraction * h^2 = polygon area)', () => {
  it('rotated square, several grid sizes', () => {
    const pts = rotatedSquare(1.7, -0.4, 3, 0.3);
    for (const target of [17, 100, 1234, 40000]) {
      const grid = rasterise(withPorts(pts), target);
      expect(Math.abs(fluidArea(grid) / 9 - 1)).toBeLessThan(1e-9);
    }
  });

  it('square with a clockwise island (annulus-like)', () => {
    const outer: Pt[] = [[0, 0], [10, 0], [10, 10], [0, 10]];
    const island = rotatedSquare(5.3, 4.9, 4, 0.7).reverse();
    const area = polygonArea(outer) + polygonArea(island);
    expect(area).toBeCloseTo(84, 12);
    for (const target of [37, 1000, 25000]) {
      const grid = rasterise(withPorts(outer, [island]), target);
      expect(Math.abs(fluidArea(grid) / area - 1)).toBeLessThan(1e-9);
    }
  });

  it('vertices on grid nodes and edges along grid lines give whole cells and whole faces', () => {
    // L shape on a 6 x 4 box; 24 target cells makes h = 1, so every vertex is a grid node.
    const pts: Pt[] = [[0, 0], [6, 0], [6, 2], [3, 2], [3, 4], [0, 4]];
    const grid = rasterise(withPorts(pts), 24);
    expect(grid.h).toBe(1);
    expect(fluidArea(grid)).toBe(18);
    for (const f of grid.cellFraction) expect(f === 0 || f === 1).toBe(true);
    for (const f of grid.openX) expect(f === 0 || f === 1).toBe(true);
    for (const f of grid.openY) expect(f === 0 || f === 1).toBe(true);
    // Cell (x, y) of the shape sits at grid (x + 1, y + 1).
    const cell = (x: number, y: number) => grid.cellFraction[x + 1 + (y + 1) * grid.nx];
    expect([cell(0, 0), cell(5, 1), cell(2, 3), cell(3, 2), cell(5, 3), cell(-1, 0)]).toEqual([1, 1, 1, 0, 0, 0]);
    // Faces on the walls are closed, faces between two fluid cells open.
    const xFace = (x: number, y: number) => grid.openX[x + 1 + (y + 1) * (grid.nx + 1)];
    const yFace = (x: number, y: number) => grid.openY[x + 1 + (y + 1) * grid.nx];
    expect([xFace(0, 0), xFace(1, 0), xFace(3, 2), xFace(3, 1), xFace(6, 0)]).toEqual([0, 1, 0, 1, 0]);
    expect([yFace(4, 2), yFace(4, 1), yFace(1, 4), yFace(1, 3), yFace(2, 0)]).toEqual([0, 1, 0, 1, 0]);
  });

  it('port section with its valve island, at coarse and fine grids', () => {
    const domain = portSection(-1);
    const points = (xy: Float64Array): Pt[] => Array.from({ length: xy.length / 2 }, (_, k): Pt => [xy[2 * k], xy[2 * k + 1]]);
    const area = polygonArea(points(domain.outer.xy)) + polygonArea(points(domain.islands[0].xy));
    for (const target of [5000, 300_000]) {
      expect(Math.abs(fluidArea(rasterise(domain, target)) / area - 1)).toBeLessThan(1e-9);
    }
  });

  it('does not depend on the rings running the expected way round', () => {
    const outer: Pt[] = [[0, 0], [10, 0], [10, 10], [0, 10]];
    const island = rotatedSquare(5.3, 4.9, 4, 0.7).reverse();
    const a = rasterise(withPorts(outer, [island]), 500);
    const flipped = domainOf(
      ringOf([...outer].reverse(), [W, OUT, IN, W]),
      [ringOf([...island].reverse())],
    );
    const b = rasterise(flipped, 500);
    expect(maxDiff(b.cellFraction, a.cellFraction)).toBeLessThan(1e-12);
    expect(maxDiff(b.inletCoupling, a.inletCoupling)).toBeLessThan(1e-12);
    expect(maxDiff(b.outletCoupling, a.outletCoupling)).toBeLessThan(1e-12);
    expect(maxDiff(b.openX, a.openX)).toBeLessThan(1e-12);
    expect(maxDiff(b.openY, a.openY)).toBeLessThan(1e-12);
  });
});

function maxDiff(a: Float64Array, b: Float64Array): number {
  let worst = 0;
  for (let k = 0; k < a.length; k++) worst = Math.max(worst, Math.abs(a[k] - b[k]));
  return worst;
}

describe('rasterise: a cell cut by a known line', () => {
  // Box [0, 8]^2 at 64 cells: h = 1, grid node (a, b) at x = a - 1, y = b - 1. The edge from (3.5, 8) to (0, 1)
  // lies on y = 1 + 2x and passes through the grid node (1, 3); the fluid is below and right of it.
  const pts: Pt[] = [[0, 0], [8, 0], [8, 8], [3.5, 8], [0, 1]];
  const marks = [W, OUT, W, W, IN];
  const grid = rasterise(domainOf(ringOf(pts, marks)), 64);
  const c = 2 + 4 * grid.nx; // cell [1, 2] x [3, 4]

  it('has area 1 - (triangle of legs 1 and 0.5) = 0.75', () => {
    expect(grid.h).toBe(1);
    expect(grid.cellFraction[c]).toBeCloseTo(0.75, 14);
  });

  it('has faces: left 0, right 1, bottom 1, top 0.5', () => {
    const left = grid.openX[2 + 4 * (grid.nx + 1)];
    const right = grid.openX[3 + 4 * (grid.nx + 1)];
    const bottom = grid.openY[c];
    const top = grid.openY[c + grid.nx];
    expect([left, right, bottom]).toEqual([0, 1, 1]);
    expect(top).toBeCloseTo(0.5, 14);
  });

  it('opens faces only between cells that both hold fluid', () => {
    const { nx, ny } = grid;
    for (let j = 0; j < ny; j++) {
      for (let k = 0; k <= nx; k++) {
        if (grid.openX[k + j * (nx + 1)] === 0) continue;
        expect(grid.cellFraction[k - 1 + j * nx] * grid.cellFraction[k + j * nx]).toBeGreaterThan(0);
      }
    }
  });
});

describe('rasterise: inlet and outlet coupling of a straight channel on grid lines', () => {
  // Channel 4 x 1 at h = 0.25: inlet on x = 0 and outlet on x = 4 lie on grid lines. [derived, REFERENCES.md 1b]
  const grid = rasterise(channel(4, 1), 64);
  const { nx, ny } = grid;

  it('couples each end cell by length / distance = h / (h / 2) = 2', () => {
    for (let j = 1; j <= 4; j++) {
      expect(grid.inletCoupling[1 + j * nx]).toBe(2);
      expect(grid.outletCoupling[16 + j * nx]).toBe(2);
    }
    expect(grid.inletCoupling.reduce((a, b) => a + b, 0)).toBe(8);
    expect(grid.outletCoupling.reduce((a, b) => a + b, 0)).toBe(8);
  });

  it('makes the linear potential 1 - x / L the exact discrete solution, with flux W / L', () => {
    const phi = new Float64Array(nx * ny);
    for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) phi[i + j * nx] = 1 - (grid.x0 + (i + 0.5) * grid.h) / 4;
    let worst = 0;
    let inletFlux = 0;
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const c = i + j * nx;
        if (grid.cellFraction[c] === 0) continue;
        // Finite-volume balance: face conductance = open fraction (face length h over centre distance h).
        let net = grid.inletCoupling[c] * (1 - phi[c]) - grid.outletCoupling[c] * phi[c];
        net += grid.openX[i + j * (nx + 1)] * (phi[c - 1] - phi[c]) + grid.openX[i + 1 + j * (nx + 1)] * (phi[c + 1] - phi[c]);
        net += grid.openY[c] * (phi[c - nx] - phi[c]) + grid.openY[c + nx] * (phi[c + nx] - phi[c]);
        worst = Math.max(worst, Math.abs(net));
        inletFlux += grid.inletCoupling[c] * (1 - phi[c]);
      }
    }
    expect(worst).toBeLessThan(1e-14);
    expect(inletFlux).toBeCloseTo(1 / 4, 12);
  });
});

describe('rasterise: set-up errors a porter can cause', () => {
  const square: Pt[] = [[0, 0], [1, 0], [1, 1], [0, 1]];
  const code = (fn: () => unknown): string => {
    try {
      fn();
    } catch (error) {
      expect(error).toBeInstanceOf(FlowSetupError);
      expect((error as FlowSetupError).message.length).toBeGreaterThan(20);
      return (error as FlowSetupError).code;
    }
    return 'none';
  };

  it('names a missing inlet or outlet', () => {
    expect(code(() => rasterise(domainOf(ringOf(square, [W, OUT, W, W])), 100))).toBe('no-inlet');
    expect(code(() => rasterise(domainOf(ringOf(square, [W, IN, W, W])), 100))).toBe('no-outlet');
  });

  it('refuses more than 16M cells and says the limit', () => {
    expect(MAX_CELLS).toBe(16_000_000);
    expect(code(() => rasterise(withPorts(square), 16_000_001))).toBe('too-many-cells');
    expect(() => rasterise(withPorts(square), 20e6)).toThrow(/16,000,000/);
  });

  it('refuses degenerate sections', () => {
    expect(code(() => rasterise(withPorts([[0, 0], [1, 0], [2, 0]]), 100))).toBe('degenerate');
    expect(code(() => rasterise(withPorts([[0, 0], [1, 0]]), 100))).toBe('degenerate');
    expect(code(() => rasterise(withPorts([[0, 0], [1, NaN], [1, 1], [0, 1]]), 100))).toBe('degenerate');
    // Inlet 0.05 long on a unit square at 100 cells (h = 0.1).
    const shortInlet: Pt[] = [[0, 0], [1, 0], [1, 1], [0, 1], [0, 0.05]];
    expect(code(() => rasterise(domainOf(ringOf(shortInlet, [W, OUT, W, W, IN])), 100))).toBe('degenerate');
    expect(() => rasterise(domainOf(ringOf(shortInlet, [W, OUT, W, W, IN])), 100)).toThrow(/inlet is 0\.05 long, shorter than one grid cell \(0\.10\)/);
  });
});

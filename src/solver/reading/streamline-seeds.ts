/** Streamline starting points spread along the inlet at equal shares of the inlet flux. */
import { forEachCellPiece } from '../rasterise/clip-pieces.ts';
import { MARK_INLET } from '../types.ts';
import type { CutGrid, FlowDomain } from '../types.ts';

/** A starting point on the inlet and the inlet's inward unit normal there. */
export interface Seed {
  readonly x: number;
  readonly y: number;
  readonly nx: number;
  readonly ny: number;
}

/** A piece of inlet inside one grid cell. */
interface InletPiece {
  readonly ax: number; readonly ay: number; readonly bx: number; readonly by: number;
  readonly cell: number;
  readonly length: number;
  readonly nx: number; readonly ny: number;
}

/**
 * `count` seeds at the points where the inlet flux, accumulated along the inlet in ring order, reaches
 * (k + 1/2) / count of its total. A cell's inlet flux is its coupling times the potential drop from the inlet,
 * inletCoupling * (1 - phi), spread evenly over the length of inlet inside the cell (each inlet segment is cut at
 * the grid lines and every piece is given to the cell on its fluid side).
 * @param phi cell potential, row-major i + j * nx, NaN where not solved
 */
export function equalFluxSeeds(domain: FlowDomain, grid: CutGrid, phi: Float64Array, count: number): Seed[] {
  const pieces = inletPieces(domain, grid);
  // inlet length per cell, only for the few cells the inlet passes through
  const lengthIn = new Map<number, number>();
  for (const p of pieces) lengthIn.set(p.cell, (lengthIn.get(p.cell) ?? 0) + p.length);
  const fluxOf = pieces.map((p) => {
    const q = grid.inletCoupling[p.cell] * (1 - phi[p.cell]);
    return Number.isFinite(q) && q > 0 ? (q * p.length) / lengthIn.get(p.cell)! : 0;
  });
  const total = fluxOf.reduce((a, b) => a + b, 0);
  if (!(total > 0)) return [];
  const seeds: Seed[] = [];
  let k = 0, before = 0;
  pieces.forEach((p, index) => {
    const after = before + fluxOf[index];
    for (; k < count; k++) {
      const target = ((k + 0.5) / count) * total;
      if (target > after) break;
      const t = fluxOf[index] > 0 ? (target - before) / fluxOf[index] : 0.5;
      seeds.push({ x: p.ax + t * (p.bx - p.ax), y: p.ay + t * (p.by - p.ay), nx: p.nx, ny: p.ny });
    }
    before = after;
  });
  return seeds;
}

/**
 * Inlet segments of the outline cut at the grid lines, in ring order: cut by forEachCellPiece in grid units, as the
 * rasteriser cuts them for the inlet couplings, so each piece lies in one cell.
 */
function inletPieces(domain: FlowDomain, grid: CutGrid): InletPiece[] {
  const { xy, marks } = domain.outer;
  const n = marks.length;
  const { h, x0, y0 } = grid;
  const pieces: InletPiece[] = [];
  for (let k = 0; k < n; k++) {
    if (marks[k] !== MARK_INLET) continue;
    const m = (k + 1) % n;
    const dx = xy[2 * m] - xy[2 * k], dy = xy[2 * m + 1] - xy[2 * k + 1];
    const len = Math.hypot(dx, dy);
    if (len === 0) continue;
    const nx = -dy / len, ny = dx / len; // the outline runs counter-clockwise, so the fluid lies to the left
    const u = (x: number): number => (x - x0) / h;
    const v = (y: number): number => (y - y0) / h;
    forEachCellPiece(u(xy[2 * k]), v(xy[2 * k + 1]), u(xy[2 * m]), v(xy[2 * m + 1]), (ua, va, ub, vb) => {
      const length = Math.hypot(ub - ua, vb - va) * h;
      if (length <= 1e-12 * len) return;
      // the cell on the fluid side of the piece's midpoint (a piece on a grid line belongs to the fluid's cell)
      const i = Math.floor(0.5 * (ua + ub) + 1e-6 * nx);
      const j = Math.floor(0.5 * (va + vb) + 1e-6 * ny);
      if (i < 0 || j < 0 || i >= grid.nx || j >= grid.ny) return;
      pieces.push({ ax: x0 + ua * h, ay: y0 + va * h, bx: x0 + ub * h, by: y0 + vb * h, cell: i + j * grid.nx, length, nx, ny });
    });
  }
  return pieces;
}

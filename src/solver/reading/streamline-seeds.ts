/** Streamline starting points spread along the inlet at equal shares of the inlet flux. */
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
  const lengthIn = new Float64Array(grid.nx * grid.ny);
  for (const p of pieces) lengthIn[p.cell] += p.length;
  const fluxOf = pieces.map((p) => {
    const q = grid.inletCoupling[p.cell] * (1 - phi[p.cell]);
    return Number.isFinite(q) && q > 0 ? (q * p.length) / lengthIn[p.cell] : 0;
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

/** Inlet segments of the outline cut at the grid lines, in ring order. */
function inletPieces(domain: FlowDomain, grid: CutGrid): InletPiece[] {
  const { xy, marks } = domain.outer;
  const n = marks.length;
  const { h, x0, y0 } = grid;
  const pieces: InletPiece[] = [];
  for (let k = 0; k < n; k++) {
    if (marks[k] !== MARK_INLET) continue;
    const m = (k + 1) % n;
    const ax = xy[2 * k], ay = xy[2 * k + 1], dx = xy[2 * m] - ax, dy = xy[2 * m + 1] - ay;
    const len = Math.hypot(dx, dy);
    if (len === 0) continue;
    const nx = -dy / len, ny = dx / len; // the outline runs counter-clockwise, so the fluid lies to the left
    const cuts = [0, 1, ...gridLineCuts(ax, dx, x0, h), ...gridLineCuts(ay, dy, y0, h)].sort((a, b) => a - b);
    for (let c = 0; c + 1 < cuts.length; c++) {
      const t0 = cuts[c], t1 = cuts[c + 1];
      if (t1 - t0 <= 1e-12) continue;
      const tm = 0.5 * (t0 + t1);
      const i = Math.floor((ax + tm * dx + 1e-6 * h * nx - x0) / h);
      const j = Math.floor((ay + tm * dy + 1e-6 * h * ny - y0) / h);
      if (i < 0 || j < 0 || i >= grid.nx || j >= grid.ny) continue;
      pieces.push({ ax: ax + t0 * dx, ay: ay + t0 * dy, bx: ax + t1 * dx, by: ay + t1 * dy, cell: i + j * grid.nx, length: (t1 - t0) * len, nx, ny });
    }
  }
  return pieces;
}

/** Parameters in (0, 1) where a + t d crosses a grid line origin + k h. */
function gridLineCuts(a: number, d: number, origin: number, h: number): number[] {
  if (d === 0) return [];
  const lo = Math.min(a, a + d), hi = Math.max(a, a + d);
  const out: number[] = [];
  for (let k = Math.ceil((lo - origin) / h); origin + k * h <= hi; k++) {
    const t = (origin + k * h - a) / d;
    if (t > 0 && t < 1) out.push(t);
  }
  return out;
}

/** Which cells the solve covers: flood fill over open faces from inlet and outlet, and where a blocked passage closes. */
import { FlowSetupError, formatLength } from './errors.ts';
import { uint8Of, type ScratchArrays } from './scratch.ts';
import type { CutGrid } from './types.ts';

const FROM_INLET = 1;
const FROM_OUTLET = 2;

/**
 * Mask of the cells to solve, row-major i + j * nx: 1 where a cell is joined through open faces
 * to both the inlet and the outlet, 0 elsewhere (solid cells and dead pockets, whose potential is
 * undefined and reported as NaN).
 * Throws FlowSetupError 'blocked' when no open path joins inlet and outlet, with the point where the
 * two sides come closest (where the passage closes), and 'no-inlet' / 'no-outlet' when no fluid cell
 * lies beside them at all.
 * A passage that pinches shut inside a single cell is not seen: the cell joins both sides.
 * With `scratch`, the mask is taken from there (valid until the next call with the same scratch).
 */
export function connectedCells(grid: CutGrid, scratch: ScratchArrays | null = null): Uint8Array {
  const size = grid.nx * grid.ny;
  const reached = uint8Of(scratch, 'connect.reached', size);
  const fill = new ScanlineFill(grid, reached);
  const fromInlet = fill.flood(grid.inletCoupling, FROM_INLET, null);
  if (fromInlet === 0) {
    throw new FlowSetupError('no-inlet', 'No open space lies beside the inlet: the inlet edge runs along solid metal.');
  }
  const mask = uint8Of(scratch, 'connect.mask', size);
  const fromOutlet = fill.flood(grid.outletCoupling, FROM_OUTLET, mask);
  if (fromOutlet === 0) {
    throw new FlowSetupError('no-outlet', 'No open space lies beside the outlet: the outlet edge runs along solid metal.');
  }
  if (fill.joined === 0) {
    const [x, y] = closingPoint(grid, reached);
    throw new FlowSetupError(
      'blocked',
      `Air cannot get from the inlet to the outlet: the passage closes near x = ${formatLength(x, grid.h)}, y = ${formatLength(y, grid.h)}. ` +
        'Open the gap there (more valve lift, or move the wall) and solve again.',
      [x, y],
    );
  }
  return mask;
}

/**
 * Scanline flood over open faces: a popped cell is widened to its whole run along the row (cells joined by open
 * x-faces), the run is marked at once, and the rows above and below are searched under the run for unreached cells
 * behind open y-faces (one push per run found there). Work is proportional to the fluid cells reached, not the grid.
 * Rasterise guarantees a face is open only between two fluid cells, and never on the grid border.
 */
class ScanlineFill {
  /** Cells to widen, i + j * nx; grows when full. */
  private stack = new Int32Array(1024);
  private top = 0;
  /** Cells marked with both bits by the last flood that was given a mask. */
  joined = 0;

  constructor(private readonly grid: CutGrid, private readonly reached: Uint8Array) {}

  /**
   * Marks `bit` on every cell reachable from a cell whose `seed` is positive; returns the count. With `mask`
   * (i + j * nx), also sets 1 there in every newly marked cell that carries both bits.
   */
  flood(seed: Float64Array, bit: number, mask: Uint8Array | null): number {
    const { nx, openX, coupledCells } = this.grid;
    const reached = this.reached;
    if (coupledCells) {
      for (const c of coupledCells) if (seed[c] > 0 && (reached[c] & bit) === 0) this.push(c);
    } else {
      for (let c = 0; c < seed.length; c++) if (seed[c] > 0 && (reached[c] & bit) === 0) this.push(c);
    }
    let count = 0;
    while (this.top > 0) {
      const c = this.stack[--this.top];
      if ((reached[c] & bit) !== 0) continue;
      const j = (c / nx) | 0; // the x-face left of cell k in row j is k + j
      let a = c;
      while (openX[a + j] > 0 && (reached[a - 1] & bit) === 0) a--;
      let b = c;
      while (openX[b + 1 + j] > 0 && (reached[b + 1] & bit) === 0) b++;
      for (let k = a; k <= b; k++) {
        const both = (reached[k] |= bit) === (FROM_INLET | FROM_OUTLET);
        if (mask !== null && both) {
          mask[k] = 1;
          this.joined++;
        }
      }
      count += b - a + 1;
      if (j > 0) this.pushBeside(a, b, j - 1, bit);
      if (j + 1 < this.grid.ny) this.pushBeside(a, b, j + 1, bit);
    }
    return count;
  }

  /**
   * Pushes one cell of each unreached run of row jn (the row above or below) that touches cells a..b of the
   * popped run through an open y-face.
   */
  private pushBeside(a: number, b: number, jn: number, bit: number): void {
    const { nx, openX, openY } = this.grid;
    const step = jn * nx - (a - (a % nx)); // from a cell of the run to the cell across
    const face = step > 0 ? step : 0; // y-face of cell k: k (south) or k + nx (north)
    let inRun = false;
    for (let k = a; k <= b; k++) {
      const n = k + step;
      const open = openY[k + face] > 0 && (this.reached[n] & bit) === 0;
      if (open && !(inRun && openX[n + jn] > 0)) this.push(n);
      inRun = open;
    }
  }

  private push(c: number): void {
    if (this.top === this.stack.length) {
      const grown = new Int32Array(2 * this.stack.length);
      grown.set(this.stack);
      this.stack = grown;
    }
    this.stack[this.top++] = c;
  }
}

/**
 * Midpoint of the closest pair of cell centres, one reached from the inlet and one from the outlet,
 * in length units: where the two sides of a closed passage come nearest. Only cells on the edge of
 * each region are compared.
 */
function closingPoint(grid: CutGrid, reached: Uint8Array): [number, number] {
  const inletEdge = regionEdge(grid, reached, FROM_INLET);
  const outletEdge = regionEdge(grid, reached, FROM_OUTLET);
  const { nx, h, x0, y0 } = grid;
  let best = Infinity;
  let pair = [inletEdge[0], outletEdge[0]];
  for (const a of inletEdge) {
    const ia = a % nx;
    const ja = (a - ia) / nx;
    for (const b of outletEdge) {
      const ib = b % nx;
      const d = (ib - ia) ** 2 + ((b - ib) / nx - ja) ** 2;
      if (d < best) {
        best = d;
        pair = [a, b];
      }
    }
  }
  const [a, b] = pair;
  const u = 0.5 * ((a % nx) + (b % nx)) + 0.5;
  const v = 0.5 * (Math.floor(a / nx) + Math.floor(b / nx)) + 0.5;
  return [x0 + u * h, y0 + v * h];
}

/** Cells of a region with a side neighbour outside it. */
function regionEdge(grid: CutGrid, reached: Uint8Array, bit: number): number[] {
  const { nx, ny } = grid;
  const edge: number[] = [];
  const inRegion = (c: number): boolean => (reached[c] & bit) !== 0;
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = i + j * nx;
      if (!inRegion(c)) continue;
      if (i === 0 || i === nx - 1 || j === 0 || j === ny - 1) edge.push(c);
      else if (!inRegion(c - 1) || !inRegion(c + 1) || !inRegion(c - nx) || !inRegion(c + nx)) edge.push(c);
    }
  }
  return edge;
}

/** Which cells the solve covers: flood fill over open faces from inlet and outlet, and where a blocked passage closes. */
import { FlowSetupError, formatLength } from './errors.ts';
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
 */
export function connectedCells(grid: CutGrid): Uint8Array {
  const size = grid.nx * grid.ny;
  const reached = new Uint8Array(size);
  const stack = new Int32Array(size);
  const fromInlet = flood(grid, grid.inletCoupling, FROM_INLET, reached, stack);
  if (fromInlet === 0) {
    throw new FlowSetupError('no-inlet', 'No open space lies beside the inlet: the inlet edge runs along solid metal.');
  }
  const fromOutlet = flood(grid, grid.outletCoupling, FROM_OUTLET, reached, stack);
  if (fromOutlet === 0) {
    throw new FlowSetupError('no-outlet', 'No open space lies beside the outlet: the outlet edge runs along solid metal.');
  }
  const mask = new Uint8Array(size);
  let joined = 0;
  for (let c = 0; c < size; c++) {
    if (reached[c] === (FROM_INLET | FROM_OUTLET)) {
      mask[c] = 1;
      joined++;
    }
  }
  if (joined === 0) {
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

/** Marks `bit` on every cell reachable through open faces from a cell whose `seed` is positive; returns the count. */
function flood(grid: CutGrid, seed: Float64Array, bit: number, reached: Uint8Array, stack: Int32Array): number {
  const { nx, openX, openY } = grid;
  let top = 0;
  for (let c = 0; c < seed.length; c++) {
    if (seed[c] > 0 && (reached[c] & bit) === 0) {
      reached[c] |= bit;
      stack[top++] = c;
    }
  }
  let count = top;
  while (top > 0) {
    const c = stack[--top];
    const j = Math.floor(c / nx);
    const xFace = c + j; // x-face on the left of cell c: i + j * (nx + 1)
    // Rasterise guarantees a face is open only between two fluid cells, and never on the grid border.
    for (let side = 0; side < 4; side++) {
      const open = side === 0 ? openX[xFace] : side === 1 ? openX[xFace + 1] : side === 2 ? openY[c] : openY[c + nx];
      if (!(open > 0)) continue;
      const next = side === 0 ? c - 1 : side === 1 ? c + 1 : side === 2 ? c - nx : c + nx;
      if ((reached[next] & bit) !== 0) continue;
      reached[next] |= bit;
      stack[top++] = next;
      count++;
    }
  }
  return count;
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

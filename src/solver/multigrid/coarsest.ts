/** Direct solve on the coarsest multigrid level: dense Cholesky over its active cells. */
import { diagonalOf, type Stencil } from '../assemble.ts';
import { couplingOf } from '../assemble-dirichlet.ts';

/** Factorised coarsest level. */
export interface CoarsestSolver {
  /** Grid index (i + j * nx) of each unknown, active cells only. */
  readonly cells: Int32Array;
  /** Lower Cholesky factor, row-major n x n (only the lower triangle is used). */
  readonly factor: Float64Array;
  /** Scratch of length n. */
  readonly work: Float64Array;
}

/** Largest coarsest level (cells) the dense factor is built for; n^3 / 3 flops once per solve. */
export const COARSEST_MAX_CELLS = 256;

/**
 * Factorises the active part of `s` (symmetric positive definite). Returns null if rounding makes a pivot
 * non-positive; the caller then relaxes instead.
 */
export function factorCoarsest(s: Stencil): CoarsestSolver | null {
  const { nx, ny, active } = s;
  const index = new Int32Array(nx * ny).fill(-1);
  const cellList: number[] = [];
  for (let k = 0; k < nx * ny; k++) if (active[k] === 1) { index[k] = cellList.length; cellList.push(k); }
  const n = cellList.length;
  const a = denseMatrix(s, index, cellList);
  for (let c = 0; c < n; c++) {
    let d = a[c * n + c];
    for (let m = 0; m < c; m++) d -= a[c * n + m] * a[c * n + m];
    if (!(d > 0)) return null;
    const lcc = Math.sqrt(d);
    a[c * n + c] = lcc;
    for (let r = c + 1; r < n; r++) {
      let v = a[r * n + c];
      for (let m = 0; m < c; m++) v -= a[r * n + m] * a[c * n + m];
      a[r * n + c] = v / lcc;
    }
  }
  return { cells: Int32Array.from(cellList), factor: a, work: new Float64Array(n) };
}

function denseMatrix(s: Stencil, index: Int32Array, cells: readonly number[]): Float64Array {
  const { nx, faceX, faceY } = s;
  const n = cells.length;
  const a = new Float64Array(n * n);
  for (let r = 0; r < n; r++) {
    const k = cells[r];
    const i = k % nx;
    const j = (k - i) / nx;
    a[r * n + r] = diagonalOf(s, k, couplingOf(s.dirichlet, k));
    const east = faceX[i + 1 + j * (nx + 1)];
    if (east !== 0) setPair(a, n, r, index[k + 1], -east);
    const north = faceY[k + nx];
    if (north !== 0) setPair(a, n, r, index[k + nx], -north);
  }
  return a;
}

function setPair(a: Float64Array, n: number, r: number, c: number, value: number): void {
  a[r * n + c] = value;
  a[c * n + r] = value;
}

/**
 * x = A^-1 b on the active cells, 0 elsewhere.
 * @param b rhs, i + j * nx; @param x padded vector (cell k at k + nx), overwritten.
 */
export function solveCoarsest(c: CoarsestSolver, nx: number, b: Float64Array, x: Float64Array): void {
  const { cells, factor, work } = c;
  const n = cells.length;
  for (let r = 0; r < n; r++) {
    let v = b[cells[r]];
    for (let m = 0; m < r; m++) v -= factor[r * n + m] * work[m];
    work[r] = v / factor[r * n + r];
  }
  for (let r = n - 1; r >= 0; r--) {
    let v = work[r];
    for (let m = r + 1; m < n; m++) v -= factor[m * n + r] * work[m];
    work[r] = v / factor[r * n + r];
  }
  x.fill(0);
  for (let r = 0; r < n; r++) x[cells[r] + nx] = work[r];
}

/**
 * Operator-dependent transfers at Dirichlet cells (inlet / outlet). Bilinear prolongation alone treats every
 * edge as a wall and carries a full-size correction into cells tied to a fixed potential; that costs the
 * V-cycle its grid independence (measured: 0.33 -> 0.69 per cycle from 64^2 to 1024^2). At a cell with a
 * Dirichlet coupling the prolonged value is instead one Jacobi step of the homogeneous equation,
 * e_f = (sum over open faces c_fn * bilinear(n)) / diag_f, which is exact for a correction that varies
 * linearly to zero at the boundary. Restriction applies the transpose, so the V-cycle stays symmetric.
 */
import type { Stencil } from './assemble.ts';
import { bilinearWeights, interpolationStrength } from './multigrid-bilinear.ts';

/** Transfer context of one fine level and its coarse level. */
export interface TransferPair {
  readonly fine: Stencil;
  readonly coarse: Stencil;
  /** Coarse neighbour row towards each fine row (see neighbourIndex). */
  readonly rowN: Int32Array;
  /** Interpolation strength of each coarse cell (interpolationStrength). */
  readonly strength: Float32Array;
  /** Scratch for bilinearWeights: up to 4 coarse cells and their weights. */
  readonly cells: Int32Array;
  readonly weights: Float64Array;
}

export function transferPair(fine: Stencil, coarse: Stencil, rowN: Int32Array): TransferPair {
  return { fine, coarse, rowN, strength: interpolationStrength(coarse), cells: new Int32Array(4), weights: new Float64Array(4) };
}

/** Bilinear prolongation at fine cell (i, j) from the coarse padded vector (same operator as prolongRow). */
function bilinearAt(t: TransferPair, i: number, j: number, coarseX: Float64Array): number {
  const n = bilinearWeights(t.coarse, t.strength, i, j, t.rowN[j], t.cells, t.weights);
  let value = 0;
  for (let m = 0; m < n; m++) value += t.weights[m] * coarseX[t.cells[m] + t.coarse.nx];
  return value;
}

/** Transpose of bilinearAt: adds amount * weight to each coarse cell fine cell (i, j) draws from. */
function scatterBilinear(t: TransferPair, i: number, j: number, amount: number, coarseB: Float64Array): void {
  const n = bilinearWeights(t.coarse, t.strength, i, j, t.rowN[j], t.cells, t.weights);
  for (let m = 0; m < n; m++) coarseB[t.cells[m]] += t.weights[m] * amount;
}

/**
 * Calls visit(ni, nj, coef / diag) for each open face of Dirichlet cell k (diag = face sum + coupling):
 * the weights of the Jacobi step in the module comment.
 */
function forNeighbours(s: Stencil, k: number, coupling: number, visit: (ni: number, nj: number, w: number) => void): void {
  const { nx, faceX, faceY } = s;
  const i = k % nx;
  const j = (k - i) / nx;
  const fx = k + j;
  const d = faceX[fx] + faceX[fx + 1] + faceY[k] + faceY[k + nx] + coupling;
  if (faceX[fx] !== 0) visit(i - 1, j, faceX[fx] / d);
  if (faceX[fx + 1] !== 0) visit(i + 1, j, faceX[fx + 1] / d);
  if (faceY[k] !== 0) visit(i, j - 1, faceY[k] / d);
  if (faceY[k + nx] !== 0) visit(i, j + 1, faceY[k + nx] / d);
}

/** After prolongRow: replaces the bilinear value at Dirichlet entry m of the fine level by the operator-dependent one. */
export function correctProlongCell(t: TransferPair, x: Float64Array, coarseX: Float64Array, m: number): void {
  const nx = t.fine.nx;
  const k = t.fine.dirichlet.cells[m];
  const i = k % nx;
  const j = (k - i) / nx;
  let value = 0;
  forNeighbours(t.fine, k, t.fine.dirichlet.coupling[m], (ni, nj, w) => { value += w * bilinearAt(t, ni, nj, coarseX); });
  x[k + nx] += value - bilinearAt(t, i, j, coarseX);
}

/**
 * After restrictRow: restrictRow spread this cell's residual without its coupling term, r + D x, by the
 * bilinear weights; this takes that back and spreads the true residual r by the operator-dependent weights
 * (the transpose of correctProlongCell). @param x fine padded vector; @param b fine rhs, i + j * nx.
 */
export function correctRestrictCell(t: TransferPair, x: Float64Array, b: Float64Array, coarseB: Float64Array, m: number): void {
  const { nx, faceX, faceY, dirichlet } = t.fine;
  const k = dirichlet.cells[m];
  const coupling = dirichlet.coupling[m];
  const i = k % nx;
  const j = (k - i) / nx;
  const v = k + nx;
  const fx = k + j;
  const w = faceX[fx];
  const e = faceX[fx + 1];
  const so = faceY[k];
  const no = faceY[k + nx];
  const spread = b[k] - ((w + e + so + no) * x[v] - w * x[v - 1] - e * x[v + 1] - so * x[v - nx] - no * x[v + nx]);
  const r = spread - coupling * x[v];
  scatterBilinear(t, i, j, -spread, coarseB);
  forNeighbours(t.fine, k, coupling, (ni, nj, wn) => scatterBilinear(t, ni, nj, wn * r, coarseB));
}

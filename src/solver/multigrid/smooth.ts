/** Red-black Gauss-Seidel on one grid row at a time, the multigrid smoother (rows let passes be fused). */
import { TINY, type Stencil } from '../assemble.ts';

/** Cell colour: (i + j) & 1; 0 = red, 1 = black. */
export type Colour = 0 | 1;

/**
 * Relaxes the cells of one colour in the active span of row j: x_k = (b_k + sum coef x_nb) / diag_k.
 * The main loop divides by the face sum; the row's Dirichlet cells are then redone with their coupling.
 * @param x padded vector (cell k at k + nx), updated in place. @param b right-hand side, i + j * nx.
 */
export function smoothRow(s: Stencil, x: Float64Array, b: Float64Array, j: number, colour: Colour): void {
  const { nx, faceX, faceY } = s;
  const rowK = j * nx;
  const rowX = rowK + j;
  const start = s.rowStart[j];
  for (let i = start + ((start + j + colour) & 1), end = s.rowEnd[j]; i < end; i += 2) {
    const k = rowK + i;
    const v = k + nx;
    const w = faceX[rowX + i];
    const e = faceX[rowX + i + 1];
    const so = faceY[k];
    const no = faceY[k + nx];
    x[v] = (b[k] + w * x[v - 1] + e * x[v + 1] + so * x[v - nx] + no * x[v + nx]) / (w + e + so + no + TINY);
  }
  const { cells, coupling, rowPtr } = s.dirichlet;
  for (let m = rowPtr[j]; m < rowPtr[j + 1]; m++) {
    const k = cells[m];
    if (((k - rowK + j) & 1) !== colour) continue;
    const i = k - rowK;
    const v = k + nx;
    const w = faceX[rowX + i];
    const e = faceX[rowX + i + 1];
    const so = faceY[k];
    const no = faceY[k + nx];
    x[v] = (b[k] + w * x[v - 1] + e * x[v + 1] + so * x[v - nx] + no * x[v + nx]) / (w + e + so + no + coupling[m]);
  }
}

/**
 * The first red relaxation of row j from a zero guess, which also zeroes the row's black cells: the same as
 * x = 0 then smoothRow(red), without clearing x first. Valid while the black neighbours are still unrelaxed.
 */
export function smoothRedFromZeroRow(s: Stencil, x: Float64Array, b: Float64Array, j: number): void {
  const { nx, faceX, faceY } = s;
  const rowK = j * nx;
  const rowX = rowK + j;
  const first = j & 1;
  for (let i = s.rowStart[j], end = s.rowEnd[j]; i < end; i++) {
    const k = rowK + i;
    x[k + nx] = (i & 1) === first
      ? b[k] / (faceX[rowX + i] + faceX[rowX + i + 1] + faceY[k] + faceY[k + nx] + TINY)
      : 0;
  }
  const { cells, coupling, rowPtr } = s.dirichlet;
  for (let m = rowPtr[j]; m < rowPtr[j + 1]; m++) {
    const k = cells[m];
    const i = k - rowK;
    if ((i & 1) !== first) continue;
    x[k + nx] = b[k] / (faceX[rowX + i] + faceX[rowX + i + 1] + faceY[k] + faceY[k + nx] + coupling[m]);
  }
}

/** One whole-grid half-sweep of one colour. */
export function smoothColour(s: Stencil, x: Float64Array, b: Float64Array, colour: Colour): void {
  for (let j = 0; j < s.ny; j++) smoothRow(s, x, b, j, colour);
}

/** b . x over the active span of row j (x padded), for the preconditioned residual r . z. */
export function rowDot(s: Stencil, b: Float64Array, x: Float64Array, j: number): number {
  const nx = s.nx;
  let sum = 0;
  for (let k = j * nx + s.rowStart[j], end = j * nx + s.rowEnd[j]; k < end; k++) sum += b[k] * x[k + nx];
  return sum;
}

/** Red-black Gauss-Seidel on one grid row at a time, the multigrid smoother (rows let passes be fused). */
import type { Stencil } from './assemble.ts';

/** Cell colour: (i + j) & 1; 0 = red, 1 = black. */
export type Colour = 0 | 1;

/**
 * Relaxes the cells of one colour in row j: x_k = (b_k + sum coef x_nb) / diag_k.
 * @param x padded vector (cell k at k + nx), updated in place. @param b right-hand side, i + j * nx.
 */
export function smoothRow(s: Stencil, x: Float64Array, b: Float64Array, j: number, colour: Colour): void {
  const { nx, diag, faceX, faceY } = s;
  const rowK = j * nx;
  const rowX = rowK + j;
  const start = s.rowStart[j];
  for (let i = start + ((start + j + colour) & 1), end = s.rowEnd[j]; i < end; i += 2) {
    const k = rowK + i;
    const v = k + nx;
    x[v] = (b[k]
      + faceX[rowX + i] * x[v - 1] + faceX[rowX + i + 1] * x[v + 1]
      + faceY[k] * x[v - nx] + faceY[k + nx] * x[v + nx]) / diag[k];
  }
}

/**
 * The first red relaxation of row j from a zero guess, which also zeroes the row's black cells: the same as
 * x = 0 then smoothRow(red), without clearing x first. Valid while the black neighbours are still unrelaxed.
 */
export function smoothRedFromZeroRow(s: Stencil, x: Float64Array, b: Float64Array, j: number): void {
  const { nx, diag } = s;
  const rowK = j * nx;
  const first = j & 1;
  for (let i = s.rowStart[j], end = s.rowEnd[j]; i < end; i++) {
    const k = rowK + i;
    x[k + nx] = (i & 1) === first ? b[k] / diag[k] : 0;
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

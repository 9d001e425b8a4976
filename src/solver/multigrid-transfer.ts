/** Grid transfers between a level and its 2x2-agglomerated coarse level: fused residual + restriction, injection. */
import type { Stencil } from './assemble.ts';

/**
 * coarseB = R (b - A x): the fine residual summed over the (up to) four children of each coarse cell.
 * Computed cell by cell without storing the fine residual.
 * @param x fine padded vector; @param b fine rhs, i + j * nx; @param coarseB coarse rhs, I + J * ncx, overwritten.
 */
export function restrictResidual(s: Stencil, x: Float64Array, b: Float64Array, coarseB: Float64Array, ncx: number): void {
  const { nx, ny, diag, faceX, faceY } = s;
  coarseB.fill(0);
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx;
    const rowX = rowK + j;
    const rowC = (j >> 1) * ncx;
    for (let i = 0; i < nx; i++) {
      const k = rowK + i;
      const v = k + nx;
      const r = b[k] - (diag[k] * x[v]
        - faceX[rowX + i] * x[v - 1] - faceX[rowX + i + 1] * x[v + 1]
        - faceY[k] * x[v - nx] - faceY[k + nx] * x[v + nx]);
      coarseB[rowC + (i >> 1)] += r;
    }
  }
}

/**
 * x += P xc, P = injection (each fine cell takes its parent's value). Excluded fine cells pick up
 * values too; the following smoothing sweep resets them to 0 (identity rows, zero rhs, sealed faces).
 * @param x fine padded vector; @param coarseX coarse padded vector.
 */
export function prolongAdd(nx: number, ny: number, x: Float64Array, coarseX: Float64Array, ncx: number): void {
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx + nx;
    const rowC = (j >> 1) * ncx + ncx;
    for (let i = 0; i < nx; i++) x[rowK + i] += coarseX[rowC + (i >> 1)];
  }
}

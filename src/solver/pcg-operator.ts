/** Applying a 5-point stencil to a padded grid vector (the solver's matrix-vector product). */
import type { Stencil } from './assemble.ts';

/**
 * A padded grid vector: cell (i, j) at index i + j * nx + nx, with one zero row before and after,
 * so the 5-point loops need no edge cases (edge faces have coefficient 0 and read the zero rows).
 */
export function paddedVector(nx: number, ny: number): Float64Array {
  return new Float64Array(nx * (ny + 2));
}

/**
 * out = A x on every cell, and returns x . out (the energy x^T A x).
 * @param x padded vector (see paddedVector), read.
 * @param out padded vector, written (padding rows untouched); must not alias x.
 */
export function applyStencil(s: Stencil, x: Float64Array, out: Float64Array): number {
  const { nx, ny, diag, faceX, faceY } = s;
  let energy = 0;
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx;
    const rowX = rowK + j;
    for (let i = 0; i < nx; i++) {
      const k = rowK + i;
      const v = k + nx;
      const xv = x[v];
      const ax = diag[k] * xv
        - faceX[rowX + i] * x[v - 1] - faceX[rowX + i + 1] * x[v + 1]
        - faceY[k] * x[v - nx] - faceY[k + nx] * x[v + nx];
      out[v] = ax;
      energy += xv * ax;
    }
  }
  return energy;
}

/**
 * p = z + beta p, then q = A p written over z; returns p . q. One pass: row j of p is updated, then row
 * j - 1 of A p (which needs p rows j - 2..j) overwrites row j - 1 of z (already consumed). Active row
 * spans only: outside them p, z and A p are all 0.
 * @param p padded search direction, updated; @param z padded preconditioned residual, overwritten by A p.
 */
export function updateDirectionAndApply(s: Stencil, p: Float64Array, z: Float64Array, beta: number): number {
  const { nx, ny, diag, faceX, faceY, rowStart, rowEnd } = s;
  let energy = 0;
  for (let j = 0; j <= ny; j++) {
    if (j < ny) {
      const row = (j + 1) * nx;
      for (let v = row + rowStart[j], end = row + rowEnd[j]; v < end; v++) p[v] = z[v] + beta * p[v];
    }
    if (j === 0) continue;
    const rowK = (j - 1) * nx;
    const rowX = rowK + j - 1;
    for (let i = rowStart[j - 1], end = rowEnd[j - 1]; i < end; i++) {
      const k = rowK + i;
      const v = k + nx;
      const pv = p[v];
      const ap = diag[k] * pv
        - faceX[rowX + i] * p[v - 1] - faceX[rowX + i + 1] * p[v + 1]
        - faceY[k] * p[v - nx] - faceY[k + nx] * p[v + nx];
      z[v] = ap;
      energy += pv * ap;
    }
  }
  return energy;
}

/**
 * r = b - A x with x padded and b, r plain (i + j * nx); returns ||r||_2. r may alias b.
 */
export function residual(s: Stencil, x: Float64Array, b: Float64Array, r: Float64Array): number {
  const { nx, ny, diag, faceX, faceY } = s;
  let sum = 0;
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx;
    const rowX = rowK + j;
    for (let i = 0; i < nx; i++) {
      const k = rowK + i;
      const v = k + nx;
      const rk = b[k] - (diag[k] * x[v]
        - faceX[rowX + i] * x[v - 1] - faceX[rowX + i + 1] * x[v + 1]
        - faceY[k] * x[v - nx] - faceY[k + nx] * x[v + nx]);
      r[k] = rk;
      sum += rk * rk;
    }
  }
  return Math.sqrt(sum);
}

/** Applying a 5-point stencil to a padded grid vector (the solver's matrix-vector products). */
import type { Stencil } from '../assemble.ts';

/**
 * A padded grid vector: cell (i, j) at index i + j * nx + nx, with one zero row before and after,
 * so the 5-point loops need no edge cases (edge faces have coefficient 0 and read the zero rows).
 */
export function paddedVector(nx: number, ny: number): Float64Array {
  return new Float64Array(nx * (ny + 2));
}

/** out += D x for the Dirichlet cells of rows from..to - 1 (x, out padded); returns the added x . D x. */
function addDirichlet(s: Stencil, x: Float64Array, out: Float64Array, from: number, to: number): number {
  const { cells, coupling, rowPtr } = s.dirichlet;
  let energy = 0;
  for (let m = rowPtr[from], end = rowPtr[to]; m < end; m++) {
    const v = cells[m] + s.nx;
    const dx = coupling[m] * x[v];
    out[v] += dx;
    energy += x[v] * dx;
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
  const { nx, ny, faceX, faceY, rowStart, rowEnd } = s;
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
      const w = faceX[rowX + i];
      const e = faceX[rowX + i + 1];
      const so = faceY[k];
      const no = faceY[k + nx];
      const ap = (w + e + so + no) * pv - w * p[v - 1] - e * p[v + 1] - so * p[v - nx] - no * p[v + nx];
      z[v] = ap;
      energy += pv * ap;
    }
    energy += addDirichlet(s, p, z, j - 1, j);
  }
  return energy;
}

/**
 * r = b - A x with x padded and b, r plain (i + j * nx); returns ||r||_2. r may alias b.
 * Only the active row spans are written and summed: b must be 0 outside them (a right-hand side of the
 * masked system is), and r there is left as it was (so pass r = b, or an r that is 0 there).
 */
export function residual(s: Stencil, x: Float64Array, b: Float64Array, r: Float64Array): number {
  const { nx, ny, rowStart, rowEnd } = s;
  const { cells, coupling, rowPtr } = s.dirichlet;
  let sum = 0;
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx;
    // Once at the start and once at the end of a solve, not per iteration: the shared cell formula is enough.
    for (let i = rowStart[j], end = rowEnd[j]; i < end; i++) r[rowK + i] = cellResidual(s, x, b, j, i);
    for (let m = rowPtr[j]; m < rowPtr[j + 1]; m++) r[cells[m]] -= coupling[m] * x[cells[m] + nx];
    for (let k = rowK + rowStart[j], end = rowK + rowEnd[j]; k < end; k++) sum += r[k] * r[k];
  }
  return Math.sqrt(sum);
}

/** b - A' x at cell (i, j), A' being A without the Dirichlet couplings (callers add those); x padded, b i + j * nx. */
export function cellResidual(s: Stencil, x: Float64Array, b: Float64Array, j: number, i: number): number {
  const { nx, faceX, faceY } = s;
  const k = i + j * nx;
  const v = k + nx;
  const f = k + j;
  const w = faceX[f];
  const e = faceX[f + 1];
  const so = faceY[k];
  const no = faceY[k + nx];
  return b[k] - ((w + e + so + no) * x[v] - w * x[v - 1] - e * x[v + 1] - so * x[v - nx] - no * x[v + nx]);
}

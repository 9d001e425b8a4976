/** Red-black Gauss-Seidel half-sweeps, the multigrid smoother (forward red-black before, black-red after: symmetric). */
import type { Stencil } from './assemble.ts';

/** Cell colour: (i + j) & 1; 0 = red, 1 = black. */
export type Colour = 0 | 1;

/**
 * Relaxes every cell of one colour: x_k = (b_k + sum coef x_nb) / diag_k.
 * @param x padded vector (cell k at k + nx), updated in place.
 * @param b right-hand side, i + j * nx.
 */
export function smoothColour(s: Stencil, x: Float64Array, b: Float64Array, colour: Colour): void {
  const { nx, ny, diag, faceX, faceY } = s;
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx;
    const rowX = rowK + j;
    for (let i = (j + colour) & 1; i < nx; i += 2) {
      const k = rowK + i;
      const v = k + nx;
      x[v] = (b[k]
        + faceX[rowX + i] * x[v - 1] + faceX[rowX + i + 1] * x[v + 1]
        + faceY[k] * x[v - nx] + faceY[k + nx] * x[v + nx]) / diag[k];
    }
  }
}

/**
 * The first red half-sweep from a zero guess, which also zeroes the black cells:
 * saves clearing x before each V-cycle. Same result as x = 0 then smoothColour(red).
 */
export function smoothRedFromZero(s: Stencil, x: Float64Array, b: Float64Array): void {
  const { nx, ny, diag } = s;
  for (let j = 0; j < ny; j++) {
    const rowK = j * nx;
    const first = j & 1;
    for (let i = 0; i < nx; i++) {
      const k = rowK + i;
      x[k + nx] = ((i & 1) === first) ? b[k] / diag[k] : 0;
    }
  }
}

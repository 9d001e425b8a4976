/** Fused vector updates of the conjugate-gradient loop (plain vectors i + j * nx, padded ones at k + nx). */
import type { Stencil } from '../assemble.ts';

/** Copies plain x into padded p (padding rows left as they are, i.e. 0). */
export function loadPadded(x: Float64Array, p: Float64Array, nx: number): void {
  p.set(x, nx);
}

/**
 * x += alpha p; r -= alpha q (p, q padded); returns r . r. Over the stencil's active row spans only: outside
 * them p and q are 0, so x and r would not change (about half the grid on a port section).
 */
export function updateSolution(
  s: Stencil, x: Float64Array, r: Float64Array, p: Float64Array, q: Float64Array, alpha: number,
): number {
  const { nx, ny, rowStart, rowEnd } = s;
  let sum = 0;
  for (let j = 0; j < ny; j++) {
    for (let k = j * nx + rowStart[j], end = j * nx + rowEnd[j]; k < end; k++) {
      x[k] += alpha * p[k + nx];
      const rk = r[k] - alpha * q[k + nx];
      r[k] = rk;
      sum += rk * rk;
    }
  }
  return sum;
}

/** Fused vector updates of the conjugate-gradient loop (plain vectors i + j * nx, padded ones at k + nx). */

/** Copies plain x into padded p (padding rows left as they are, i.e. 0). */
export function loadPadded(x: Float64Array, p: Float64Array, nx: number): void {
  p.set(x, nx);
}

/** x += alpha p; r -= alpha q (p, q padded); returns r . r. */
export function updateSolution(
  x: Float64Array, r: Float64Array, p: Float64Array, q: Float64Array, alpha: number, nx: number,
): number {
  let sum = 0;
  for (let k = 0, n = x.length; k < n; k++) {
    x[k] += alpha * p[k + nx];
    const rk = r[k] - alpha * q[k + nx];
    r[k] = rk;
    sum += rk * rk;
  }
  return sum;
}

/** A small dense linear solve: the leading block of the 4 x 4 normal equations of the wall-speed fit. */

/**
 * Solves the leading `n` x `n` block of a 4 x 4 system by Gaussian elimination with partial pivoting; null if
 * singular. `matrix` is row-major (entry (r, c) at 4 r + c, 16 entries), `rhs` has 4 entries; neither is changed.
 */
export function solveLeadingBlock(matrix: Float64Array, rhs: Float64Array, n: number): Float64Array | null {
  const a = Float64Array.from(matrix);
  const b = Float64Array.from(rhs);
  let scale = 0;
  for (let r = 0; r < n; r++) scale = Math.max(scale, Math.abs(a[5 * r]));
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[4 * r + col]) > Math.abs(a[4 * pivot + col])) pivot = r;
    if (!(Math.abs(a[4 * pivot + col]) > 1e-12 * scale)) return null;
    for (let k = 0; k < 4; k++) [a[4 * col + k], a[4 * pivot + k]] = [a[4 * pivot + k], a[4 * col + k]];
    [b[col], b[pivot]] = [b[pivot], b[col]];
    for (let r = col + 1; r < n; r++) {
      const f = a[4 * r + col] / a[4 * col + col];
      for (let k = col; k < n; k++) a[4 * r + k] -= f * a[4 * col + k];
      b[r] -= f * b[col];
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let sum = b[r];
    for (let k = r + 1; k < n; k++) sum -= a[4 * r + k] * b[k];
    b[r] = sum / a[4 * r + r];
  }
  return b;
}

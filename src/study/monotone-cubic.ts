/** Monotone cubic interpolation (PCHIP) of a width profile along the port: smooth, and never overshooting the widths given. */

/**
 * The piecewise cubic Hermite interpolant through (xs[k], ys[k]) with the slopes of Fritsch and Carlson's monotone
 * scheme (F. N. Fritsch, R. E. Carlson, "Monotone piecewise cubic interpolation", SIAM J. Numer. Anal. 17, 1980),
 * in the weighted harmonic-mean form of Fritsch and Butland used by MATLAB's pchip: where the data rise the curve
 * rises, a station that is a local widest or narrowest stays so, and no width overshoots its neighbours. Beyond the
 * first and last x the end value is held. Two points give the straight line between them.
 * `xs` strictly ascending, at least 2. Example: through (0, 30), (10, 34) the value at 5 is 32.
 */
export function monotoneCubic(xs: readonly number[], ys: readonly number[]): (x: number) => number {
  const n = xs.length;
  if (n < 2 || ys.length !== n) throw new RangeError(`monotoneCubic: needs 2 or more points with one value each, got ${n} and ${ys.length}`);
  const h = Array.from({ length: n - 1 }, (_, k) => xs[k + 1] - xs[k]);
  const d = h.map((hk, k) => (ys[k + 1] - ys[k]) / hk);
  const m = slopes(h, d);
  return (x) => {
    if (!(x > xs[0])) return ys[0];
    if (x >= xs[n - 1]) return ys[n - 1];
    let lo = 0, hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (xs[mid] <= x) lo = mid;
      else hi = mid;
    }
    const t = (x - xs[lo]) / h[lo];
    // y0 + (y1 - y0) s(t) + slope terms: equal widths with zero slopes give exactly y0, not y0 to rounding.
    const rise = t * t * (3 - 2 * t);
    return ys[lo] + (ys[lo + 1] - ys[lo]) * rise + h[lo] * (m[lo] * t * (1 - t) * (1 - t) - m[lo + 1] * t * t * (1 - t));
  };
}

/** Slopes at the points: zero at a local extreme, the weighted harmonic mean of the neighbouring secants elsewhere. */
function slopes(h: readonly number[], d: readonly number[]): number[] {
  const n = h.length + 1;
  if (n === 2) return [d[0], d[0]];
  const m = new Array<number>(n).fill(0);
  for (let k = 1; k < n - 1; k++) {
    if (d[k - 1] * d[k] <= 0) continue;
    const w1 = 2 * h[k] + h[k - 1], w2 = h[k] + 2 * h[k - 1];
    m[k] = (w1 + w2) / (w1 / d[k - 1] + w2 / d[k]);
  }
  m[0] = endSlope(h[0], h[1], d[0], d[1]);
  m[n - 1] = endSlope(h[n - 2], h[n - 3], d[n - 2], d[n - 3]);
  return m;
}

/** The one-sided three-point slope at an end, kept to the shape of the data (pchip's end rule). */
function endSlope(h0: number, h1: number, d0: number, d1: number): number {
  const m = ((2 * h0 + h1) * d0 - h0 * d1) / (h0 + h1);
  if (Math.sign(m) !== Math.sign(d0)) return 0;
  if (Math.sign(d0) !== Math.sign(d1) && Math.abs(m) > Math.abs(3 * d0)) return 3 * d0;
  return m;
}

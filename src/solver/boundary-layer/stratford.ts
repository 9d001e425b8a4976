/** Stratford's criterion for turbulent separation in a pressure rise, used as a second opinion beside Head. */

import { speedGradient } from './wall-samples.ts';

/** Stratford's Cp limit for the simple form of the criterion. */
const CP_LIMIT = 4 / 7;
/** Curvature counts as negative only beyond this share of dCp/dx over the run x (guards against round-off). */
const CURVATURE_TOLERANCE = 1e-3;

/**
 * Right-hand side of Stratford's criterion, Cp sqrt(x dCp/dx) = S (1e-6 R)^0.1 with S = 0.39 when d2p/dx2 >= 0
 * and 0.35 when d2p/dx2 < 0 (Stratford 1959). R = U_peak x / nu.
 */
export function stratfordLimit(reynolds: number, pressureCurvatureNegative: boolean): number {
  return (pressureCurvatureNegative ? 0.35 : 0.39) * (1e-6 * reynolds) ** 0.1;
}

/**
 * First point where Stratford predicts turbulent separation, or null.
 * Cp = 1 - (U / U_peak)^2 is measured from the highest speed so far (the peak moves whenever the speed reaches a new
 * high, and along a plateau to its downstream end); x = the equivalent flat-plate run at the peak plus the distance
 * since. Only pressure rises with 0 < Cp <= 4/7 are judged (beyond 4/7 the simple form does not hold).
 * @param sM arc length, m, increasing
 * @param speedMs edge speed, m/s
 * @param equivalentRunM per sample: flat-plate run, m, that would give the layer there; used at the peak
 * @param fromIndex first sample to consider (the start of the turbulent layer)
 * @returns arc length of separation, m, interpolated linearly between samples
 */
export function stratfordSeparation(
  sM: Float64Array,
  speedMs: Float64Array,
  nuM2s: number,
  equivalentRunM: Float64Array,
  fromIndex = 0,
): { sM: number } | null {
  const n = sM.length;
  if (fromIndex >= n) return null;
  const q = speedMs.map((u) => u * u);
  const dq = speedGradient(sM, q);
  const ddq = speedGradient(sM, dq);
  let peak = fromIndex;
  let prevMargin = marginAtPeak(speedMs[fromIndex], equivalentRunM[fromIndex], nuM2s);
  for (let i = fromIndex; i < n; i++) {
    if (q[i] >= q[peak]) {
      peak = i;
      prevMargin = marginAtPeak(speedMs[i], equivalentRunM[i], nuM2s);
      continue;
    }
    const cp = 1 - q[i] / q[peak];
    const dCp = -dq[i] / q[peak];
    const x = equivalentRunM[peak] + sM[i] - sM[peak];
    if (!(dCp > 0) || !(x > 0) || cp > CP_LIMIT) {
      prevMargin = -Infinity;
      continue;
    }
    const curvatureNegative = -ddq[i] * x < -CURVATURE_TOLERANCE * dCp * q[peak];
    const reynolds = (speedMs[peak] * x) / nuM2s;
    const margin = cp * Math.sqrt(x * dCp) - stratfordLimit(reynolds, curvatureNegative);
    if (!Number.isFinite(margin)) {
      prevMargin = -Infinity;
      continue;
    }
    if (margin >= 0) {
      const t = Number.isFinite(prevMargin) ? prevMargin / (prevMargin - margin) : 1;
      return { sM: sM[i - 1] + t * (sM[i] - sM[i - 1]) };
    }
    prevMargin = margin;
  }
  return null;
}

/** At the peak Cp = 0, so the margin is minus the limit (or -Infinity when there is no run yet). */
function marginAtPeak(speedMs: number, runM: number, nuM2s: number): number {
  return runM > 0 && speedMs > 0 ? -stratfordLimit((speedMs * runM) / nuM2s, false) : -Infinity;
}

/** Flux balance over equipotential stations: each station phi = c must pass the whole flux (a solver check). */
import type { Stencil } from './assemble.ts';
import type { CutGrid } from './types.ts';

/** Number of equipotential stations checked, at phi = m / (STATION_COUNT + 1), m = 1..STATION_COUNT. */
export const STATION_COUNT = 20;

/**
 * Flux through every station phi = c_m: the sum, over the faces between a cell above c (phi > c) and one
 * at or below it, of coef * (phi_above - phi_below); the inlet counts as above every station and the
 * outlet as below, so their couplings add where a cell lies on the other side.
 * In exact arithmetic this equals the total flux plus the residuals of the cells above c, so it checks
 * the solve (and the assembly's conservation) independently of the residual norm.
 * @param phi potential, i + j * nx, finite in active cells.
 * @returns flux per station, index m - 1.
 */
export function stationFluxes(s: Stencil, grid: CutGrid, phi: Float64Array, count: number = STATION_COUNT): Float64Array {
  const levels = new Float64Array(count + 2);
  for (let m = 0; m < count + 2; m++) levels[m] = m / (count + 1);
  const flux = new Float64Array(count + 2);
  const { nx, ny, faceX, faceY, rowStart, rowEnd } = s;
  // Open faces lie inside the active spans (a face is open only between two active cells).
  for (let j = 0; j < ny; j++) {
    const rowX = j * (nx + 1);
    const rowK = j * nx;
    for (let i = Math.max(1, rowStart[j]), end = rowEnd[j]; i < end; i++) {
      const coef = faceX[rowX + i];
      if (coef !== 0) addCrossing(phi[rowK + i - 1], phi[rowK + i], coef, levels, flux, count);
    }
    if (j === 0) continue;
    for (let k = rowK + rowStart[j], end = rowK + rowEnd[j]; k < end; k++) {
      const coef = faceY[k];
      if (coef !== 0) addCrossing(phi[k - nx], phi[k], coef, levels, flux, count);
    }
  }
  const { inletCoupling, outletCoupling } = grid;
  const { cells } = s.dirichlet; // the active cells with a coupling
  for (let n = 0; n < cells.length; n++) {
    const k = cells[n];
    const p = phi[k];
    const cin = inletCoupling[k];
    const cout = outletCoupling[k];
    for (let m = 1; m <= count; m++) {
      if (p <= levels[m]) flux[m] += cin * (1 - p);
      else flux[m] += cout * p;
    }
  }
  return flux.subarray(1, count + 1);
}

/** Adds coef * |a - b| to every station c with min(a, b) <= c < max(a, b). */
function addCrossing(a: number, b: number, coef: number, levels: Float64Array, flux: Float64Array, count: number): void {
  const lo = a < b ? a : b;
  const hi = a < b ? b : a;
  if (!(hi > lo)) return;
  const first = Math.max(1, Math.floor(lo * (count + 1)));
  const last = Math.min(count, Math.ceil(hi * (count + 1)));
  for (let m = first; m <= last; m++) {
    const c = levels[m];
    if (lo <= c && c < hi) flux[m] += coef * (hi - lo);
  }
}

/** Worst |station flux - total| / total over the stations. */
export function worstImbalance(fluxes: Float64Array, total: number): number {
  let worst = 0;
  for (let m = 0; m < fluxes.length; m++) worst = Math.max(worst, Math.abs(fluxes[m] - total) / total);
  return worst;
}

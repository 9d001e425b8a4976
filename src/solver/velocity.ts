/** Velocity from the potential: inlet and outlet fluxes, cell-centre speed ratio (u = -grad phi, unit potential drop). */
import type { Stencil } from './assemble.ts';
import type { CutGrid } from './types.ts';

/** Total flux through the inlet and the outlet, per unit depth at a unit potential drop (equal at convergence). */
export interface BoundaryFlux {
  readonly inlet: number;
  readonly outlet: number;
}

/**
 * Sums the Dirichlet fluxes: inlet coupling * (1 - phi) and outlet coupling * (phi - 0) over the solved cells
 * (the stencil's Dirichlet list holds exactly the solved cells with a coupling, so only those are visited).
 * @param phi potential, i + j * nx (values in excluded cells are ignored).
 */
export function boundaryFlux(s: Stencil, grid: CutGrid, phi: Float64Array): BoundaryFlux {
  const { inletCoupling, outletCoupling } = grid;
  const { cells } = s.dirichlet;
  let inlet = 0;
  let outlet = 0;
  for (let m = 0; m < cells.length; m++) {
    const k = cells[m];
    inlet += inletCoupling[k] * (1 - phi[k]);
    outlet += outletCoupling[k] * phi[k];
  }
  return { inlet, outlet };
}

/**
 * Cell-centre speed ratio. Face velocity is (phi_upstream - phi_downstream) / h on each open face; the cell's
 * x (y) velocity is the open-fraction-weighted mean of its two x (y) faces, i.e. the face fluxes divided by
 * the open face length, so a closed wall face contributes nothing (no flow through a wall).
 * @param phi potential, i + j * nx, finite in active cells (call before excluded cells are set to NaN).
 * @param meanInletSpeed potential units per length unit; the ratio is speed / meanInletSpeed.
 * @param out speed ratio, i + j * nx, written; NaN in excluded cells.
 */
export function speedRatio(s: Stencil, h: number, phi: Float64Array, meanInletSpeed: number, out: Float64Array): void {
  const { nx, ny, faceX, faceY, active, rowStart, rowEnd } = s;
  const scale = 1 / (h * meanInletSpeed);
  for (let j = 0; j < ny; j++) {
    const rowX = j * (nx + 1);
    const rowK = j * nx;
    // Outside the active span every cell is excluded.
    out.fill(NaN, rowK, rowK + rowStart[j]);
    out.fill(NaN, rowK + rowEnd[j], rowK + nx);
    for (let i = rowStart[j], end = rowEnd[j]; i < end; i++) {
      const k = i + rowK;
      if (active[k] !== 1) {
        out[k] = NaN;
        continue;
      }
      const p = phi[k];
      const ow = faceX[rowX + i];
      const oe = faceX[rowX + i + 1];
      const os = faceY[k];
      const on = faceY[k + nx];
      const fx = (ow !== 0 ? ow * (phi[k - 1] - p) : 0) + (oe !== 0 ? oe * (p - phi[k + 1]) : 0);
      const fy = (os !== 0 ? os * (phi[k - nx] - p) : 0) + (on !== 0 ? on * (p - phi[k + nx]) : 0);
      const u = ow + oe > 0 ? fx / (ow + oe) : 0;
      const v = os + on > 0 ? fy / (os + on) : 0;
      out[k] = Math.sqrt(u * u + v * v) * scale;
    }
  }
}

/** Velocity from the potential: inlet and outlet fluxes, cell-centre speed ratio (u = -grad phi, unit potential drop). */
import type { Stencil } from './assemble.ts';
import type { CutGrid } from './types.ts';

/** Total flux through the inlet and the outlet, per unit depth at a unit potential drop (equal at convergence). */
export interface BoundaryFlux {
  readonly inlet: number;
  readonly outlet: number;
}

/**
 * Sums the Dirichlet fluxes: inlet coupling * (1 - phi) and outlet coupling * (phi - 0) over the solved cells.
 * @param phi potential, i + j * nx (values in excluded cells are ignored).
 */
export function boundaryFlux(grid: CutGrid, mask: Uint8Array, phi: Float64Array): BoundaryFlux {
  const { inletCoupling, outletCoupling } = grid;
  let inlet = 0;
  let outlet = 0;
  for (let k = 0; k < phi.length; k++) {
    if (mask[k] !== 1) continue;
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
  const { nx, ny, faceX, faceY, active } = s;
  const scale = 1 / (h * meanInletSpeed);
  for (let j = 0; j < ny; j++) {
    const rowX = j * (nx + 1);
    for (let i = 0; i < nx; i++) {
      const k = i + j * nx;
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

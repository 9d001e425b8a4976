/** Velocity anywhere in a cell from the fluxes through its four faces (linear between opposite faces). */
import type { CutGrid } from '../types.ts';

/**
 * Flow direction field built from face fluxes. Face flux = conductance x potential drop across the face (the
 * finite-volume flux: open fraction, times the passage depth when the grid has one); inside a cell the x-velocity varies linearly between the left and right faces'
 * fluxes and the y-velocity between the bottom and top faces' (the cell-wise scheme used for particle tracking in
 * groundwater models). Where the cell balance holds this field has no divergence, so traced lines keep the flux
 * between them. Values are flux per cell size; only the direction is used by the tracer.
 */
export class FaceVelocity {
  constructor(private readonly grid: CutGrid, private readonly phi: Float64Array) {}

  /** Velocity at (x, y), in `out`; false when the point is off the grid or in a cell with no solved fluid. */
  at(x: number, y: number, out: [number, number]): boolean {
    const { nx, ny, h, x0, y0 } = this.grid;
    const u = (x - x0) / h, v = (y - y0) / h;
    const i = Math.floor(u), j = Math.floor(v);
    if (i < 0 || j < 0 || i >= nx || j >= ny) return false;
    const c = i + j * nx;
    if (!(this.grid.cellFraction[c] > 0) || !Number.isFinite(this.phi[c])) return false;
    const faceX = this.grid.conductanceX ?? this.grid.openX;
    const faceY = this.grid.conductanceY ?? this.grid.openY;
    const left = this.flux(faceX[i + j * (nx + 1)], c - 1, c);
    const right = this.flux(faceX[i + 1 + j * (nx + 1)], c, c + 1);
    const bottom = this.flux(faceY[c], c - nx, c);
    const top = this.flux(faceY[c + nx], c, c + nx);
    out[0] = left + (u - i) * (right - left);
    out[1] = bottom + (v - j) * (top - bottom);
    return true;
  }

  /** Flux from cell `from` to cell `to` through a face of conductance `open` (0 when closed or unsolved). */
  private flux(open: number, from: number, to: number): number {
    if (!(open > 0)) return 0;
    const drop = this.phi[from] - this.phi[to];
    return Number.isFinite(drop) ? open * drop : 0;
  }
}

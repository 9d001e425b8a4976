/** Hand-built cut grids for solver tests (rectangles need no rasteriser: every fraction is 0 or 1). */
import type { CutGrid } from '../../src/solver/types.ts';

/**
 * A straight channel nx * h long and ny * h wide, flow along x: inlet on the left edge, outlet on the
 * right edge, walls top and bottom. Inlet and outlet couplings are edge length / (h / 2) = 2 per cell.
 * `solid(i, j)` may mark cells as solid (fraction 0, faces closed) to carve blocks out of the rectangle.
 */
export function channelGrid(nx: number, ny: number, h = 1, solid: (i: number, j: number) => boolean = () => false): CutGrid {
  const cellFraction = new Float64Array(nx * ny);
  const openX = new Float64Array((nx + 1) * ny);
  const openY = new Float64Array(nx * (ny + 1));
  const inletCoupling = new Float64Array(nx * ny);
  const outletCoupling = new Float64Array(nx * ny);
  const fluid = (i: number, j: number) => i >= 0 && i < nx && j >= 0 && j < ny && !solid(i, j);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      if (!fluid(i, j)) continue;
      cellFraction[i + j * nx] = 1;
      if (fluid(i - 1, j)) openX[i + j * (nx + 1)] = 1;
      if (fluid(i, j - 1)) openY[i + j * nx] = 1;
    }
    if (fluid(0, j)) inletCoupling[j * nx] = 2;
    if (fluid(nx - 1, j)) outletCoupling[nx - 1 + j * nx] = 2;
  }
  return { nx, ny, h, x0: 0, y0: 0, cellFraction, openX, openY, inletCoupling, outletCoupling };
}

/** Every cell with a nonzero fluid fraction; stands in for connectedCells on grids without dead pockets. */
export function fluidMask(grid: CutGrid): Uint8Array {
  const mask = new Uint8Array(grid.nx * grid.ny);
  for (let k = 0; k < mask.length; k++) mask[k] = grid.cellFraction[k] > 0 ? 1 : 0;
  return mask;
}

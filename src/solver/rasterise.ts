/** Cut-cell rasterisation of a flow domain: area fractions, face open fractions and inlet/outlet couplings. */
import { cellFractions } from './rasterise-area.ts';
import { bounds, checkDomain, checkInletSpan } from './rasterise-checks.ts';
import { couplings } from './rasterise-coupling.ts';
import { faceFractions } from './rasterise-faces.ts';
import { gridFrame, toGridRings } from './rasterise-frame.ts';
import type { CutGrid, FlowDomain } from './types.ts';

/**
 * Lays a square grid over the domain and measures it exactly.
 * Cell size h = sqrt(bounding-box area / targetCells), with one spare cell around the box
 * (so the box's lower-left corner is grid node (1, 1)). Area and face fractions come from exact clipping
 * of the rings against the grid, not from sampling cell centres.
 *
 * Guarantees, so the solver need not re-check: every fraction is in 0..1; a face is open only if both
 * cells beside it hold fluid; a coupling is non-zero only in a cell holding fluid.
 * Memory: five Float64 arrays of about nx * ny (40 bytes a cell).
 *
 * Throws FlowSetupError for a section the solver cannot use (see rasterise-checks.ts).
 * Example: a 4 x 1 channel at targetCells 64 gives h = 0.25, nx = 18, ny = 6.
 */
export function rasterise(domain: FlowDomain, targetCells: number): CutGrid {
  checkDomain(domain, targetCells);
  const frame = gridFrame(bounds(domain), targetCells);
  checkInletSpan(domain, frame.h);
  const { nx, ny } = frame;
  const rings = toGridRings(domain, frame);
  const cellFraction = cellFractions(rings, nx, ny);
  const { openX, openY } = faceFractions(rings, nx, ny);
  const { inletCoupling, outletCoupling } = couplings(rings, nx, ny);
  keepToFluid(cellFraction, openX, openY, inletCoupling, outletCoupling, nx, ny);
  return { ...frame, cellFraction, openX, openY, inletCoupling, outletCoupling };
}

/**
 * Closes faces beside a cell with no fluid and drops couplings of such cells. This only removes
 * slivers below rounding level (a cell whose area rounded to 0 while a face or boundary piece
 * still grazes it), which carry no flow.
 */
function keepToFluid(
  fraction: Float64Array, openX: Float64Array, openY: Float64Array,
  inlet: Float64Array, outlet: Float64Array, nx: number, ny: number,
): void {
  const strideX = nx + 1;
  for (let j = 0; j < ny; j++) {
    for (let k = 0; k <= nx; k++) {
      const f = k + j * strideX;
      if (openX[f] === 0) continue;
      if (k === 0 || k === nx || fraction[k - 1 + j * nx] === 0 || fraction[k + j * nx] === 0) openX[f] = 0;
    }
  }
  for (let m = 0; m <= ny; m++) {
    for (let i = 0; i < nx; i++) {
      const f = i + m * nx;
      if (openY[f] === 0) continue;
      if (m === 0 || m === ny || fraction[i + (m - 1) * nx] === 0 || fraction[i + m * nx] === 0) openY[f] = 0;
    }
  }
  for (let c = 0; c < fraction.length; c++) {
    if (fraction[c] === 0) {
      inlet[c] = 0;
      outlet[c] = 0;
    }
  }
}

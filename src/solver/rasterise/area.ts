/** Exact fluid area fraction of every cell, from the rings' boundary alone (Green's theorem plus a row sweep). */
import { forEachCellPiece } from './clip-pieces.ts';
import type { GridRing } from './frame.ts';

/** Fractions this close to 0 or 1 are rounding noise of the row sums and are made exact. */
const FRACTION_NOISE = 1e-12;

/**
 * Fluid area fraction per cell, 0..1, row-major i + j * nx.
 *
 * Why it is exact: the fluid indicator at a point is the winding number of the rings, which a horizontal
 * ray to the left picks up from each boundary piece it passes. Integrating it over a cell, a piece inside
 * the cell contributes -dv * (right cell edge - piece midpoint u) (a trapezoid), and every cell to its right
 * in the same row gets the full -dv. Storing those contributions as differences along the row and summing
 * the row once gives every cell's area, interior cells included, in O(cells + pieces).
 * The sum is continuous in the geometry, so pieces lying on grid lines or vertices on nodes need no tie rule.
 */
export function cellFractions(rings: readonly GridRing[], nx: number, ny: number): Float64Array {
  const cover = new Float64Array(nx * ny);
  for (const { uv, sense } of rings) {
    const n = uv.length >> 1;
    const visit = (ua: number, va: number, ub: number, vb: number): void => {
      const dv = (vb - va) * sense;
      if (dv === 0) return;
      const um = 0.5 * (ua + ub);
      const i = clamp(Math.floor(um), 0, nx - 1);
      const j = clamp(Math.floor(0.5 * (va + vb)), 0, ny - 1);
      const f = um - i;
      const row = j * nx;
      cover[row + i] -= dv * (1 - f);
      if (i + 1 < nx) cover[row + i + 1] -= dv * f;
    };
    for (let k = 0; k < n; k++) {
      const m = k + 1 === n ? 0 : k + 1;
      forEachCellPiece(uv[2 * k], uv[2 * k + 1], uv[2 * m], uv[2 * m + 1], visit);
    }
  }
  for (let j = 0; j < ny; j++) {
    let running = 0;
    for (let c = j * nx, end = c + nx; c < end; c++) {
      running += cover[c];
      cover[c] = tidyFraction(running);
    }
  }
  return cover;
}

/**
 * Clamps to 0..1 and removes rounding noise next to 0 and 1.
 * (Hot loops in other modules should copy it to a local: some module loaders turn imported bindings into getters.)
 */
export function tidyFraction(value: number): number {
  if (value < FRACTION_NOISE) return 0;
  if (value > 1 - FRACTION_NOISE) return 1;
  return value;
}

export function clamp(value: number, lo: number, hi: number): number {
  return value < lo ? lo : value > hi ? hi : value;
}

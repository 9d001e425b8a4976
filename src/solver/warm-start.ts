/** Starting guess for the solve from an earlier potential on any grid (coarser, finer or shifted). */
import { sampleCells } from './reading/field.ts';
import type { CutGrid, PotentialField } from './types.ts';

/** Guess where the earlier field has no valid cell near: midway between inlet (1) and outlet (0). */
const FALLBACK_POTENTIAL = 0.5;
/** How far (old cells) to look for a valid old cell when none of the four bilinear neighbours is valid. */
const SEARCH_CELLS = 2;

/**
 * Writes the guess into x (i + j * nx) for every active cell: bilinear interpolation of the old potential
 * at the cell centre, over the old cells that hold a value (weights renormalised), else the nearest valid
 * old cell within SEARCH_CELLS, else FALLBACK_POTENTIAL; clamped to 0..1 (the potential's range).
 * Excluded cells get 0. A field whose phi length does not match its nx * ny is ignored (fallback guess).
 */
export function warmStartGuess(field: PotentialField, grid: CutGrid, mask: Uint8Array, x: Float64Array): void {
  const { nx, ny, h, x0, y0 } = grid;
  const usable = field.phi.length === field.nx * field.ny && field.h > 0;
  for (let j = 0; j < ny; j++) {
    const y = y0 + (j + 0.5) * h;
    for (let i = 0; i < nx; i++) {
      const k = i + j * nx;
      if (mask[k] !== 1) {
        x[k] = 0;
        continue;
      }
      const guess = usable ? sample(field, x0 + (i + 0.5) * h, y) : FALLBACK_POTENTIAL;
      x[k] = Math.min(1, Math.max(0, guess));
    }
  }
}

/** Old potential at (x, y), length units: bilinear over its valid cells, else the nearest valid cell near. */
function sample(f: PotentialField, x: number, y: number): number {
  const value = sampleCells(f, f.phi, x, y);
  if (!Number.isNaN(value)) return value;
  return nearest(f, Math.round((x - f.x0) / f.h - 0.5), Math.round((y - f.y0) / f.h - 0.5));
}

function nearest(f: PotentialField, ic: number, jc: number): number {
  let best = FALLBACK_POTENTIAL;
  let bestD = Infinity;
  for (let dj = -SEARCH_CELLS; dj <= SEARCH_CELLS; dj++) {
    for (let di = -SEARCH_CELLS; di <= SEARCH_CELLS; di++) {
      const value = at(f, ic + di, jc + dj);
      const d = di * di + dj * dj;
      if (!Number.isNaN(value) && d < bestD) {
        best = value;
        bestD = d;
      }
    }
  }
  return best;
}

/** Old potential of cell (i, j), NaN outside the old grid or the old fluid. */
function at(f: PotentialField, i: number, j: number): number {
  if (i < 0 || j < 0 || i >= f.nx || j >= f.ny) return NaN;
  const value = f.phi[i + j * f.nx];
  return Number.isFinite(value) ? value : NaN;
}

/** Starting guess for the solve from an earlier potential on any grid (coarser, finer or shifted). */
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
    const v = (y0 + (j + 0.5) * h - field.y0) / field.h - 0.5;
    for (let i = 0; i < nx; i++) {
      const k = i + j * nx;
      if (mask[k] !== 1) {
        x[k] = 0;
        continue;
      }
      const u = (x0 + (i + 0.5) * h - field.x0) / field.h - 0.5;
      const guess = usable ? sample(field, u, v) : FALLBACK_POTENTIAL;
      x[k] = Math.min(1, Math.max(0, guess));
    }
  }
}

/** Old potential at fractional old-cell coordinates (u, v) (cell centres at integers). */
function sample(f: PotentialField, u: number, v: number): number {
  const i0 = Math.floor(u);
  const j0 = Math.floor(v);
  const tx = u - i0;
  const ty = v - j0;
  let sum = 0;
  let weight = 0;
  for (let dj = 0; dj <= 1; dj++) {
    for (let di = 0; di <= 1; di++) {
      const value = at(f, i0 + di, j0 + dj);
      if (Number.isNaN(value)) continue;
      const w = (di === 1 ? tx : 1 - tx) * (dj === 1 ? ty : 1 - ty);
      sum += w * value;
      weight += w;
    }
  }
  if (weight > 1e-9) return sum / weight;
  return nearest(f, Math.round(u), Math.round(v));
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

/** Full-multigrid starting guess: the problem solved on the coarsest level, then carried up one level at a time. */
import type { Stencil } from '../assemble.ts';
import { residual } from '../pcg/operator.ts';
import { float64Of } from '../scratch.ts';
import { prolongRow } from './bilinear.ts';
import { solveCoarsest } from './coarsest.ts';
import { applyMultigridAt, type Multigrid } from './multigrid.ts';

/**
 * Writes a starting guess for A x = b into x (i + j * nx, 0 outside the active cells). The right-hand side is
 * carried to every level the way the coarse couplings are (children summed, times the coarse scale), so each
 * level holds its own rediscretised problem; the coarsest is solved directly, and each finer level starts from
 * the bilinear prolongation of the level below, improved by one V-cycle (all but the finest: the conjugate
 * gradients' first iteration is that V-cycle). Returns false, leaving x alone, when the coarsest level has no
 * direct factor or the hierarchy has a single level.
 * @param b fine right-hand side, i + j * nx (nonzero only in Dirichlet cells); @param scratch fine padded vector.
 */
export function fullMultigridStart(mg: Multigrid, b: Float64Array, x: Float64Array, scratch: Float64Array): boolean {
  const depth = mg.levels.length - 1;
  if (mg.coarsest === null || depth === 0) return false;
  const rhs = restrictedRhs(mg, b);
  const coarsest = mg.levels[depth].stencil;
  // Padded guesses and corrections (cell k at k + nx), residuals i + j * nx, one of each per level.
  const padded = (slot: string, s: Stencil) => float64Of(mg.scratch, `fmg${slot}`, s.nx * (s.ny + 2));
  let below = padded(`${depth}.guess`, coarsest);
  solveCoarsest(mg.coarsest, coarsest.nx, rhs[depth], below);
  for (let l = depth - 1; l >= 1; l--) {
    const s = mg.levels[l].stencil;
    const guess = padded(`${l}.guess`, s);
    prolongLevel(mg, l, below, guess);
    const r = float64Of(mg.scratch, `fmg${l}.r`, s.nx * s.ny);
    residual(s, guess, rhs[l], r);
    const e = padded(`${l}.e`, s);
    applyMultigridAt(mg, l, r, e);
    for (let j = 0; j < s.ny; j++) {
      for (let k = (j + 1) * s.nx + s.rowStart[j], end = (j + 1) * s.nx + s.rowEnd[j]; k < end; k++) guess[k] += e[k];
    }
    below = guess;
  }
  const fine = mg.levels[0].stencil;
  scratch.fill(0);
  prolongLevel(mg, 0, below, scratch);
  x.set(scratch.subarray(fine.nx, fine.nx * (fine.ny + 1)));
  return true;
}

/** b on every level: rhs[0] = b, rhs[l + 1] = coarse scale times the sum over each cell's children. */
function restrictedRhs(mg: Multigrid, b: Float64Array): Float64Array[] {
  const rhs = [b];
  for (let l = 0; l + 1 < mg.levels.length; l++) {
    const fine = mg.levels[l].stencil;
    const coarse = mg.levels[l + 1].stencil;
    const out = float64Of(mg.scratch, `fmg${l + 1}.rhs`, coarse.nx * coarse.ny);
    const { cells } = fine.dirichlet;
    for (let m = 0; m < cells.length; m++) {
      const k = cells[m];
      const i = k % fine.nx;
      const j = (k - i) / fine.nx;
      out[(i >> 1) + (j >> 1) * coarse.nx] += mg.coarseScale * rhs[l][k];
    }
    rhs.push(out);
  }
  return rhs;
}

/** x = P xc on level l from level l + 1 (bilinear rows), then 0 in the level's excluded cells. x padded, zero on entry. */
function prolongLevel(mg: Multigrid, l: number, coarseX: Float64Array, x: Float64Array): void {
  const down = mg.levels[l].down;
  if (down === null) throw new Error('prolongLevel: no coarser level');
  const s: Stencil = down.fine;
  for (let j = 0; j < s.ny; j++) {
    prolongRow(s, x, j, down.coarse, down.strength, coarseX, down.rowN[j]);
    const row = j * s.nx;
    for (let i = s.rowStart[j], end = s.rowEnd[j]; i < end; i++) if (s.active[row + i] !== 1) x[row + i + s.nx] = 0;
  }
}

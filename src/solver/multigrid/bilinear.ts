/**
 * Bilinear grid transfers, row by row, between a level and its 2x2-agglomerated coarse level; restriction
 * is the exact transpose of prolongation, which keeps the V-cycle symmetric. A fine cell sits a quarter
 * coarse cell from its parent's centre: weights 9/16 (parent), 3/16 (row neighbour towards the child),
 * 3/16 (column neighbour), 1/16 (diagonal), applied as two 1D steps (across rows, then along the row).
 *
 * Every coarse cell but the parent enters with its interpolation strength (interpolationStrength), and the
 * weights are renormalised: an excluded cell (strength 0) acts as a wall, not as a zero value, and a weakly
 * connected cut cell lends its value only weakly. Without the latter, a coarse cell joined to the rest by
 * slivers of faces (a sharp seat edge) passes full bilinear weight to well-connected neighbours while its
 * own coarse equation is weak; the coarse correction then overshoots that mode many times over (measured:
 * V-cycle iteration diverging at 41x per cycle, PCG 23 instead of 13 iterations on the 4M-cell sample).
 *
 * Piecewise-constant transfers (injection and sum) are cheaper but lose grid independence: measured
 * V-cycle residual factors on a square channel were 0.17, 0.35, 0.44 at 32, 128, 512 cells across,
 * against about 0.3 at every size with these (test/solver/multigrid.test.ts).
 */
import { diagonalOf, type Stencil } from '../assemble.ts';
import { float32Of, type ScratchArrays } from '../scratch.ts';

/**
 * Coarse cells whose diagonal (face sum + coupling) reaches this take full weight; 2 keeps wall and corner cells full.
 * With a passage depth, in units of the stencil's depthScale (a whole face of the mean depth).
 */
const FULL_STRENGTH_DIAGONAL = 2;

/**
 * Per coarse cell: min(1, diagonal / FULL_STRENGTH_DIAGONAL), 0 in excluded cells; I + J * ncx (taken from `scratch`,
 * slot named by the coarse level's `depth`, when given). Interpolation weights only (used identically by
 * prolongation and restriction), so single precision is enough.
 */
export function interpolationStrength(c: Stencil, scratch: ScratchArrays | null = null, depth = 1): Float32Array {
  const { nx, ny, active, dirichlet } = c;
  const out = float32Of(scratch, `mg${depth}.strength`, nx * ny);
  const scale = c.depthScale === undefined ? 1 / FULL_STRENGTH_DIAGONAL : 1 / (FULL_STRENGTH_DIAGONAL * c.depthScale);
  for (let j = 0; j < ny; j++) {
    for (let i = c.rowStart[j], k = i + j * nx, end = c.rowEnd[j]; i < end; i++, k++) {
      if (active[k] === 1) out[k] = Math.min(1, diagonalOf(c, k, 0) * scale);
    }
  }
  for (let m = 0; m < dirichlet.cells.length; m++) {
    const k = dirichlet.cells[m];
    out[k] = Math.min(1, diagonalOf(c, k, dirichlet.coupling[m]) * scale);
  }
  return out;
}

/** For each fine index along one axis: the coarse neighbour towards it, clamped to the grid (then it is the parent). */
export function neighbourIndex(n: number, nc: number): Int32Array {
  const out = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const parent = i >> 1;
    out[i] = (i & 1) === 1 ? Math.min(parent + 1, nc - 1) : Math.max(parent - 1, 0);
  }
  return out;
}

/** Along-row weight g of coarse column I as a side neighbour: (3 s(I, J) + s(I, jn)) / 4. rowC, rowD = J * ncx, jn * ncx. */
export function sideWeight(strength: Float32Array, rowC: number, rowD: number, I: number): number {
  return 0.75 * strength[rowC + I] + 0.25 * strength[rowD + I];
}

/** g times the across-row value of column I as a side neighbour: (3 s e(I, J) + s e(I, jn)) / 4. */
function sideValue(strength: Float32Array, coarseX: Float64Array, rowC: number, rowD: number, ncx: number, I: number): number {
  return 0.75 * strength[rowC + I] * coarseX[rowC + I + ncx] + 0.25 * strength[rowD + I] * coarseX[rowD + I + ncx];
}

/**
 * x += P xc on the active span of fine row j: v = (3 tp + G(side)) / (3 + g(side)) with the parent column's
 * across-row value tp = (3 e(I, J) + s(I, jn) e(I, jn)) / (3 + s(I, jn)). Excluded fine cells inside the span
 * may pick up values; the next smoothing sweep resets them to 0.
 * @param x fine padded vector; @param coarseX coarse padded vector; @param jn coarse row towards row j (neighbourIndex).
 */
export function prolongRow(
  s: Stencil, x: Float64Array, j: number, coarse: Stencil, strength: Float32Array, coarseX: Float64Array, jn: number,
): void {
  const fs = s.rowStart[j];
  const fe = s.rowEnd[j];
  if (fe === 0) return;
  const ncx = coarse.nx;
  const act = coarse.active;
  const rowC = (j >> 1) * ncx;
  const rowD = jn * ncx;
  const base = j * s.nx + s.nx;
  const first = fs >> 1;
  const last = (fe - 1) >> 1;
  const left = first > 0 ? first - 1 : first;
  // Sliding window over columns: 1 / (3 + g) and g-weighted value of the left, centre and right column.
  let invL = 1 / (3 + sideWeight(strength, rowC, rowD, left));
  let vL = sideValue(strength, coarseX, rowC, rowD, ncx, left);
  let invC = 1 / (3 + sideWeight(strength, rowC, rowD, first));
  let vC = sideValue(strength, coarseX, rowC, rowD, ncx, first);
  for (let I = first; I <= last; I++) {
    const right = I + 1 < ncx ? I + 1 : I;
    const invR = 1 / (3 + sideWeight(strength, rowC, rowD, right));
    const vR = sideValue(strength, coarseX, rowC, rowD, ncx, right);
    if (act[rowC + I] !== 0) {
      const sN = strength[rowD + I];
      const tp3 = (9 * coarseX[rowC + I + ncx] + 3 * sN * coarseX[rowD + I + ncx]) / (3 + sN);
      const i0 = 2 * I;
      if (i0 >= fs) x[base + i0] += (tp3 + vL) * invL;
      if (i0 + 1 < fe) x[base + i0 + 1] += (tp3 + vR) * invR;
    }
    invL = invC;
    vL = vC;
    invC = invR;
    vC = vR;
  }
}

/**
 * P at one fine cell (i, j): up to four coarse cells (I + J * ncx) and weights, the same as prolongRow;
 * for the Dirichlet-cell transfers. Returns the count (0 under an excluded parent).
 */
export function bilinearWeights(
  coarse: Stencil, strength: Float32Array, i: number, j: number, jn: number, cells: Int32Array, weights: Float64Array,
): number {
  const ncx = coarse.nx;
  const I = i >> 1;
  const rowC = (j >> 1) * ncx;
  const rowD = jn * ncx;
  if (coarse.active[rowC + I] === 0) return 0;
  const side = (i & 1) === 0 ? (I > 0 ? I - 1 : I) : (I + 1 < ncx ? I + 1 : I);
  const denominator = 3 + sideWeight(strength, rowC, rowD, side);
  const sN = strength[rowD + I];
  cells[0] = rowC + I;
  weights[0] = (3 / denominator) * (3 / (3 + sN));
  cells[1] = rowD + I;
  weights[1] = (3 / denominator) * (sN / (3 + sN));
  cells[2] = rowC + side;
  weights[2] = (0.75 * strength[rowC + side]) / denominator;
  cells[3] = rowD + side;
  weights[3] = (0.25 * strength[rowD + side]) / denominator;
  return 4;
}

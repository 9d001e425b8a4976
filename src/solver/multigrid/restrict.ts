/** Restriction P^T of one fine row, the exact transpose of prolongRow (see bilinear.ts for the weights). */
import type { Stencil } from '../assemble.ts';
import { sideWeight } from './bilinear.ts';
import { cellResidual } from '../pcg/operator.ts';

/**
 * Adds P^T (b - A' x) of fine row j to coarseB (I + J * ncx; the caller zeroes it before the first row),
 * A' being A without the Dirichlet couplings: the Dirichlet cells are redone by correctRestrictCell.
 * Needs x final in rows j - 1..j + 1, and the last relaxation before it black (as in the pre-smoother): black
 * cells then have zero residual, so only red cells are evaluated (half the work; the same operator in exact
 * arithmetic, so the V-cycle stays symmetric). One pass over the coarse columns under the row's active span and one
 * beyond each end (residuals are 0 outside the span: excluded cells have none). A child's residual r, with
 * q = r / (3 + g(side)), gives 3 q to its parent column (split across rows as 3 : s(I, jn)) and q to its
 * side column (split as 3 s(side, J) : s(side, jn), over 4); a side column's share is complete once the
 * column after it is done.
 */
export function restrictRow(
  s: Stencil, x: Float64Array, b: Float64Array, j: number, coarse: Stencil, strength: Float32Array, coarseB: Float64Array, jn: number,
): void {
  const fs = s.rowStart[j];
  const fe = s.rowEnd[j];
  if (fe === 0) return;
  const ncx = coarse.nx;
  const rowC = (j >> 1) * ncx;
  const rowD = jn * ncx;
  const first = Math.max(0, (fs >> 1) - 1);
  const last = Math.min(ncx - 1, ((fe - 1) >> 1) + 1);
  // Sliding window of 1 / (3 + g) for the left, centre and right column.
  let invL = 1 / (3 + sideWeight(strength, rowC, rowD, first > 0 ? first - 1 : first));
  let invC = 1 / (3 + sideWeight(strength, rowC, rowD, first));
  let sidePrev = 0;
  let sideCur = 0;
  const redOffset = j & 1; // red cells have i + j even
  for (let I = first; I <= last; I++) {
    const right = I + 1 < ncx ? I + 1 : I;
    const invR = 1 / (3 + sideWeight(strength, rowC, rowD, right));
    const i0 = 2 * I;
    const red = i0 + redOffset;
    const r = red >= fs && red < fe ? cellResidual(s, x, b, j, red) : 0;
    const q0 = redOffset === 0 ? r * invL : 0;
    const q1 = redOffset === 1 ? r * invR : 0;
    spreadParent(strength, coarseB, rowC, rowD, I, 3 * (q0 + q1));
    if (I > 0) {
      sidePrev += q0;
      spreadSide(strength, coarseB, rowC, rowD, I - 1, sidePrev);
    } else {
      sideCur += q0;
    }
    sidePrev = sideCur;
    sideCur = 0;
    if (right !== I) sideCur = q1;
    else sidePrev += q1;
    invL = invC;
    invC = invR;
  }
  spreadSide(strength, coarseB, rowC, rowD, last, sidePrev);
  if (last + 1 < ncx) spreadSide(strength, coarseB, rowC, rowD, last + 1, sideCur);
}

/** Parent share of column I: 3 : s(I, jn) across rows (all to (I, J) when jn = J). */
function spreadParent(strength: Float32Array, coarseB: Float64Array, rowC: number, rowD: number, I: number, amount: number): void {
  if (amount === 0) return;
  const sN = strength[rowD + I];
  const scale = amount / (3 + sN);
  coarseB[rowC + I] += 3 * scale;
  coarseB[rowD + I] += sN * scale;
}

/** Side share of column I: 3 s(I, J) / 4 and s(I, jn) / 4. */
function spreadSide(strength: Float32Array, coarseB: Float64Array, rowC: number, rowD: number, I: number, amount: number): void {
  if (amount === 0) return;
  coarseB[rowC + I] += 0.75 * strength[rowC + I] * amount;
  coarseB[rowD + I] += 0.25 * strength[rowD + I] * amount;
}

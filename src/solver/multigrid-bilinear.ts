/**
 * Bilinear grid transfers, row by row, between a level and its 2x2-agglomerated coarse level. Done as two
 * 1D interpolations (across rows, then along the row), each renormalised over active coarse cells so that
 * walls act as walls, not as zero values; restriction is the exact transpose, which keeps the V-cycle
 * symmetric. A fine cell sits a quarter coarse cell from its parent's centre: 1D weights 3/4 (parent side)
 * and 1/4 (neighbour towards the child); at the grid edge the neighbour is the parent itself.
 *
 * Piecewise-constant transfers (injection and sum) are cheaper but lose grid independence: measured
 * V-cycle residual factors on a square channel were 0.17, 0.35, 0.44 at 32, 128, 512 cells across,
 * against about 0.3 at every size with these (test/solver/multigrid.test.ts).
 */
import type { Stencil } from './assemble.ts';

/** 1 / (3 a0 + an) for the possible sums 0, 1, 3, 4 (0 where nothing is active). */
const INV_ROW_WEIGHT = Float64Array.from([0, 1, 0, 1 / 3, 1 / 4]);
/** Weight of the parent side along the row, 3 / (3 + ta of the neighbour), indexed by that ta (0 or 1). */
const SELF_WEIGHT = Float64Array.from([1, 3 / 4]);
/** Weight of the neighbour along the row, ta / (3 + ta). */
const SIDE_WEIGHT = Float64Array.from([0, 1 / 4]);

/** For each fine index along one axis: the coarse neighbour towards it, clamped to the grid (then it is the parent). */
export function neighbourIndex(n: number, nc: number): Int32Array {
  const out = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const parent = i >> 1;
    out[i] = (i & 1) === 1 ? Math.min(parent + 1, nc - 1) : Math.max(parent - 1, 0);
  }
  return out;
}

/** Across-row interpolation at coarse column I for a fine row between coarse rows rowC and rowD (offsets). */
function acrossRows(act: Uint8Array, coarseX: Float64Array, rowC: number, rowD: number, ncx: number, I: number): number {
  const a0 = 3 * act[rowC + I];
  const an = act[rowD + I];
  return (a0 * coarseX[rowC + I + ncx] + an * coarseX[rowD + I + ncx]) * INV_ROW_WEIGHT[a0 + an];
}

/**
 * x += P xc on the active span of fine row j, in one pass over the coarse columns with a sliding window
 * (left, centre, right) of the across-row values t and their activity ta (1 where t holds a value).
 * Excluded fine cells inside the span may pick up values; the next smoothing sweep resets them to 0.
 * @param x fine padded vector; @param coarseX coarse padded vector; @param jn coarse row towards row j (neighbourIndex).
 */
export function prolongRow(s: Stencil, x: Float64Array, j: number, coarse: Stencil, coarseX: Float64Array, jn: number): void {
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
  let tC = acrossRows(act, coarseX, rowC, rowD, ncx, first);
  let taC = act[rowC + first] | act[rowD + first];
  const left = first > 0 ? first - 1 : first;
  let tL = acrossRows(act, coarseX, rowC, rowD, ncx, left);
  let taL = act[rowC + left] | act[rowD + left];
  for (let I = first; I <= last; I++) {
    let tR = tC;
    let taR = taC;
    if (I + 1 < ncx) {
      tR = acrossRows(act, coarseX, rowC, rowD, ncx, I + 1);
      taR = act[rowC + I + 1] | act[rowD + I + 1];
    }
    if (act[rowC + I] !== 0) {
      const i0 = 2 * I;
      if (i0 >= fs) x[base + i0] += SELF_WEIGHT[taL] * tC + SIDE_WEIGHT[taL] * tL;
      if (i0 + 1 < fe) x[base + i0 + 1] += SELF_WEIGHT[taR] * tC + SIDE_WEIGHT[taR] * tR;
    }
    tL = tC;
    taL = taC;
    tC = tR;
    taC = taR;
  }
}

/**
 * Adds P^T (b - A' x) of fine row j to coarseB (I + J * ncx; the caller zeroes it before the first row),
 * A' being A without the Dirichlet couplings: the Dirichlet cells are redone by correctRestrictCell.
 * Needs x final in rows j - 1..j + 1. One pass over the coarse columns under the row's active span and one
 * beyond each end: the residual of the two children (0 outside the span: excluded cells have none), then
 * the along-row shares (u of column I - 1 is complete once column I is done), then across rows.
 */
export function restrictRow(
  s: Stencil, x: Float64Array, b: Float64Array, j: number, coarse: Stencil, coarseB: Float64Array, jn: number,
): void {
  const fs = s.rowStart[j];
  const fe = s.rowEnd[j];
  if (fe === 0) return;
  const { nx, faceX, faceY } = s;
  const ncx = coarse.nx;
  const act = coarse.active;
  const rowC = (j >> 1) * ncx;
  const rowD = jn * ncx;
  const rowK = j * nx;
  const rowX = rowK + j;
  const first = Math.max(0, (fs >> 1) - 1);
  const last = Math.min(ncx - 1, ((fe - 1) >> 1) + 1);
  let taC = act[rowC + first] | act[rowD + first];
  let taL = first > 0 ? act[rowC + first - 1] | act[rowD + first - 1] : taC;
  let uPrev = 0;
  let uCur = 0;
  for (let I = first; I <= last; I++) {
    const taR = I + 1 < ncx ? act[rowC + I + 1] | act[rowD + I + 1] : taC;
    const i0 = 2 * I;
    const k0 = rowK + i0;
    const v0 = k0 + nx;
    const f0 = rowX + i0;
    let r0 = 0;
    if (i0 >= fs && i0 < fe) {
      const w = faceX[f0];
      const e = faceX[f0 + 1];
      const so = faceY[k0];
      const no = faceY[k0 + nx];
      r0 = b[k0] - ((w + e + so + no) * x[v0] - w * x[v0 - 1] - e * x[v0 + 1] - so * x[v0 - nx] - no * x[v0 + nx]);
    }
    let r1 = 0;
    if (i0 + 1 >= fs && i0 + 1 < fe) {
      const k1 = k0 + 1;
      const v1 = v0 + 1;
      const w = faceX[f0 + 1];
      const e = faceX[f0 + 2];
      const so = faceY[k1];
      const no = faceY[k1 + nx];
      r1 = b[k1] - ((w + e + so + no) * x[v1] - w * x[v0] - e * x[v1 + 1] - so * x[v1 - nx] - no * x[v1 + nx]);
    }
    uCur += SELF_WEIGHT[taL] * r0 + SELF_WEIGHT[taR] * r1;
    const sideL = SIDE_WEIGHT[taL] * r0;
    const sideR = SIDE_WEIGHT[taR] * r1;
    if (I > 0) {
      uPrev += sideL;
      spreadAcrossRows(act, coarseB, rowC + I - 1, rowD + I - 1, uPrev);
    } else {
      uCur += sideL;
    }
    uPrev = uCur;
    uCur = 0;
    if (I + 1 < ncx) uCur = sideR;
    else uPrev += sideR;
    taL = taC;
    taC = taR;
  }
  spreadAcrossRows(act, coarseB, rowC + last, rowD + last, uPrev);
  if (last + 1 < ncx) spreadAcrossRows(act, coarseB, rowC + last + 1, rowD + last + 1, uCur);
}

/** Adds `amount` to coarse cells c (parent row) and d (neighbour row) with the across-row weights 3 a0 : an. */
function spreadAcrossRows(act: Uint8Array, coarseB: Float64Array, c: number, d: number, amount: number): void {
  if (amount === 0) return;
  const a0 = 3 * act[c];
  const an = act[d];
  const scale = amount * INV_ROW_WEIGHT[a0 + an];
  coarseB[c] += a0 * scale;
  coarseB[d] += an * scale;
}

/** P at one fine cell (i, j): the coarse cells it draws from and their weights; for the Dirichlet-cell transfers. */
export function bilinearWeights(coarse: Stencil, i: number, j: number, jn: number, cells: Int32Array, weights: Float64Array): number {
  const ncx = coarse.nx;
  const act = coarse.active;
  const I = i >> 1;
  const J = j >> 1;
  if (act[I + J * ncx] === 0) return 0;
  const side = (i & 1) === 0 ? (I > 0 ? I - 1 : 0) : (I + 1 < ncx ? I + 1 : I);
  const sideA0 = 3 * act[side + J * ncx];
  const sideAn = act[side + jn * ncx];
  const ts = INV_ROW_WEIGHT[sideA0 + sideAn] === 0 ? 0 : 1;
  const wSelf = 3 / (3 + ts);
  const wSide = ts / (3 + ts);
  let n = 0;
  for (const [col, w] of [[I, wSelf], [side, wSide]] as const) {
    const a0 = 3 * act[col + J * ncx];
    const an = act[col + jn * ncx];
    const inv = INV_ROW_WEIGHT[a0 + an];
    if (w === 0 || inv === 0) continue;
    cells[n] = col + J * ncx;
    weights[n++] = w * a0 * inv;
    cells[n] = col + jn * ncx;
    weights[n++] = w * an * inv;
  }
  return n;
}

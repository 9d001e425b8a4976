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

/**
 * x += P xc on fine row j, in one pass over the coarse columns with a sliding window (left, centre, right)
 * of the across-row values t and their activity ta. Fine cells under an excluded parent are skipped; other
 * excluded fine cells pick up values that the next smoothing sweep resets to 0.
 * @param x fine padded vector; @param coarseX coarse padded vector; @param jn coarse row towards row j (neighbourIndex).
 */
export function prolongRow(s: Stencil, x: Float64Array, j: number, coarse: Stencil, coarseX: Float64Array, jn: number): void {
  const nx = s.nx;
  const ncx = coarse.nx;
  const act = coarse.active;
  const rowC = (j >> 1) * ncx;
  const rowD = jn * ncx;
  const base = j * nx + nx;
  let a0 = 3 * act[rowC];
  let an = act[rowD];
  let tC = (a0 * coarseX[rowC + ncx] + an * coarseX[rowD + ncx]) * INV_ROW_WEIGHT[a0 + an];
  let taC = act[rowC] | an;
  let tL = tC;
  let taL = taC;
  for (let I = 0; I < ncx; I++) {
    let tR = tC;
    let taR = taC;
    if (I + 1 < ncx) {
      a0 = 3 * act[rowC + I + 1];
      an = act[rowD + I + 1];
      tR = (a0 * coarseX[rowC + I + 1 + ncx] + an * coarseX[rowD + I + 1 + ncx]) * INV_ROW_WEIGHT[a0 + an];
      taR = act[rowC + I + 1] | an;
    }
    if (act[rowC + I] !== 0) {
      const i0 = base + 2 * I;
      x[i0] += SELF_WEIGHT[taL] * tC + SIDE_WEIGHT[taL] * tL;
      if (2 * I + 1 < nx) x[i0 + 1] += SELF_WEIGHT[taR] * tC + SIDE_WEIGHT[taR] * tR;
    }
    tL = tC;
    taL = taC;
    tC = tR;
    taC = taR;
  }
}

/**
 * Adds P^T (b - A x) of fine row j to coarseB (I + J * ncx; the caller zeroes it before the first row).
 * Needs x final in rows j - 1..j + 1. One pass over the coarse columns: the residual of the two children,
 * then the along-row shares (u of column I - 1 is complete once column I is done), then across rows.
 * Excluded cells, and so every cell under an excluded parent, have a zero residual: no mask is needed.
 */
export function restrictRow(
  s: Stencil, x: Float64Array, b: Float64Array, j: number, coarse: Stencil, coarseB: Float64Array, jn: number,
): void {
  const { nx, diag, faceX, faceY } = s;
  const ncx = coarse.nx;
  const act = coarse.active;
  const rowC = (j >> 1) * ncx;
  const rowD = jn * ncx;
  const rowK = j * nx;
  const rowX = rowK + j;
  let taC = act[rowC] | act[rowD];
  let taL = taC;
  let uPrev = 0;
  let uCur = 0;
  for (let I = 0; I < ncx; I++) {
    const taR = I + 1 < ncx ? act[rowC + I + 1] | act[rowD + I + 1] : taC;
    const i0 = 2 * I;
    const k0 = rowK + i0;
    const v0 = k0 + nx;
    const f0 = rowX + i0;
    const r0 = b[k0] - (diag[k0] * x[v0] - faceX[f0] * x[v0 - 1] - faceX[f0 + 1] * x[v0 + 1]
      - faceY[k0] * x[v0 - nx] - faceY[k0 + nx] * x[v0 + nx]);
    let r1 = 0;
    if (i0 + 1 < nx) {
      const k1 = k0 + 1;
      const v1 = v0 + 1;
      r1 = b[k1] - (diag[k1] * x[v1] - faceX[f0 + 1] * x[v0] - faceX[f0 + 2] * x[v1 + 1]
        - faceY[k1] * x[v1 - nx] - faceY[k1 + nx] * x[v1 + nx]);
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
  spreadAcrossRows(act, coarseB, rowC + ncx - 1, rowD + ncx - 1, uPrev);
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

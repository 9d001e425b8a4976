/**
 * Bilinear grid transfers, row by row, between a level and its 2x2-agglomerated coarse level, renormalised
 * over active coarse cells (so walls act as walls, not as zero values). Restriction is the exact transpose
 * of prolongation, which keeps the V-cycle symmetric.
 *
 * A fine cell sits a quarter coarse cell from its parent's centre; bilinear weights are 9/16 (parent),
 * 3/16 (side neighbour towards the child), 3/16 (row neighbour towards the child), 1/16 (diagonal).
 * Piecewise-constant transfers (injection and sum) are cheaper but lose grid independence: measured
 * V-cycle residual factors on a square channel were 0.17, 0.35, 0.44 at 32, 128, 512 cells across,
 * against about 0.3 at every size with these (test/solver/multigrid.test.ts).
 */
import type { Stencil } from './assemble.ts';

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
 * Adds P^T (b - A x) of fine row j to coarseB (I + J * ncx; the caller zeroes it before the first row).
 * Needs x final in rows j - 1..j + 1. colN / rowN from neighbourIndex.
 */
export function restrictRow(
  s: Stencil, x: Float64Array, b: Float64Array, j: number,
  coarse: Stencil, coarseB: Float64Array, colN: Int32Array, rowN: Int32Array,
): void {
  const { nx, diag, faceX, faceY } = s;
  const ncx = coarse.nx;
  const act = coarse.active;
  const rowK = j * nx;
  const rowX = rowK + j;
  const rowC = (j >> 1) * ncx;
  const rowD = rowN[j] * ncx;
  for (let i = 0; i < nx; i++) {
    const c0 = rowC + (i >> 1);
    if (act[c0] === 0) continue;
    const k = rowK + i;
    const v = k + nx;
    const r = b[k] - (diag[k] * x[v]
      - faceX[rowX + i] * x[v - 1] - faceX[rowX + i + 1] * x[v + 1]
      - faceY[k] * x[v - nx] - faceY[k + nx] * x[v + nx]);
    const c1 = rowC + colN[i];
    const c2 = rowD + (i >> 1);
    const c3 = rowD + colN[i];
    const a1 = 3 * act[c1];
    const a2 = 3 * act[c2];
    const a3 = act[c3];
    const scale = r / (9 + a1 + a2 + a3);
    coarseB[c0] += 9 * scale;
    coarseB[c1] += a1 * scale;
    coarseB[c2] += a2 * scale;
    coarseB[c3] += a3 * scale;
  }
}

/**
 * x += P xc on fine row j. Relies on xc being 0 in excluded coarse cells (the coarse smoother and direct
 * solve keep it so). Fine cells under an excluded parent are skipped; other excluded fine cells pick up
 * values that the next smoothing sweep resets to 0.
 */
export function prolongRow(
  s: Stencil, x: Float64Array, j: number, coarse: Stencil, coarseX: Float64Array, colN: Int32Array, rowN: Int32Array,
): void {
  const nx = s.nx;
  const ncx = coarse.nx;
  const act = coarse.active;
  const rowK = j * nx + nx;
  const rowC = (j >> 1) * ncx;
  const rowD = rowN[j] * ncx;
  for (let i = 0; i < nx; i++) {
    const c0 = rowC + (i >> 1);
    if (act[c0] === 0) continue;
    const c1 = rowC + colN[i];
    const c2 = rowD + (i >> 1);
    const c3 = rowD + colN[i];
    const a1 = 3 * act[c1];
    const a2 = 3 * act[c2];
    const a3 = act[c3];
    x[rowK + i] += (9 * coarseX[c0 + ncx] + a1 * coarseX[c1 + ncx] + a2 * coarseX[c2 + ncx] + a3 * coarseX[c3 + ncx])
      / (9 + a1 + a2 + a3);
  }
}

/** Splits a segment at the grid lines it crosses, so that each piece lies inside one cell (grid units). */

/** Receives one piece, from (ua, va) to (ub, vb) in grid units, lying inside a single cell (or on its border). */
export type PieceVisitor = (ua: number, va: number, ub: number, vb: number) => void;

/**
 * Visits the pieces of segment (u0, v0) -> (u1, v1) in order along it.
 * Cut points are put exactly on the grid line they lie on, so neighbouring pieces share end points
 * and the cell a piece belongs to is floor of its midpoint. Costs O(cells crossed).
 */
export function forEachCellPiece(u0: number, v0: number, u1: number, v1: number, visit: PieceVisitor): void {
  const du = u1 - u0;
  let ua = u0;
  let va = v0;
  if (du > 0) {
    for (let k = Math.floor(u0) + 1; k < u1; k++) {
      const v = v0 + ((k - u0) * (v1 - v0)) / du;
      splitAtRows(ua, va, k, v, visit);
      ua = k;
      va = v;
    }
  } else if (du < 0) {
    for (let k = Math.ceil(u0) - 1; k > u1; k--) {
      const v = v0 + ((k - u0) * (v1 - v0)) / du;
      splitAtRows(ua, va, k, v, visit);
      ua = k;
      va = v;
    }
  }
  splitAtRows(ua, va, u1, v1, visit);
}

/** The same split along v for a piece that already lies within one column. */
function splitAtRows(ua: number, va: number, ub: number, vb: number, visit: PieceVisitor): void {
  const dv = vb - va;
  let uc = ua;
  let vc = va;
  if (dv > 0) {
    for (let m = Math.floor(va) + 1; m < vb; m++) {
      const u = ua + ((m - va) * (ub - ua)) / dv;
      visit(uc, vc, u, m);
      uc = u;
      vc = m;
    }
  } else if (dv < 0) {
    for (let m = Math.ceil(va) - 1; m > vb; m--) {
      const u = ua + ((m - va) * (ub - ua)) / dv;
      visit(uc, vc, u, m);
      uc = u;
      vc = m;
    }
  }
  visit(uc, vc, ub, vb);
}

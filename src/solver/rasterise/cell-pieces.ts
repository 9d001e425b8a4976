/** Splits one cut cell's fluid into its separate pieces by walking its chains and the cell's border (Weiler-Atherton). */
import type { CellChain } from './cell-chains.ts';

/**
 * Border position t of a point on the border of a unit cell, counter-clockwise from the lower-left corner:
 * bottom side 0..1, right 1..2, top 2..3, left 3..4. A corner belongs to the side it starts (t = 0, 1, 2, 3).
 */
type BorderT = number;

/** One separate piece of a cell's fluid. */
export interface CellPiece {
  /** Fluid area of the piece as a fraction of the cell, 0..1. */
  readonly area: number;
  /** Indices into the cell's chain list of the chains bounding the piece. */
  readonly chains: readonly number[];
  /**
   * Open intervals of the piece on each side of the cell (bottom, right, top, left), 2 numbers each (lo, hi):
   * offsets from the cell's lower-left corner along the face's own axis (u for bottom and top, v for right and left), 0..1.
   */
  readonly sides: readonly [number[], number[], number[], number[]];
}

/** Area sums further than this from the cell's measured fraction mean the walk went wrong, and it is not used. */
const AREA_CHECK = 1e-9;

/** Border positions closer than this (grid units) are one point: cut points off a grid line carry rounding. */
const SAME_POINT = 1e-9;

/**
 * The pieces of cell (i, j) from its chains (at least two, none closed), or null when the walk cannot be made
 * consistent (an end off the border, two chains entering at one point, areas not adding up to `fraction`).
 * Each chain's exit is linked to the next chain entry counter-clockwise along the border, the fluid following the
 * border with the cell on its left; every cycle of links bounds one piece.
 */
export function cellPieces(chains: readonly CellChain[], i: number, j: number, fraction: number): CellPiece[] | null {
  const count = chains.length;
  const entry = new Float64Array(count);
  const exit = new Float64Array(count);
  for (let c = 0; c < count; c++) {
    const uv = chains[c].uv;
    const a = borderT(uv[0] - i, uv[1] - j);
    const b = borderT(uv[uv.length - 2] - i, uv[uv.length - 1] - j);
    if (a === null || b === null) return null;
    entry[c] = a;
    exit[c] = b;
  }
  const next = linkChains(entry, exit);
  if (next === null) return null;
  const pieces = cycles(next).map((cycle) => pieceOf(cycle, chains, entry, exit, i, j));
  let total = 0;
  for (const p of pieces) {
    if (p.area < -AREA_CHECK) return null;
    total += p.area;
  }
  return Math.abs(total - fraction) <= AREA_CHECK ? pieces : null;
}

/**
 * next[c] = the chain whose entry comes first counter-clockwise after chain c's exit; null unless one-to-one.
 * An entry at the very point of the exit comes last, a whole turn on: there the boundary only touches the border
 * from the other side, as the two faces of a wall of no thickness do (its upper face leaves where its lower face enters).
 */
function linkChains(entry: Float64Array, exit: Float64Array): Int32Array | null {
  const count = entry.length;
  const next = new Int32Array(count);
  const taken = new Uint8Array(count);
  for (let c = 0; c < count; c++) {
    let best = -1;
    let bestGap = Infinity;
    for (let e = 0; e < count; e++) {
      const gap = linkGap(exit[c], entry[e]);
      if (Math.abs(gap - bestGap) <= SAME_POINT) return null;
      if (gap < bestGap) {
        bestGap = gap;
        best = e;
      }
    }
    if (taken[best]) return null;
    taken[best] = 1;
    next[c] = best;
  }
  return next;
}

/** The permutation's cycles, each as its chain indices in walking order. */
function cycles(next: Int32Array): number[][] {
  const seen = new Uint8Array(next.length);
  const out: number[][] = [];
  for (let start = 0; start < next.length; start++) {
    if (seen[start]) continue;
    const cycle: number[] = [];
    for (let c = start; !seen[c]; c = next[c]) {
      seen[c] = 1;
      cycle.push(c);
    }
    out.push(cycle);
  }
  return out;
}

/** Area (shoelace over chains and border stretches, cell-local units) and open side intervals of one cycle. */
function pieceOf(cycle: readonly number[], chains: readonly CellChain[], entry: Float64Array, exit: Float64Array, i: number, j: number): CellPiece {
  let twice = 0;
  const sides: [number[], number[], number[], number[]] = [[], [], [], []];
  cycle.forEach((c, k) => {
    const uv = chains[c].uv;
    for (let p = 0; p < uv.length; p += 4) twice += (uv[p] - i) * (uv[p + 3] - j) - (uv[p + 2] - i) * (uv[p + 1] - j);
    const end = exit[c] + linkGap(exit[c], entry[cycle[(k + 1) % cycle.length]]);
    twice += stretchCross(exit[c], end);
    addStretch(sides, exit[c], end);
  });
  return { area: 0.5 * twice, chains: cycle, sides };
}

/** Shoelace terms of the border path from t = a to t = b (b >= a, may pass 4), corners included. */
function stretchCross(a: number, b: number): number {
  let sum = 0;
  let [x0, y0] = borderPoint(a);
  for (let n = Math.floor(a) + 1; n < b; n++) {
    const [x1, y1] = borderPoint(n);
    sum += x0 * y1 - x1 * y0;
    x0 = x1;
    y0 = y1;
  }
  const [x1, y1] = borderPoint(b);
  return sum + x0 * y1 - x1 * y0;
}

/** Adds the border stretch a..b (b >= a, may pass 4) to the side intervals, on each face's own axis. */
function addStretch(sides: [number[], number[], number[], number[]], a: number, b: number): void {
  for (let s = 0; s < 4; s++) {
    for (const wrap of [0, 4]) {
      const lo = Math.max(a, s + wrap) - s - wrap;
      const hi = Math.min(b, s + 1 + wrap) - s - wrap;
      if (!(hi > lo)) continue;
      if (s < 2) sides[s].push(lo, hi);
      else sides[s].push(1 - hi, 1 - lo);
    }
  }
}

/** Counter-clockwise border distance from exit a to entry b, 0..4, a whole turn (4) when they are one point. */
function linkGap(a: BorderT, b: BorderT): number {
  const d = b - a;
  const gap = d < 0 ? d + 4 : d;
  return gap <= SAME_POINT || gap >= 4 - SAME_POINT ? 4 : gap;
}

/** Cell-local point at border position t (any real; taken modulo 4). */
function borderPoint(t: number): [number, number] {
  const w = t - 4 * Math.floor(t / 4);
  const s = Math.floor(w);
  const p = w - s;
  return s === 0 ? [p, 0] : s === 1 ? [1, p] : s === 2 ? [1 - p, 1] : [0, 1 - p];
}

/** Border position of cell-local point (x, y), or null when it is not on the border. */
function borderT(x: number, y: number): BorderT | null {
  const inside = (t: number): number => (t < 0 ? 0 : t > 1 ? 1 : t);
  if (y === 0 && x < 1) return inside(x);
  if (x === 1 && y < 1) return 1 + inside(y);
  if (y === 1 && x > 0) return 2 + (1 - inside(x));
  if (x === 0 && y > 0) return 3 + (1 - inside(y));
  return null;
}

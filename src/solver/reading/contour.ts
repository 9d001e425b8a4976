/** Level lines of a cell-centred field by marching squares, joined into polylines (not yet clipped to the fluid). */
import type { CutGrid } from '../types.ts';

/**
 * The lines where `values` equals each of `levels`, traced over the squares between four cell centres that all hold
 * a number. Each crossing of a square's side is placed by linear interpolation; the two ambiguous saddle cases are
 * settled by the mean of the four corners. Segments sharing a side are joined, so each result is one unbroken
 * polyline (closed loops repeat their first point at the end). One pass over the grid serves every level.
 * @param values row-major i + j * nx, NaN where there is no value
 * @returns per level, polylines x0, y0, x1, y1, ... in document units
 */
export function levelLines(grid: CutGrid, values: Float64Array, levels: readonly number[]): Float64Array[][] {
  const { nx, ny } = grid;
  const order = levels.map((_, k) => k).sort((a, b) => levels[a] - levels[b]);
  const sorted = order.map((k) => levels[k]);
  const ends: number[][] = levels.map(() => []);
  for (let j = 0; j < ny - 1; j++) {
    for (let i = 0; i < nx - 1; i++) {
      const c = i + j * nx;
      const a = values[c], b = values[c + 1], d = values[c + nx + 1], e = values[c + nx];
      if (!(Number.isFinite(a) && Number.isFinite(b) && Number.isFinite(d) && Number.isFinite(e))) continue;
      const lo = Math.min(a, b, d, e), hi = Math.max(a, b, d, e);
      // a level crosses the square when some corner is above it and some is not: lo <= level < hi
      for (let q = firstAtLeast(sorted, lo); q < sorted.length && sorted[q] < hi; q++) {
        squareSegments(values, nx, c, sorted[q], ends[order[q]]);
      }
    }
  }
  return levels.map((level, k) => joinSegments(ends[k], (side) => sidePoint(grid, values, side, level)));
}

/** First index q of an ascending array with sorted[q] >= value. */
function firstAtLeast(sorted: readonly number[], value: number): number {
  let lo = 0, hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid] < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Side ids: the side from cell c to its right neighbour is 2c, to its upper neighbour 2c + 1. */
function squareSegments(values: Float64Array, nx: number, c: number, level: number, ends: number[]): void {
  const a = values[c], b = values[c + 1], d = values[c + nx + 1], e = values[c + nx];
  const bottom = 2 * c, right = 2 * (c + 1) + 1, top = 2 * (c + nx), left = 2 * c + 1;
  const hiA = a > level, hiB = b > level, hiD = d > level, hiE = e > level;
  const crossings = (hiA !== hiB ? 1 : 0) + (hiB !== hiD ? 1 : 0) + (hiD !== hiE ? 1 : 0) + (hiE !== hiA ? 1 : 0);
  if (crossings === 4) {
    // saddle: when the centre sides with corner a, a's diagonal joins through the middle and the other two corners are cut off
    const centreHigh = (a + b + d + e) / 4 > level;
    if (centreHigh === hiA) ends.push(bottom, right, top, left);
    else ends.push(left, bottom, right, top);
    return;
  }
  if (crossings !== 2) return;
  if (hiA !== hiB) ends.push(bottom);
  if (hiB !== hiD) ends.push(right);
  if (hiD !== hiE) ends.push(top);
  if (hiE !== hiA) ends.push(left);
}

/** The point where the level crosses side `side` (see squareSegments for side ids). */
function sidePoint(grid: CutGrid, values: Float64Array, side: number, level: number): [number, number] {
  const c = side >> 1;
  const other = side & 1 ? c + grid.nx : c + 1;
  const t = (level - values[c]) / (values[other] - values[c]);
  const i = c % grid.nx;
  const j = (c - i) / grid.nx;
  const x = grid.x0 + (i + 0.5 + (side & 1 ? 0 : t)) * grid.h;
  const y = grid.y0 + (j + 0.5 + (side & 1 ? t : 0)) * grid.h;
  return [x, y];
}

/** Joins segments (pairs of side ids in `ends`) that share a side into polylines. */
function joinSegments(ends: number[], pointOf: (side: number) => [number, number]): Float64Array[] {
  const count = ends.length / 2;
  const bySide = new Map<number, number[]>();
  for (let k = 0; k < ends.length; k++) {
    const list = bySide.get(ends[k]);
    if (list) list.push(k);
    else bySide.set(ends[k], [k]);
  }
  const used = new Uint8Array(count);
  const lines: Float64Array[] = [];
  // open chains first (start at a side with one segment), then whatever is left is a closed loop
  const starts = [...bySide.entries()].filter(([, list]) => list.length === 1).map(([, list]) => list[0]);
  for (let k = 0; k < ends.length; k++) starts.push(k);
  for (const startEnd of starts) {
    if (used[startEnd >> 1]) continue;
    const sides: number[] = [ends[startEnd]];
    let end = startEnd;
    for (;;) {
      used[end >> 1] = 1;
      const far = end ^ 1;
      sides.push(ends[far]);
      const next = bySide.get(ends[far])!.find((k) => k !== far && !used[k >> 1]);
      if (next === undefined) break;
      end = next;
    }
    const xy = new Float64Array(2 * sides.length);
    sides.forEach((side, q) => xy.set(pointOf(side), 2 * q));
    lines.push(xy);
  }
  return lines;
}

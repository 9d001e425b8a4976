/** Splits a ring into runs of consecutive segments with the same mark and wall id (e.g. the whole short side). */

import type { Ring } from '../solver/types.ts';

/** One run of a ring, as an open polyline in ring order. */
export interface WallRun {
  /** MARK_WALL, MARK_INLET or MARK_OUTLET. */
  readonly mark: number;
  /** Index into FlowDomain.wallNames, or -1. */
  readonly wallId: number;
  /** Ring segment the run starts with. */
  readonly firstSegment: number;
  readonly segmentCount: number;
  /** x0, y0, x1, y1, ... length units: segmentCount + 1 points. Use with polylineLength / pointAtLength. */
  readonly xy: Float64Array;
}

/**
 * Runs of `ring` in ring order. A run that wraps past the ring's point 0 is kept whole, so the list starts
 * at the first change of mark or wall id. A ring that is one run throughout gives a single closed-off run
 * (its polyline ends back at its first point).
 */
export function wallRuns(ring: Ring): WallRun[] {
  const n = ring.marks.length;
  if (n === 0) return [];
  const same = (a: number, b: number): boolean => ring.marks[a] === ring.marks[b] && ring.wallIds[a] === ring.wallIds[b];
  let start = 0;
  while (start < n && same(start, (start - 1 + n) % n)) start++;
  if (start === n) start = 0; // one run all round
  const runs: WallRun[] = [];
  let k = 0;
  while (k < n) {
    const first = (start + k) % n;
    let count = 1;
    while (k + count < n && same(first, (first + count) % n)) count++;
    runs.push({ mark: ring.marks[first], wallId: ring.wallIds[first], firstSegment: first, segmentCount: count, xy: runPoints(ring.xy, first, count) });
    k += count;
  }
  return runs;
}

function runPoints(ringXy: Float64Array, first: number, count: number): Float64Array {
  const n = ringXy.length >> 1;
  const out = new Float64Array(2 * (count + 1));
  for (let k = 0; k <= count; k++) {
    const p = (first + k) % n;
    out[2 * k] = ringXy[2 * p];
    out[2 * k + 1] = ringXy[2 * p + 1];
  }
  return out;
}

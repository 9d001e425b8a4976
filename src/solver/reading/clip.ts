/** Clips polylines to the fluid: inside the outline, outside every island. */
import type { BoundaryHit, RingIndex } from './ring-index.ts';

const NO_HITS: readonly BoundaryHit[] = [];

/**
 * The parts of each polyline that lie in the fluid. Each segment is cut where it crosses the boundary and each
 * piece kept when its midpoint is in the fluid (a test per piece, so a line grazing a corner cannot flip the
 * inside and outside of everything after it). Pieces that follow on from each other stay one polyline.
 * Segments must be short (a cell or two) because the crossing search only looks in the cells they span.
 * @param lines x0, y0, x1, y1, ... document units
 */
export function clipToFluid(lines: readonly Float64Array[], index: RingIndex): Float64Array[] {
  const out: Float64Array[] = [];
  for (const line of lines) {
    let current: number[] = [];
    const flush = (): void => {
      if (current.length >= 4) out.push(Float64Array.from(current));
      current = [];
    };
    for (let k = 0; k + 3 < line.length; k += 2) {
      const ax = line[k], ay = line[k + 1], bx = line[k + 2], by = line[k + 3];
      // most segments are far from any boundary: no cut, one piece, and a cheap inside test
      const hits = index.clearBox(ax, ay, bx, by) ? NO_HITS : index.crossings(ax, ay, bx, by);
      for (let p = 0; p <= hits.length; p++) {
        const t0 = p === 0 ? 0 : hits[p - 1].t, t1 = p === hits.length ? 1 : hits[p].t;
        if (t1 - t0 <= 0) continue;
        const tm = 0.5 * (t0 + t1);
        if (!index.contains(ax + tm * (bx - ax), ay + tm * (by - ay))) {
          flush();
          continue;
        }
        if (current.length === 0) current.push(ax + t0 * (bx - ax), ay + t0 * (by - ay));
        current.push(ax + t1 * (bx - ax), ay + t1 * (by - ay));
      }
    }
    flush();
  }
  return out;
}

/** Total length of polylines, document units. */
export function totalLength(lines: readonly Float64Array[]): number {
  let sum = 0;
  for (const xy of lines) for (let k = 0; k + 3 < xy.length; k += 2) sum += Math.hypot(xy[k + 2] - xy[k], xy[k + 3] - xy[k + 1]);
  return sum;
}

/** Clipping of polylines to the fluid: inside tests (cell mask or rings) and splitting a line where it leaves. */

import type { FieldImage, FluidClip, Polyline } from './types.ts';

/** True when section point (x, y) lies in the fluid. */
export type InsideTest = (x: number, y: number) => boolean;

/** Inside when the cell containing the point holds a finite value. */
export function cellMaskInside(field: FieldImage): InsideTest {
  const { nx, ny, x0, y0, h, values } = field;
  return (x, y) => {
    const i = Math.floor((x - x0) / h);
    const j = Math.floor((y - y0) / h);
    return i >= 0 && j >= 0 && i < nx && j < ny && Number.isFinite(values[i + j * nx]);
  };
}

/** Even-odd rule over every ring: inside the outer ring and outside each hole. */
export function ringsInside(clip: FluidClip): InsideTest {
  const rings = [clip.outer, ...clip.holes].map((r) => r.xy);
  return (x, y) => {
    let inside = false;
    for (const xy of rings) if (crossesOdd(xy, x, y)) inside = !inside;
    return inside;
  };
}

/** Ray cast to +x: odd number of edge crossings means the point is inside this ring. */
function crossesOdd(xy: Polyline['xy'], x: number, y: number): boolean {
  const n = xy.length / 2;
  let odd = false;
  for (let a = 0, b = n - 1; a < n; b = a++) {
    const ya = xy[2 * a + 1];
    const yb = xy[2 * b + 1];
    if (ya > y !== yb > y) {
      const xa = xy[2 * a];
      const xCross = xa + ((y - ya) * (xy[2 * b] - xa)) / (yb - ya);
      if (x < xCross) odd = !odd;
    }
  }
  return odd;
}

/** Steps of bisection for the point where a segment leaves the fluid: 2^-14 of a segment, far below a pixel. */
const BISECT_STEPS = 14;

function crossing(ax: number, ay: number, bx: number, by: number, inside: InsideTest, out: number[]): void {
  // Invariant: t = lo is inside, t = hi is outside (when a is the inside end).
  const aIn = inside(ax, ay);
  let lo = 0;
  let hi = 1;
  for (let k = 0; k < BISECT_STEPS; k++) {
    const mid = (lo + hi) / 2;
    if (inside(ax + mid * (bx - ax), ay + mid * (by - ay)) === aIn) lo = mid;
    else hi = mid;
  }
  const t = aIn ? lo : hi;
  out.push(ax + t * (bx - ax), ay + t * (by - ay));
}

/**
 * Split a polyline (flat x, y pairs) into the runs that lie inside the fluid; each run is flat x, y pairs with at
 * least two points. A closed line that never leaves comes back as one run ending on its first point.
 */
export function clipPolyline(xy: ArrayLike<number>, closed: boolean, inside: InsideTest): number[][] {
  const n = xy.length / 2;
  if (n < 2) return [];
  const count = closed ? n + 1 : n;
  const runs: number[][] = [];
  let run: number[] | null = null;
  let prevIn = inside(xy[0], xy[1]);
  if (prevIn) run = [xy[0], xy[1]];
  for (let k = 1; k < count; k++) {
    const ax = xy[2 * (k - 1)];
    const ay = xy[2 * (k - 1) + 1];
    const bx = xy[2 * (k % n)];
    const by = xy[2 * (k % n) + 1];
    const bIn = inside(bx, by);
    if (prevIn && bIn) run!.push(bx, by);
    else if (prevIn && !bIn) {
      crossing(ax, ay, bx, by, inside, run!);
      runs.push(run!);
      run = null;
    } else if (!prevIn && bIn) {
      run = [];
      crossing(ax, ay, bx, by, inside, run);
      run.push(bx, by);
    }
    prevIn = bIn;
  }
  if (run) runs.push(run);
  // A closed line cut open somewhere: its last run ends where its first run starts, so join them.
  if (closed && runs.length > 1 && inside(xy[0], xy[1])) {
    const last = runs.pop()!;
    runs[0] = last.concat(runs[0].slice(2));
  }
  return runs.filter((r) => r.length >= 4);
}

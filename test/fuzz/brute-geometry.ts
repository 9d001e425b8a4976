/** Plain, slow reference answers for the geometry fuzz: every segment pair tested, distances from first principles. */

import type { Point } from '../../src/document/types.ts';

/** Distance from p to the segment a-b, length units. */
export function segmentDistance(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const s = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return Math.hypot(p[0] - (a[0] + s * dx), p[1] - (a[1] + s * dy));
}

/** Twice the signed area of a, b, c: exact for the small whole numbers the crossing fuzz uses. */
function orient(a: Point, b: Point, c: Point): number {
  return (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
}

/** Whether c, on the line through a and b, lies within the segment a-b. */
function onSegment(a: Point, b: Point, c: Point): boolean {
  return Math.min(a[0], b[0]) <= c[0] && c[0] <= Math.max(a[0], b[0]) && Math.min(a[1], b[1]) <= c[1] && c[1] <= Math.max(a[1], b[1]);
}

/** Whether the closed segments p and q share any point. */
function segmentsMeet([a, b]: [Point, Point], [c, d]: [Point, Point]): boolean {
  const d1 = orient(c, d, a), d2 = orient(c, d, b), d3 = orient(a, b, c), d4 = orient(a, b, d);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) return true;
  return (d1 === 0 && onSegment(c, d, a)) || (d2 === 0 && onSegment(c, d, b)) || (d3 === 0 && onSegment(a, b, c)) || (d4 === 0 && onSegment(a, b, d));
}

/** Whether `next` (starting where `first` ends) runs back over `first`: any shared point besides the one they must share. */
function foldsBack([a, b]: [Point, Point], [, c]: [Point, Point]): boolean {
  const ux = b[0] - a[0], uy = b[1] - a[1], vx = c[0] - b[0], vy = c[1] - b[1];
  return ux * vy - uy * vx === 0 && ux * vx + uy * vy < 0;
}

/** Segment k of a closed ring. */
const segment = (ring: readonly Point[], k: number): [Point, Point] => [ring[k], ring[(k + 1) % ring.length]];

/** Every pair of segments that cross or touch, as [ringA, segmentA, ringB, segmentB] with (ringA, segmentA) first. */
export function bruteCrossings(rings: readonly (readonly Point[])[]): number[][] {
  const found: number[][] = [];
  rings.forEach((ringA, ra) => rings.forEach((ringB, rb) => {
    if (rb < ra) return;
    for (let ka = 0; ka < ringA.length; ka++) {
      for (let kb = ra === rb ? ka + 1 : 0; kb < ringB.length; kb++) {
        const n = ringA.length;
        const sa = segment(ringA, ka), sb = segment(ringB, kb);
        let meet: boolean;
        if (ra === rb && kb === ka + 1) meet = foldsBack(sa, sb);
        else if (ra === rb && ka === 0 && kb === n - 1) meet = foldsBack(sb, sa);
        else meet = segmentsMeet(sa, sb);
        if (meet) found.push([ra, ka, rb, kb]);
      }
    }
  }));
  return found;
}

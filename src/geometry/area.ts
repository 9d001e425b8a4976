/** Signed area of closed polylines (shoelace formula). */

import type { FlowDomain } from '../solver/types.ts';

/**
 * Signed area of the closed polyline x0, y0, x1, y1, ... (length units), in length units squared:
 * positive when the points run counter-clockwise (y up), negative clockwise.
 * Coordinates are taken relative to the first point, which keeps the sum accurate far from the origin.
 * Example: the unit square (0,0) (1,0) (1,1) (0,1) gives 1.
 */
export function signedArea(xy: Float64Array): number {
  const n = xy.length >> 1;
  if (n < 3) return 0;
  const ox = xy[0], oy = xy[1];
  let twice = 0;
  for (let k = 1; k + 1 < n; k++) {
    const ax = xy[2 * k] - ox, ay = xy[2 * k + 1] - oy;
    const bx = xy[2 * k + 2] - ox, by = xy[2 * k + 3] - oy;
    twice += ax * by - ay * bx;
  }
  return twice / 2;
}

/** Area of the flow region (inside the outer ring, outside every island), length units squared, whatever the rings' directions. */
export function regionArea(domain: FlowDomain): number {
  let area = Math.abs(signedArea(domain.outer.xy));
  for (const island of domain.islands) area -= Math.abs(signedArea(island.xy));
  return area;
}

/** Point-in-ring and point-in-flow-region tests. */

import type { FlowDomain } from '../solver/types.ts';

/**
 * Whether (x, y) lies inside the closed polyline x0, y0, x1, y1, ... (even-odd rule, either direction).
 * A point exactly on the boundary may fall either way.
 */
export function pointInRing(xy: Float64Array, x: number, y: number): boolean {
  const n = xy.length >> 1;
  let inside = false;
  for (let k = 0, j = n - 1; k < n; j = k++) {
    const yk = xy[2 * k + 1], yj = xy[2 * j + 1];
    // Count crossings of the ray to +x; the half-open test (yk > y) !== (yj > y) counts a shared vertex once.
    if ((yk > y) !== (yj > y)) {
      const xk = xy[2 * k], xj = xy[2 * j];
      const xCross = xk + ((y - yk) * (xj - xk)) / (yj - yk);
      if (x < xCross) inside = !inside;
    }
  }
  return inside;
}

/** Whether (x, y) lies in the flow: inside the outer ring and outside every island. */
export function pointInRegion(domain: FlowDomain, x: number, y: number): boolean {
  if (!pointInRing(domain.outer.xy, x, y)) return false;
  for (const island of domain.islands) if (pointInRing(island.xy, x, y)) return false;
  return true;
}

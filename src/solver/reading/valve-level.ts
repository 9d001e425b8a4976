/** Where the port ends: the highest potential found on the valve head's wall. */
import type { CutGrid, FlowDomain } from '../types.ts';
import { sampleCells } from './field.ts';

/**
 * The highest potential on the island named `islandName` (sampled at its ring's points and segment midpoints),
 * or null when the section has no such island. A station with a higher potential lies wholly upstream of the
 * valve head, in the port; one with a lower potential wraps round the valve or lies past it.
 * @param phi extended cell potential (see extendedPhi), row-major i + j * nx
 */
export function valvePotential(domain: FlowDomain, grid: CutGrid, phi: Float64Array, islandName: string): number | null {
  const id = domain.wallNames.indexOf(islandName);
  if (id < 0) return null;
  let top = -Infinity;
  for (const ring of domain.islands) {
    if (!ring.wallIds.includes(id)) continue;
    const n = ring.marks.length;
    for (let k = 0; k < n; k++) {
      const m = (k + 1) % n;
      const mx = 0.5 * (ring.xy[2 * k] + ring.xy[2 * m]);
      const my = 0.5 * (ring.xy[2 * k + 1] + ring.xy[2 * m + 1]);
      for (const value of [sampleCells(grid, phi, ring.xy[2 * k], ring.xy[2 * k + 1]), sampleCells(grid, phi, mx, my)]) {
        if (value > top) top = value;
      }
    }
  }
  return Number.isFinite(top) ? top : null;
}

/** The grid's frame (cell size, origin, counts) and the section's rings moved into grid units. */
import type { CutGrid, FlowDomain, Ring } from '../types.ts';
import { fluidSense } from './checks.ts';

/** A grid's lattice without its cut-cell measures: counts, cell size and the lower-left corner of cell (0, 0). */
export type GridFrame = Pick<CutGrid, 'nx' | 'ny' | 'h' | 'x0' | 'y0'>;

/**
 * A ring in grid units: u = (x - x0) / h, v = (y - y0) / h, so grid lines sit on integers.
 * `sense` is +1 when the fluid lies left of the direction of travel (outline counter-clockwise,
 * island clockwise) and -1 when a ring arrives the other way round; every signed sum is multiplied by it.
 */
export interface GridRing {
  /** u0, v0, u1, v1, ... grid units. */
  readonly uv: Float64Array;
  readonly ring: Ring;
  readonly sense: 1 | -1;
}

/** Coordinates closer than this to a grid line (grid units) are put on it, so near-ties obey the exact tie rules. */
const SNAP = 1e-9;

/**
 * Square cells of side sqrt(box area / targetCells), one spare cell around the box, so that
 * the box's lower-left corner lies on grid node (1, 1) and no ring touches the outermost cells' outer faces.
 */
export function gridFrame(box: readonly [number, number, number, number], targetCells: number): GridFrame {
  const w = box[2] - box[0];
  const hgt = box[3] - box[1];
  const h = Math.sqrt((w * hgt) / targetCells);
  const nx = Math.max(1, Math.ceil(w / h - SNAP)) + 2;
  const ny = Math.max(1, Math.ceil(hgt / h - SNAP)) + 2;
  return { nx, ny, h, x0: box[0] - h, y0: box[1] - h };
}

function snap(t: number): number {
  const r = Math.round(t);
  return Math.abs(t - r) < SNAP ? r : t;
}

/** Every ring of the domain in grid units, outline first. */
export function toGridRings(domain: FlowDomain, frame: GridFrame): GridRing[] {
  const rings = [domain.outer, ...domain.islands];
  return rings.map((ring, index) => {
    const uv = new Float64Array(ring.xy.length);
    for (let k = 0; k < uv.length; k += 2) {
      uv[k] = snap((ring.xy[k] - frame.x0) / frame.h);
      uv[k + 1] = snap((ring.xy[k + 1] - frame.y0) / frame.h);
    }
    return { uv, ring, sense: fluidSense(ring, index === 0) };
  });
}

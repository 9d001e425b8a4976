/** Peak speed ratio of a solved field, kept clear of partial cells and of sharp convex corners. */
import { fluidSense } from './rasterise/checks.ts';
import type { GridFrame } from './rasterise/frame.ts';
import type { CutGrid, FlowDomain, Ring } from './types.ts';

export interface SpeedPeak {
  readonly speedRatio: number;
  /** Cell centre, length units. */
  readonly x: number;
  readonly y: number;
}

/** Turn (radians) above which a convex corner counts as sharp: 20 degrees, a free choice. */
const SHARP_TURN = (20 * Math.PI) / 180;

/**
 * Cells closer to a sharp convex corner than CORNER_CLEARANCE_CELLS cell sizes or CORNER_CLEARANCE_SHARE of the
 * grid's diagonal, whichever is larger, are left out of the peak. At a corner where the fluid turns through
 * an angle alpha > 180 deg the ideal speed grows like r^(pi/alpha - 1) without bound (r^(-1/3) at a square
 * outside corner), so the largest value next to it is a property of the grid, not of the port: a clearance of
 * a fixed number of cells would still let it grow by 2^(1/3) per halving of the cell size. A clearance of
 * fixed length makes the peak converge as the grid is refined. 1% is a free choice: small against a port's
 * passages, large against the cells of a standard grid. The real flow separates at such an edge anyway.
 */
export const CORNER_CLEARANCE_CELLS = 2;
export const CORNER_CLEARANCE_SHARE = 0.01;

/**
 * Vertices where the wall turns away from the fluid by more than SHARP_TURN: x, y pairs, length units.
 * The fluid side of each ring comes from its signed area (fluidSense: outer ring fluid inside, islands outside).
 */
export function sharpConvexCorners(domain: FlowDomain): Float64Array {
  const out: number[] = [];
  collect(domain.outer, true, out);
  for (const ring of domain.islands) collect(ring, false, out);
  return Float64Array.from(out);
}

function collect(ring: Ring, outer: boolean, out: number[]): void {
  const { xy } = ring;
  const n = xy.length / 2;
  const fluidLeft = fluidSense(ring, outer) === 1;
  for (let k = 0; k < n; k++) {
    const a = (k + n - 1) % n;
    const c = (k + 1) % n;
    const dx1 = xy[2 * k] - xy[2 * a];
    const dy1 = xy[2 * k + 1] - xy[2 * a + 1];
    const dx2 = xy[2 * c] - xy[2 * k];
    const dy2 = xy[2 * c + 1] - xy[2 * k + 1];
    const turn = Math.atan2(dx1 * dy2 - dy1 * dx2, dx1 * dx2 + dy1 * dy2);
    // Turning right with fluid on the left (or left with fluid on the right) bends the wall away from the fluid.
    const away = fluidLeft ? -turn : turn;
    if (away > SHARP_TURN) out.push(xy[2 * k], xy[2 * k + 1]);
  }
}

/**
 * Largest speed ratio over cells with fluid fraction >= 0.5 (partial cells hold a poorly placed centre)
 * that lie outside the corner clearance (see CORNER_CLEARANCE_SHARE) of every point in `corners`.
 * @param speed speed ratio, i + j * nx, NaN outside the fluid.
 * @param corners x, y pairs (sharpConvexCorners).
 */
export function peakSpeed(
  grid: GridFrame & Pick<CutGrid, 'cellFraction'>,
  speed: Float64Array, corners: Float64Array,
): SpeedPeak {
  const { nx, ny, h, x0, y0, cellFraction } = grid;
  const cleared = cornerMask(grid, corners);
  let best = -1;
  let bestK = -1;
  for (let k = 0; k < nx * ny; k++) {
    const s = speed[k];
    if (cellFraction[k] >= 0.5 && s > best && cleared[k] === 0) {
      best = s;
      bestK = k;
    }
  }
  if (bestK < 0) return { speedRatio: NaN, x: NaN, y: NaN };
  const i = bestK % nx;
  const j = (bestK - i) / nx;
  return { speedRatio: best, x: x0 + (i + 0.5) * h, y: y0 + (j + 0.5) * h };
}

/** 1 = cell centre within the clearance of a corner. */
function cornerMask(grid: GridFrame, corners: Float64Array): Uint8Array {
  const { nx, ny, h, x0, y0 } = grid;
  const out = new Uint8Array(nx * ny);
  const radiusCells = Math.max(CORNER_CLEARANCE_CELLS, CORNER_CLEARANCE_SHARE * Math.hypot(nx, ny));
  const reach = Math.ceil(radiusCells) + 1;
  for (let c = 0; c < corners.length; c += 2) {
    const ci = (corners[c] - x0) / h - 0.5;
    const cj = (corners[c + 1] - y0) / h - 0.5;
    for (let j = Math.max(0, Math.floor(cj) - reach); j <= Math.min(ny - 1, Math.ceil(cj) + reach); j++) {
      for (let i = Math.max(0, Math.floor(ci) - reach); i <= Math.min(nx - 1, Math.ceil(ci) + reach); i++) {
        if (Math.hypot(i - ci, j - cj) <= radiusCells) out[i + j * nx] = 1;
      }
    }
  }
  return out;
}

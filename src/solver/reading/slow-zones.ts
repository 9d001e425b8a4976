/** Slow zones: cells that move far below the mean speed of their own station, and how much of the section they are. */
import type { CutGrid } from '../types.ts';
import { pastDeck } from './deck.ts';
import type { DeckLine, SlowZones, Station } from './types.ts';

/**
 * Marks solved cells whose speed ratio is below `slowFraction` times their station's mean speed ratio. A cell's
 * station mean comes from its potential, linear between the two stations around it (held constant beyond the first
 * and last). Shares are fluid-area weighted (cell fraction), times the depth at the cell centre when there is one
 * (shares of the volume); the port share counts only cells with potential above `valvePhi` (every cell when it is
 * null). Cells whose centre lies past `deck` (the test bore) are not judged: never marked and left out of both shares.
 * @param phi cell potential, row-major i + j * nx, NaN where not solved
 * @param speedRatio cell speed ratio, row-major i + j * nx, NaN where not solved
 * @param depth passage depth at cell centres (cellDepths), row-major i + j * nx; null for unit depth
 */
export function slowZones(
  grid: CutGrid, phi: Float64Array, speedRatio: Float64Array, stations: readonly Station[], slowFraction: number, valvePhi: number | null,
  deck: DeckLine | null = null, depth: Float64Array | null = null,
): SlowZones {
  const { nx, ny, h, x0, y0 } = grid;
  const mask = new Uint8Array(nx * ny);
  const port = new Uint8Array(nx * ny);
  const levels = stations.map((s) => s.phi);
  const means = stations.map((s) => s.meanSpeedRatio);
  // a cell at or above this speed ratio cannot be slow whatever its station (the margin covers rounding in the
  // interpolation), so the station mean is looked up only for the few cells below it
  const neverSlow = stations.length > 0 ? slowFraction * Math.max(...means) * (1 + 1e-9) : -Infinity;
  let area = 0, slowArea = 0, portArea = 0, portSlowArea = 0;
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = i + j * nx;
      const fraction = grid.cellFraction[c];
      const f = depth === null ? fraction : fraction * depth[c];
      const u = speedRatio[c], p = phi[c];
      if (!(fraction > 0) || !Number.isFinite(p) || !Number.isFinite(u)) continue;
      if (deck !== null && pastDeck(deck, x0 + (i + 0.5) * h, y0 + (j + 0.5) * h) > 0) continue;
      const inPort = valvePhi === null || p > valvePhi;
      area += f;
      if (inPort) portArea += f;
      if (!(u < neverSlow) || !(u < slowFraction * interpolateDescending(levels, means, p))) continue;
      mask[c] = 1;
      slowArea += f;
      if (inPort) {
        portSlowArea += f;
        port[c] = 1;
      }
    }
  }
  return {
    mask,
    share: area > 0 ? slowArea / area : 0,
    portShare: portArea > 0 ? portSlowArea / portArea : 0,
    largest: largestPatch(grid, port),
  };
}

/** Linear interpolation in a table whose keys fall (stations run from phi near 1 to near 0); clamped at the ends. */
export function interpolateDescending(keys: readonly number[], values: readonly number[], key: number): number {
  const n = keys.length;
  if (key >= keys[0]) return values[0];
  if (key <= keys[n - 1]) return values[n - 1];
  let lo = 0, hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (keys[mid] >= key) lo = mid;
    else hi = mid;
  }
  const t = (key - keys[lo]) / (keys[hi] - keys[lo]);
  return values[lo] + t * (values[hi] - values[lo]);
}

/** Centre, radius and fluid area (document units) of the largest edge-joined group of marked cells; null if none. */
function largestPatch(grid: CutGrid, marked: Uint8Array): SlowZones['largest'] {
  const { nx, ny, h, x0, y0 } = grid;
  const seen = new Uint8Array(marked.length);
  const stack: number[] = [];
  let best: { cells: number[]; area: number } | null = null;
  const visit = (n: number): void => {
    if (marked[n] && !seen[n]) {
      seen[n] = 1;
      stack.push(n);
    }
  };
  for (let start = 0; start < marked.length; start++) {
    if (!marked[start] || seen[start]) continue;
    const cells: number[] = [];
    let area = 0;
    seen[start] = 1;
    stack.push(start);
    while (stack.length > 0) {
      const c = stack.pop()!;
      cells.push(c);
      area += grid.cellFraction[c] * h * h;
      const i = c % nx, j = (c - i) / nx;
      // edge neighbours in the order right, left, up, down
      if (i + 1 < nx) visit(c + 1);
      if (i > 0) visit(c - 1);
      if (j + 1 < ny) visit(c + nx);
      if (j > 0) visit(c - nx);
    }
    if (best === null || area > best.area) best = { cells, area };
  }
  if (best === null) return null;
  const centre = (c: number): [number, number] => [x0 + ((c % nx) + 0.5) * h, y0 + (Math.floor(c / nx) + 0.5) * h];
  let sx = 0, sy = 0;
  for (const c of best.cells) {
    const [x, y] = centre(c);
    sx += x * grid.cellFraction[c] * h * h;
    sy += y * grid.cellFraction[c] * h * h;
  }
  const x = sx / best.area, y = sy / best.area;
  let radius = 0;
  for (const c of best.cells) radius = Math.max(radius, Math.hypot(centre(c)[0] - x, centre(c)[1] - y));
  return { x, y, radius: radius + h, area: best.area };
}

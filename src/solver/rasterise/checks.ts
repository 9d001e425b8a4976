/** Set-up checks before rasterising: a section the solver cannot use becomes a FlowSetupError a porter can act on. */
import { FlowSetupError, MAX_CELLS, formatLength } from '../errors.ts';
import { MARK_INLET, MARK_OUTLET } from '../types.ts';
import type { FlowDomain, Ring } from '../types.ts';

/** Twice the signed area of a ring (positive when counter-clockwise), length units squared. */
function ringDoubleArea(ring: Ring): number {
  const xy = ring.xy;
  const n = xy.length >> 1;
  let sum = 0;
  for (let k = 0; k < n; k++) {
    const m = (k + 1) % n;
    sum += xy[2 * k] * xy[2 * m + 1] - xy[2 * m] * xy[2 * k + 1];
  }
  return sum;
}

/**
 * +1 when the fluid lies left of the ring's direction of travel, -1 when it lies right. The fluid is inside the
 * outline and outside each island, so it is left of a counter-clockwise outline or a clockwise island, whichever
 * way round a ring arrives.
 */
export function fluidSense(ring: Ring, outer: boolean): 1 | -1 {
  return outer === ringDoubleArea(ring) > 0 ? 1 : -1;
}

/** Sum of `of(x0, y0, x1, y1)` over the segments of every ring that carry `mark` (e.g. the inlet's). */
export function sumOverMarked(domain: FlowDomain, mark: number, of: (x0: number, y0: number, x1: number, y1: number) => number): number {
  let total = 0;
  for (const ring of [domain.outer, ...domain.islands]) {
    const n = ring.xy.length >> 1;
    for (let k = 0; k < n; k++) {
      if (ring.marks[k] !== mark) continue;
      const m = (k + 1) % n;
      total += of(ring.xy[2 * k], ring.xy[2 * k + 1], ring.xy[2 * m], ring.xy[2 * m + 1]);
    }
  }
  return total;
}

/** Total length of the segments of every ring that carry `mark`, length units. */
export function markedLength(domain: FlowDomain, mark: number): number {
  return sumOverMarked(domain, mark, (x0, y0, x1, y1) => Math.hypot(x1 - x0, y1 - y0));
}

function checkRing(ring: Ring, what: string): void {
  const n = ring.xy.length >> 1;
  if (n < 3) throw new FlowSetupError('degenerate', `The ${what} has fewer than 3 points, so it encloses nothing.`);
  if (ring.marks.length !== n || ring.wallIds.length !== n) {
    throw new RangeError(`${what}: ${n} points but ${ring.marks.length} marks and ${ring.wallIds.length} wall ids`);
  }
  for (let k = 0; k < 2 * n; k++) {
    if (!Number.isFinite(ring.xy[k])) {
      throw new FlowSetupError('degenerate', `The ${what} has a point with no valid position (point ${(k >> 1) + 1}).`);
    }
  }
}

/**
 * Everything that can be said before the grid exists: points, inlet, outlet, area and grid size.
 * Throws FlowSetupError; a bad `targetCells` (not a positive number) is a caller bug and throws RangeError.
 */
export function checkDomain(domain: FlowDomain, targetCells: number): void {
  if (!(targetCells >= 1) || !Number.isFinite(targetCells)) throw new RangeError(`targetCells must be a positive number, got ${targetCells}`);
  checkRing(domain.outer, 'outline');
  domain.islands.forEach((island, k) => checkRing(island, `island ${k + 1}`));
  if (markedLength(domain, MARK_INLET) === 0) {
    throw new FlowSetupError('no-inlet', 'The section has no inlet: mark the manifold-side edge as inlet.');
  }
  if (markedLength(domain, MARK_OUTLET) === 0) {
    throw new FlowSetupError('no-outlet', 'The section has no outlet: mark the edge where the air leaves (the test bore end) as outlet.');
  }
  let area = Math.abs(ringDoubleArea(domain.outer)) / 2;
  for (const island of domain.islands) area -= Math.abs(ringDoubleArea(island)) / 2;
  const b = bounds(domain);
  const boxArea = (b[2] - b[0]) * (b[3] - b[1]);
  if (!(boxArea > 0) || !(area > 1e-12 * boxArea)) {
    throw new FlowSetupError('degenerate', 'The section encloses no area: its outline is flat or folds onto itself.');
  }
  if (targetCells > MAX_CELLS) {
    throw new FlowSetupError(
      'too-many-cells',
      `${Math.round(targetCells).toLocaleString('en-US')} grid cells asked for; the most one solve can use is ${MAX_CELLS.toLocaleString('en-US')}. Choose a coarser grid detail.`,
    );
  }
}

/** The inlet must span at least one cell, else no cell can carry its flow. `h` in length units. */
export function checkInletSpan(domain: FlowDomain, h: number): void {
  const inlet = markedLength(domain, MARK_INLET);
  if (inlet < h) {
    throw new FlowSetupError(
      'degenerate',
      `The inlet is ${formatLength(inlet, h / 10)} long, shorter than one grid cell (${formatLength(h, h / 10)}): lengthen the inlet or use a finer grid.`,
    );
  }
}

/** [xmin, ymin, xmax, ymax] over every ring, length units. */
export function bounds(domain: FlowDomain): [number, number, number, number] {
  const b: [number, number, number, number] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const ring of [domain.outer, ...domain.islands]) {
    for (let k = 0; k < ring.xy.length; k += 2) {
      b[0] = Math.min(b[0], ring.xy[k]);
      b[1] = Math.min(b[1], ring.xy[k + 1]);
      b[2] = Math.max(b[2], ring.xy[k]);
      b[3] = Math.max(b[3], ring.xy[k + 1]);
    }
  }
  return b;
}

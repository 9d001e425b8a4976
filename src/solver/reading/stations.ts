/** Equipotential stations from inlet to outlet: width, mean speed, distance along the port, and the tightest one. */
import { MARK_INLET } from '../types.ts';
import type { CutGrid, FlowDomain } from '../types.ts';
import { clipToFluid, totalLength } from './clip.ts';
import { linesDepthIntegral } from '../depth/depth-integral.ts';
import { levelLines } from './contour.ts';
import { lengthPastDeck } from './deck.ts';
import type { RingIndex } from './ring-index.ts';
import type { DeckLine, Station, TightestStation } from './types.ts';

/** What a station needs from the solve. */
export interface StationInputs {
  readonly domain: FlowDomain;
  readonly grid: CutGrid;
  /** extended cell potential (see extendedPhi), row-major i + j * nx */
  readonly phi: Float64Array;
  readonly index: RingIndex;
  /** total flux per unit potential drop: per unit depth, or with the domain's depth (SolveResult.conductance) */
  readonly conductance: number;
  /** mean inlet speed, potential units per length unit */
  readonly inletMeanSpeed: number;
}

/**
 * Stations at the given potentials (normally falling from near 1 to near 0). A level that finds no line in the
 * fluid is left out. Distances run along the path inlet centre -> each station's centroid in turn. A station with
 * more than half its length past `deck` (in the test bore) is not judged; every station is without a deck.
 */
export function buildStations(input: StationInputs, levels: readonly number[], deck: DeckLine | null = null): Station[] {
  const raw = levelLines(input.grid, input.phi, levels);
  const { depth } = input.domain;
  const pieces = levels
    .map((phi, k) => {
      const lines = clipToFluid(raw[k], input.index);
      const width = totalLength(lines);
      return { phi, lines, width, area: depth === undefined ? width : linesDepthIntegral(depth, lines) };
    })
    .filter((s) => s.width > 0);
  let [px, py] = inletCentre(input.domain);
  let distance = 0;
  return pieces.map(({ phi, lines, width, area }) => {
    const [midX, midY] = centroid(lines, width);
    distance += Math.hypot(midX - px, midY - py);
    px = midX;
    py = midY;
    const [x1, y1, x2, y2] = farthestEnds(lines, midX, midY);
    const meanSpeedRatio = input.conductance / area / input.inletMeanSpeed;
    const judged = deck === null || lengthPastDeck(deck, lines) <= 0.5 * width;
    return { phi, lines, width, area, meanSpeedRatio, midX, midY, distanceFromInlet: distance, x1, y1, x2, y2, judged };
  });
}

/** Evenly spaced potentials 1 - (k + 1/2) / count, k = 0 .. count - 1: from near the inlet to near the outlet. */
export function evenLevels(count: number): number[] {
  return Array.from({ length: count }, (_, k) => 1 - (k + 0.5) / count);
}

/**
 * The judged station of least area with potential above `valvePhi` (any when it is null); null when there is none.
 * Without a depth a station's area is its width, so this is the narrowest.
 */
export function tightestStation(stations: readonly Station[], valvePhi: number | null): TightestStation | null {
  let best = -1;
  stations.forEach((s, k) => {
    if (s.judged && (valvePhi === null || s.phi > valvePhi) && (best < 0 || s.area < stations[best].area)) best = k;
  });
  if (best < 0) return null;
  const { width, area, x1, y1, x2, y2, distanceFromInlet } = stations[best];
  return { index: best, width, area, x1, y1, x2, y2, distanceFromInlet };
}

/** Length-weighted centre of the inlet segments, document units. */
function inletCentre(domain: FlowDomain): [number, number] {
  const { xy, marks } = domain.outer;
  const n = marks.length;
  let sx = 0, sy = 0, sum = 0;
  for (let k = 0; k < n; k++) {
    if (marks[k] !== MARK_INLET) continue;
    const m = (k + 1) % n;
    const len = Math.hypot(xy[2 * m] - xy[2 * k], xy[2 * m + 1] - xy[2 * k + 1]);
    sx += 0.5 * len * (xy[2 * k] + xy[2 * m]);
    sy += 0.5 * len * (xy[2 * k + 1] + xy[2 * m + 1]);
    sum += len;
  }
  return sum > 0 ? [sx / sum, sy / sum] : [xy[0], xy[1]];
}

function centroid(lines: readonly Float64Array[], width: number): [number, number] {
  let sx = 0, sy = 0;
  for (const xy of lines) {
    for (let k = 0; k + 3 < xy.length; k += 2) {
      const len = Math.hypot(xy[k + 2] - xy[k], xy[k + 3] - xy[k + 1]);
      sx += 0.5 * len * (xy[k] + xy[k + 2]);
      sy += 0.5 * len * (xy[k + 1] + xy[k + 3]);
    }
  }
  return [sx / width, sy / width];
}

/** The two line ends farthest apart (the station's span across the port); the centroid twice for closed loops only. */
function farthestEnds(lines: readonly Float64Array[], cx: number, cy: number): [number, number, number, number] {
  const ends: number[] = [];
  for (const xy of lines) {
    const last = xy.length - 2;
    if (xy[0] === xy[last] && xy[1] === xy[last + 1]) continue;
    ends.push(xy[0], xy[1], xy[last], xy[last + 1]);
  }
  let best: [number, number, number, number] = [cx, cy, cx, cy];
  let far = -1;
  for (let a = 0; a < ends.length; a += 2) {
    for (let b = a + 2; b < ends.length; b += 2) {
      const d = Math.hypot(ends[b] - ends[a], ends[b + 1] - ends[a + 1]);
      if (d > far) {
        far = d;
        best = [ends[a], ends[a + 1], ends[b], ends[b + 1]];
      }
    }
  }
  return best;
}

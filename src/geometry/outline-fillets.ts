/** Fillets at the corners of one outline: exact line-line rounding or a solved one beside arcs and curves, checked for fit. */

import type { Outline, Point } from '../document/types.ts';
import type { CircleArc } from './circle-arc.ts';
import type { EdgePath } from './edge-path.ts';
import { GeometryError, formatLength, outlineLabel } from './errors.ts';
import { cornerFillet, largestFilletRadius } from './fillet.ts';
import { solvePathFillet } from './fillet-solve.ts';
import type { FlatEdge } from './flatten-edge.ts';

/** A fillet placed at a corner: where it cuts the two edges (path parameters) and its arc. */
export interface PlacedFillet {
  /** Parameter on the incoming edge where the fillet starts. */
  readonly tIn: number;
  /** Parameter on the outgoing edge where the fillet ends. */
  readonly tOut: number;
  readonly tangentIn: Point;
  readonly tangentOut: Point;
  readonly arc: CircleArc;
}

/** The edges of an outline, ready for fillet placement. */
export interface OutlineEdges {
  readonly paths: readonly EdgePath[];
  readonly flat: readonly FlatEdge[];
  /** Per edge: running length at each flattened point (cumulativeLengths of flat[i].xy). */
  readonly cum: readonly Float64Array[];
}

export interface FilletPlace {
  readonly islandName?: string;
  readonly units?: string;
}

/**
 * The fillet at vertex i, or null when it has none or the corner is straight.
 * Each fillet may use all of a neighbouring edge, or half of it when the edge's other end is filleted too;
 * beyond that it throws GeometryError 'fillet-too-large' with the largest radius that fits.
 */
export function placeFillet(outline: Outline, i: number, edges: OutlineEdges, place: FilletPlace): PlacedFillet | null {
  const { vertices } = outline;
  const n = vertices.length;
  const radius = vertices[i].filletRadius ?? 0;
  if (!(radius > 0)) return null;
  const before = (i - 1 + n) % n, after = (i + 1) % n;
  const share = (corner: number): number => ((vertices[corner].filletRadius ?? 0) > 0 ? 0.5 : 1);
  const roomIn = lengthOf(edges.cum[before]) * share(before), roomOut = lengthOf(edges.cum[i]) * share(after);
  const dirIn = edges.flat[before].endDir, dirOut = edges.flat[i].startDir;
  const angle = Math.atan2(Math.abs(dirIn[0] * dirOut[1] - dirIn[1] * dirOut[0]), dirIn[0] * dirOut[0] + dirIn[1] * dirOut[1]);
  const tooLarge = (largest: number): GeometryError => filletTooLarge(i, vertices[i].at, radius, largest, place);

  if (edges.paths[before].kind === 'line' && edges.paths[i].kind === 'line') {
    const f = cornerFillet(vertices[i].at, dirIn, dirOut, radius);
    if (f === null) return null;
    const room = Math.min(roomIn, roomOut);
    if (f.tangentDistance > room * (1 + 1e-9)) throw tooLarge(largestFilletRadius(f.cornerAngle, room));
    const d = Math.min(f.tangentDistance, room);
    return { tIn: 1 - d / lengthOf(edges.cum[before]), tOut: d / lengthOf(edges.cum[i]), tangentIn: f.tangentIn, tangentOut: f.tangentOut, arc: f.arc };
  }
  if (angle >= Math.PI - 1e-9) return null;
  const fits = (r: number): PlacedFillet | null => solveWithin(edges, before, i, r, angle, roomIn, roomOut);
  const found = fits(radius);
  if (found !== null) return found;
  throw tooLarge(largestFitting(fits, radius));
}

function lengthOf(cum: Float64Array): number {
  return cum[cum.length - 1];
}

/** Solved fillet of radius r between edges `before` and `i`, or null when it cannot be placed within the rooms. */
function solveWithin(edges: OutlineEdges, before: number, i: number, r: number, angle: number, roomIn: number, roomOut: number): PlacedFillet | null {
  // Start Newton from the straight-line answer, tangent distance r / tan(angle / 2) along each edge.
  const d = r / Math.tan(angle / 2);
  const lenIn = lengthOf(edges.cum[before]);
  const guessIn = paramAtLength(edges.flat[before], edges.cum[before], Math.max(0, lenIn - d));
  const guessOut = paramAtLength(edges.flat[i], edges.cum[i], Math.min(d, lengthOf(edges.cum[i])));
  const f = solvePathFillet(edges.paths[before], edges.paths[i], r, guessIn, guessOut);
  if (f === null) return null;
  const usedIn = lenIn - lengthAtParam(edges.flat[before], edges.cum[before], f.tIn);
  const usedOut = lengthAtParam(edges.flat[i], edges.cum[i], f.tOut);
  return usedIn <= roomIn * (1 + 1e-9) && usedOut <= roomOut * (1 + 1e-9) ? f : null;
}

/** Largest radius below `tooBig` that still fits, by bisection (only run when reporting an error). */
function largestFitting(fits: (r: number) => unknown, tooBig: number): number {
  let lo = 0, hi = tooBig;
  for (let k = 0; k < 48; k++) {
    const mid = 0.5 * (lo + hi);
    if (fits(mid) !== null) lo = mid; else hi = mid;
  }
  return lo;
}

/** Length from the edge's start to parameter t, interpolated on the flattened edge. */
function lengthAtParam(flat: FlatEdge, cum: Float64Array, t: number): number {
  return interpolate(flat.t, cum, t);
}

/** Parameter at length s from the edge's start, interpolated on the flattened edge. */
function paramAtLength(flat: FlatEdge, cum: Float64Array, s: number): number {
  return interpolate(cum, flat.t, s);
}

/** Piecewise-linear value at x of (xs, ys), xs increasing; clamped at the ends. */
function interpolate(xs: Float64Array, ys: Float64Array, x: number): number {
  const last = xs.length - 1;
  if (x <= xs[0]) return ys[0];
  if (x >= xs[last]) return ys[last];
  let lo = 0, hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= x) lo = mid; else hi = mid;
  }
  const f = (x - xs[lo]) / (xs[hi] - xs[lo]);
  return ys[lo] + f * (ys[hi] - ys[lo]);
}

function filletTooLarge(vertexIndex: number, at: Point, radius: number, largest: number, place: FilletPlace): GeometryError {
  const where = place.islandName === undefined ? '' : ` of ${outlineLabel(place.islandName)}`;
  return new GeometryError('fillet-too-large',
    `The fillet at corner ${vertexIndex + 1}${where} (radius ${formatLength(radius, place.units)}) does not fit: ` +
    `at most ${formatLength(largest, place.units, 'down')} fits between its neighbouring edges.`,
    { where: at, vertexIndex, islandName: place.islandName, radius, largestRadius: largest });
}

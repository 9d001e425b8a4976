/**
 * Fillets where an arc or curve meets the corner: the circle of the given radius tangent to both true edges,
 * found by Newton's method on the two edge parameters (the centre must lie one radius off each edge).
 */

import type { Point } from '../document/types.ts';
import type { CircleArc } from './circle-arc.ts';
import type { EdgePath } from './edge-path.ts';

/** A fillet located on two edge paths. */
export interface PathFillet {
  /** Parameter of the tangent point on the incoming edge (whose t = 1 is the corner). */
  readonly tIn: number;
  /** Parameter of the tangent point on the outgoing edge (whose t = 0 is the corner). */
  readonly tOut: number;
  readonly tangentIn: Point;
  readonly tangentOut: Point;
  readonly centre: Point;
  /** From tangentIn to tangentOut in the direction of travel. */
  readonly arc: CircleArc;
}

/** Unit normal to the left of direction (dx, dy). */
function leftNormal(d: readonly [number, number]): [number, number] {
  const len = Math.hypot(d[0], d[1]);
  return [-d[1] / len, d[0] / len];
}

/** Centre of a circle of radius r tangent to `path` at t, on side +1 (left of travel) or -1. */
function centreFrom(path: EdgePath, t: number, r: number, side: number): [number, number] {
  const p = path.point(t), n = leftNormal(path.derivative(t));
  return [p[0] + side * r * n[0], p[1] + side * r * n[1]];
}

/**
 * The fillet of `radius` between `inPath` (ending at the corner) and `outPath` (starting there), starting Newton
 * from the parameters guessIn, guessOut. The fillet lies on the inside of the turn.
 * Returns null when no tangent circle is found with both parameters within [0, 1] (the radius cannot fit).
 * The caller deals with straight-through corners before calling (there is no turn to take the side from).
 */
export function solvePathFillet(inPath: EdgePath, outPath: EdgePath, radius: number, guessIn: number, guessOut: number): PathFillet | null {
  const dIn = inPath.derivative(1), dOut = outPath.derivative(0);
  const side = dIn[0] * dOut[1] - dIn[1] * dOut[0] > 0 ? 1 : -1;
  let tIn = guessIn, tOut = guessOut;
  const h = 1e-6, close = 1e-12 * radius;
  let best = { tIn, tOut, miss: Infinity };
  for (let iter = 0; iter < 40; iter++) {
    const a = centreFrom(inPath, tIn, radius, side), b = centreFrom(outPath, tOut, radius, side);
    const fx = a[0] - b[0], fy = a[1] - b[1], miss = Math.hypot(fx, fy);
    if (miss <= close) return within(tIn, tOut) ? fillet(inPath, outPath, tIn, tOut, radius, side) : null;
    if (miss < best.miss) best = { tIn, tOut, miss };
    // Central-difference Jacobian: columns d(centreIn)/dtIn and -d(centreOut)/dtOut.
    const aP = centreFrom(inPath, tIn + h, radius, side), aM = centreFrom(inPath, tIn - h, radius, side);
    const bP = centreFrom(outPath, tOut + h, radius, side), bM = centreFrom(outPath, tOut - h, radius, side);
    const j11 = (aP[0] - aM[0]) / (2 * h), j21 = (aP[1] - aM[1]) / (2 * h);
    const j12 = -(bP[0] - bM[0]) / (2 * h), j22 = -(bP[1] - bM[1]) / (2 * h);
    const det = j11 * j22 - j12 * j21;
    if (!(Math.abs(det) > 0)) return null;
    // Newton step, limited so a poor start cannot throw the parameters far along the edges' continuations.
    const stepIn = clampStep((fx * j22 - fy * j12) / det), stepOut = clampStep((j11 * fy - j21 * fx) / det);
    tIn -= stepIn;
    tOut -= stepOut;
  }
  // Rounding can hold the centres a few ulps of the coordinates apart for good (a small fillet far from the origin, or
  // beside a flat arc whose centre is far away): the closest pair is the fillet when it misses by under 1e-6 radius.
  const found = best.miss <= 1e-6 * radius && within(best.tIn, best.tOut);
  return found ? fillet(inPath, outPath, best.tIn, best.tOut, radius, side) : null;
}

function clampStep(step: number): number {
  return Math.max(-0.25, Math.min(0.25, step));
}

function within(tIn: number, tOut: number): boolean {
  return tIn >= -1e-12 && tIn <= 1 && tOut >= 0 && tOut <= 1 + 1e-12;
}

function fillet(inPath: EdgePath, outPath: EdgePath, tIn: number, tOut: number, radius: number, side: number): PathFillet {
  const tangentIn = inPath.point(tIn), tangentOut = outPath.point(tOut);
  const c0 = centreFrom(inPath, tIn, radius, side), c1 = centreFrom(outPath, tOut, radius, side);
  const centre: Point = [(c0[0] + c1[0]) / 2, (c0[1] + c1[1]) / 2];
  const a0 = Math.atan2(tangentIn[1] - centre[1], tangentIn[0] - centre[0]);
  const a1 = Math.atan2(tangentOut[1] - centre[1], tangentOut[0] - centre[0]);
  let sweep = a1 - a0;
  if (side > 0) { if (sweep < 0) sweep += 2 * Math.PI; } else if (sweep > 0) sweep -= 2 * Math.PI;
  return { tIn, tOut, tangentIn, tangentOut, centre, arc: { cx: centre[0], cy: centre[1], r: radius, startAngle: a0, sweep } };
}

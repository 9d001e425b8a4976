/** Fillets: the circular arc of a given radius tangent to the two edges meeting at a corner. */

import type { Point } from '../document/types.ts';
import { arcPoints, arcSegmentCount, type CircleArc } from './circle-arc.ts';

/** A fillet at one corner. Lengths in document units. */
export interface CornerFillet {
  /** Tangent point on the incoming edge (the edge ending at the corner). */
  readonly tangentIn: Point;
  /** Tangent point on the outgoing edge (the edge starting at the corner). */
  readonly tangentOut: Point;
  readonly centre: Point;
  readonly radius: number;
  /** Distance from the corner to each tangent point: radius / tan(angle / 2). */
  readonly tangentDistance: number;
  /** Angle between the two edges at the corner, radians, 0..pi (pi: straight through). */
  readonly cornerAngle: number;
  /** The arc from tangentIn to tangentOut, in the direction of travel around the outline. */
  readonly arc: CircleArc;
}

/** Corners closer to straight than this (radians) need no rounding. */
const STRAIGHT = 1e-9;

/**
 * Fillet of `radius` at `corner`, where `dirIn` and `dirOut` are unit directions leaving the corner along
 * the incoming and outgoing edge. The arc is tangent to the two lines through the corner along those directions.
 * Returns null for a straight-through corner (nothing to round). For folded-back edges (angle 0) the
 * tangent distance is Infinity: no radius fits.
 */
export function cornerFillet(corner: Point, dirIn: readonly [number, number], dirOut: readonly [number, number], radius: number): CornerFillet | null {
  const [ux, uy] = dirIn, [wx, wy] = dirOut;
  const cross = ux * wy - uy * wx, dot = ux * wx + uy * wy;
  const angle = Math.atan2(Math.abs(cross), dot);
  if (angle >= Math.PI - STRAIGHT) return null;
  const half = angle / 2;
  const tangentDistance = radius / Math.tan(half);
  const tangentIn: Point = [corner[0] + tangentDistance * ux, corner[1] + tangentDistance * uy];
  const tangentOut: Point = [corner[0] + tangentDistance * wx, corner[1] + tangentDistance * wy];
  // The centre lies on the bisector, radius / sin(half) from the corner.
  const bx = ux + wx, by = uy + wy, bLen = Math.hypot(bx, by);
  const toCentre = radius / Math.sin(half) / bLen;
  const centre: Point = [corner[0] + bx * toCentre, corner[1] + by * toCentre];
  // Travelling in along -dirIn and out along dirOut: a left turn (cross(-u, w) > 0) runs counter-clockwise.
  const turn = -cross > 0 ? 1 : -1;
  const arc: CircleArc = {
    cx: centre[0], cy: centre[1], r: radius,
    startAngle: Math.atan2(tangentIn[1] - centre[1], tangentIn[0] - centre[0]),
    sweep: turn * (Math.PI - angle),
  };
  return { tangentIn, tangentOut, centre, radius, tangentDistance, cornerAngle: angle, arc };
}

/** Unit direction from a to b. */
function towards(a: Point, b: Point): [number, number] {
  const dx = b[0] - a[0], dy = b[1] - a[1], len = Math.hypot(dx, dy);
  return [dx / len, dy / len];
}

/**
 * Fillet of `radius` at `corner` between two straight edges, from `prev` (start of the incoming edge)
 * and to `next` (end of the outgoing edge). Exact tangency: the tangent points lie on the two lines,
 * radius / tan(angle / 2) from the corner, and the centre is `radius` from both lines.
 * Does not check that the tangent points fall within the edges; see largestFilletRadius.
 */
export function lineCornerFillet(prev: Point, corner: Point, next: Point, radius: number): CornerFillet | null {
  return cornerFillet(corner, towards(corner, prev), towards(corner, next), radius);
}

/** Largest radius whose tangent points stay within `room` (length units) of the corner, for a corner `angle` (radians). */
export function largestFilletRadius(cornerAngle: number, room: number): number {
  return room * Math.tan(cornerAngle / 2);
}

/**
 * Points of a fillet arc, tangentIn to tangentOut inclusive (ends exact), within chordal tolerance `tol`.
 * The chord count is even so the arc's midpoint is a point: the two halves can take the roles
 * of the two edges they join.
 */
export function filletPoints(fillet: Pick<CornerFillet, 'arc' | 'tangentIn' | 'tangentOut'>, tol: number): Float64Array {
  const count = 2 * Math.ceil(arcSegmentCount(fillet.arc, tol, 2) / 2);
  const xy = arcPoints(fillet.arc, count);
  xy[0] = fillet.tangentIn[0]; xy[1] = fillet.tangentIn[1];
  xy[xy.length - 2] = fillet.tangentOut[0]; xy[xy.length - 1] = fillet.tangentOut[1];
  return xy;
}

/**
 * The fillet-radius handle of a corner: where it sits for a radius, and the radius a drag of it means.
 * The handle is the fillet arc's midpoint, on the corner's bisector; dragging it along the bisector sets the radius.
 */

import type { Point, Section } from '../document/types.ts';
import { directionTolerance, flatEdge } from './edge-flat.ts';
import { findOutline, wrap } from './section-access.ts';
import { add, dot, scale, sub, unit } from './vec.ts';

/** Corners within this of straight (radians) have no fillet to shape, like the geometry kernel's. */
const STRAIGHT = 1e-9;

/** The two edges meeting at a corner, as the fillet sees them. */
export interface CornerShape {
  readonly at: Point;
  /** Angle between the two edges at the corner, radians, in (0, pi). */
  readonly angle: number;
  /** Unit vector from the corner into the angle, halfway between the edges: the fillet's centre lies on it. */
  readonly bisector: Point;
}

/**
 * The corner at vertex `vertex` of the section outline (or of island `island`), or null when there is no
 * such vertex or the edges run straight through (or fold back). Edge directions are the edges' tangents at
 * the corner, as the kernel uses them to place fillets; for two lines this is exact.
 */
export function cornerShape(section: Section, vertex: number, island?: number): CornerShape | null {
  const outline = findOutline(section, island);
  if (outline === undefined || outline.vertices[vertex] === undefined) return null;
  const before = wrap(vertex - 1, outline.vertices.length);
  const dirIn = flatEdge(outline, before, directionTolerance(outline, before)).endDir;
  const dirOut = flatEdge(outline, vertex, directionTolerance(outline, vertex)).startDir;
  const angle = Math.atan2(Math.abs(dirIn[0] * dirOut[1] - dirIn[1] * dirOut[0]), dot(dirIn, dirOut));
  if (!(angle > STRAIGHT && angle < Math.PI - STRAIGHT)) return null;
  return { at: outline.vertices[vertex].at, angle, bisector: unit(add(dirIn, dirOut)) };
}

/**
 * Distance from the corner to the fillet arc's midpoint, along the bisector, for radius `radius`
 * and corner angle `angle` (radians): the centre is r / sin(angle/2) away and the arc's middle r nearer.
 * Example: a 90 degree corner with r = 3 gives 3 * (sqrt 2 - 1) = 1.243.
 */
export function handleDistance(angle: number, radius: number): number {
  return radius / Math.sin(angle / 2) - radius;
}

/** Inverse of handleDistance: the radius whose fillet midpoint lies `distance` along the bisector. */
function radiusForHandleDistance(angle: number, distance: number): number {
  const s = Math.sin(angle / 2);
  return (distance * s) / (1 - s);
}

/**
 * Where the fillet-radius handle of vertex `vertexIndex` sits (document units): the fillet arc's midpoint,
 * or the corner itself for a sharp corner. Null when the corner is straight or does not exist.
 */
export function filletHandlePosition(section: Section, vertexIndex: number, island?: number): Point | null {
  const corner = cornerShape(section, vertexIndex, island);
  if (corner === null) return null;
  const radius = findOutline(section, island)?.vertices[vertexIndex].filletRadius ?? 0;
  return add(corner.at, scale(corner.bisector, handleDistance(corner.angle, radius)));
}

/**
 * The fillet radius (document units, >= 0) meant by dragging vertex `vertexIndex`'s handle to `pointer`:
 * the pointer is projected onto the bisector; behind the corner it means 0. Null when the corner is straight
 * or does not exist. Exact inverse of filletHandlePosition for two straight edges.
 */
export function radiusFromHandleDrag(section: Section, vertexIndex: number, pointer: Point, island?: number): number | null {
  const corner = cornerShape(section, vertexIndex, island);
  if (corner === null) return null;
  const along = Math.max(0, dot(sub(pointer, corner.at), corner.bisector));
  return radiusForHandleDistance(corner.angle, along);
}

/** Geometry of one edge as the editor needs it: its arc, points along it, and the check that it still has a shape. */

import type { Edge, Outline, Point, Section } from '../document/types.ts';
import { arcThroughPoints, type CircleArc } from '../geometry/circle-arc.ts';
import { EditError } from './errors.ts';
import { edgeName } from './outline-parts.ts';
import { wrap } from './section-access.ts';
import { distance, dot, samePlace, sub } from './vec.ts';

/** Start and end vertex positions of edge `index` of an outline. */
export function edgeEnds(outline: Outline, index: number): [Point, Point] {
  const n = outline.vertices.length;
  return [outline.vertices[index].at, outline.vertices[wrap(index + 1, n)].at];
}

/** Point at fraction `t` (0 start, 1 end) of the arc's sweep. */
export function arcPointAt(arc: CircleArc, t: number): Point {
  const angle = arc.startAngle + arc.sweep * t;
  return [arc.cx + arc.r * Math.cos(angle), arc.cy + arc.r * Math.sin(angle)];
}

/** Fraction of the sweep (0..1) of the arc point nearest `p`. */
export function arcFractionNearest(arc: CircleArc, p: Point): number {
  const turn = 2 * Math.PI;
  const angle = Math.atan2(p[1] - arc.cy, p[0] - arc.cx);
  const along = arc.sweep >= 0 ? angle - arc.startAngle : arc.startAngle - angle;
  const swept = ((along % turn) + turn) % turn;
  const sweep = Math.abs(arc.sweep);
  if (swept <= sweep) return swept / sweep;
  // Outside the arc: whichever end is nearer.
  return distance(p, arcPointAt(arc, 0)) <= distance(p, arcPointAt(arc, 1)) ? 0 : 1;
}

/** The points an edge passes through between its ends: nothing for a line, the through point, or the vias. */
export function innerPoints(edge: Edge): readonly Point[] {
  if (edge.kind === 'arc') return [edge.through];
  if (edge.kind === 'curve') return edge.via;
  return [];
}

/**
 * Throws an EditError when edge `index` of the outline has lost its shape: its ends at one place,
 * an arc's through point on an end or in line with the ends but outside them, or two curve points alike.
 */
export function checkEdgeShape(section: Section, outline: Outline, island: number | undefined, index: number, edit: string): void {
  const [start, end] = edgeEnds(outline, index);
  const edge = outline.edges[index];
  const where = edgeName(section, island, index);
  if (samePlace(start, end)) throw new EditError(edit, `That would put both ends of ${where} at the same place.`);
  if (edge.kind === 'arc') checkArc(start, edge.through, end, where, edit);
  if (edge.kind === 'curve') {
    const points = [start, ...edge.via, end];
    for (let k = 0; k + 1 < points.length; k++) {
      if (samePlace(points[k], points[k + 1])) {
        throw new EditError(edit, `That would put two points of the curve ${where} at the same place.`);
      }
    }
  }
}

function checkArc(start: Point, through: Point, end: Point, where: string, edit: string): void {
  if (samePlace(through, start) || samePlace(through, end)) {
    throw new EditError(edit, `The middle point of the arc ${where} would sit on one of its ends.`);
  }
  if (arcThroughPoints(start, through, end) !== null) return;
  const chord = distance(start, end);
  const along = dot(sub(through, start), sub(end, start)) / chord;
  if (along < 0 || along > chord) {
    throw new EditError(edit, `The middle point of the arc ${where} would be in line with its ends but outside them.`);
  }
}

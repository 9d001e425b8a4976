/** Bounding box of a section and the default chordal tolerance derived from it. */

import type { Edge, Outline, Point, Section } from '../document/types.ts';
import { arcContainsAngle, arcThroughPoints } from './circle-arc.ts';
import { catmullRomSpans, flattenSpan } from './catmull-rom.ts';

/** Axis-aligned box, length units. */
export interface Bounds {
  readonly minX: number;
  readonly minY: number;
  readonly maxX: number;
  readonly maxY: number;
}

/**
 * Box around the section outline (islands lie inside it when the section is valid, but are included anyway).
 * Exact for lines and arcs (an arc's bulge past its three points counts); curves are included through their
 * flattening at 1e-3 of their own extent, so a curve may overshoot the box by that much at most.
 * Throws nothing: returns an empty box (min > max) for an outline with no vertices.
 */
export function sectionBounds(section: Section): Bounds {
  const box = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  const add = (x: number, y: number): void => {
    box.minX = Math.min(box.minX, x); box.maxX = Math.max(box.maxX, x);
    box.minY = Math.min(box.minY, y); box.maxY = Math.max(box.maxY, y);
  };
  addOutline(section.outline, add);
  for (const island of section.islands) addOutline(island.outline, add);
  return box;
}

function addOutline(outline: Outline, add: (x: number, y: number) => void): void {
  const n = outline.vertices.length;
  outline.vertices.forEach((v, i) => {
    add(v.at[0], v.at[1]);
    const edge = outline.edges[i];
    if (edge !== undefined && n > 1) addEdgeBulge(v.at, edge, outline.vertices[(i + 1) % n].at, add);
  });
}

function addEdgeBulge(start: Point, edge: Edge, end: Point, add: (x: number, y: number) => void): void {
  if (edge.kind === 'arc') {
    add(edge.through[0], edge.through[1]);
    const arc = arcThroughPoints(start, edge.through, end);
    if (arc === null) return;
    for (let q = 0; q < 4; q++) {
      const angle = (q * Math.PI) / 2;
      if (arcContainsAngle(arc, angle)) add(arc.cx + arc.r * Math.cos(angle), arc.cy + arc.r * Math.sin(angle));
    }
  } else if (edge.kind === 'curve' && edge.via.length > 0) {
    const points = [start, ...edge.via, end];
    const xs = points.map((p) => p[0]), ys = points.map((p) => p[1]);
    const extent = Math.hypot(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
    if (!(extent > 0) || points.some((p, k) => k > 0 && p[0] === points[k - 1][0] && p[1] === points[k - 1][1])) {
      points.forEach((p) => add(p[0], p[1]));
      return;
    }
    const sink = { xy: [] as number[], u: [] as number[] };
    for (const span of catmullRomSpans(points)) flattenSpan(span, 1e-3 * extent, sink);
    for (let k = 0; k < sink.xy.length; k += 2) add(sink.xy[k], sink.xy[k + 1]);
  }
}

/**
 * Default chordal tolerance, length units: 2e-4 of the bounding-box diagonal, for drawing and for checking a
 * section's geometry, never for solving it. A solve flattens for its own grid (src/study, solveFlattenTolerance):
 * at this tolerance every chord corner is a real corner to the solver, whose speed spike a finer grid resolves
 * better, so the wall speeds would get worse as the grid is refined.
 * Falls back to 1 length unit for an empty or single-point section (which the tracing then rejects).
 */
export function defaultTolerance(section: Section): number {
  const b = sectionBounds(section);
  const diagonal = Math.hypot(b.maxX - b.minX, b.maxY - b.minY);
  return diagonal > 0 && Number.isFinite(diagonal) ? 2e-4 * diagonal : 1;
}

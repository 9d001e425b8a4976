/** Picking: the handle nearest the pointer within a tolerance; points first, then edges (for inserting corners). */

import type { Parts, Point, Section } from '../document/types.ts';
import { generatedGeometry, type GeneratedGeometry } from './generated.ts';
import { editableOutlines, listHandles } from './handles.ts';
import { nearestOnEdge } from './handle-edge.ts';
import { islandPart, type HandleKind, type HandleRef } from './refs.ts';
import { distance } from './vec.ts';

/** What the pointer is on. For an edge, `at` is the nearest point of the edge (where a corner would go). */
export interface Hit {
  readonly ref: HandleRef;
  /** Document units. */
  readonly at: Point;
  /** From the pointer, document units. */
  readonly distance: number;
}

export interface HitOptions {
  /** Only these kinds of handle count, e.g. `['fillet']` while a radius modifier is held. Default: all. */
  readonly kinds?: readonly HandleKind[];
  /**
   * The variant's parametric parts (e.g. `activeVariant(doc).parts`): what they generate cannot be hit (see
   * listHandles), and a valve adds its lift and valve-axis handles. Absent: every corner and edge counts.
   */
  readonly parts?: Parts;
}

/**
 * The handle nearest `pointer` (document units) no further than `tolerance` (document units; the app turns
 * its pixel slop into this), or null. Point handles (corners, through and via points, fillet handles) take
 * precedence over edges, because every edge runs into the corners at its ends; among points at equal
 * distance a corner wins over an arc or curve point, which wins over a fillet handle, which wins over the valve's
 * lift and axis handles. Generated geometry is never hit when `options.parts` is given.
 */
export function hitTest(section: Section, pointer: Point, tolerance: number, options: HitOptions = {}): Hit | null {
  if (!(tolerance > 0 && Number.isFinite(tolerance))) throw new RangeError(`hitTest: tolerance must be a positive length, got ${tolerance}`);
  const allowed = (kind: HandleKind) => options.kinds === undefined || options.kinds.includes(kind);
  const generated = generatedGeometry(section, options.parts);
  let best: Hit | null = null;
  for (const handle of listHandles(section, options.parts, generated)) {
    if (!allowed(handle.ref.kind)) continue;
    const d = distance(handle.at, pointer);
    if (d <= tolerance && (best === null || d < best.distance)) best = { ref: handle.ref, at: handle.at, distance: d };
  }
  if (best !== null || !allowed('edge')) return best;
  return nearestEdge(section, pointer, tolerance, generated);
}

function nearestEdge(section: Section, pointer: Point, tolerance: number, generated: GeneratedGeometry): Hit | null {
  // Flatten finer than the slop so the picked point lies on the edge as drawn.
  const tol = tolerance / 8;
  let best: Hit | null = null;
  for (const { outline, island } of editableOutlines(section, generated)) {
    for (let edge = 0; edge < outline.edges.length; edge++) {
      if (island === undefined && generated.outlineEdges.has(edge)) continue;
      const near = nearestOnEdge(outline, edge, pointer, tol);
      if (near.distance <= tolerance && (best === null || near.distance < best.distance)) {
        best = { ref: { kind: 'edge', edge, ...islandPart(island) }, at: near.at, distance: near.distance };
      }
    }
  }
  return best;
}

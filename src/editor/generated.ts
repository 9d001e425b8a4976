/**
 * Which corners, edges and islands of a section its parametric parts generate. Regenerating puts them back on their
 * numbers after every edit, so they get no handles: a porter changes them through the parts, not by dragging.
 */

import type { Parts, Section } from '../document/types.ts';
import { pocketAnchors } from '../parts/anchors.ts';
import { PartsError } from '../parts/errors.ts';
import { VALVE_ISLAND_NAME } from '../parts/valve-head.ts';
import { isPartHandle, type HandleRef } from './refs.ts';

export interface GeneratedGeometry {
  /** Outline corners strictly between the two anchor corners (the anchors stay the porter's: they are drawn by hand). */
  readonly outlineVertices: ReadonlySet<number>;
  /** Outline edges from one anchor corner to the other along the valve pocket (seat, deck, test bore). */
  readonly outlineEdges: ReadonlySet<number>;
  /** Islands the parts generate whole: the valve head. */
  readonly islands: ReadonlySet<number>;
}

const NONE: GeneratedGeometry = { outlineVertices: new Set(), outlineEdges: new Set(), islands: new Set() };

/**
 * What `parts` generate in `section`: with a valve, the island named "valve head"; with a seat and a test bore, the
 * valve pocket between the outline's anchor corners. Nothing when there are no parts. An outline whose anchors do not
 * split off a pocket (the parts could not have been built on it) has no generated stretch; it stays editable.
 */
export function generatedGeometry(section: Section, parts: Parts | undefined): GeneratedGeometry {
  if (parts === undefined) return NONE;
  const islands = new Set<number>();
  if (parts.valve) section.islands.forEach((island, k) => island.name === VALVE_ISLAND_NAME && islands.add(k));
  const outlineVertices = new Set<number>(), outlineEdges = new Set<number>();
  const anchors = parts.seat && parts.bore ? anchorsOrNull(section) : null;
  if (anchors !== null) {
    const n = section.outline.vertices.length;
    for (let k = anchors.from; k !== anchors.to; k = (k + 1) % n) {
      outlineEdges.add(k);
      if (k !== anchors.from) outlineVertices.add(k);
    }
  }
  return { outlineVertices, outlineEdges, islands };
}

function anchorsOrNull(section: Section): { from: number; to: number } | null {
  try {
    return pocketAnchors(section.outline);
  } catch (error) {
    if (error instanceof PartsError) return null;
    throw error;
  }
}

/** Whether handle `ref` is on generated geometry (the valve's own handles never are: they are how the parts move). */
export function isGenerated(generated: GeneratedGeometry, ref: HandleRef): boolean {
  if (isPartHandle(ref)) return false;
  if (ref.island !== undefined) return generated.islands.has(ref.island);
  if (ref.kind === 'vertex' || ref.kind === 'fillet') return generated.outlineVertices.has(ref.vertex);
  return generated.outlineEdges.has(ref.edge);
}

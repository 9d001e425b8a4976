/** Every handle of a section with its position, for drawing them and for picking. */

import type { Outline, Point, Section } from '../document/types.ts';
import { filletHandlePosition } from './fillet-handle.ts';
import { islandPart, type HandleKind, type HandleRef } from './refs.ts';
import { edgeMiddle } from './handle-edge.ts';

/** A handle and where it is, document units. */
export interface Handle {
  readonly ref: HandleRef;
  readonly at: Point;
}

/** Order of precedence when two handles sit at one place: a corner wins over its zero-radius fillet handle. */
export const HANDLE_ORDER: readonly HandleKind[] = ['vertex', 'through', 'via', 'fillet'];

/**
 * Point handles of the section (the outline first, then each island), ordered by HANDLE_ORDER:
 * corners, arc through points, curve via points, fillet-radius handles (one per corner that is not straight,
 * sharp corners included, sitting on the corner). Edges are not listed; see hitTest.
 */
export function listHandles(section: Section): Handle[] {
  const outlines = [{ outline: section.outline, island: undefined as number | undefined },
    ...section.islands.map((isl, k) => ({ outline: isl.outline, island: k as number | undefined }))];
  const handles: Handle[] = [];
  for (const kind of HANDLE_ORDER) {
    for (const { outline, island } of outlines) handles.push(...handlesOfKind(section, outline, island, kind));
  }
  return handles;
}

function handlesOfKind(section: Section, outline: Outline, island: number | undefined, kind: HandleKind): Handle[] {
  const part = islandPart(island);
  const out: Handle[] = [];
  outline.vertices.forEach((vertex, k) => {
    if (kind === 'vertex') out.push({ ref: { kind, vertex: k, ...part }, at: vertex.at });
    if (kind === 'fillet') {
      const at = filletHandlePosition(section, k, island);
      if (at !== null) out.push({ ref: { kind, vertex: k, ...part }, at });
    }
  });
  outline.edges.forEach((edge, k) => {
    if (kind === 'through' && edge.kind === 'arc') out.push({ ref: { kind, edge: k, ...part }, at: edge.through });
    if (kind === 'via' && edge.kind === 'curve') edge.via.forEach((at, via) => out.push({ ref: { kind, edge: k, via, ...part }, at }));
  });
  return out;
}

/**
 * Where handle `ref` is now, or null when it no longer exists (e.g. a selection left over from before an edit).
 * An edge's position is the point halfway along it.
 */
export function handlePosition(section: Section, ref: HandleRef): Point | null {
  const outline = ref.island === undefined ? section.outline : section.islands[ref.island]?.outline;
  if (outline === undefined) return null;
  switch (ref.kind) {
    case 'vertex': return outline.vertices[ref.vertex]?.at ?? null;
    case 'fillet': return filletHandlePosition(section, ref.vertex, ref.island);
    case 'edge': return outline.edges[ref.edge] === undefined ? null : edgeMiddle(outline, ref.edge);
    case 'through': {
      const edge = outline.edges[ref.edge];
      return edge?.kind === 'arc' ? edge.through : null;
    }
    case 'via': {
      const edge = outline.edges[ref.edge];
      return edge?.kind === 'curve' ? edge.via[ref.via] ?? null : null;
    }
  }
}

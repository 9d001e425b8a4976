/** Every handle of a section with its position, for drawing them and for picking. */

import type { Outline, Parts, Point, Section } from '../document/types.ts';
import { filletHandlePosition } from './fillet-handle.ts';
import { generatedGeometry, isGenerated, type GeneratedGeometry } from './generated.ts';
import { partHandlePosition, partHandles } from './part-handles.ts';
import { islandPart, isPartHandle, type HandleKind, type HandleRef } from './refs.ts';
import { edgeMiddle } from './handle-edge.ts';
import { findOutline } from './section-access.ts';

/** A handle and where it is, document units. */
export interface Handle {
  readonly ref: HandleRef;
  readonly at: Point;
}

/**
 * Order of precedence when two handles sit at one place: a corner wins over its zero-radius fillet handle, and any
 * handle of the outlines over the valve's lift and axis handles (which sit in open space, clear of the outlines).
 */
const HANDLE_ORDER: readonly HandleKind[] = ['vertex', 'through', 'via', 'fillet', 'lift', 'valve-axis'];

/**
 * Point handles of the section (the outline first, then each island), ordered by HANDLE_ORDER:
 * corners, arc through points, curve via points, fillet-radius handles (one per corner that is not straight,
 * sharp corners included, sitting on the corner), then the valve's lift and axis handles. Edges are not listed;
 * see hitTest.
 *
 * With `parts` (the variant's, e.g. `activeVariant(doc).parts`), what they generate gets no handles: the valve head
 * island with a valve, and the valve pocket between the anchor corners with a seat and bore (the anchors themselves
 * keep theirs); and a valve adds the lift and valve-axis handles. Without `parts` every corner is listed.
 * `generated` is what `parts` generate, for a caller that has it already (hitTest).
 */
export function listHandles(section: Section, parts?: Parts, generated = generatedGeometry(section, parts)): Handle[] {
  const outlines = editableOutlines(section, generated);
  const handles: Handle[] = [];
  for (const kind of HANDLE_ORDER) {
    for (const { outline, island } of outlines) handles.push(...handlesOfKind(section, outline, island, kind));
  }
  handles.push(...partHandles(parts));
  return handles.filter((h) => !isGenerated(generated, h.ref));
}

/** The section outline (island undefined) and each island with its index, less the islands `generated` holds. */
export function editableOutlines(section: Section, generated: GeneratedGeometry): { outline: Outline; island: number | undefined }[] {
  const all = [{ outline: section.outline, island: undefined as number | undefined },
    ...section.islands.map((isl, k) => ({ outline: isl.outline, island: k as number | undefined }))];
  return all.filter(({ island }) => island === undefined || !generated.islands.has(island));
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
 * An edge's position is the point halfway along it. The lift and valve-axis handles need `parts` (null without a valve).
 */
export function handlePosition(section: Section, ref: HandleRef, parts?: Parts): Point | null {
  if (isPartHandle(ref)) return partHandlePosition(parts, ref);
  const outline = findOutline(section, ref.island);
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

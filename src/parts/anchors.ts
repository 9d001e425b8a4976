/**
 * Where generated geometry joins the hand-drawn outline. The outline marks two corners `anchor: true`; of the two
 * stretches between them, the one with no inlet edge is the valve pocket, and its edges and inner corners are
 * replaced. The anchors stay where they are drawn (they belong to the hand-drawn bowl), so regenerating is stable.
 */

import type { Edge, Outline, Vertex } from '../document/types.ts';
import { PartsError } from './errors.ts';

/** The pocket runs forward (in outline order) from corner `from` to corner `to`. */
export interface PocketAnchors {
  readonly from: number;
  readonly to: number;
}

/** Indices of the anchor corners, in outline order. */
export function anchorIndices(outline: Outline): number[] {
  return outline.vertices.flatMap((v, i) => (v.anchor ? [i] : []));
}

function inletsBetween(outline: Outline, from: number, to: number): number {
  const n = outline.edges.length;
  let count = 0;
  for (let k = from; k !== to; k = (k + 1) % n) if (outline.edges[k].role === 'inlet') count++;
  return count;
}

/** The two anchors, ordered so the pocket runs forward from `from`. Throws PartsError if they do not split the outline so. */
export function pocketAnchors(outline: Outline): PocketAnchors {
  const marked = anchorIndices(outline);
  if (marked.length !== 2) {
    throw new PartsError(
      'anchors', 'outline',
      `The seat and test bore join the outline at two anchor corners, one each side of the valve; the outline has ${marked.length}.`,
    );
  }
  const [i, j] = marked;
  const ahead = inletsBetween(outline, i, j), behind = inletsBetween(outline, j, i);
  if ((ahead === 0) === (behind === 0)) {
    throw new PartsError(
      'anchors', 'outline',
      ahead === 0
        ? 'The outline has no inlet, so the anchors cannot tell the port from the valve pocket; mark the inlet edge.'
        : 'The anchor corners have inlet edges on both sides; put both anchors between the inlet and the valve, one each side.',
    );
  }
  return ahead === 0 ? { from: i, to: j } : { from: j, to: i };
}

/**
 * The outline with the pocket's corners and edges replaced by `stretch` (corners strictly between the anchors, and
 * the edges leaving `from` and each new corner). When the pocket runs past corner 0, the result starts at `to`.
 */
export function splicePocket(outline: Outline, anchors: PocketAnchors, stretch: { vertices: Vertex[]; edges: Edge[] }): Outline {
  const { from, to } = anchors;
  const { vertices, edges } = outline;
  if (from < to) {
    return {
      vertices: [...vertices.slice(0, from + 1), ...stretch.vertices, ...vertices.slice(to)],
      edges: [...edges.slice(0, from), ...stretch.edges, ...edges.slice(to)],
    };
  }
  return {
    vertices: [...vertices.slice(to, from + 1), ...stretch.vertices],
    edges: [...edges.slice(to, from), ...stretch.edges],
  };
}

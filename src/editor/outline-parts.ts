/** Looking up a vertex or edge of an outline by index, with a plain message when it is not there. */

import type { Edge, Outline, Section, Vertex } from '../document/types.ts';
import { EditError } from './errors.ts';
import { outlineName } from './section-access.ts';

export function requireVertex(section: Section, outline: Outline, island: number | undefined, index: number, edit: string): Vertex {
  const vertex = outline.vertices[index];
  if (vertex === undefined) {
    throw new EditError(edit, `There is no corner ${index + 1}: ${outlineName(section, island)} has ${outline.vertices.length}.`);
  }
  return vertex;
}

export function requireEdge(section: Section, outline: Outline, island: number | undefined, index: number, edit: string): Edge {
  const edge = outline.edges[index];
  if (edge === undefined) {
    throw new EditError(edit, `There is no edge ${index + 1}: ${outlineName(section, island)} has ${outline.edges.length}.`);
  }
  return edge;
}

/** "edge 3 of the section outline", for messages. */
export function edgeName(section: Section, island: number | undefined, index: number): string {
  return `edge ${index + 1} of ${outlineName(section, island)}`;
}

/** "a line", "an arc", "a curve". */
export function kindName(edge: Edge): string {
  return edge.kind === 'arc' ? 'an arc' : `a ${edge.kind}`;
}

/** Edits of the points of the active section: move a point, insert or delete a corner, set a corner's fillet radius. */

import { z } from 'zod';
import { MAX_FILLET_RADIUS } from '../document/limits.ts';
import type { Outline, PortDocument, Vertex } from '../document/types.ts';
import { edgeArgs, finite, pointRefSchema, pointSchema, vertexArgs } from './args.ts';
import { checkEdgeShape, edgeEnds } from './edge-shape.ts';
import { EditError } from './errors.ts';
import { mergeEdges } from './merge-edges.ts';
import { edgeName, kindName, requireEdge, requireVertex } from './outline-parts.ts';
import { activeSection, outlineName, outlineOf, replaceAt, withActiveSection, withOutline, wrap } from './section-access.ts';
import { splitEdge } from './split-edge.ts';
import { samePlace } from './vec.ts';

export const movePointArgs = z.strictObject({ point: pointRefSchema, to: pointSchema });
export type MovePointArgs = z.infer<typeof movePointArgs>;

/** Moves a corner, an arc's through point or a curve's via point to `to` (document units). */
export function movePoint(doc: PortDocument, { point, to }: MovePointArgs): PortDocument {
  const edit = 'movePoint';
  const section = activeSection(doc, edit);
  const outline = outlineOf(section, point.island, edit);
  let next: Outline;
  let touched: number[];
  if (point.kind === 'vertex') {
    const vertex = requireVertex(section, outline, point.island, point.vertex, edit);
    if (vertex.at[0] === to[0] && vertex.at[1] === to[1]) return doc;
    next = { ...outline, vertices: replaceAt(outline.vertices, point.vertex, { ...vertex, at: to }) };
    touched = [wrap(point.vertex - 1, outline.vertices.length), point.vertex];
  } else {
    const edge = requireEdge(section, outline, point.island, point.edge, edit);
    const where = edgeName(section, point.island, point.edge);
    if (point.kind === 'through') {
      if (edge.kind !== 'arc') throw new EditError(edit, `The ${where} is ${kindName(edge)}, not an arc: it has no through point.`);
      next = { ...outline, edges: replaceAt(outline.edges, point.edge, { ...edge, through: to }) };
    } else {
      if (edge.kind !== 'curve') throw new EditError(edit, `The ${where} is ${kindName(edge)}, not a curve: it has no via points.`);
      if (point.via >= edge.via.length) throw new EditError(edit, `The curve ${where} has ${edge.via.length} via points, not ${point.via + 1}.`);
      next = { ...outline, edges: replaceAt(outline.edges, point.edge, { ...edge, via: replaceAt(edge.via, point.via, to) }) };
    }
    touched = [point.edge];
  }
  for (const k of touched) checkEdgeShape(section, next, point.island, k, edit);
  return withActiveSection(doc, edit, withOutline(section, point.island, next));
}

export const insertVertexArgs = z.strictObject({ ...edgeArgs, at: pointSchema });
export type InsertVertexArgs = z.infer<typeof insertVertexArgs>;

/**
 * Splits edge `edge` with a new corner at the point of the edge nearest `at` (a curve at its nearest via point);
 * see splitEdge. The new corner has index edge + 1; both pieces keep the edge's role and wall name.
 */
export function insertVertex(doc: PortDocument, { edge, island, at }: InsertVertexArgs): PortDocument {
  const edit = 'insertVertex';
  const section = activeSection(doc, edit);
  const outline = outlineOf(section, island, edit);
  const old = requireEdge(section, outline, island, edge, edit);
  const [start, end] = edgeEnds(outline, edge);
  const split = splitEdge(start, old, end, at);
  if (samePlace(split.vertex, start) || samePlace(split.vertex, end)) {
    throw new EditError(edit, `Pick a point further from the ends of ${edgeName(section, island, edge)}.`);
  }
  const vertices = outline.vertices.slice();
  vertices.splice(edge + 1, 0, { at: split.vertex });
  const edges = outline.edges.slice();
  edges.splice(edge, 1, split.first, split.second);
  const next: Outline = { vertices, edges };
  checkEdgeShape(section, next, island, edge, edit);
  checkEdgeShape(section, next, island, edge + 1, edit);
  return withActiveSection(doc, edit, withOutline(section, island, next));
}

export const deleteVertexArgs = z.strictObject(vertexArgs);
export type DeleteVertexArgs = z.infer<typeof deleteVertexArgs>;

/**
 * Removes a corner and joins its two edges into one (see mergeEdges); the first edge's role and name stay.
 * An anchor corner (where the generated seat and bore join the port) is refused: an outline has none or two.
 */
export function deleteVertex(doc: PortDocument, { vertex, island }: DeleteVertexArgs): PortDocument {
  const edit = 'deleteVertex';
  const section = activeSection(doc, edit);
  const outline = outlineOf(section, island, edit);
  const corner = requireVertex(section, outline, island, vertex, edit);
  if (corner.anchor) {
    throw new EditError(edit, 'This corner is an anchor, where the seat and test bore join the port; it cannot be deleted. Move it instead.');
  }
  const n = outline.vertices.length;
  if (n <= 3) {
    throw new EditError(edit, `An outline needs at least 3 corners; ${outlineName(section, island)} has ${n}.`);
  }
  const before = wrap(vertex - 1, n);
  const merged = mergeEdges(outline.vertices[before].at, outline.edges[before], corner.at, outline.edges[vertex], outline.vertices[wrap(vertex + 1, n)].at);
  const edges = outline.edges.slice();
  edges[before] = merged;
  edges.splice(vertex, 1);
  const vertices = outline.vertices.filter((_, k) => k !== vertex);
  const next: Outline = { vertices, edges };
  checkEdgeShape(section, next, island, before < vertex ? before : before - 1, edit);
  return withActiveSection(doc, edit, withOutline(section, island, next));
}

export const setFilletRadiusArgs = z.strictObject({
  ...vertexArgs,
  radius: finite
    .min(0, 'A fillet radius cannot be negative; use 0 for a sharp corner.')
    .max(MAX_FILLET_RADIUS, `A fillet radius can be at most ${MAX_FILLET_RADIUS}.`),
});
export type SetFilletRadiusArgs = z.infer<typeof setFilletRadiusArgs>;

/**
 * Sets the fillet radius (document units; its bounds are checked by setFilletRadiusArgs) of a corner; 0 makes it sharp (the field is then left out).
 * On the corner where the short side turns into the seat this is the short-side radius.
 */
export function setFilletRadius(doc: PortDocument, { vertex, island, radius }: SetFilletRadiusArgs): PortDocument {
  const edit = 'setFilletRadius';
  const section = activeSection(doc, edit);
  const outline = outlineOf(section, island, edit);
  const old = requireVertex(section, outline, island, vertex, edit);
  if ((old.filletRadius ?? 0) === radius) return doc;
  const { filletRadius: _old, ...sharp } = old;
  const next: Vertex = radius === 0 ? sharp : { ...old, filletRadius: radius };
  return withActiveSection(doc, edit, withOutline(section, island, { ...outline, vertices: replaceAt(outline.vertices, vertex, next) }));
}

/** Edits of one edge of the active section: its role, its wall name and its kind (line, arc, curve). */

import { z } from 'zod';
import type { Edge, Outline, PortDocument, Point, Section } from '../document/types.ts';
import { edgeRoleSchema } from '../document/schema.ts';
import { signedArea } from '../geometry/area.ts';
import { edgeArgs, pointSchema } from './args.ts';
import { checkEdgeShape, edgeEnds } from './edge-shape.ts';
import { arcLike, curveLike, lineLike } from './edge-kinds.ts';
import { EditError } from './errors.ts';
import { typedName } from './names.ts';
import { edgeName, requireEdge } from './outline-parts.ts';
import { activeSection, outlineOf, replaceAt, withActiveSection, withOutline } from './section-access.ts';
import { add, dot, lerp, scale, sub, unit } from './vec.ts';

/** How far a new arc bulges from its chord, as a fraction of the chord: a visible bow the porter then drags. */
export const NEW_ARC_BULGE = 0.1;

type EdgeChange = (edge: Edge, ctx: { section: Section; outline: Outline; where: string }) => Edge;

/** Replaces edge `index` by `change(old)`; the same document when the change returns the old edge. */
function changeEdge(doc: PortDocument, edit: string, index: number, island: number | undefined, change: EdgeChange): PortDocument {
  const section = activeSection(doc, edit);
  const outline = outlineOf(section, island, edit);
  const old = requireEdge(section, outline, island, index, edit);
  const edge = change(old, { section, outline, where: edgeName(section, island, index) });
  if (edge === old) return doc;
  const next: Outline = { ...outline, edges: replaceAt(outline.edges, index, edge) };
  checkEdgeShape(section, next, island, index, edit);
  return withActiveSection(doc, edit, withOutline(section, island, next));
}

export const setEdgeRoleArgs = z.strictObject({ ...edgeArgs, role: edgeRoleSchema });
export type SetEdgeRoleArgs = z.infer<typeof setEdgeRoleArgs>;

/** Marks an edge wall, inlet or outlet. Island edges are always walls. Leaving "wall" drops the wall name. */
export function setEdgeRole(doc: PortDocument, { edge, island, role }: SetEdgeRoleArgs): PortDocument {
  return changeEdge(doc, 'setEdgeRole', edge, island, (old, { where }) => {
    if (old.role === role) return old;
    if (island !== undefined) throw new EditError('setEdgeRole', `Islands are walls (the flow goes round them), so ${where} cannot be an ${role}.`);
    const { wallName: _name, ...rest } = old;
    return role === 'wall' ? { ...old, role } : { ...rest, role };
  });
}

export const setWallNameArgs = z.strictObject({ ...edgeArgs, name: z.string() });
export type SetWallNameArgs = z.infer<typeof setWallNameArgs>;

/** Names a wall, e.g. "short side" (see WALL_NAMES); an empty name removes it. Surrounding spaces are dropped. */
export function setWallName(doc: PortDocument, { edge, island, name }: SetWallNameArgs): PortDocument {
  const edit = 'setWallName';
  const trimmed = typedName(name, 'wall', edit);
  return changeEdge(doc, edit, edge, island, (old, { where }) => {
    if (old.role !== 'wall') throw new EditError(edit, `The ${where} is an ${old.role}; only walls carry a name.`);
    if ((old.wallName ?? '') === trimmed) return old;
    const { wallName: _name, ...rest } = old;
    return trimmed === '' ? rest : { ...old, wallName: trimmed };
  });
}

export const makeArcArgs = z.strictObject({ ...edgeArgs, through: pointSchema.optional() });
export type MakeArcArgs = z.infer<typeof makeArcArgs>;

/**
 * Makes an edge an arc through `through`. Without it: a line bows out of the outline by NEW_ARC_BULGE of
 * its length at the middle; a curve keeps its via point nearest the middle; an arc stays as it is.
 */
export function makeArc(doc: PortDocument, { edge, island, through }: MakeArcArgs): PortDocument {
  return changeEdge(doc, 'makeArc', edge, island, (old, { outline }) => {
    if (through !== undefined) return arcLike(old, through);
    if (old.kind === 'arc') return old;
    const [start, end] = edgeEnds(outline, edge);
    if (old.kind === 'curve' && old.via.length > 0) return arcLike(old, middlemost(old.via, start, end));
    return arcLike(old, bowOut(outline, start, end));
  });
}

export const makeCurveArgs = z.strictObject({ ...edgeArgs, via: z.array(pointSchema).min(1, 'A curve needs at least one via point.').optional() });
export type MakeCurveArgs = z.infer<typeof makeCurveArgs>;

/** Makes an edge a curve through `via`. Without it: a line gets one via at its middle, an arc its through point. */
export function makeCurve(doc: PortDocument, { edge, island, via }: MakeCurveArgs): PortDocument {
  return changeEdge(doc, 'makeCurve', edge, island, (old, { outline }) => {
    if (via !== undefined) return curveLike(old, via);
    if (old.kind === 'curve') return old;
    if (old.kind === 'arc') return curveLike(old, [old.through]);
    const [start, end] = edgeEnds(outline, edge);
    return curveLike(old, [lerp(start, end, 0.5)]);
  });
}

export const makeLineArgs = z.strictObject(edgeArgs);
export type MakeLineArgs = z.infer<typeof makeLineArgs>;

/** Makes an edge straight, dropping its through or via points. */
export function makeLine(doc: PortDocument, { edge, island }: MakeLineArgs): PortDocument {
  return changeEdge(doc, 'makeLine', edge, island, (old) => (old.kind === 'line' ? old : lineLike(old)));
}

/** The chord's middle, moved NEW_ARC_BULGE of the chord away from the outline's inside. */
function bowOut(outline: Outline, start: Point, end: Point): Point {
  const along = sub(end, start);
  const right: Point = unit([along[1], -along[0]]);
  // Counter-clockwise outline: the inside is on the left of each edge, so outward is right.
  const corners = Float64Array.from(outline.vertices.flatMap((v) => v.at));
  const outward = signedArea(corners) >= 0 ? right : scale(right, -1);
  return add(lerp(start, end, 0.5), scale(outward, NEW_ARC_BULGE * Math.hypot(along[0], along[1])));
}

/** The via point nearest the chord's perpendicular bisector. */
function middlemost(via: readonly Point[], start: Point, end: Point): Point {
  const mid = lerp(start, end, 0.5), along = sub(end, start);
  const off = (p: Point) => Math.abs(dot(sub(p, mid), along));
  return via.reduce((best, p) => (off(p) < off(best) ? p : best));
}

/**
 * The edit a drag means at a pointer position: move the held point (snapped), set the held corner's radius, or move
 * the valve (its lift, or its axis with the seat and test bore).
 */

import type { Point, ValvePart } from '../document/types.ts';
import type { EditRequest } from './edits.ts';
import { radiusFromHandleDrag } from './fillet-handle.ts';
import { axisFromDrag, liftFromDrag } from './part-handles.ts';
import { islandPart, type FilletRef, type PartHandleRef, type PointRef } from './refs.ts';
import { roundToStep, snapPoint, type SnapResult } from './snap.ts';
import type { ToolContext } from './tool-context.ts';

/** A drag of a point or a fillet handle. */
export interface OutlineGrip {
  readonly ref: PointRef | FilletRef;
  /** Handle position minus pointer position at the press, document units: the handle does not jump to the pointer. */
  readonly offset: Point;
  /** Points the held point may line up with while snapping. */
  readonly neighbours: readonly Point[];
}

/** A drag of the valve's lift or axis handle: it moves the valve by how far the pointer has moved since the press. */
export interface PartGrip {
  readonly ref: PartHandleRef;
  /** The valve part when it was grabbed. */
  readonly valve: ValvePart;
  /** Pointer at the press, document units. */
  readonly pressedAt: Point;
}

/** What a drag holds. */
export type DragGrip = OutlineGrip | PartGrip;

/** A drag's edit at one pointer position, and what the point snapped to (absent when snapping is off or for a radius). */
export interface DragEdit {
  readonly edit: EditRequest;
  readonly snapped?: SnapResult;
}

function isPartGrip(grip: DragGrip): grip is PartGrip {
  return 'valve' in grip;
}

/**
 * movePoint to the pointer plus the grab offset, snapped when snapping is on; for a fillet handle,
 * setFilletRadius with the radius the position means (rounded to the grid step when snapping is on);
 * for the valve's handles, setLift or setPart (valve axis), see partDragEdit.
 */
export function dragEdit(grip: DragGrip, pointer: Point, ctx: ToolContext): DragEdit {
  if (isPartGrip(grip)) return partDragEdit(grip, pointer, ctx);
  const held: Point = [pointer[0] + grip.offset[0], pointer[1] + grip.offset[1]];
  const snap = ctx.snap ?? null;
  if (grip.ref.kind === 'fillet') {
    const { vertex, island } = grip.ref;
    const raw = radiusFromHandleDrag(ctx.section, vertex, held, island) ?? 0;
    const step = snap?.gridStep ?? 0;
    const radius = step > 0 ? Math.max(0, roundToStep(raw, step)) : raw;
    return { edit: { name: 'setFilletRadius', args: { vertex, ...islandPart(island), radius } } };
  }
  if (snap === null) return { edit: { name: 'movePoint', args: { point: grip.ref, to: held } } };
  const snapped = snapPoint(held, snap, grip.neighbours);
  return { edit: { name: 'movePoint', args: { point: grip.ref, to: snapped.at } }, snapped };
}

/**
 * The lift handle sets the lift from the pointer's travel along the valve axis (across it counts for nothing),
 * rounded to the grid step when snapping is on and held to 0 .. MAX_LIFT_SHARE x diameter. The axis handle moves the
 * gauge-line centre by the pointer's travel, snapped to the grid when snapping is on; the seat and bore follow it.
 */
function partDragEdit(grip: PartGrip, pointer: Point, ctx: ToolContext): DragEdit {
  const moved: Point = [pointer[0] - grip.pressedAt[0], pointer[1] - grip.pressedAt[1]];
  const snap = ctx.snap ?? null;
  if (grip.ref.kind === 'lift') return { edit: { name: 'setLift', args: { lift: liftFromDrag(grip.valve, moved, snap?.gridStep ?? 0) } } };
  const axis = axisFromDrag(grip.valve, moved);
  if (snap === null) return { edit: { name: 'setPart', args: { part: 'valve', values: { axis } } } };
  const snapped = snapPoint([axis.x, axis.y], snap);
  return { edit: { name: 'setPart', args: { part: 'valve', values: { axis: { x: snapped.at[0], y: snapped.at[1] } } } }, snapped };
}

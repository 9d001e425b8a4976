/** The edit a drag means at a pointer position: move the held point (snapped), or set the held corner's radius. */

import type { Point } from '../document/types.ts';
import type { EditRequest } from './edits.ts';
import { radiusFromHandleDrag } from './fillet-handle.ts';
import { islandPart, type PointRef } from './refs.ts';
import { roundToStep, snapPoint, type SnapResult } from './snap.ts';
import type { ToolContext } from './tool-context.ts';

/** What a drag holds. */
export interface DragGrip {
  readonly ref: PointRef | { readonly kind: 'fillet'; readonly vertex: number; readonly island?: number };
  /** Handle position minus pointer position at the press, document units: the handle does not jump to the pointer. */
  readonly offset: Point;
  /** Points the held point may line up with while snapping. */
  readonly neighbours: readonly Point[];
}

/** A drag's edit at one pointer position, and what the point snapped to (absent when snapping is off or for a radius). */
export interface DragEdit {
  readonly edit: EditRequest;
  readonly snapped?: SnapResult;
}

/**
 * movePoint to the pointer plus the grab offset, snapped when snapping is on; for a fillet handle,
 * setFilletRadius with the radius the position means (rounded to the grid step when snapping is on).
 */
export function dragEdit(grip: DragGrip, pointer: Point, ctx: ToolContext): DragEdit {
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

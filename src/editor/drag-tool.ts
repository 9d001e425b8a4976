/**
 * The select-and-drag tool as a small state machine: idle -> pointing (pointer down) -> dragging (moved past
 * DRAG_THRESHOLD_PX) -> idle (released). Events in, actions out; it never touches the DOM or the document.
 */

import type { Point } from '../document/types.ts';
import type { EditRequest } from './edits.ts';
import { dragEdit, type DragEdit, type DragGrip } from './drag-edit.ts';
import { hitTest, type Hit } from './hit-test.ts';
import { islandPart, isPartHandle, type HandleRef } from './refs.ts';
import { editForSelection } from './selection-edits.ts';
import { findShortcut, type CommandName, type KeyPress } from './shortcuts.ts';
import type { ToolContext } from './tool-context.ts';
import { snapNeighbours, type SnapResult } from './snap.ts';

export type { ToolContext } from './tool-context.ts';

/** How far (CSS pixels) the pointer must travel before a press becomes a drag; less is a click. */
export const DRAG_THRESHOLD_PX = 4;

export type ToolState =
  | { readonly mode: 'idle'; readonly selection: HandleRef | null }
  | {
    readonly mode: 'pointing'; readonly selection: HandleRef | null;
    /** What was under the pointer when it went down (null: empty space). */
    readonly hit: Hit | null; readonly downScreen: Point; readonly downAt: Point; readonly insert: boolean;
  }
  | { readonly mode: 'dragging'; readonly selection: HandleRef | null; readonly grip: DragGrip; readonly last: EditRequest };

/** `at`: document units; `screen`: CSS pixels. `insert`: the insert modifier is held or insert mode is on. */
export type ToolEvent =
  | { readonly type: 'pointer-down'; readonly at: Point; readonly screen: Point; readonly insert?: boolean }
  | { readonly type: 'pointer-move'; readonly at: Point; readonly screen: Point }
  | { readonly type: 'pointer-up'; readonly at: Point; readonly screen: Point }
  | { readonly type: 'pointer-cancel' }
  | { readonly type: 'key'; readonly press: KeyPress };

/**
 * What the app should do. A drag is drag-start, drag-move..., then drag-end (commit as one undo step) or
 * drag-cancel (go back to the document before drag-start). `edit` is a one-step edit; `hint` a message to show.
 */
export type ToolAction =
  | { readonly type: 'select'; readonly selection: HandleRef | null }
  | DragAction
  | { readonly type: 'drag-cancel' }
  | { readonly type: 'edit'; readonly edit: EditRequest }
  | { readonly type: 'command'; readonly name: CommandName }
  | { readonly type: 'hint'; readonly message: string };

/** One step of a drag: the edit for the pointer's position, and what the point snapped to (when snapping is on). */
export interface DragAction {
  readonly type: 'drag-start' | 'drag-move' | 'drag-end';
  readonly edit: EditRequest;
  readonly snapped?: SnapResult;
}

export interface ToolStep {
  readonly state: ToolState;
  readonly actions: readonly ToolAction[];
}

export const IDLE: ToolState = { mode: 'idle', selection: null };

/** The tool's next state and actions for one event. `ctx.section` is the active section as it is now. */
export function stepTool(state: ToolState, event: ToolEvent, ctx: ToolContext): ToolStep {
  switch (event.type) {
    case 'pointer-down': return state.mode === 'idle' ? pointerDown(state.selection, event, ctx) : { state, actions: [] };
    case 'pointer-move': return pointerMove(state, event.at, event.screen, ctx);
    case 'pointer-up': return pointerUp(state, event.at, ctx);
    case 'pointer-cancel': return cancel(state);
    case 'key': return keyPress(state, event.press);
  }
}

function pointerDown(selection: HandleRef | null, event: Extract<ToolEvent, { type: 'pointer-down' }>, ctx: ToolContext): ToolStep {
  const hit = hitTest(ctx.section, event.at, ctx.tolerance, { parts: ctx.parts });
  const insert = event.insert ?? false;
  const state: ToolState = { mode: 'pointing', selection, hit, downScreen: event.screen, downAt: event.at, insert };
  // An insert-click on an edge selects the new corner on release; anything else hit is selected at once.
  if (hit === null || (insert && hit.ref.kind === 'edge')) return { state, actions: [] };
  return { state: { ...state, selection: hit.ref }, actions: [{ type: 'select', selection: hit.ref }] };
}

function pointerMove(state: ToolState, at: Point, screen: Point, ctx: ToolContext): ToolStep {
  if (state.mode === 'dragging') {
    const step = dragEdit(state.grip, at, ctx);
    // Snapped to the same place again: nothing new to solve.
    if (JSON.stringify(step.edit) === JSON.stringify(state.last)) return { state, actions: [] };
    return { state: { ...state, last: step.edit }, actions: [dragAction('drag-move', step)] };
  }
  if (state.mode !== 'pointing') return { state, actions: [] };
  if (Math.hypot(screen[0] - state.downScreen[0], screen[1] - state.downScreen[1]) < DRAG_THRESHOLD_PX) return { state, actions: [] };
  const grip = gripOf(state.hit, state.downAt, ctx);
  // Pressing on an edge or on nothing and moving away is not ours (the app may pan).
  if (grip === null) return { state: { mode: 'idle', selection: state.selection }, actions: [] };
  const step = dragEdit(grip, at, ctx);
  return { state: { mode: 'dragging', selection: state.selection, grip, last: step.edit }, actions: [dragAction('drag-start', step)] };
}

/**
 * What a drag of `hit` holds: the handle, where on it it was grabbed, and the points it may line up with; for the
 * valve's handles, the valve as grabbed and where the press was.
 */
function gripOf(hit: Hit | null, downAt: Point, ctx: ToolContext): DragGrip | null {
  if (hit === null || hit.ref.kind === 'edge') return null;
  if (isPartHandle(hit.ref)) {
    const valve = ctx.parts?.valve;
    return valve === undefined ? null : { ref: hit.ref, valve, pressedAt: downAt };
  }
  const offset: Point = [hit.at[0] - downAt[0], hit.at[1] - downAt[1]];
  if (hit.ref.kind === 'fillet') return { ref: hit.ref, offset, neighbours: [] };
  return { ref: hit.ref, offset, neighbours: snapNeighbours(ctx.section, hit.ref) };
}

function pointerUp(state: ToolState, at: Point, ctx: ToolContext): ToolStep {
  if (state.mode === 'dragging') {
    return { state: { mode: 'idle', selection: state.selection }, actions: [dragAction('drag-end', dragEdit(state.grip, at, ctx))] };
  }
  if (state.mode !== 'pointing') return { state, actions: [] };
  const { hit } = state;
  if (hit !== null && hit.ref.kind === 'edge' && state.insert) {
    const island = islandPart(hit.ref.island);
    const selection: HandleRef = { kind: 'vertex', vertex: hit.ref.edge + 1, ...island };
    return {
      state: { mode: 'idle', selection },
      actions: [{ type: 'edit', edit: { name: 'insertVertex', args: { edge: hit.ref.edge, ...island, at: hit.at } } }, { type: 'select', selection }],
    };
  }
  if (hit === null && state.selection !== null) return { state: IDLE, actions: [{ type: 'select', selection: null }] };
  return { state: { mode: 'idle', selection: state.selection }, actions: [] };
}

function dragAction(type: DragAction['type'], step: DragEdit): DragAction {
  return step.snapped === undefined ? { type, edit: step.edit } : { type, edit: step.edit, snapped: step.snapped };
}

function cancel(state: ToolState): ToolStep {
  const idle: ToolState = { mode: 'idle', selection: state.selection };
  return { state: idle, actions: state.mode === 'dragging' ? [{ type: 'drag-cancel' }] : [] };
}

function keyPress(state: ToolState, press: KeyPress): ToolStep {
  const shortcut = findShortcut(press);
  if (shortcut === undefined) return { state, actions: [] };
  const { run } = shortcut;
  if ('command' in run && run.command === 'cancel') {
    if (state.mode !== 'idle') return cancel(state);
    return state.selection === null ? { state, actions: [] } : { state: IDLE, actions: [{ type: 'select', selection: null }] };
  }
  // Other keys wait until the pointer is up: an edit in mid-drag would fight the drag.
  if (state.mode !== 'idle') return { state, actions: [] };
  if ('command' in run) return { state, actions: [{ type: 'command', name: run.command }] };
  const result = editForSelection(run, state.selection);
  if (result.kind === 'hint') return { state, actions: [{ type: 'hint', message: result.message }] };
  return {
    state: { mode: 'idle', selection: result.selectionAfter },
    actions: [{ type: 'edit', edit: result.edit }, { type: 'select', selection: result.selectionAfter }],
  };
}

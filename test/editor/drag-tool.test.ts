import { describe, expect, it } from 'vitest';
import type { Point } from '../../src/document/types.ts';
import { IDLE, stepTool, type DragAction, type ToolAction, type ToolContext, type ToolEvent, type ToolState } from '../../src/editor/drag-tool.ts';
import { applyEdit } from '../../src/editor/edits.ts';
import { filletHandlePosition, radiusFromHandleDrag } from '../../src/editor/fillet-handle.ts';
import { active, boxDocument, boxSection } from './fixtures.ts';

const ctx: ToolContext = { section: boxSection(), tolerance: 1 };

/** Runs events through the tool; returns the final state and every action, in order. */
function run(events: ToolEvent[], context: ToolContext = ctx, start: ToolState = IDLE): { state: ToolState; actions: ToolAction[] } {
  let state = start;
  const actions: ToolAction[] = [];
  for (const e of events) {
    const step = stepTool(state, e, context);
    state = step.state;
    actions.push(...step.actions);
  }
  return { state, actions };
}

// 10 screen pixels per document unit, y down on screen: screen = (10 x, -10 y).
const down = (at: Point, insert = false): ToolEvent => ({ type: 'pointer-down', at, screen: [10 * at[0], -10 * at[1]], insert });
const move = (at: Point): ToolEvent => ({ type: 'pointer-move', at, screen: [10 * at[0], -10 * at[1]] });
const up = (at: Point): ToolEvent => ({ type: 'pointer-up', at, screen: [10 * at[0], -10 * at[1]] });
const key = (k: string, ctrlKey = false): ToolEvent => ({ type: 'key', press: { key: k, ctrlKey } });

describe('drag tool: click versus drag', () => {
  it('a click on a corner selects it and edits nothing', () => {
    const { state, actions } = run([down([40.2, 0.1]), move([40.25, 0.1]), up([40.25, 0.1])]);
    expect(actions).toEqual([{ type: 'select', selection: { kind: 'vertex', vertex: 1 } }]);
    expect(state).toEqual({ mode: 'idle', selection: { kind: 'vertex', vertex: 1 } });
  });

  it('a drag goes idle -> pointing -> dragging -> idle with drag-start, drag-move, drag-end', () => {
    let state: ToolState = IDLE;
    const modes: string[] = [];
    const actions: ToolAction[] = [];
    for (const e of [down([40.2, 0.1]), move([40.4, 0.1]), move([41.2, 1.1]), move([42.2, 2.1]), up([43.2, 2.1])]) {
      const step = stepTool(state, e, ctx);
      state = step.state;
      modes.push(state.mode);
      actions.push(...step.actions);
    }
    // The 2-pixel wiggle stays a press; the handle keeps its grab offset (-0.2, -0.1) from the pointer.
    expect(modes).toEqual(['pointing', 'pointing', 'dragging', 'dragging', 'idle']);
    const point = { kind: 'vertex', vertex: 1 };
    expect(actions.map((a) => a.type)).toEqual(['select', 'drag-start', 'drag-move', 'drag-end']);
    const targets = actions.slice(1).map((a) => ('edit' in a && a.edit.name === 'movePoint' ? a.edit.args : null));
    expect(targets[0]?.point).toEqual(point);
    [[41, 1], [42, 2], [43, 2]].forEach((want, k) => {
      expect(targets[k]!.to[0]).toBeCloseTo(want[0], 12);
      expect(targets[k]!.to[1]).toBeCloseTo(want[1], 12);
    });
    expect(state.selection).toEqual(point);
  });

  it('snaps while dragging and says to what; a move that snaps to the same place emits nothing', () => {
    const snapping: ToolContext = { ...ctx, snap: { gridStep: 0.5, alignTolerance: 0.3 } };
    const { actions } = run([down([40, 30]), move([41.13, 31.9]), move([41.2, 31.95])], snapping);
    expect(actions.map((a) => a.type)).toEqual(['select', 'drag-start']);
    const start = actions[1] as DragAction;
    // Neighbours of corner 2 are (40, 0) and (0, 30): both more than 0.3 away in x and y, so both go to the grid.
    expect(start.edit).toEqual({ name: 'movePoint', args: { point: { kind: 'vertex', vertex: 2 }, to: [41, 32] } });
    expect(start.snapped?.x).toEqual({ kind: 'grid', step: 0.5 });
    const aligned = run([down([40, 30]), move([39.8, 20])], snapping).actions[1] as DragAction;
    expect(aligned.edit.args).toEqual({ point: { kind: 'vertex', vertex: 2 }, to: [40, 20] });
    expect(aligned.snapped?.x).toEqual({ kind: 'aligned', with: [40, 0] });
  });

  it('dragging a fillet handle sets the radius the position means', () => {
    const handle = filletHandlePosition(ctx.section, 1)!;
    const target: Point = [handle[0] - 1, handle[1] + 1];
    const { actions } = run([down(handle), move(target), up(target)]);
    expect(actions[0]).toEqual({ type: 'select', selection: { kind: 'fillet', vertex: 1 } });
    const end = actions[actions.length - 1] as DragAction;
    expect(end.edit.name).toBe('setFilletRadius');
    expect(end.edit.args).toEqual({ vertex: 1, radius: radiusFromHandleDrag(ctx.section, 1, target) });
    // [derived] 90 degree corner: moving sqrt 2 further along the bisector adds sqrt 2 / (sqrt 2 - 1) to the radius.
    expect((end.edit.args as { radius: number }).radius).toBeCloseTo(3 + Math.SQRT2 / (Math.SQRT2 - 1), 9);
    const snapped = run([down(handle), move(target)], { ...ctx, snap: { gridStep: 0.5 } }).actions[1];
    expect(snapped).toEqual({ type: 'drag-start', edit: { name: 'setFilletRadius', args: { vertex: 1, radius: 6.5 } } });
  });

  it('cancels a drag on Escape or pointer-cancel', () => {
    const dragging = run([down([40, 30]), move([45, 35])]).state;
    expect(dragging.mode).toBe('dragging');
    expect(run([key('Escape')], ctx, dragging).actions).toEqual([{ type: 'drag-cancel' }]);
    expect(run([{ type: 'pointer-cancel' }], ctx, dragging)).toEqual({
      state: { mode: 'idle', selection: { kind: 'vertex', vertex: 2 } }, actions: [{ type: 'drag-cancel' }],
    });
  });
});

describe('drag tool: edges, empty space and keys', () => {
  it('an insert-click on an edge inserts a corner there and selects it', () => {
    const { state, actions } = run([down([12, 0.4], true), up([12, 0.4])]);
    expect(actions).toEqual([
      { type: 'edit', edit: { name: 'insertVertex', args: { edge: 0, at: [12, 0] } } },
      { type: 'select', selection: { kind: 'vertex', vertex: 1 } },
    ]);
    expect(state.selection).toEqual({ kind: 'vertex', vertex: 1 });
    const edit = actions[0] as Extract<ToolAction, { type: 'edit' }>;
    expect(active(applyEdit(boxDocument(), edit.edit.name, edit.edit.args)).outline.vertices[1].at).toEqual([12, 0]);
  });

  it('a plain click selects an edge; pressing on it and moving starts no drag', () => {
    expect(run([down([12, 0.4]), up([12, 0.4])]).actions).toEqual([{ type: 'select', selection: { kind: 'edge', edge: 0 } }]);
    const pressed = run([down([12, 0.4]), move([14, 3]), up([14, 3])]);
    expect(pressed.actions.map((a) => a.type)).toEqual(['select']);
    expect(pressed.state.mode).toBe('idle');
  });

  it('a click on empty space clears the selection', () => {
    const selected: ToolState = { mode: 'idle', selection: { kind: 'vertex', vertex: 1 } };
    expect(run([down([30, 20]), up([30, 20])], ctx, selected)).toEqual({ state: IDLE, actions: [{ type: 'select', selection: null }] });
  });

  it('Delete deletes the selected corner; edge keys act on the selected edge or point', () => {
    const corner: ToolState = { mode: 'idle', selection: { kind: 'vertex', vertex: 2, island: 0 } };
    expect(run([key('Delete')], ctx, corner).actions).toEqual([
      { type: 'edit', edit: { name: 'deleteVertex', args: { vertex: 2, island: 0 } } },
      { type: 'select', selection: null },
    ]);
    const through: ToolState = { mode: 'idle', selection: { kind: 'through', edge: 2 } };
    expect(run([key('n')], ctx, through).actions).toEqual([
      { type: 'edit', edit: { name: 'setEdgeRole', args: { edge: 2, role: 'inlet' } } },
      { type: 'select', selection: { kind: 'edge', edge: 2 } },
    ]);
    expect(run([key('a')], ctx, { mode: 'idle', selection: { kind: 'edge', edge: 0 } }).actions[0])
      .toEqual({ type: 'edit', edit: { name: 'makeArc', args: { edge: 0 } } });
  });

  it('hints when the selection does not fit the key, runs commands, and holds keys during a drag', () => {
    expect(run([key('Delete')], ctx, { mode: 'idle', selection: { kind: 'edge', edge: 0 } }).actions)
      .toEqual([{ type: 'hint', message: 'Select a corner first (click on it).' }]);
    expect(run([key('l')]).actions).toEqual([{ type: 'hint', message: 'Select an edge first (click on it).' }]);
    expect(run([key('f')]).actions).toEqual([{ type: 'command', name: 'fitView' }]);
    expect(run([key('s', true)]).actions).toEqual([{ type: 'command', name: 'save' }]);
    expect(run([key('x')]).actions).toEqual([]);
    const dragging = run([down([40, 30]), move([45, 35])]).state;
    expect(run([key('Delete')], ctx, dragging)).toEqual({ state: dragging, actions: [] });
  });
});

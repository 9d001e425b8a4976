/** Dragging the valve's handles with the drag tool: lift along the axis, the whole valve by its axis handle. */

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Point, PortDocument, ValvePart } from '../../src/document/types.ts';
import { loadDocument } from '../../src/document/load.ts';
import { IDLE, stepTool, type ToolAction, type ToolContext, type ToolEvent } from '../../src/editor/drag-tool.ts';
import { applyEdit, type EditRequest } from '../../src/editor/edits.ts';
import { liftFromDrag, liftHandlePosition, MAX_LIFT_SHARE } from '../../src/editor/part-handles.ts';
import { active, deepFreeze } from './fixtures.ts';

/** The tight-short-side street sample: 46 mm valve on the axis (95, 2.3) at 10 mm lift with a 1.2 margin. */
const sample = (): PortDocument =>
  deepFreeze(loadDocument(readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8')));
const contextOf = (doc: PortDocument, extra: Partial<ToolContext> = {}): ToolContext =>
  ({ section: active(doc), parts: doc.variants[0].parts, tolerance: 1, ...extra });

// 10 screen pixels per document unit, y down on screen.
const screen = (at: Point): Point => [10 * at[0], -10 * at[1]];
const down = (at: Point): ToolEvent => ({ type: 'pointer-down', at, screen: screen(at) });
const move = (at: Point): ToolEvent => ({ type: 'pointer-move', at, screen: screen(at) });
const up = (at: Point): ToolEvent => ({ type: 'pointer-up', at, screen: screen(at) });

/** Presses at `from`, moves to `to` and lets go; returns every action and the edits of the drag, in order. */
function drag(from: Point, to: Point, ctx: ToolContext): { actions: ToolAction[]; edits: EditRequest[] } {
  let state = IDLE;
  const actions: ToolAction[] = [];
  for (const e of [down(from), move(to), up(to)]) {
    const step = stepTool(state, e, ctx);
    state = step.state;
    actions.push(...step.actions);
  }
  return { actions, edits: actions.flatMap((a) => ('edit' in a ? [a.edit] : [])) };
}

const liftOf = (edit: EditRequest | undefined): number => {
  if (edit?.name !== 'setLift') throw new Error(`expected setLift, got ${JSON.stringify(edit)}`);
  return edit.args.lift;
};

describe('the lift handle', () => {
  // Grabbed 0.25 off the handle at (95, -8.9), so the handle does not jump to the pointer.
  const grab: Point = [95.25, -8.75];

  it('dragged a distance d down the axis raises the lift by exactly d, and the valve face follows', () => {
    const doc = sample();
    const { actions, edits } = drag(grab, [95.25, -8.75 - 3.5], contextOf(doc));
    expect(actions.map((a) => a.type)).toEqual(['select', 'drag-start', 'drag-end']);
    expect(actions[0]).toEqual({ type: 'select', selection: { kind: 'lift' } });
    expect(edits.map(liftOf)).toEqual([13.5, 13.5]);
    const next = applyEdit(doc, edits[1].name, edits[1].args);
    expect(next.variants[0].parts?.valve?.lift).toBe(13.5);
    const faceY = (d: PortDocument) => active(d).islands[0].outline.vertices[0].at[1];
    expect(faceY(next) - faceY(doc)).toBeCloseTo(-3.5, 12);
  });

  it('dragged across the axis leaves the lift alone', () => {
    const { edits } = drag(grab, [95.25 + 6, -8.75], contextOf(sample()));
    expect(edits.map(liftOf)).toEqual([10, 10]);
  });

  it('on a leaning valve counts only the travel along its axis', () => {
    const leaning = applyEdit(sample(), 'setPart', { part: 'valve', values: { axis: { inclinationDeg: 5 } } });
    const valve = leaning.variants[0].parts!.valve!;
    const at = liftHandlePosition(valve);
    const i = (5 * Math.PI) / 180;
    const open: Point = [Math.sin(i), -Math.cos(i)], across: Point = [Math.cos(i), Math.sin(i)];
    const along = drag(at, [at[0] + 3 * open[0], at[1] + 3 * open[1]], contextOf(leaning)).edits;
    expect(liftOf(along[1])).toBeCloseTo(13, 12);
    const sideways = drag(at, [at[0] + 3 * across[0], at[1] + 3 * across[1]], contextOf(leaning)).edits;
    expect(liftOf(sideways[1])).toBeCloseTo(10, 12);
  });

  it('stops at the seat (0) and at half the valve diameter', () => {
    expect(liftOf(drag(grab, [95.25, -8.75 + 30], contextOf(sample())).edits[1])).toBe(0);
    expect(liftOf(drag(grab, [95.25, -8.75 - 40], contextOf(sample())).edits[1])).toBe(MAX_LIFT_SHARE * 46);
    expect(MAX_LIFT_SHARE * 46).toBe(23);
  });

  it('snaps the lift to the grid step when snapping is on', () => {
    const ctx = contextOf(sample(), { snap: { gridStep: 0.5, alignTolerance: 0.3 } });
    // 10 + 1.13 = 11.13 -> 11; 10 + 1.3 = 11.3 -> 11.5
    expect(drag(grab, [95.25, -8.75 - 1.13], ctx).edits.map(liftOf)).toEqual([11, 11]);
    expect(drag(grab, [95.25, -8.75 - 1.3], ctx).edits.map(liftOf)).toEqual([11.5, 11.5]);
    const valve = sample().variants[0].parts!.valve as ValvePart;
    expect(liftFromDrag(valve, [0, 0.2], 0.5)).toBe(10);
  });
});

describe('the valve-axis handle', () => {
  const axisEdit = (edit: EditRequest | undefined): unknown => {
    if (edit?.name !== 'setPart' || edit.args.part !== 'valve') throw new Error(`expected setPart valve, got ${JSON.stringify(edit)}`);
    return edit.args.values.axis;
  };

  it('moves the valve axis by the drag, and the seat and test bore with it', () => {
    const doc = sample();
    const { actions, edits } = drag([95.1, 2.2], [96.6, 1.7], contextOf(doc));
    expect(actions[0]).toEqual({ type: 'select', selection: { kind: 'valve-axis' } });
    const axis = axisEdit(edits[1]) as { x: number; y: number };
    expect(axis.x).toBeCloseTo(96.5, 12);
    expect(axis.y).toBeCloseTo(1.8, 12);
    const next = applyEdit(doc, edits[1].name, edits[1].args);
    expect(next.variants[0].parts?.valve?.axis.x).toBeCloseTo(96.5, 12);
    expect(next.variants[0].parts?.valve?.axis.inclinationDeg).toBe(0);
    // Every bore wall corner moves 1.5 across and 0.5 down with the valve (the deck is the recess below the gauge line).
    const boreCorners = (d: PortDocument) => {
      const o = active(d).outline;
      return o.edges.flatMap((e, k) => (e.wallName?.startsWith('bore wall') ? [o.vertices[k].at] : []));
    };
    const before = boreCorners(doc), after = boreCorners(next);
    expect(after).toHaveLength(2);
    after.forEach((p, k) => {
      expect(p[0] - before[k][0]).toBeCloseTo(1.5, 9);
      expect(p[1] - before[k][1]).toBeCloseTo(-0.5, 9);
    });
  });

  it('snaps the axis to the grid when snapping is on', () => {
    const ctx = contextOf(sample(), { snap: { gridStep: 0.5, alignTolerance: 0.3 } });
    const { actions } = drag([95, 2.3], [96.13, 1.9], ctx);
    const start = actions.find((a) => a.type === 'drag-start');
    expect(start && 'edit' in start ? axisEdit(start.edit) : null).toEqual({ x: 96, y: 2 });
    expect(start && 'snapped' in start ? start.snapped?.x : null).toEqual({ kind: 'grid', step: 0.5 });
  });
});

describe('generated geometry in the drag tool', () => {
  it('cannot be grabbed: a press on a seat corner starts nothing when the parts are known', () => {
    const doc = sample();
    const anchor = active(doc).outline.vertices.findIndex((v) => v.anchor);
    const seatCorner = active(doc).outline.vertices[anchor + 2].at;
    const away: Point = [seatCorner[0] + 2, seatCorner[1] + 2];
    expect(drag(seatCorner, away, contextOf(doc)).actions).toEqual([]);
    // without the parts the tool sees a plain corner, as before
    expect(drag(seatCorner, away, contextOf(doc, { parts: undefined })).edits[0]?.name).toBe('movePoint');
  });

  it('a selected lift handle takes no corner or edge key, with a hint', () => {
    const doc = sample();
    const ctx = contextOf(doc);
    let state = IDLE;
    for (const e of [down([95, -8.9]), up([95, -8.9])]) state = stepTool(state, e, ctx).state;
    expect(state.selection).toEqual({ kind: 'lift' });
    expect(stepTool(state, { type: 'key', press: { key: 'Delete' } }, ctx).actions).toEqual([{ type: 'hint', message: 'Select a corner first (click on it).' }]);
    expect(stepTool(state, { type: 'key', press: { key: 'a' } }, ctx).actions).toEqual([{ type: 'hint', message: 'Select an edge first (click on it).' }]);
  });
});

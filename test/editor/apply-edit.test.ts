import { describe, expect, it } from 'vitest';
import { applyEdit, EDIT_LIST, EDITS, isEditName } from '../../src/editor/edits.ts';
import { EditError } from '../../src/editor/errors.ts';
import { activeSection } from '../../src/editor/section-access.ts';
import { boxDocument } from './fixtures.ts';

describe('applyEdit', () => {
  it('names the unknown edit', () => {
    expect(() => applyEdit(boxDocument(), 'grindPort', {})).toThrow(new EditError('', 'There is no edit called "grindPort".'));
    expect(isEditName('toString')).toBe(false);
  });

  it('turns malformed arguments into an EditError naming the edit and the argument', () => {
    const doc = boxDocument();
    const bad: [string, unknown, RegExp][] = [
      ['movePoint', { point: { kind: 'vertex', vertex: 1 }, to: [1] }, /^movePoint: to: /],
      ['movePoint', { point: { kind: 'corner', vertex: 1 }, to: [1, 2] }, /^movePoint: point\.kind: /],
      ['insertVertex', { edge: -1, at: [0, 0] }, /^insertVertex: edge: /],
      ['deleteVertex', { vertex: 1.5 }, /^deleteVertex: vertex: /],
      ['setEdgeRole', { edge: 0, role: 'exhaust' }, /^setEdgeRole: role: /],
      ['makeLine', { edge: 0, extra: true }, /^makeLine: .*"extra"/],
      ['movePoint', null, /^movePoint: /],
      ['movePoint', { point: { kind: 'vertex', vertex: 1 }, to: [Number.POSITIVE_INFINITY, 0] }, /^movePoint: to\[0\]: /],
      // Past the file's bounds the document could not be saved.
      ['movePoint', { point: { kind: 'vertex', vertex: 1 }, to: [0, -2e5] }, /^movePoint: to\[1\]: A point must lie within 100000/],
      ['setFilletRadius', { vertex: 1, radius: 2e5 }, /^setFilletRadius: radius: A fillet radius can be at most 100000/],
      ['setFilletRadius', { vertex: 1, radius: -1 }, /^setFilletRadius: radius: A fillet radius cannot be negative/],
    ];
    for (const [name, args, message] of bad) {
      let caught: unknown;
      try { applyEdit(doc, name, args); } catch (e) { caught = e; }
      expect(caught, name).toBeInstanceOf(EditError);
      expect((caught as EditError).message).toMatch(message);
      expect((caught as EditError).edit).toBe(name);
    }
  });

  it('refuses a document whose active variant is missing', () => {
    const doc = { ...boxDocument(), activeVariant: 'gone' };
    expect(() => applyEdit(doc, 'makeLine', { edge: 2 })).toThrow(/active variant "gone" is not in the document/);
    expect(() => activeSection(doc)).toThrow(EditError);
  });

  it('registers each edit under its own name with a label', () => {
    for (const [key, spec] of Object.entries(EDITS)) {
      expect(spec.name).toBe(key);
      expect(spec.label.length).toBeGreaterThan(0);
    }
    expect(EDIT_LIST.map((e) => e.name)).toEqual(Object.keys(EDITS));
    const keys = EDIT_LIST.flatMap((e) => e.shortcuts ?? []).map((s) => s.key);
    expect(new Set(keys).size).toBe(keys.length);
  });
});

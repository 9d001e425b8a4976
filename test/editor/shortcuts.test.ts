import { describe, expect, it } from 'vitest';
import { isEditName } from '../../src/editor/edits.ts';
import { chordOf, findShortcut, SHORTCUTS } from '../../src/editor/shortcuts.ts';

describe('shortcuts', () => {
  it('writes presses as chords', () => {
    expect(chordOf({ key: 's', ctrlKey: true })).toBe('Ctrl+S');
    expect(chordOf({ key: 'o', metaKey: true })).toBe('Ctrl+O');
    expect(chordOf({ key: '?', shiftKey: true })).toBe('?');
    expect(chordOf({ key: 'Delete', shiftKey: true })).toBe('Shift+Delete');
    expect(chordOf({ key: 'f' })).toBe('f');
  });

  it('finds the shortcut for a press, either letter case', () => {
    expect(findShortcut({ key: 'F' })?.run).toEqual({ command: 'fitView' });
    expect(findShortcut({ key: 'o', ctrlKey: true })?.run).toEqual({ command: 'open' });
    expect(findShortcut({ key: 'o' })?.run).toEqual({ edit: 'setEdgeRole', target: 'edge', preset: { role: 'outlet' } });
    expect(findShortcut({ key: 'Backspace' })?.run).toEqual({ edit: 'deleteVertex', target: 'vertex' });
    expect(findShortcut({ key: 'Delete', shiftKey: true })).toBeUndefined();
    expect(findShortcut({ key: 'x' })).toBeUndefined();
  });

  it('has one row per key, each with a description, naming registered edits', () => {
    const keys = SHORTCUTS.map((s) => s.key.toLowerCase());
    expect(new Set(keys).size).toBe(keys.length);
    for (const s of SHORTCUTS) {
      expect(s.description.length).toBeGreaterThan(0);
      if ('edit' in s.run) expect(isEditName(s.run.edit)).toBe(true);
    }
    expect(SHORTCUTS.map((s) => s.key).sort()).toEqual(
      ['?', 'Backspace', 'Ctrl+O', 'Ctrl+S', 'Delete', 'Escape', 'a', 'c', 'f', 'i', 'l', 'n', 'o', 's', 'w'].sort(),
    );
  });
});

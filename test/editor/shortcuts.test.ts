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
    // With Ctrl (or Cmd) Shift is written even on a letter: Ctrl+Shift+Z is redo, not Ctrl+Z.
    expect(chordOf({ key: 'Z', ctrlKey: true, shiftKey: true })).toBe('Ctrl+Shift+Z');
    expect(chordOf({ key: 'z', metaKey: true, shiftKey: true })).toBe('Ctrl+Shift+Z');
  });

  it('undo is Ctrl/Cmd+Z, redo Ctrl/Cmd+Shift+Z or Ctrl+Y', () => {
    expect(findShortcut({ key: 'z', ctrlKey: true })?.run).toEqual({ command: 'undo' });
    expect(findShortcut({ key: 'z', metaKey: true })?.run).toEqual({ command: 'undo' });
    expect(findShortcut({ key: 'Z', ctrlKey: true, shiftKey: true })?.run).toEqual({ command: 'redo' });
    expect(findShortcut({ key: 'z', metaKey: true, shiftKey: true })?.run).toEqual({ command: 'redo' });
    expect(findShortcut({ key: 'y', ctrlKey: true })?.run).toEqual({ command: 'redo' });
    expect(findShortcut({ key: 'z' })).toBeUndefined();
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
      ['?', 'Backspace', 'Ctrl+O', 'Ctrl+S', 'Ctrl+Shift+Z', 'Ctrl+Y', 'Ctrl+Z', 'Delete', 'Escape', 'a', 'c', 'f', 'i', 'l', 'n', 'o', 's', 'w'].sort(),
    );
  });
});

/** The keyboard shortcuts: one table that both dispatches keys and fills the help overlay. */

import { EDIT_LIST, type EditName, type EditShortcut } from './edits.ts';

/** Things keys do that are not document edits; the app carries them out. */
export type CommandName =
  | 'fitView' | 'toggleInsertMode' | 'toggleSnapping' | 'toggleHelp' | 'save' | 'open' | 'cancel' | 'undo' | 'redo';

/** What a key runs: an edit on the current selection, or a command. */
export type ShortcutRun =
  | { readonly edit: EditName; readonly target: EditShortcut['target']; readonly preset?: Readonly<Record<string, unknown>> }
  | { readonly command: CommandName };

export interface Shortcut {
  /** Key as shown in the help overlay and matched against presses: "f", "Ctrl+S", "Delete", "?". */
  readonly key: string;
  readonly description: string;
  /** Heading in the help overlay. */
  readonly group: 'Edit' | 'View' | 'File';
  readonly run: ShortcutRun;
}

const COMMANDS: readonly Shortcut[] = [
  { key: 'i', description: 'Insert mode on/off: a click on an edge adds a corner there', group: 'Edit', run: { command: 'toggleInsertMode' } },
  { key: 's', description: 'Snapping on/off (grid, and lining up with neighbouring points)', group: 'Edit', run: { command: 'toggleSnapping' } },
  { key: 'Escape', description: 'Close the keys or history list; otherwise cancel the drag, or clear the selection', group: 'Edit', run: { command: 'cancel' } },
  { key: 'Ctrl+Z', description: 'Undo the last change to the document (a whole drag is one change)', group: 'Edit', run: { command: 'undo' } },
  { key: 'Ctrl+Shift+Z', description: 'Redo what was undone', group: 'Edit', run: { command: 'redo' } },
  { key: 'Ctrl+Y', description: 'Redo what was undone', group: 'Edit', run: { command: 'redo' } },
  { key: 'f', description: 'Fit the section in the view', group: 'View', run: { command: 'fitView' } },
  { key: '?', description: 'Show or hide this list of keys', group: 'View', run: { command: 'toggleHelp' } },
  { key: 'Ctrl+S', description: 'Save the section file', group: 'File', run: { command: 'save' } },
  { key: 'Ctrl+O', description: 'Open a section file', group: 'File', run: { command: 'open' } },
];

/** Every shortcut: commands first, then the keys registered with the edits (src/editor/edits.ts). */
export const SHORTCUTS: readonly Shortcut[] = [
  ...COMMANDS,
  ...EDIT_LIST.flatMap((spec) => (spec.shortcuts ?? []).map((s): Shortcut => ({
    key: s.key,
    description: s.description,
    group: 'Edit',
    run: { edit: spec.name as EditName, target: s.target, ...(s.preset === undefined ? {} : { preset: s.preset }) },
  }))),
];

/** Pointer gestures for the help overlay; they are handled by the drag tool, not dispatched from here. */
export const POINTER_HINTS: readonly { readonly key: string; readonly description: string }[] = [
  { key: 'Drag a point', description: 'Move a corner, an arc\'s middle point or a curve point' },
  { key: 'Drag a fillet dot', description: 'Change that corner\'s radius (the short-side radius on the short-side corner)' },
  { key: 'Drag the valve face dot', description: 'Change the lift: only the travel along the valve axis counts' },
  { key: 'Drag the gauge-line dot', description: 'Move the valve with its seat and test bore' },
  // Shift, not Alt: Alt-click belongs to the desktop on many systems.
  { key: 'Shift+click an edge', description: 'Add a corner there (or a plain click in insert mode)' },
  { key: 'Click an edge', description: 'Select it for a, c, l, w, n, o' },
];

/** The parts of a key press that matter; a DOM KeyboardEvent fits. */
export interface KeyPress {
  readonly key: string;
  readonly ctrlKey?: boolean;
  readonly metaKey?: boolean;
  readonly altKey?: boolean;
  readonly shiftKey?: boolean;
}

/**
 * The press written as a chord, e.g. "Ctrl+S", "f", "Delete", "Ctrl+Shift+Z". Cmd counts as Ctrl. Shift is written
 * with named keys and with Ctrl; on a plain character it is already in the character ("?" is Shift+/ on many layouts).
 */
export function chordOf(press: KeyPress): string {
  const parts: string[] = [];
  if (press.ctrlKey || press.metaKey) parts.push('Ctrl');
  if (press.altKey) parts.push('Alt');
  if (press.shiftKey && (press.key.length > 1 || parts.includes('Ctrl'))) parts.push('Shift');
  parts.push(press.key.length === 1 && parts.length > 0 ? press.key.toUpperCase() : press.key);
  return parts.join('+');
}

/** The shortcut for a press, or undefined. Letters match either case (Caps Lock on still works). */
export function findShortcut(press: KeyPress): Shortcut | undefined {
  const chord = chordOf(press).toLowerCase();
  return SHORTCUTS.find((s) => s.key.toLowerCase() === chord);
}

/** Turning a shortcut's edit into a concrete edit request on the current selection. */

import type { EditRequest } from './edits.ts';
import { islandPart, type HandleRef } from './refs.ts';
import type { ShortcutRun } from './shortcuts.ts';

/** The edit to run, and what is selected after it; or a hint when the selection does not fit the edit. */
export type SelectionEdit =
  | { readonly kind: 'edit'; readonly edit: EditRequest; readonly selectionAfter: HandleRef | null }
  | { readonly kind: 'hint'; readonly message: string };

/**
 * Fills in the target of `run` from `selection`: a corner edit takes a selected corner (or its fillet handle);
 * an edge edit takes a selected edge, or the edge of a selected through or via point.
 * After deleting a corner nothing is selected; after an edge edit the edge is.
 */
export function editForSelection(run: Extract<ShortcutRun, { edit: unknown }>, selection: HandleRef | null): SelectionEdit {
  const preset = run.preset ?? {};
  if (run.target === 'vertex') {
    if (selection === null || (selection.kind !== 'vertex' && selection.kind !== 'fillet')) {
      return { kind: 'hint', message: 'Select a corner first (click on it).' };
    }
    const args = { vertex: selection.vertex, ...islandPart(selection.island), ...preset };
    return { kind: 'edit', edit: { name: run.edit, args } as EditRequest, selectionAfter: null };
  }
  if (selection === null || (selection.kind !== 'edge' && selection.kind !== 'through' && selection.kind !== 'via')) {
    return { kind: 'hint', message: 'Select an edge first (click on it).' };
  }
  const edge: HandleRef = { kind: 'edge', edge: selection.edge, ...islandPart(selection.island) };
  const args = { edge: selection.edge, ...islandPart(selection.island), ...preset };
  return { kind: 'edit', edit: { name: run.edit, args } as EditRequest, selectionAfter: edge };
}

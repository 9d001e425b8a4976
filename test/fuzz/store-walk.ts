/**
 * Walks a DocumentStore through random steps (edits, drags let go, cancelled or left open, undo, redo, opening a
 * file) beside a model of what its history must be, checking the store against the model at every step.
 */

import fc from 'fast-check';
import { expect } from 'vitest';
import { checkDocument, DocumentCheckError } from '../../src/app/document-check.ts';
import type { DocumentStore } from '../../src/app/document-store.ts';
import { saveDocument } from '../../src/document/load.ts';
import type { PortDocument } from '../../src/document/types.ts';
import { EditError } from '../../src/editor/index.ts';
import { DRAGGED, intentArb, resolve, type Intent } from './edit-intents.ts';

/**
 * One step. A drag runs 2..5 steps and is let go, cancelled, or left open ('leave': the next edit then ends it,
 * opening a file cancels it, undo and redo are refused). `open` replaces the document with file `file` of those given.
 */
export type Step =
  | { readonly kind: 'edit'; readonly intent: Intent }
  | { readonly kind: 'drag'; readonly intent: Intent; readonly steps: number; readonly finish: 'end' | 'cancel' | 'leave' }
  | { readonly kind: 'undo' }
  | { readonly kind: 'redo' }
  | { readonly kind: 'open'; readonly file: number };

export const stepArb: fc.Arbitrary<Step> = fc.oneof(
  { weight: 16, arbitrary: fc.record({ kind: fc.constant('edit' as const), intent: intentArb() }) },
  {
    weight: 4,
    arbitrary: fc.record({
      kind: fc.constant('drag' as const), intent: intentArb(DRAGGED), steps: fc.integer({ min: 2, max: 5 }),
      finish: fc.constantFrom('end' as const, 'end' as const, 'cancel' as const, 'leave' as const),
    }),
  },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('undo' as const) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('redo' as const) }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('open' as const), file: fc.nat() }) },
);

/** Every committed document in order (the start first), which one is shown, and the drag in progress. */
export interface Timeline {
  docs: PortDocument[];
  at: number;
  /** The document before the open drag's first step; null when no drag is open. */
  dragBefore: PortDocument | null;
}

/** Applies one edit; a refusal must be a typed error of ours with a message, and leave the document alone. */
function tryEdit(store: DocumentStore, name: string, args: unknown, cause: 'edit' | 'drag'): void {
  const before = store.doc;
  try {
    store.edit(name, args, cause);
  } catch (error) {
    if (!(error instanceof EditError || error instanceof DocumentCheckError)) throw error;
    expect(error.message.trim()).not.toBe('');
    expect(store.doc).toBe(before);
  }
}

/** The store's document became a step of its history (if it changed): every committed document builds and saves. */
function commit(store: DocumentStore, line: Timeline): void {
  if (store.doc === line.docs[line.at]) return;
  checkDocument(store.doc);
  saveDocument(store.doc);
  line.docs = [...line.docs.slice(0, line.at + 1), store.doc];
  line.at++;
}

/** Ends an open drag as the store's next plain edit does: its last document becomes one step. */
function endOpenDrag(store: DocumentStore, line: Timeline): void {
  if (line.dragBefore === null) return;
  line.dragBefore = null;
  commit(store, line);
}

function undoOrRedo(store: DocumentStore, line: Timeline, kind: 'undo' | 'redo'): void {
  const shown = store.doc;
  const label = kind === 'undo' ? store.undo() : store.redo();
  if (line.dragBefore !== null) {
    expect(label, 'undo and redo wait for an open drag').toBeNull();
    expect(store.doc).toBe(shown);
    return;
  }
  const target = line.at + (kind === 'undo' ? -1 : 1);
  expect(label === null).toBe(target < 0 || target >= line.docs.length);
  if (label !== null) line.at = target;
  expect(store.doc).toBe(line.docs[line.at]);
}

/** Opens a file: an open drag is cancelled first (back to the shown step), then the whole document is one step. */
function open(store: DocumentStore, line: Timeline, doc: PortDocument): void {
  line.dragBefore = null;
  store.replace(doc, 'Open a file');
  expect(store.doc).toBe(doc);
  commit(store, line);
}

/** Runs `steps` on `store`, checking it against the model throughout; returns the model at the end (no drag open). */
export function walk(store: DocumentStore, steps: readonly Step[], files: readonly (() => PortDocument)[]): Timeline {
  const line: Timeline = { docs: [store.doc], at: 0, dragBefore: null };
  for (const step of steps) {
    if (step.kind === 'undo' || step.kind === 'redo') undoOrRedo(store, line, step.kind);
    else if (step.kind === 'open') open(store, line, files[step.file % files.length]());
    else if (step.kind === 'edit') {
      endOpenDrag(store, line);
      const call = resolve(store.doc, step.intent);
      tryEdit(store, call.name, call.args, 'edit');
      commit(store, line);
    } else {
      line.dragBefore ??= store.doc;
      const from = store.doc;
      for (let k = 1; k <= step.steps; k++) {
        const call = resolve(from, step.intent, k, step.steps);
        tryEdit(store, call.name, call.args, 'drag');
      }
      if (step.finish === 'end') {
        store.endDrag();
        endOpenDrag(store, line);
      } else if (step.finish === 'cancel') {
        store.cancelDrag();
        expect(store.doc).toBe(line.dragBefore);
        line.dragBefore = null;
      }
    }
  }
  if (line.dragBefore !== null) {
    store.endDrag();
    endOpenDrag(store, line);
  }
  return line;
}

/**
 * Edit-registry fuzz: random sequences of registry edits and drags through the app's checked DocumentStore; every
 * committed document passes the check, and undoing all gives back the starting document, redoing all the end one.
 */

import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkDocument, DocumentCheckError } from '../../src/app/document-check.ts';
import { DocumentStore } from '../../src/app/document-store.ts';
import { clampEdit } from '../../src/app/edit-clamp.ts';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import type { PortDocument } from '../../src/document/types.ts';
import { applyEdit, EDITS, EditError, isEditName } from '../../src/editor/index.ts';
import { deepFreeze } from '../editor/fixtures.ts';
import { EDIT_SEQUENCE_RUNS, SEEDS } from './counts.ts';
import { DRAGGED, DRAWN, intentArb, resolve, type Intent } from './edit-intents.ts';

const FILES = ['../../samples/street-tight-short-side.json', '../../samples/short-side-compare.json', '../fixtures/section-v1-as-v3.json']
  .map((path) => readFileSync(new URL(path, import.meta.url), 'utf8'));
/** Starting documents, frozen: a one-variant sample, the two-variant one with parts, and an inch file with an island. */
const STARTS = FILES.map((text) => deepFreeze(loadDocument(text)));

/** The store as the app builds it (src/app/start-document.ts): checked by checkDocument, drags clamped by clampEdit. */
function appStore(doc: PortDocument): DocumentStore {
  return new DocumentStore(doc, applyEdit, {
    guard: { check: checkDocument, clamp: clampEdit },
    label: (name) => (isEditName(name) ? EDITS[name].label : name),
  });
}

/** One step of a sequence: a plain edit, a drag of 2..5 steps let go or cancelled, or an undo or a redo. */
type EditStep =
  | { readonly kind: 'edit'; readonly intent: Intent }
  | { readonly kind: 'drag'; readonly intent: Intent; readonly steps: number; readonly cancel: boolean };
type Step = EditStep | { readonly kind: 'undo' | 'redo' };

const stepArb: fc.Arbitrary<Step> = fc.oneof(
  { weight: 8, arbitrary: fc.record({ kind: fc.constant('edit' as const), intent: intentArb() }) },
  {
    weight: 2,
    arbitrary: fc.record({
      kind: fc.constant('drag' as const), intent: intentArb(DRAGGED), steps: fc.integer({ min: 2, max: 5 }), cancel: fc.boolean(),
    }),
  },
  { weight: 1, arbitrary: fc.record({ kind: fc.constantFrom('undo' as const, 'redo' as const) }) },
);

/**
 * What the history must hold: every committed document in order (the start first) and which one is shown. A new
 * commit drops the documents after the shown one (they can no longer be redone).
 */
interface Timeline {
  docs: PortDocument[];
  at: number;
}

/** Applies one edit through the store; a refusal must be a typed error of ours and leave the document alone. */
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

/** Runs one edit or drag; returns whether it committed a document. */
function runEdit(store: DocumentStore, step: EditStep): boolean {
  const before = store.doc;
  if (step.kind === 'edit') {
    const call = resolve(store.doc, step.intent);
    tryEdit(store, call.name, call.args, 'edit');
  } else {
    for (let k = 1; k <= step.steps; k++) {
      const call = resolve(before, step.intent, k, step.steps);
      tryEdit(store, call.name, call.args, 'drag');
    }
    if (step.cancel) store.cancelDrag();
    else store.endDrag();
    if (step.cancel) expect(store.doc).toBe(before);
  }
  return store.doc !== before;
}

/** Runs the steps, checking each undo and redo against the timeline; returns the timeline at the end. */
function runSteps(store: DocumentStore, steps: readonly Step[]): Timeline {
  const line: Timeline = { docs: [store.doc], at: 0 };
  for (const step of steps) {
    if (!('intent' in step)) {
      const target = line.at + (step.kind === 'undo' ? -1 : 1);
      const label = step.kind === 'undo' ? store.undo() : store.redo();
      expect(label === null).toBe(target < 0 || target >= line.docs.length);
      if (label !== null) line.at = target;
      expect(store.doc).toBe(line.docs[line.at]);
    } else if (runEdit(store, step)) {
      // Every committed document builds (each variant, as `portwright check` builds it).
      checkDocument(store.doc);
      line.docs = [...line.docs.slice(0, line.at + 1), store.doc];
      line.at++;
    }
  }
  return line;
}

describe(`edit-registry fuzz: ${EDIT_SEQUENCE_RUNS} random edit sequences through the checked store`, () => {
  it('draws every edit in the registry (a new edit needs a case in edit-intents.ts resolve)', () => {
    expect([...new Set(DRAWN)].sort()).toEqual(Object.keys(EDITS).sort());
  });

  it('commits only documents that build; undo and redo, mid-sequence and all the way, walk through exactly them', () => {
    let edits = 0, committedSteps = 0;
    const cases = fc.record({ start: fc.nat({ max: STARTS.length - 1 }), steps: fc.array(stepArb, { minLength: 1, maxLength: 20 }) });
    fc.assert(fc.property(cases, ({ start, steps }) => {
      const store = appStore(STARTS[start]);
      const line = runSteps(store, steps);
      edits += steps.length;
      committedSteps += line.docs.length - 1;
      expect(loadDocument(saveDocument(store.doc))).toStrictEqual(store.doc);
      for (let k = line.at; k > 0; k--) {
        expect(store.undo()).not.toBeNull();
        expect(store.doc).toBe(line.docs[k - 1]);
      }
      expect(store.undo()).toBeNull();
      expect(store.doc).toBe(STARTS[start]);
      for (let k = 1; k < line.docs.length; k++) {
        expect(store.redo()).not.toBeNull();
        expect(store.doc).toBe(line.docs[k]);
      }
      expect(store.redo()).toBeNull();
    }), { seed: SEEDS.edits, numRuns: EDIT_SEQUENCE_RUNS });
    // The starting documents (frozen, so an edit in place would have thrown) are still those of their files.
    STARTS.forEach((doc, k) => expect(doc).toStrictEqual(loadDocument(FILES[k])));
    expect(committedSteps).toBeGreaterThan(edits / 4);
    console.info(`edit-registry fuzz: ${EDIT_SEQUENCE_RUNS} sequences, ${edits} steps (edits, drags, undos, redos), ${committedSteps} committed`);
  });
});

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

const read = (path: string): PortDocument => deepFreeze(loadDocument(readFileSync(new URL(path, import.meta.url), 'utf8')));
/** Starting documents: a one-variant sample, the two-variant one with parts, and an inch file with an island. */
const STARTS = [
  read('../../samples/street-tight-short-side.json'),
  read('../../samples/short-side-compare.json'),
  read('../fixtures/section-v1-as-v3.json'),
];

/** The store as the app builds it (src/app/start-document.ts): checked by checkDocument, drags clamped by clampEdit. */
function appStore(doc: PortDocument): DocumentStore {
  return new DocumentStore(doc, applyEdit, {
    guard: { check: checkDocument, clamp: clampEdit },
    label: (name) => (isEditName(name) ? EDITS[name].label : name),
  });
}

/** One step of a sequence: a plain edit, or a drag of 2..5 steps let go or cancelled. */
interface Step {
  readonly intent: Intent;
  readonly drag: null | { readonly steps: number; readonly cancel: boolean };
}

const stepArb: fc.Arbitrary<Step> = fc.oneof(
  { weight: 4, arbitrary: fc.record({ intent: intentArb(), drag: fc.constant(null) }) },
  {
    weight: 1,
    arbitrary: fc.record({
      intent: intentArb(DRAGGED),
      drag: fc.record({ steps: fc.integer({ min: 2, max: 5 }), cancel: fc.boolean() }),
    }),
  },
);

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

/** Runs the steps; returns the committed documents in order, the start first (each one undo step from the last). */
function runSteps(store: DocumentStore, steps: readonly Step[]): PortDocument[] {
  const committed = [store.doc];
  for (const { intent, drag } of steps) {
    const before = store.doc;
    if (drag === null) {
      const call = resolve(store.doc, intent);
      tryEdit(store, call.name, call.args, 'edit');
    } else {
      for (let k = 1; k <= drag.steps; k++) {
        const call = resolve(before, intent, k, drag.steps);
        tryEdit(store, call.name, call.args, 'drag');
      }
      if (drag.cancel) store.cancelDrag();
      else store.endDrag();
      if (drag.cancel) expect(store.doc).toBe(before);
    }
    if (store.doc !== before) {
      // Every committed document builds (each variant, as `portwright check` builds it) and saves.
      checkDocument(store.doc);
      committed.push(store.doc);
    }
  }
  return committed;
}

describe(`edit-registry fuzz: ${EDIT_SEQUENCE_RUNS} random edit sequences through the checked store`, () => {
  it('draws every edit in the registry (a new edit needs a case in edit-intents.ts resolve)', () => {
    expect([...new Set(DRAWN)].sort()).toEqual(Object.keys(EDITS).sort());
  });

  it('commits only documents that build, and undo all / redo all walk back and forth through exactly them', () => {
    let edits = 0, committedSteps = 0;
    const cases = fc.record({ start: fc.nat({ max: STARTS.length - 1 }), steps: fc.array(stepArb, { minLength: 1, maxLength: 20 }) });
    fc.assert(fc.property(cases, ({ start, steps }) => {
      const store = appStore(STARTS[start]);
      const committed = runSteps(store, steps);
      edits += steps.length;
      committedSteps += committed.length - 1;
      const end = store.doc;
      expect(loadDocument(saveDocument(end))).toStrictEqual(end);
      for (let k = committed.length - 1; k > 0; k--) {
        expect(store.undo()).not.toBeNull();
        expect(store.doc).toBe(committed[k - 1]);
      }
      expect(store.undo()).toBeNull();
      expect(store.doc).toBe(STARTS[start]);
      for (let k = 1; k < committed.length; k++) {
        expect(store.redo()).not.toBeNull();
        expect(store.doc).toBe(committed[k]);
      }
      expect(store.redo()).toBeNull();
      expect(store.doc).toBe(end);
    }), { seed: SEEDS.edits, numRuns: EDIT_SEQUENCE_RUNS });
    // The starting documents are frozen and deep-equal to their files: no edit changed them in place.
    STARTS.forEach((doc, k) => expect(saveDocument(doc)).toBe(saveDocument(loadDocument(saveDocument(STARTS[k])))));
    expect(committedSteps).toBeGreaterThan(edits / 4);
    console.info(`edit-registry fuzz: ${EDIT_SEQUENCE_RUNS} sequences, ${edits} edits and drags, ${committedSteps} committed`);
  });
});

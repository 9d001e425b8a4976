/**
 * Edit-registry fuzz: random sequences of registry edits, drags, undos, redos and opened files through the app's
 * checked DocumentStore; every committed document passes the check, each undo and redo shows exactly the document it
 * should, undoing all gives back the starting document itself and redoing all the last one.
 */

import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkDocument } from '../../src/app/document-check.ts';
import { DocumentStore } from '../../src/app/document-store.ts';
import { clampEdit } from '../../src/app/edit-clamp.ts';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import type { PortDocument } from '../../src/document/types.ts';
import { applyEdit, EDITS, isEditName } from '../../src/editor/index.ts';
import { deepFreeze } from '../editor/fixtures.ts';
import { EDIT_SEQUENCE_RUNS, SEEDS } from './counts.ts';
import { DRAWN } from './edit-intents.ts';
import { stepArb, walk } from './store-walk.ts';

const FILES = ['../../samples/street-tight-short-side.json', '../../samples/short-side-compare.json', '../fixtures/section-v1-as-v3.json']
  .map((path) => readFileSync(new URL(path, import.meta.url), 'utf8'));
/** Starting documents, frozen: a one-variant sample, the two-variant one with parts, and an inch file with an island. */
const STARTS = FILES.map((text) => deepFreeze(loadDocument(text)));
/** Files the sequences open: each time a fresh document, as reading the file again gives. */
const OPENED = FILES.map((text) => () => loadDocument(text));

/** The store as the app builds it (src/app/keeping/start-document.ts): checked by checkDocument, drags clamped by clampEdit. */
function appStore(doc: PortDocument): DocumentStore {
  return new DocumentStore(doc, applyEdit, {
    guard: { check: checkDocument, clamp: clampEdit },
    label: (name) => (isEditName(name) ? EDITS[name].label : name),
  });
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
      const line = walk(store, steps, OPENED);
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
    console.info(`edit-registry fuzz: ${EDIT_SEQUENCE_RUNS} sequences, ${edits} steps (edits, drags, undos, redos, opened files), ${committedSteps} committed`);
  });
});

/** Bench inputs through the document store: one undo step per entered value, heard as a bench-only change, no build. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { checkDocument, DocumentCheckError } from '../../../src/app/document-check.ts';
import { DocumentStore, type ChangeCause } from '../../../src/app/document-store.ts';
import { loadDocument } from '../../../src/document/load.ts';
import type { PortDocument } from '../../../src/document/types.ts';
import { adoptKeptBench } from '../../../src/app/bench-panel/adopt.ts';
import { benchOnlyChange } from '../../../src/editor/edits-bench.ts';
import { activeVariant, applyEdit, EDITS, isEditName } from '../../../src/editor/index.ts';

const SAMPLE = loadDocument(readFileSync(new URL('../../../samples/short-side-compare.json', import.meta.url), 'utf8'));

function newStore(doc: PortDocument = SAMPLE): DocumentStore {
  return new DocumentStore(doc, applyEdit, {
    guard: { check: checkDocument },
    label: (name) => (isEditName(name) ? EDITS[name].label : name),
  });
}

describe('bench inputs in the store', () => {
  it('an entered value is one step named "Set bench inputs"; undo and redo bring the inputs back, heard as bench-only', () => {
    const store = newStore();
    const heard: Array<{ cause: ChangeCause; benchOnly: boolean }> = [];
    let last = store.doc;
    store.subscribe((doc, cause) => {
      heard.push({ cause, benchOnly: benchOnlyChange(last, doc) });
      last = doc;
    });
    const before = activeVariant(store.doc).bench!;
    store.edit('setBench', { bench: { ...before, boreM: 0.09 } });
    expect(store.steps(5).undo).toEqual(['Set bench inputs']);
    expect(activeVariant(store.doc).bench?.boreM).toBe(0.09);
    store.undo();
    expect(activeVariant(store.doc).bench).toEqual(before);
    store.redo();
    expect(activeVariant(store.doc).bench?.boreM).toBe(0.09);
    expect(heard).toEqual([
      { cause: 'edit', benchOnly: true }, { cause: 'history', benchOnly: true }, { cause: 'history', benchOnly: true },
    ]);
  });

  it('the same numbers entered again make no step', () => {
    const store = newStore();
    store.edit('setBench', { bench: { ...activeVariant(store.doc).bench } });
    expect(store.steps(5).undo).toEqual([]);
  });

  it('the check before a change lands builds no variant for a change of bench inputs alone', () => {
    // A variant that cannot be built (a fillet far too big), as if it had been let in: only a build would find it.
    const broken = applyEdit(SAMPLE, 'setFilletRadius', { vertex: 3, radius: 60 });
    expect(() => checkDocument(broken)).toThrow(DocumentCheckError);
    const benchOnly = applyEdit(broken, 'setBench', { bench: { boreM: 0.09 } });
    expect(() => checkDocument(benchOnly, broken)).not.toThrow();
    expect(() => checkDocument(benchOnly)).toThrow(DocumentCheckError);
  });
});

describe('inputs kept in the browser before files held them', () => {
  const KEPT = { boreM: 0.1024, testPressurePa: 6974.4892 };
  const withoutBench = (): PortDocument => applyEdit(SAMPLE, 'setBench', {});

  it('are moved into the active variant that has none, as one undoable step, and the porter is told', () => {
    const store = newStore(withoutBench());
    let taken = 0;
    const said = adoptKeptBench(store.doc, () => (taken++, KEPT), (bench) => (store.edit('setBench', { bench }), true));
    expect(said).toBe('The air and bench inputs kept in this browser are now saved with the variant "tight short side".');
    expect(taken).toBe(1);
    expect(activeVariant(store.doc).bench).toEqual(KEPT);
    expect(store.steps(5).undo).toEqual(['Set bench inputs']);
  });

  it('are left where they are while the active variant has inputs of its own, and nothing is said', () => {
    let taken = 0;
    expect(adoptKeptBench(SAMPLE, () => (taken++, KEPT), () => true)).toBeNull();
    expect(taken).toBe(0);
  });

  it('say nothing when there are none, or the step is refused', () => {
    expect(adoptKeptBench(withoutBench(), () => null, () => true)).toBeNull();
    expect(adoptKeptBench(withoutBench(), () => KEPT, () => false)).toBeNull();
  });
});

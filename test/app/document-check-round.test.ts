/** The store's check builds a variant again when only its round model changes: the model cuts the section. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { checkDocument, DocumentCheckError, plainMessage } from '../../src/app/document-check.ts';
import { clampEdit } from '../../src/app/edit-clamp.ts';
import { DocumentStore } from '../../src/app/document-store.ts';
import { loadDocument } from '../../src/document/load.ts';
import { applyEdit, EDITS, isEditName } from '../../src/editor/index.ts';

const SAMPLE = loadDocument(readFileSync(new URL('../../samples/short-side-compare.json', import.meta.url), 'utf8'));

function newStore(): DocumentStore {
  return new DocumentStore(SAMPLE, applyEdit, {
    guard: { check: checkDocument, clamp: clampEdit },
    label: (name) => (isEditName(name) ? EDITS[name].label : name),
  });
}

describe('a round model through the checked store', () => {
  it('commits the manifold side of the valve axis as one undo step, and refuses the other side (the inlet lies there) in whole sentences', () => {
    const store = newStore();
    store.edit('setAxisymmetric', { axisymmetric: { keep: 'left' } });
    expect(store.doc.variants.find((v) => v.name === SAMPLE.activeVariant)!.axisymmetric).toStrictEqual({ keep: 'left' });
    const round = store.doc;
    let refusal: unknown;
    try {
      store.edit('setAxisymmetric', { axisymmetric: { keep: 'right' } });
    } catch (error) {
      refusal = error;
    }
    expect(refusal).toBeInstanceOf(DocumentCheckError);
    expect(plainMessage(refusal)).toBe(
      'The inlet (the manifold face) lies wholly on the other side of the axis from the right side that is solved. Keep the other side, or move the axis. The change was not made.',
    );
    expect(store.doc).toBe(round);
    store.undo();
    expect(store.doc).toBe(SAMPLE);
  });
});

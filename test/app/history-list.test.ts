/** The history list travels through the store's own undo and redo, one call per step, and says where it went. */
import { describe, expect, it } from 'vitest';
import { DocumentStore } from '../../src/app/document-store.ts';
import { travel } from '../../src/app/history-list.ts';
import type { PortDocument } from '../../src/document/types.ts';

/** A stand-in document: the store only passes documents to `apply` and compares them by identity. */
type Doc = { readonly lift: number };
const asPort = (d: Doc) => d as unknown as PortDocument;
const liftOf = (store: DocumentStore) => (store.doc as unknown as Doc).lift;

function storeWithLifts(lifts: readonly number[]): { store: DocumentStore; calls: string[] } {
  const store = new DocumentStore(asPort({ lift: 0 }), (_doc, _name, args) => asPort({ lift: (args as Doc).lift }), {
    label: (name) => (name === 'setLift' ? 'Set lift' : name),
  });
  const calls: string[] = [];
  for (const lift of lifts) store.edit('setLift', { lift });
  const undo = store.undo.bind(store);
  const redo = store.redo.bind(store);
  store.undo = () => (calls.push('undo'), undo());
  store.redo = () => (calls.push('redo'), redo());
  return { store, calls };
}

describe('travel', () => {
  it('undoes three steps with three store undos, back to the start, and redoes two with two redos', () => {
    const { store, calls } = storeWithLifts([7, 8, 9]);
    expect(travel(store, 'undo', 3)).toBe('Undone 3 steps, back to before Set lift.');
    expect(liftOf(store)).toBe(0);
    expect(calls).toEqual(['undo', 'undo', 'undo']);
    expect(travel(store, 'redo', 2)).toBe('Redone 2 steps, up to Set lift.');
    expect(liftOf(store)).toBe(8);
    expect(store.steps(12)).toEqual({ undo: ['Set lift', 'Set lift'], redo: ['Set lift'] });
  });

  it('says one step as the Undo button does, and stops where the history ends', () => {
    const { store, calls } = storeWithLifts([5]);
    expect(travel(store, 'undo', 1)).toBe('Undone: Set lift.');
    expect(travel(store, 'undo', 4)).toBe('Nothing to undo.');
    expect(travel(store, 'redo', 4)).toBe('Redone: Set lift.');
    expect(liftOf(store)).toBe(5);
    // The second undo and the redo past the end each asked the store once and stopped at its refusal.
    expect(calls).toEqual(['undo', 'undo', 'redo', 'redo']);
  });
});

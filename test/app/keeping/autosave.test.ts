/** Autosave: committed changes are written once they pause (a drag only at its release), refusals are said once. */
import { readFileSync } from 'node:fs';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { Autosaver, type SavedState } from '../../../src/app/keeping/autosave.ts';
import { DocumentStore } from '../../../src/app/document-store.ts';
import { asKeptWork, RECENT_KEY, WORK_KEY, type RecentEntry } from '../../../src/app/keeping/records.ts';
import { loadDocument } from '../../../src/document/load.ts';
import type { PortDocument } from '../../../src/document/types.ts';
import { FakeKeptStorage, quotaError } from './fake-storage.ts';

const SAMPLE = loadDocument(readFileSync(new URL('../../../samples/short-side-compare.json', import.meta.url), 'utf8'));
const NOW = Date.UTC(2026, 11, 5, 21, 40);
const retitle = (doc: PortDocument, _name: string, args: unknown) => ({ ...doc, title: String(args) }) as PortDocument;

function autosaverOn(storage: FakeKeptStorage | null, recent: RecentEntry[] = []) {
  const states: Array<{ state: SavedState; firstFailure: boolean }> = [];
  const saver = new Autosaver(storage, recent, { now: () => NOW, onState: (state, firstFailure) => states.push({ state, firstFailure }) }, storage ? null : 'the page keeps nothing here');
  return { saver, states };
}

beforeEach(() => vi.useFakeTimers());
afterEach(() => vi.useRealTimers());

describe('autosave', () => {
  it('writes the last of a burst of changes once, with the recent list, after the quiet time', async () => {
    const storage = new FakeKeptStorage();
    const { saver, states } = autosaverOn(storage);
    const store = new DocumentStore(SAMPLE, retitle);
    saver.follow(store, () => true);
    expect(saver.current).toEqual({ kind: 'idle' });
    store.edit('title', 'Bowl A');
    store.edit('title', 'Bowl B');
    expect(storage.writes).toBe(0);
    expect(saver.current).toEqual({ kind: 'saving' });
    await vi.runAllTimersAsync();
    await saver.flush();
    expect(storage.writes).toBe(1);
    const work = asKeptWork(storage.records.get(WORK_KEY));
    expect(work?.title).toBe('Bowl B');
    expect(work?.changedAt).toBe(NOW);
    expect(loadDocument(work?.text ?? '').title).toBe('Bowl B');
    expect((storage.records.get(RECENT_KEY) as RecentEntry[]).map((e) => e.title)).toEqual(['Bowl B']);
    expect(states.at(-1)?.state).toEqual({ kind: 'saved' });
  });

  it('writes nothing mid-drag, and the drag at its release', async () => {
    const storage = new FakeKeptStorage();
    const { saver } = autosaverOn(storage);
    const store = new DocumentStore(SAMPLE, retitle);
    saver.follow(store, () => true);
    store.edit('title', 'step 1', 'drag');
    store.edit('title', 'step 2', 'drag');
    await vi.runAllTimersAsync();
    expect(storage.writes).toBe(0);
    store.endDrag();
    await vi.runAllTimersAsync();
    await saver.flush();
    expect(storage.writes).toBe(1);
    expect(asKeptWork(storage.records.get(WORK_KEY))?.title).toBe('step 2');
  });

  it('records whether the work has changes not in a saved file', async () => {
    const storage = new FakeKeptStorage();
    const { saver } = autosaverOn(storage);
    saver.changed(SAMPLE, false);
    await saver.flush();
    expect(asKeptWork(storage.records.get(WORK_KEY))?.unsaved).toBe(false);
  });

  it('says a refusal once, keeps saying it in the state, and recovers when a write lands', async () => {
    const storage = new FakeKeptStorage();
    storage.failWith = quotaError();
    const { saver, states } = autosaverOn(storage);
    saver.changed(SAMPLE, true);
    await saver.flush();
    saver.changed(SAMPLE, true);
    await saver.flush();
    const failed = { kind: 'failed', reason: "the browser's storage for this page is full" };
    expect(states.filter((s) => s.state.kind === 'failed')).toEqual([{ state: failed, firstFailure: true }, { state: failed, firstFailure: false }]);
    storage.failWith = null;
    saver.changed(SAMPLE, true);
    await saver.flush();
    expect(saver.current).toEqual({ kind: 'saved' });
    expect(storage.writes).toBe(1);
  });

  it('without storage every change reports why nothing is kept', async () => {
    const { saver, states } = autosaverOn(null);
    expect(saver.current).toEqual({ kind: 'failed', reason: 'the page keeps nothing here' });
    saver.changed(SAMPLE, true);
    await saver.flush();
    expect(states).toEqual([{ state: { kind: 'failed', reason: 'the page keeps nothing here' }, firstFailure: false }]);
  });
});

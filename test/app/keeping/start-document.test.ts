/** The start: kept work is offered back when it opens, set aside (never lost) when it does not, else the sample. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { asKeptWork, MOVED_KEY, setAsideCopies, WORK_KEY } from '../../../src/app/keeping/records.ts';
import type { KeptStorage } from '../../../src/app/keeping/storage.ts';
import { judgeKeptWork, startStore } from '../../../src/app/keeping/start-document.ts';
import { loadDocument, saveDocument } from '../../../src/document/load.ts';
import { FORMAT_VERSION } from '../../../src/document/types.ts';
import { FakeKeptStorage, quotaError } from './fake-storage.ts';

const SAMPLE_TEXT = readFileSync(new URL('../../../samples/short-side-compare.json', import.meta.url), 'utf8');
const TIGHT_TEXT = readFileSync(new URL('../../../samples/street-tight-short-side.json', import.meta.url), 'utf8');
const NOW = Date.UTC(2026, 11, 5, 21, 40);
const kept = (text: string) => ({ text, title: 'kept', changedAt: NOW - 60_000, unsaved: true });

function storageWith(work: unknown): FakeKeptStorage {
  const storage = new FakeKeptStorage();
  if (work !== undefined) storage.records.set(WORK_KEY, work);
  return storage;
}

describe('starting the app', () => {
  it('with nothing kept shows the sample and offers nothing', async () => {
    const started = await startStore(SAMPLE_TEXT, Promise.resolve(storageWith(undefined)), null, NOW);
    expect(started.store.doc).toEqual(loadDocument(SAMPLE_TEXT));
    expect(started.offer).toBeNull();
    expect(started.setAside).toBeNull();
    expect(started.keepingProblem).toBeNull();
  });

  it('with kept work shows it and offers it back by its title', async () => {
    const started = await startStore(SAMPLE_TEXT, Promise.resolve(storageWith(kept(TIGHT_TEXT))), null, NOW);
    expect(started.store.doc).toEqual(loadDocument(TIGHT_TEXT));
    expect(started.offer).toEqual({ ...kept(TIGHT_TEXT), title: 'Street intake, 46 mm valve: tight short side' });
  });

  it('sets corrupt work aside, shows the sample and says how to get the copy', async () => {
    const storage = storageWith(kept('{"format": "portwright-section", "ver'));
    const started = await startStore(SAMPLE_TEXT, Promise.resolve(storage), null, NOW);
    expect(started.store.doc).toEqual(loadDocument(SAMPLE_TEXT));
    expect(started.setAside?.message).toMatch(/^The work kept from your last visit could not be read: .+\. It was set aside in this browser, not deleted, and the sample is shown\. "Download the set-aside copy" saves it as a file\.$/);
    expect(storage.records.has(WORK_KEY)).toBe(false);
    const copies = await setAsideCopies(storage);
    expect(copies.map((c) => c.key)).toEqual([started.setAside?.key]);
    expect(copies[0].copy.value).toEqual(kept('{"format": "portwright-section", "ver'));
  });

  it('sets newer-version work aside with the version named', async () => {
    const newer = JSON.stringify({ ...JSON.parse(TIGHT_TEXT), version: FORMAT_VERSION + 1 });
    const judged = judgeKeptWork(kept(newer));
    expect(judged).toEqual({ reason: `The work kept from your last visit was saved by a newer Portwright (format version ${FORMAT_VERSION + 1}); this one reads versions 1 to ${FORMAT_VERSION}.` });
  });

  it('sets aside work that loads but cannot be solved, with the problem as a sentence', () => {
    const judged = judgeKeptWork(kept(TIGHT_TEXT), () => 'the variant "A" cannot be solved. The fillet does not fit');
    expect(judged).toEqual({ reason: 'The work kept from your last visit cannot be solved. The variant "A" cannot be solved. The fillet does not fit.' });
  });

  it('keeps nothing when unreadable work cannot be moved aside, and leaves it where it was', async () => {
    const storage = storageWith('not kept work at all');
    storage.failWith = quotaError();
    const started = await startStore(SAMPLE_TEXT, Promise.resolve(storage), null, NOW);
    expect(started.storage).toBeNull();
    expect(started.keepingProblem).toBe("the unreadable work from your last visit could not be set aside (the browser's storage for this page is full), so nothing is written over it");
    expect(started.setAside?.message).toBe('The work kept from your last visit could not be read: it is not a saved section. It is left untouched and the sample is shown.');
    expect(storage.records.get(WORK_KEY)).toBe('not kept work at all');
  });

  it('brings the old local-storage work over once and offers it', async () => {
    const storage = storageWith(undefined);
    const started = await startStore(SAMPLE_TEXT, Promise.resolve(storage), TIGHT_TEXT, NOW);
    expect(started.store.doc).toEqual(loadDocument(TIGHT_TEXT));
    expect(asKeptWork(storage.records.get(WORK_KEY))?.text).toBe(TIGHT_TEXT);
    expect(storage.records.get(MOVED_KEY)).toBe(true);
    expect(started.recent.map((e) => e.title)).toEqual(['Street intake, 46 mm valve: tight short side']);
  });

  it('without IndexedDB still offers the old local-storage work, and says nothing will be kept', async () => {
    const refused = Promise.reject<KeptStorage>(new DOMException('no', 'SecurityError'));
    const started = await startStore(SAMPLE_TEXT, refused, saveDocument(loadDocument(TIGHT_TEXT)), NOW);
    expect(started.store.doc).toEqual(loadDocument(TIGHT_TEXT));
    expect(started.storage).toBeNull();
    expect(started.keepingProblem).toBe('this browser does not let the page keep data (storage is turned off, or this is a private window)');
  });
});

/** The kept records: the recent list, set-aside copies (moved, never lost) and the one-time move from local storage. */
import { describe, expect, it } from 'vitest';
import {
  asKeptWork, asRecentList, LEGACY_KEY, MOVED_KEY, moveLegacyWork, RECENT_CAP, RECENT_KEY, setAside, setAsideCopies,
  setAsideText, titleOfText, withRecent, WORK_KEY, type RecentEntry,
} from '../../../src/app/keeping/records.ts';
import { storageProblem } from '../../../src/app/keeping/storage.ts';
import { offerText, whenChanged } from '../../../src/app/keeping/notices.ts';
import { FakeKeptStorage, quotaError } from './fake-storage.ts';

const entry = (title: string, changedAt: number): RecentEntry => ({ title, changedAt, text: `{"title":"${title}"}` });
const NOW = Date.UTC(2026, 11, 5, 21, 40);

describe('the recent list', () => {
  it('puts the newest first, keeps one entry per title and at most eight', () => {
    let list: RecentEntry[] = [];
    for (let i = 0; i < 10; i++) list = withRecent(list, entry(`Head ${i}`, i));
    expect(list.map((e) => e.title)).toEqual(['Head 9', 'Head 8', 'Head 7', 'Head 6', 'Head 5', 'Head 4', 'Head 3', 'Head 2']);
    expect(RECENT_CAP).toBe(8);
    list = withRecent(list, entry('Head 5', 20));
    expect(list.map((e) => e.title).slice(0, 3)).toEqual(['Head 5', 'Head 9', 'Head 8']);
    expect(list.filter((e) => e.title === 'Head 5')).toEqual([entry('Head 5', 20)]);
  });

  it('reads a stored list, leaving out entries not shaped as one', () => {
    expect(asRecentList([entry('A', 1), { title: 'no text', changedAt: 2 }, 'junk', null])).toEqual([entry('A', 1)]);
    expect(asRecentList('not a list')).toEqual([]);
  });
});

describe('kept work records', () => {
  it('are read only when shaped as kept work', () => {
    expect(asKeptWork({ text: '{}', title: 'T', changedAt: 5, unsaved: false })).toEqual({ text: '{}', title: 'T', changedAt: 5, unsaved: false });
    expect(asKeptWork({ text: '{}', changedAt: 5 })).toEqual({ text: '{}', title: '', changedAt: 5, unsaved: true });
    expect(asKeptWork({ text: 3, changedAt: 5 })).toBeNull();
    expect(asKeptWork('{"format":"portwright-section"}')).toBeNull();
  });

  it('title of a section text, or nothing when it is not one', () => {
    expect(titleOfText('{"title": "Bowl study"}')).toBe('Bowl study');
    expect(titleOfText('{"title": 4}')).toBe('');
    expect(titleOfText('half a {')).toBe('');
  });
});

describe('setting kept work aside', () => {
  it('moves it to a record of its own in one write, and a second one the same moment gets another key', async () => {
    const storage = new FakeKeptStorage();
    storage.records.set(WORK_KEY, 'garbage one');
    const first = await setAside(storage, 'garbage one', 'It could not be read.', NOW);
    expect(storage.records.has(WORK_KEY)).toBe(false);
    expect(storage.writes).toBe(1);
    storage.records.set(WORK_KEY, 'garbage two');
    const second = await setAside(storage, 'garbage two', 'It could not be read.', NOW);
    expect(second).not.toBe(first);
    const copies = await setAsideCopies(storage);
    expect(copies.map(({ copy }) => copy.value)).toEqual(['garbage one', 'garbage two']);
    expect(copies[0].copy).toEqual({ value: 'garbage one', reason: 'It could not be read.', setAsideAt: NOW });
  });

  it('leaves the work where it was when the browser refuses the write', async () => {
    const storage = new FakeKeptStorage();
    storage.records.set(WORK_KEY, 'garbage');
    storage.failWith = quotaError();
    await expect(setAside(storage, 'garbage', 'It could not be read.', NOW)).rejects.toThrow(/quota/);
    expect(storage.records.get(WORK_KEY)).toBe('garbage');
    expect(await setAsideCopies(storage)).toEqual([]);
  });

  it('downloads as the section text it held, or as what was stored', () => {
    expect(setAsideText({ value: { text: '{"a":1}', changedAt: 1 }, reason: '', setAsideAt: 0 })).toBe('{"a":1}');
    expect(setAsideText({ value: 'raw words', reason: '', setAsideAt: 0 })).toBe('raw words');
    expect(setAsideText({ value: { odd: [1, 2] }, reason: '', setAsideAt: 0 })).toBe('{\n  "odd": [\n    1,\n    2\n  ]\n}');
  });
});

describe('the old local-storage autosave', () => {
  it('is brought over once, into the work and the recent list', async () => {
    const storage = new FakeKeptStorage();
    await moveLegacyWork(storage, '{"title": "Old head"}', NOW);
    expect(storage.records.get(WORK_KEY)).toEqual({ text: '{"title": "Old head"}', title: 'Old head', changedAt: NOW, unsaved: true });
    expect(storage.records.get(RECENT_KEY)).toEqual([{ text: '{"title": "Old head"}', title: 'Old head', changedAt: NOW }]);
    expect(storage.records.get(MOVED_KEY)).toBe(true);
    storage.records.delete(WORK_KEY);
    await moveLegacyWork(storage, '{"title": "Old head"}', NOW + 1);
    expect(storage.records.has(WORK_KEY)).toBe(false);
    expect(LEGACY_KEY).toBe('portwright.autosave');
  });

  it('never writes over newer work already kept', async () => {
    const storage = new FakeKeptStorage();
    storage.records.set(WORK_KEY, { text: '{"title": "Newer"}', title: 'Newer', changedAt: 1, unsaved: true });
    await moveLegacyWork(storage, '{"title": "Old head"}', NOW);
    expect((storage.records.get(WORK_KEY) as { title: string }).title).toBe('Newer');
    expect(storage.records.get(MOVED_KEY)).toBe(true);
  });
});

describe('why the browser would not keep the work', () => {
  it('is said in plain words for the usual refusals', () => {
    expect(storageProblem(quotaError())).toBe("the browser's storage for this page is full");
    expect(storageProblem(new DOMException('no', 'SecurityError'))).toBe('this browser does not let the page keep data (storage is turned off, or this is a private window)');
    expect(storageProblem(new DOMException('no', 'InvalidStateError'))).toBe(storageProblem(new DOMException('no', 'NotSupportedError')));
    expect(storageProblem(new DOMException('odd', 'DataCloneError'))).toBe('the browser refused to keep it (DataCloneError)');
    expect(storageProblem('odd')).toBe('the browser refused to keep it');
  });
});

describe('the offer of kept work', () => {
  it('names the work and when it changed, today or on another day', () => {
    const earlier = NOW - 5 * 60_000;
    expect(whenChanged(earlier, NOW)).toMatch(/^today at \S/);
    expect(whenChanged(NOW - 3 * 86_400_000, NOW)).toMatch(/2026 at \S/);
    const work = { text: '{}', title: 'Bowl study', changedAt: earlier, unsaved: true };
    expect(offerText(work, NOW)).toBe(`Keep working on "Bowl study" (changed ${whenChanged(earlier, NOW)})?`);
    expect(offerText({ ...work, title: '' }, NOW)).toMatch(/^Keep working on "your section" \(changed today at .+\)\?$/);
  });
});

/** The bench panel's storage of its display units: writes held back, inputs of old visits handed over once, and a storage that fails never breaks the panel. */

import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { initialBenchState, setAreas, setUnit, typeField } from '../../../src/app/bench-panel/model.ts';
import { savedBench } from '../../../src/app/bench-panel/saved.ts';
import { BENCH_STORAGE_KEY, BENCH_WRITE_DELAY_MS, benchStore, type BenchStorage } from '../../../src/app/bench-panel/store.ts';

/** An in-memory storage that counts writes, and can be made to fail as a full or disabled one does. */
function fakeStorage(initial: Record<string, string> = {}) {
  const items = new Map(Object.entries(initial));
  const store = {
    writes: 0,
    failing: false,
    getItem(key: string): string | null {
      if (store.failing) throw new DOMException('storage disabled', 'SecurityError');
      return items.get(key) ?? null;
    },
    setItem(key: string, value: string): void {
      if (store.failing) throw new DOMException('quota exceeded', 'QuotaExceededError');
      store.writes++;
      items.set(key, value);
    },
    items,
  };
  return store satisfies BenchStorage;
}

beforeEach(() => {
  vi.useFakeTimers();
});
afterEach(() => {
  vi.useRealTimers();
});

const typedBore = typeField(setUnit(initialBenchState(), 'length', 'inch'), 'bore', '4.03');

describe('bench panel storage', () => {
  it('writes once changes pause, the last units only, under its own key', () => {
    const storage = fakeStorage();
    const kept = benchStore(storage);
    kept.changed(setUnit(initialBenchState(), 'length', 'inch'));
    kept.changed(setUnit(initialBenchState(), 'flow', 'L/s'));
    vi.advanceTimersByTime(BENCH_WRITE_DELAY_MS - 1);
    kept.changed(typeField(setUnit(initialBenchState(), 'pressure', 'Pa'), 'bore', '102'));
    vi.advanceTimersByTime(BENCH_WRITE_DELAY_MS - 1);
    expect(storage.writes).toBe(0);
    vi.advanceTimersByTime(1);
    expect(storage.writes).toBe(1);
    const stored = JSON.parse(storage.items.get(BENCH_STORAGE_KEY)!);
    expect(stored).toEqual({ version: 2, units: { ...initialBenchState().units, pressure: 'Pa' } });
    expect([...storage.items.keys()]).toEqual(['portwright.bench']);
  });

  it('the next visit reads back the units, not what was typed (that is kept in the document)', () => {
    const storage = fakeStorage();
    const first = benchStore(storage);
    first.changed(typedBore);
    first.flush();
    const back = benchStore(storage).restore(initialBenchState());
    expect(back.units.length).toBe('inch');
    expect(back.fields.bore).toEqual({ text: '', valueSI: null });
  });

  it('areas sent again and again by the app do not rewrite an unchanged store', () => {
    const storage = fakeStorage({ [BENCH_STORAGE_KEY]: JSON.stringify(savedBench(typedBore)) });
    const kept = benchStore(storage);
    let s = kept.restore(initialBenchState());
    for (const head of [1e-3, 1.5e-3, 2e-3]) {
      s = setAreas(typeField(s, 'rpm', String(head * 1e6)), { valveHead: head });
      kept.changed(s);
      vi.advanceTimersByTime(BENCH_WRITE_DELAY_MS);
    }
    expect(storage.writes).toBe(0);
    kept.changed(setUnit(s, 'speed', 'ft/s'));
    kept.flush();
    expect(storage.writes).toBe(1);
  });

  it('hands over the inputs an older visit kept (version 1) once, then keeps the units alone', () => {
    const legacy = { version: 1, units: { ...initialBenchState().units, length: 'inch' }, fields: { bore: { text: '4.03' } }, flowScale: 'mean port speed' };
    const storage = fakeStorage({ [BENCH_STORAGE_KEY]: JSON.stringify(legacy) });
    const kept = benchStore(storage);
    const base = kept.restore(initialBenchState());
    expect(base.units.length).toBe('inch');
    const taken = kept.takeLegacy(base);
    expect(taken?.fields.bore).toEqual(typedBore.fields.bore);
    expect(taken?.flowScale).toBe('mean port speed');
    expect(JSON.parse(storage.items.get(BENCH_STORAGE_KEY)!)).toEqual({ version: 2, units: base.units });
    expect(kept.takeLegacy(base)).toBeNull();
    expect(benchStore(storage).takeLegacy(initialBenchState())).toBeNull();
    expect(benchStore(fakeStorage()).takeLegacy(initialBenchState())).toBeNull();
  });

  it('flush writes a waiting change at once and leaves no timer behind', () => {
    const storage = fakeStorage();
    const kept = benchStore(storage);
    kept.changed(typedBore);
    kept.flush();
    expect(storage.writes).toBe(1);
    expect(vi.getTimerCount()).toBe(0);
    kept.flush();
    expect(storage.writes).toBe(1);
  });

  it('a storage that throws on read or write, or holds text that is not JSON, gives a fresh panel and no error', () => {
    const base = initialBenchState();
    const failing = fakeStorage();
    failing.failing = true;
    const kept = benchStore(failing);
    expect(kept.restore(base)).toBe(base);
    kept.changed(typedBore);
    expect(() => vi.advanceTimersByTime(BENCH_WRITE_DELAY_MS)).not.toThrow();
    expect(() => kept.flush()).not.toThrow();
    for (const text of ['{"version":1,', 'undefined', '']) {
      expect(benchStore(fakeStorage({ [BENCH_STORAGE_KEY]: text })).restore(base)).toBe(base);
    }
  });

  it('null storage keeps nothing and sets no timers', () => {
    const kept = benchStore(null);
    const base = initialBenchState();
    expect(kept.restore(base)).toBe(base);
    kept.changed(typedBore);
    expect(vi.getTimerCount()).toBe(0);
  });
});

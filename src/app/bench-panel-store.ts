/** Keeps the bench panel's inputs in the browser's storage between visits: one read at mount, writes held back. */

import type { BenchPanelState } from './bench-panel-model.ts';
import { restoreBench, savedBench } from './bench-panel-saved.ts';

/** Where the panel's inputs live; the document's own autosave has a key of its own. */
export const BENCH_STORAGE_KEY = 'portwright.bench';

/** Quiet time after the last change before it is written, ms: typing a number is one write, not one per key. */
export const BENCH_WRITE_DELAY_MS = 500;

/** The part of the Web Storage API the panel uses (window.localStorage in the page, a fake in tests). */
export type BenchStorage = Pick<Storage, 'getItem' | 'setItem'>;

export interface BenchStore {
  /** The panel as the last visit left it, put onto `base`; `base` when nothing usable is kept. */
  restore(base: BenchPanelState): BenchPanelState;
  /** The panel changed: it is written once no change has come for the write delay. */
  changed(state: BenchPanelState): void;
  /** Write a change still waiting now (the page is going away, the panel is disposed). */
  flush(): void;
}

/** A store over `storage`; null keeps nothing. Storage that is disabled, full or throwing never breaks the panel. */
export function benchStore(storage: BenchStorage | null, delayMs = BENCH_WRITE_DELAY_MS): BenchStore {
  let pending: BenchPanelState | null = null;
  let timer: ReturnType<typeof setTimeout> | undefined;
  /** What the storage holds as far as this panel knows, so repeats (areas sent on every edit) are not rewritten. */
  let lastText: string | null = null;

  function flush(): void {
    clearTimeout(timer);
    timer = undefined;
    if (!storage || !pending) return;
    const text = JSON.stringify(savedBench(pending));
    pending = null;
    if (text === lastText) return;
    try {
      storage.setItem(BENCH_STORAGE_KEY, text);
      lastText = text;
    } catch {
      // Storage full or disabled: the panel still works, it just starts fresh next time.
    }
  }

  return {
    restore(base) {
      if (!storage) return base;
      try {
        const text = storage.getItem(BENCH_STORAGE_KEY);
        lastText = text;
        return text === null ? base : restoreBench(JSON.parse(text), base);
      } catch {
        return base;
      }
    },
    changed(state) {
      if (!storage) return;
      pending = state;
      clearTimeout(timer);
      timer = setTimeout(flush, delayMs);
    },
    flush,
  };
}

/** Keeps the bench panel's display units in the browser's storage between visits, and hands over inputs kept there before. */

import type { BenchPanelState } from './model.ts';
import { restoreLegacyBench, restoreUnits, savedBench } from './saved.ts';

/** Where the panel's units live; the document's own autosave has a key of its own. */
export const BENCH_STORAGE_KEY = 'portwright.bench';

/** Quiet time after the last change before it is written, ms: a burst of changes is one write. */
export const BENCH_WRITE_DELAY_MS = 500;

/** The part of the Web Storage API the panel uses (window.localStorage in the page, a fake in tests). */
export type BenchStorage = Pick<Storage, 'getItem' | 'setItem'>;

export interface BenchStore {
  /** The panel with the units the last visit left, put onto `base`; `base` when nothing usable is kept. */
  restore(base: BenchPanelState): BenchPanelState;
  /**
   * The inputs a browser kept before they were saved in the document, put onto `base`, or null when there are none.
   * Taking them rewrites the store with the units alone, so they are handed over once.
   */
  takeLegacy(base: BenchPanelState): BenchPanelState | null;
  /** The panel changed: its units are written once no change has come for the write delay. */
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
      // Storage full or disabled: the panel still works, it just starts in its default units next time.
    }
  }

  function read(): unknown {
    if (!storage) return null;
    try {
      lastText = storage.getItem(BENCH_STORAGE_KEY);
      return lastText === null ? null : JSON.parse(lastText);
    } catch {
      return null;
    }
  }

  return {
    restore: (base) => restoreUnits(read(), base),
    takeLegacy(base) {
      const legacy = restoreLegacyBench(read(), base);
      if (legacy === null) return null;
      pending = base;
      flush();
      return legacy;
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

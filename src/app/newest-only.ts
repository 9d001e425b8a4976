/** Coalesces events that arrive faster than the page takes them: only the newest is handled. */

/**
 * Handles only the newest of events that arrive faster than the page takes them: each one replaces the one
 * waiting, and the waiting one is handled in a task of its own right after the events queued before it.
 */
export function newestOnly<E>(handle: (event: E) => void): { handle: (event: E) => void; cancel: () => void } {
  let waiting: E | null = null;
  let timer: ReturnType<typeof setTimeout> | undefined;
  return {
    handle: (event) => {
      if (waiting === null) {
        timer = setTimeout(() => {
          const newest = waiting as E;
          waiting = null;
          handle(newest);
        }, 0);
      }
      waiting = event;
    },
    cancel: () => {
      clearTimeout(timer);
      waiting = null;
    },
  };
}

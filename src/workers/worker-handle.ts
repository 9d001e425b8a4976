/** One solver worker as its client sees it: a comlink endpoint, word that it died, and a way to end it. */
import type * as Comlink from 'comlink';

export interface WorkerHandle {
  readonly endpoint: Comlink.Endpoint;
  /** Calls `listener` when the worker fails on its own (an uncaught error, a message that could not be read). */
  onDeath(listener: (reason: string) => void): void;
  /** Ends the worker; safe to call on one already ended. */
  terminate(): void;
}

/** A browser Worker: its `error` and `messageerror` events are taken as death (a worker terminated from outside
 * says nothing at all; the client's watchdog finds it). */
export function browserWorker(worker: Worker): WorkerHandle {
  return {
    endpoint: worker,
    onDeath(listener) {
      worker.addEventListener('error', (event) => listener(event.message || 'the worker failed'));
      worker.addEventListener('messageerror', () => listener('a message from the worker could not be read'));
    },
    terminate: () => worker.terminate(),
  };
}

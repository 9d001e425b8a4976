/** The browser's IndexedDB as a small promise-based key-value store: where the app keeps work between visits. */

/** Records kept under string keys; values are anything the browser can clone (plain objects, strings, numbers). */
export interface KeptStorage {
  /** The value under `key`, or undefined when there is none. */
  get(key: string): Promise<unknown>;
  /** Writes `entries` and removes `remove` in one transaction: all of it lands or none of it does. */
  write(entries: ReadonlyArray<readonly [string, unknown]>, remove?: readonly string[]): Promise<void>;
  /** Every key held. */
  keys(): Promise<string[]>;
}

const DB_NAME = 'portwright';
const STORE_NAME = 'kept';

/** Opens (creating on first use) the app's database; rejects when the browser has none or refuses it. */
export function openKeptStorage(factory: IDBFactory | undefined = globalThis.indexedDB, timeoutMs = 5000): Promise<KeptStorage> {
  return new Promise((resolve, reject) => {
    if (factory === undefined) {
      reject(new DOMException('This browser has no IndexedDB.', 'NotSupportedError'));
      return;
    }
    // A browser that never answers (another tab holding an old version open) must not hold up the start.
    const timer = setTimeout(() => reject(new DOMException('IndexedDB did not open in time.', 'TimeoutError')), timeoutMs);
    try {
      const request = factory.open(DB_NAME, 1);
      request.onupgradeneeded = () => request.result.createObjectStore(STORE_NAME);
      request.onsuccess = () => {
        clearTimeout(timer);
        resolve(wrap(request.result));
      };
      request.onerror = () => {
        clearTimeout(timer);
        reject(request.error ?? new DOMException('IndexedDB did not open.', 'UnknownError'));
      };
    } catch (error) {
      clearTimeout(timer);
      reject(error);
    }
  });
}

function wrap(db: IDBDatabase): KeptStorage {
  /** Runs `body` in one transaction; resolves with the last request's result when the transaction has committed. */
  const run = <T>(mode: IDBTransactionMode, body: (store: IDBObjectStore) => IDBRequest<T> | undefined): Promise<T> =>
    new Promise((resolve, reject) => {
      let tx: IDBTransaction | undefined;
      try {
        tx = db.transaction(STORE_NAME, mode);
        const request = body(tx.objectStore(STORE_NAME));
        const done = tx;
        done.oncomplete = () => resolve(request?.result as T);
        // A full disk shows up as an aborted transaction whose error is a QuotaExceededError.
        done.onabort = () => reject(done.error ?? request?.error ?? new DOMException('The write was abandoned.', 'AbortError'));
      } catch (error) {
        // A request refused as it was made: nothing of the transaction may land (a move must not lose its source).
        try {
          tx?.abort();
        } catch {
          // Already finished: nothing was written by it.
        }
        reject(error);
      }
    });
  return {
    get: (key) => run('readonly', (store) => store.get(key)),
    write: async (entries, remove = []) => {
      await run('readwrite', (store) => {
        for (const [key, value] of entries) store.put(value, key);
        for (const key of remove) store.delete(key);
        return undefined;
      });
    },
    keys: async () => (await run('readonly', (store) => store.getAllKeys())).map(String),
  };
}

/** Why the browser would not keep the work, as a clause for "Not saved: … .", from the error it gave. */
export function storageProblem(error: unknown): string {
  const name = error instanceof Error || error instanceof DOMException ? error.name : '';
  switch (name) {
    case 'QuotaExceededError':
      return "the browser's storage for this page is full";
    case 'SecurityError':
    case 'InvalidStateError':
    case 'NotAllowedError':
    case 'NotSupportedError':
      return 'this browser does not let the page keep data (storage is turned off, or this is a private window)';
    case 'TimeoutError':
      return 'the browser did not open its storage in time (another Portwright tab may be holding it)';
    default:
      return `the browser refused to keep it${name ? ` (${name})` : ''}`;
  }
}

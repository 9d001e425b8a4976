/** An in-memory KeptStorage for unit tests: values are cloned as IndexedDB clones them; writes can be made to fail. */
import type { KeptStorage } from '../../../src/app/keeping/storage.ts';

export class FakeKeptStorage implements KeptStorage {
  readonly records = new Map<string, unknown>();
  /** Set to make every write fail with this error (nothing of the write lands, as with a transaction). */
  failWith: Error | null = null;
  writes = 0;

  async get(key: string): Promise<unknown> {
    return structuredClone(this.records.get(key));
  }

  async write(entries: ReadonlyArray<readonly [string, unknown]>, remove: readonly string[] = []): Promise<void> {
    if (this.failWith) throw this.failWith;
    this.writes++;
    for (const [key, value] of entries) this.records.set(key, structuredClone(value));
    for (const key of remove) this.records.delete(key);
  }

  async keys(): Promise<string[]> {
    return [...this.records.keys()];
  }
}

/** The error a browser gives when its storage for the page is full. */
export const quotaError = (): Error => new DOMException('The quota has been exceeded.', 'QuotaExceededError');

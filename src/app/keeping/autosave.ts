/** Keeps the current work in the browser (IndexedDB) after each committed change, and says whether it is kept. */
import { saveDocument } from '../../document/load.ts';
import type { PortDocument } from '../../document/types.ts';
import type { DocumentStore } from '../document-store.ts';
import { RECENT_KEY, withRecent, WORK_KEY, type KeptWork, type RecentEntry } from './records.ts';
import { storageProblem, type KeptStorage } from './storage.ts';

/** Whether the work is kept in this browser: nothing written yet, written, waiting to be written, or refused with a reason. */
export type SavedState =
  | { readonly kind: 'idle' }
  | { readonly kind: 'saved' }
  | { readonly kind: 'saving' }
  | { readonly kind: 'failed'; readonly reason: string };

export interface AutosaveHooks {
  /** The saved state changed; `firstFailure` is true for a refusal after a write that landed (say it in the status line). */
  readonly onState: (state: SavedState, firstFailure: boolean) => void;
  /** The recent list after a write (the Recent menu shows it). */
  readonly onRecent?: (recent: readonly RecentEntry[]) => void;
  /** ms since 1970 (Date.now in the app; a fixed clock in tests). */
  readonly now: () => number;
}

/** Quiet time after a change before it is written, ms. */
export const AUTOSAVE_DELAY_MS = 600;

/**
 * Writes the work and the recent list together after `delayMs` without a newer change; writes never overlap and
 * the newest change is always the last written. Without storage (`problem` says why) every change reports 'failed'.
 */
export class Autosaver {
  private timer: ReturnType<typeof setTimeout> | undefined;
  private waiting: { doc: PortDocument; unsaved: boolean } | null = null;
  private writing: Promise<void> = Promise.resolve();
  private state: SavedState;
  /** The last write was refused (a new refusal is said once, not at every change). */
  private refused: boolean;

  constructor(
    private readonly storage: KeptStorage | null,
    private recent: RecentEntry[],
    private readonly hooks: AutosaveHooks,
    private readonly problem: string | null = null,
    private readonly delayMs = AUTOSAVE_DELAY_MS,
    /** The work shown at the start was read from storage (so it is kept already). */
    kept = false,
  ) {
    this.state = storage === null ? { kind: 'failed', reason: problem ?? storageProblem(null) } : { kind: kept ? 'saved' : 'idle' };
    this.refused = storage === null;
  }

  get current(): SavedState {
    return this.state;
  }

  get recentList(): readonly RecentEntry[] {
    return this.recent;
  }

  /**
   * Writes every committed change of `store` (a drag's steps are not committed: only its release is written);
   * `isUnsaved` says whether a document has changes not in a file saved or opened.
   */
  follow(store: DocumentStore, isUnsaved: (doc: PortDocument) => boolean): () => void {
    return store.subscribe((doc, cause) => {
      if (cause !== 'drag') this.changed(doc, isUnsaved(doc));
    });
  }

  /** A committed change (never a mid-drag step): written once the changes pause. */
  changed(doc: PortDocument, unsaved: boolean): void {
    this.waiting = { doc, unsaved };
    if (this.storage === null) return this.report(this.state);
    this.report({ kind: 'saving' });
    clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.flush(), this.delayMs);
  }

  /** Writes a waiting change now (the page is being hidden, or a test wants it); resolves when written or refused. */
  flush(): Promise<void> {
    clearTimeout(this.timer);
    const next = this.waiting;
    this.waiting = null;
    if (next === null || this.storage === null) return this.writing;
    this.writing = this.writing.then(() => this.write(next.doc, next.unsaved));
    return this.writing;
  }

  private async write(doc: PortDocument, unsaved: boolean): Promise<void> {
    const storage = this.storage as KeptStorage;
    const work: KeptWork = { text: saveDocument(doc), title: doc.title, changedAt: this.hooks.now(), unsaved };
    const recent = withRecent(this.recent, { title: work.title, changedAt: work.changedAt, text: work.text });
    try {
      await storage.write([[WORK_KEY, work], [RECENT_KEY, recent]]);
      this.recent = recent;
      this.hooks.onRecent?.(recent);
      // A newer change waiting to be written keeps the state at 'saving'.
      if (this.waiting === null) this.report({ kind: 'saved' });
    } catch (error) {
      this.report({ kind: 'failed', reason: storageProblem(error) });
    }
  }

  private report(state: SavedState): void {
    const firstFailure = state.kind === 'failed' && !this.refused;
    if (state.kind !== 'saving') this.refused = state.kind === 'failed';
    this.state = state;
    this.hooks.onState(state, firstFailure);
  }
}

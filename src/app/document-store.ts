/**
 * The one place every edit goes through: holds the document and its undo history, checks each change before it
 * lands (no invalid document is ever committed), applies named edits, tells listeners.
 */
import type { PortDocument } from '../document/types.ts';
import { emptyHistory, recordStep, redoLabels, redoStep, undoLabels, undoStep, HISTORY_CAP, type History } from './history.ts';

/**
 * Why the document changed: a drag in progress wants a coarse solve; 'open' is a file (or a change of units) that
 * brings its own view, or the undo or redo of one; 'history' any other undo or redo; anything else is an 'edit'.
 */
export type ChangeCause = 'drag' | 'edit' | 'open' | 'history';

export type ApplyEdit = (doc: PortDocument, name: string, args: unknown) => PortDocument;
type Listener = (doc: PortDocument, cause: ChangeCause) => void;

/** What the store checks a change against; the app's guard builds every changed variant (see document-check.ts). */
export interface DocumentGuard {
  /** Throws an error with a plain message when `doc` must not be committed; `before` is the committed document. */
  readonly check: (doc: PortDocument, before?: PortDocument) => void;
  /** For a drag step the check refused: the same edit at its nearest valid value, with the reason, or null. */
  readonly clamp?: (doc: PortDocument, name: string, args: unknown, error: unknown, shrink: number) => { args: unknown; note: string } | null;
}

export interface StoreOptions {
  readonly guard?: DocumentGuard;
  /** An edit's name in the history list, e.g. "Set fillet radius" for setFilletRadius. */
  readonly label?: (name: string) => string;
  readonly cap?: number;
}

/**
 * Recording rule: every committed edit, opened file and change of units is one undo step. A drag is one step from
 * the document before its first step to the document at release (endDrag); its steps in between are not recorded,
 * and a cancelled drag (cancelDrag) leaves no step. Undo and redo are refused while a drag is open.
 */
export class DocumentStore {
  private current: PortDocument;
  private history: History<PortDocument> = emptyHistory();
  /** The document before the open drag's first step, and the drag's label; null when no drag is open. */
  private drag: { readonly before: PortDocument; readonly label: string } | null = null;
  private readonly listeners = new Set<Listener>();

  constructor(initial: PortDocument, private readonly apply: ApplyEdit, private readonly options: StoreOptions = {}) {
    this.current = initial;
  }

  get doc(): PortDocument {
    return this.current;
  }

  /**
   * Apply a named edit. Throws the edit's own error, or the guard's when the result cannot be solved, and keeps the
   * document unchanged. A drag step the guard refuses is clamped to its nearest valid value where it has one: the
   * reason is returned (to show), else undefined.
   */
  edit(name: string, args: unknown, cause: ChangeCause = 'edit'): string | undefined {
    const label = this.options.label?.(name) ?? name;
    if (cause === 'drag') this.drag ??= { before: this.current, label };
    else if (this.drag) this.endDrag();
    const before = this.current;
    const next = this.apply(before, name, args);
    if (next === before) return undefined;
    let checked: { doc: PortDocument; note?: string };
    try {
      this.options.guard?.check(next, before);
      checked = { doc: next };
    } catch (error) {
      if (cause !== 'drag') throw error;
      checked = this.clamped(name, args, error);
      if (checked.doc === before) return checked.note;
    }
    // Recorded before listeners hear of it, so they see the history that includes it.
    if (cause !== 'drag') this.record(before, checked.doc, label, cause === 'open');
    this.set(checked.doc, cause);
    return checked.note;
  }

  /** Replace the whole document (a file was opened): checked like an edit, one undo step named `label`. */
  replace(doc: PortDocument, label: string, cause: ChangeCause = 'open'): void {
    if (this.drag) this.cancelDrag();
    this.options.guard?.check(doc);
    const before = this.current;
    this.record(before, doc, label, true);
    this.set(doc, cause);
  }

  /** The drag was let go: its steps become one undo step, and listeners hear an 'edit' (the full grid follows). */
  endDrag(): void {
    const drag = this.drag;
    this.drag = null;
    if (drag) this.record(drag.before, this.current, drag.label);
    this.notify('edit');
  }

  /** The drag was cancelled (Escape, or the browser took the pointer): back to the document before it, no step. */
  cancelDrag(): void {
    const drag = this.drag;
    this.drag = null;
    if (drag) this.set(drag.before, 'edit');
  }

  /** Undo the last step; returns its label, or null when there is nothing to undo (or a drag is open). */
  undo(): string | null {
    const undone = this.drag ? null : undoStep(this.history);
    if (undone === null) return null;
    this.history = undone.history;
    this.set(undone.step.before, undone.step.wholeDocument ? 'open' : 'history');
    return undone.step.label;
  }

  /** Redo the last undone step; returns its label, or null when there is nothing to redo (or a drag is open). */
  redo(): string | null {
    const redone = this.drag ? null : redoStep(this.history);
    if (redone === null) return null;
    this.history = redone.history;
    this.set(redone.step.after, redone.step.wholeDocument ? 'open' : 'history');
    return redone.step.label;
  }

  /** Labels of what undo would undo, newest first, and of what redo would redo, next first (at most `count` each). */
  steps(count: number): { readonly undo: string[]; readonly redo: string[] } {
    return { undo: undoLabels(this.history, count), redo: redoLabels(this.history, count) };
  }

  subscribe(listener: Listener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /** A refused drag step at its nearest valid value (a second try a hair smaller), or the guard's error again. */
  private clamped(name: string, args: unknown, error: unknown): { doc: PortDocument; note: string } {
    const clamp = this.options.guard?.clamp;
    for (const shrink of [1, 1 - 1e-6]) {
      const nearer = clamp?.(this.current, name, args, error, shrink) ?? null;
      if (nearer === null) break;
      try {
        const doc = this.apply(this.current, name, nearer.args);
        this.options.guard?.check(doc, this.current);
        return { doc, note: nearer.note };
      } catch {
        // Rounding put the largest radius a hair over: try once more, a hair smaller.
      }
    }
    throw error;
  }

  private record(before: PortDocument, after: PortDocument, label: string, wholeDocument = false): void {
    this.history = recordStep(this.history, { before, after, label, wholeDocument }, this.options.cap ?? HISTORY_CAP);
  }

  private set(doc: PortDocument, cause: ChangeCause): void {
    this.current = doc;
    this.notify(cause);
  }

  private notify(cause: ChangeCause): void {
    for (const listener of this.listeners) listener(this.current, cause);
  }
}

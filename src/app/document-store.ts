/** The one place every edit goes through: holds the document, applies named edits, tells listeners. */
import type { PortDocument } from '../document/types.ts';

/** Why the document changed: a drag in progress wants a coarse solve; anything else a full one. */
export type ChangeCause = 'drag' | 'edit' | 'open';

export type ApplyEdit = (doc: PortDocument, name: string, args: unknown) => PortDocument;
type Listener = (doc: PortDocument, cause: ChangeCause) => void;

export class DocumentStore {
  private current: PortDocument;
  private readonly listeners = new Set<Listener>();

  constructor(initial: PortDocument, private readonly apply: ApplyEdit) {
    this.current = initial;
  }

  get doc(): PortDocument {
    return this.current;
  }

  /** Apply a named edit; throws the edit's own error (with a plain message) and keeps the document unchanged. */
  edit(name: string, args: unknown, cause: ChangeCause = 'edit'): void {
    const next = this.apply(this.current, name, args);
    if (next === this.current) return;
    this.set(next, cause);
  }

  /** Replace the whole document (a file was opened, or a cancelled drag goes back to where it started). */
  replace(doc: PortDocument, cause: ChangeCause = 'open'): void {
    this.set(doc, cause);
  }

  /** Tell listeners again (e.g. a drag ended: the last coarse state now wants the full grid). */
  touch(cause: ChangeCause): void {
    this.notify(cause);
  }

  subscribe(listener: Listener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  private set(doc: PortDocument, cause: ChangeCause): void {
    this.current = doc;
    this.notify(cause);
  }

  private notify(cause: ChangeCause): void {
    for (const listener of this.listeners) listener(this.current, cause);
  }
}

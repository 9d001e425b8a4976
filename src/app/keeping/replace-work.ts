/** Replacing the work with another document (a file, a recent one, the sample): one undoable step, asked first over unsaved work. */
import type { PortDocument } from '../../document/types.ts';
import { checkDocument } from '../document-check.ts';
import type { DocumentStore } from '../document-store.ts';
import { askToReplace } from './replace-dialog.ts';

/** How an open is named: in the undo list ("Open \"a.json\""), in the question ("opening \"a.json\""), once done. */
export interface OpenWords {
  readonly label: string;
  readonly doing: string;
  readonly opened: string;
}

export class WorkReplacer {
  /** Heard after each replace (the offer of the last visit's work goes then). */
  onReplaced: () => void = () => {};

  /** `baseline`: the document as last saved or opened (null when the work shown has changes not in a file). */
  constructor(private readonly store: DocumentStore, private readonly say: (message: string) => void, private baseline: PortDocument | null) {}

  /** True when `doc` has changes not in a file saved or opened (undoing back to that file makes it false again). */
  isUnsaved(doc: PortDocument): boolean {
    return doc !== this.baseline;
  }

  /** The document in the store was saved to a file, or is to be treated as saved. */
  markSaved(doc: PortDocument = this.store.doc): void {
    this.baseline = doc;
  }

  /**
   * Opens `doc` as one undoable step, asking first when it would replace unsaved work, and says `words.opened` when
   * it has; `refused` hears why a document that cannot be solved was not opened (before any question).
   */
  open(doc: PortDocument, words: OpenWords, refused: (error: unknown) => void): void {
    if (!this.isUnsaved(this.store.doc)) return this.commit(doc, words, refused);
    try {
      checkDocument(doc);
    } catch (error) {
      return refused(error);
    }
    const title = this.store.doc.title || 'Your section';
    const text = `"${title}" has changes that are not in a saved file, and ${words.doing} replaces it. Undo brings it back while this page is open.`;
    void askToReplace({ text }).then((replace) => (replace ? this.commit(doc, words, refused) : this.say('Your work is unchanged; nothing was opened.')));
  }

  private commit(doc: PortDocument, words: OpenWords, refused: (error: unknown) => void): void {
    const before = this.baseline;
    // Set first: the autosave that hears of the replace records the work as saved.
    this.baseline = doc;
    try {
      this.store.replace(doc, words.label);
    } catch (error) {
      this.baseline = before;
      refused(error);
      return;
    }
    this.onReplaced();
    this.say(words.opened);
  }
}

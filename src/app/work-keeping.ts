/**
 * Keeping the work in the browser, wired: autosave after each committed change, the saved state, the offer of the
 * last visit's work, set-aside copies, the Recent menu, and asking before unsaved work is replaced.
 */
import { loadDocument } from '../document/load.ts';
import type { PortDocument } from '../document/types.ts';
import { Autosaver, type SavedState } from './autosave.ts';
import { checkDocument } from './document-check.ts';
import type { DocumentStore } from './document-store.ts';
import { downloadText } from './files.ts';
import { offerKeptWork, showSetAside } from './kept-notices.ts';
import { setAsideText, type RecentEntry, type SetAsideCopy } from './kept-records.ts';
import { RecentMenu } from './recent-menu.ts';
import { askToReplace } from './replace-dialog.ts';
import { showSavedState } from './saved-state-view.ts';
import type { StartedWork } from './start-document.ts';
import type { StatusLevel } from './status.ts';

export interface KeepingParts {
  readonly started: StartedWork;
  readonly sampleText: string;
  readonly say: (message: string, level?: StatusLevel) => void;
  readonly element: (id: string) => HTMLElement;
  /** ms since 1970. */
  readonly now: () => number;
}

/** How an open is named: in the undo list ("Open \"a.json\""), in the question ("opening \"a.json\""), once done. */
export interface OpenWords {
  readonly label: string;
  readonly doing: string;
  readonly opened: string;
}

export interface WorkKeeping {
  /**
   * Opens `doc` as one undoable step, asking first when it would replace unsaved work, and says `words.opened` when
   * it has; `refused` hears why a document that cannot be solved was not opened.
   */
  open(doc: PortDocument, words: OpenWords, refused: (error: unknown) => void): void;
  /** The work was saved to a file: it is no longer unsaved. */
  saved(): void;
  /** Writes a waiting change now. */
  flush(): Promise<void>;
  readonly state: SavedState;
}

export function mountWorkKeeping({ started, sampleText, say, element, now }: KeepingParts): WorkKeeping {
  const { store, offer } = started;
  /** The document as last saved or opened; the work is unsaved while the store holds another. */
  let baseline: PortDocument | null = offer?.unsaved ? null : store.doc;
  const offered = store.doc;
  const menu = new RecentMenu(element('recent-button') as HTMLButtonElement, element('recent-menu'), { reopen: (entry) => reopen(entry), now });
  const autosaver = new Autosaver(started.storage, started.recent, {
    now,
    onState: (state, firstFailure) => {
      showSavedState(element('saved-state'), state);
      if (firstFailure && state.kind === 'failed') say(`Your work was not saved in this browser: ${state.reason}. Use Save to keep a file.`, 'error');
    },
    onRecent: (recent) => menu.show(recent),
  }, started.keepingProblem);
  showSavedState(element('saved-state'), autosaver.current);
  menu.show(started.recent);
  autosaver.follow(store, (doc) => doc !== baseline);
  // A tab closed within the quiet time still keeps its last change.
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') void autosaver.flush();
  });

  let dismissOffer: (() => void) | null = null;
  const keeping: WorkKeeping = {
    open(doc, { label, doing, opened }, refused) {
      const commit = () => {
        const before = baseline;
        baseline = doc;
        try {
          store.replace(doc, label);
        } catch (error) {
          baseline = before;
          refused(error);
          return;
        }
        dismissOffer?.();
        say(opened);
      };
      if (store.doc === baseline) return commit();
      try {
        // Refuse a document that cannot be solved before asking about it.
        checkDocument(doc);
      } catch (error) {
        return refused(error);
      }
      const title = store.doc.title || 'Your section';
      const text = `"${title}" has changes that are not in a saved file, and ${doing} replaces it. Undo brings it back while this page is open.`;
      void askToReplace({ text }).then((replace) => (replace ? commit() : say('Your work is unchanged; nothing was opened.')));
    },
    saved() {
      baseline = store.doc;
      autosaver.changed(store.doc, false);
    },
    flush: () => autosaver.flush(),
    get state() {
      return autosaver.current;
    },
  };

  function reopen(entry: RecentEntry): void {
    const name = entry.title || 'the section';
    let doc: PortDocument;
    try {
      doc = loadDocument(entry.text);
    } catch (error) {
      say(`"${name}" from the recent list could not be opened (${firstLine(error)}). Your current work is unchanged.`, 'error');
      return;
    }
    const words = { label: `Open "${name}"`, doing: `opening "${name}"`, opened: `Opened "${name}" from the recent list.` };
    keeping.open(doc, words, (error) => {
      say(`"${name}" from the recent list was not opened: ${firstLine(error)}. Your current work is unchanged.`, 'error');
    });
  }

  if (offer) {
    dismissOffer = offerKeptWork(element('notices'), offer, now(), {
      keep: () => say('Keeping your work from the last visit.'),
      sample: () => {
        const sample = loadDocument(sampleText);
        // Chosen straight away, the offer itself was the question; after changes made since, ask again.
        if (store.doc === offered) baseline = offered;
        const words = { label: 'Start from the sample', doing: 'starting from the sample', opened: 'Started from the sample. Undo brings your work back.' };
        keeping.open(sample, words, (error) => say(firstLine(error), 'error'));
      },
    });
  }
  if (started.setAside) showSetAsideNotice(started, element('notices'), say);
  // Said as information, so the first solve (which clears errors it answers) leaves it in the status line.
  else if (started.keepingProblem) say(`Your work will not be kept in this browser: ${started.keepingProblem}. Use Save to keep a file.`);
  return keeping;
}

function showSetAsideNotice(started: StartedWork, host: HTMLElement, say: KeepingParts['say']): void {
  const aside = started.setAside;
  if (!aside) return;
  const { storage } = started;
  const download = storage === null || aside.key === '' ? null : () => {
    void storage.get(aside.key).then((copy) => {
      const stamp = aside.key.replace(/[^0-9]+/g, '-').replace(/^-|-$/g, '');
      downloadText(`set-aside-${stamp}.portwright.json`, setAsideText(copy as SetAsideCopy));
    }, () => say('The set-aside copy could not be read from this browser.', 'error'));
  };
  showSetAside(host, aside.message, download);
  say(aside.message);
}

function firstLine(error: unknown): string {
  return (error instanceof Error ? error.message : String(error)).split('\n')[0].replace(/[.\s]+$/, '');
}

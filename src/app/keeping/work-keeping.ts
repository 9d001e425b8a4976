/**
 * Keeping the work in the browser, wired: autosave after each committed change, the saved state, the offer of the
 * last visit's work, set-aside copies, the Recent menu, and asking before unsaved work is replaced.
 */
import { loadDocument } from '../../document/load.ts';
import type { PortDocument } from '../../document/types.ts';
import { Autosaver, type SavedState } from './autosave.ts';
import { downloadText } from '../files.ts';
import { offerKeptWork, showSetAside } from './notices.ts';
import { setAsideText, type KeptWork, type RecentEntry, type SetAsideCopy } from './records.ts';
import { RecentMenu } from './recent-menu.ts';
import { WorkReplacer, type OpenWords } from './replace-work.ts';
import { showSavedState } from './saved-state-view.ts';
import type { StartedWork } from './start-document.ts';
import type { KeptStorage } from './storage.ts';
import type { StatusLevel } from '../status.ts';

export interface KeepingParts {
  readonly started: StartedWork;
  readonly sampleText: string;
  readonly say: (message: string, level?: StatusLevel) => void;
  readonly element: (id: string) => HTMLElement;
  /** ms since 1970. */
  readonly now: () => number;
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
  const replacer = new WorkReplacer(store, say, offer?.unsaved ? null : store.doc);
  const download = (key: string) => downloadSetAside(started.storage, key, say);
  const reopen = (entry: RecentEntry) => reopenRecent(entry, replacer, say);
  const menu = new RecentMenu(element('recent-button') as HTMLButtonElement, element('recent-menu'), { reopen, download, now });
  const autosaver = new Autosaver(started.storage, started.recent, {
    now,
    onState: (state, firstFailure) => {
      showSavedState(element('saved-state'), state);
      if (firstFailure && state.kind === 'failed') say(`Your work was not saved in this browser: ${state.reason}. Use Save to keep a file.`, 'error');
    },
    onRecent: (recent) => menu.show(recent),
  }, started.keepingProblem, undefined, offer !== null);
  showSavedState(element('saved-state'), autosaver.current);
  menu.show(started.recent, started.asides);
  autosaver.follow(store, (doc) => replacer.isUnsaved(doc));
  // A tab closed within the quiet time still keeps its last change.
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') void autosaver.flush();
  });
  if (offer) offerBack(offer, { started, sampleText, say, element, now }, replacer);
  if (started.setAside) showSetAsideNotice(started, element('notices'), say, download);
  // Said as information, so the first solve (which clears errors it answers) leaves it in the status line.
  else if (started.keepingProblem) say(`Your work will not be kept in this browser: ${started.keepingProblem}. Use Save to keep a file.`);
  return {
    open: (doc, words, refused) => replacer.open(doc, words, refused),
    saved() {
      replacer.markSaved();
      autosaver.changed(store.doc, false);
    },
    flush: () => autosaver.flush(),
    get state() {
      return autosaver.current;
    },
  };
}

/** The notice that offers the last visit's work back; it goes once a choice is made or another document is opened. */
function offerBack(offer: KeptWork, { started, sampleText, say, element, now }: KeepingParts, replacer: WorkReplacer): void {
  const offered = started.store.doc;
  const dismiss = offerKeptWork(element('notices'), offer, now(), {
    keep: () => say('Keeping your work from the last visit.'),
    sample: () => {
      // Chosen straight away, the offer itself was the question; after changes made since, ask again.
      if (started.store.doc === offered) replacer.markSaved(offered);
      const words = { label: 'Start from the sample', doing: 'starting from the sample', opened: 'Started from the sample. Undo brings your work back.' };
      replacer.open(loadDocument(sampleText), words, (error) => say(firstLine(error), 'error'));
    },
  });
  replacer.onReplaced = dismiss;
}

function reopenRecent(entry: RecentEntry, replacer: WorkReplacer, say: KeepingParts['say']): void {
  const name = entry.title || 'the section';
  let doc: PortDocument;
  try {
    doc = loadDocument(entry.text);
  } catch (error) {
    say(`"${name}" from the recent list could not be opened (${firstLine(error)}). Your current work is unchanged.`, 'error');
    return;
  }
  const words = { label: `Open "${name}"`, doing: `opening "${name}"`, opened: `Opened "${name}" from the recent list.` };
  replacer.open(doc, words, (error) => say(`"${name}" from the recent list was not opened: ${firstLine(error)}. Your current work is unchanged.`, 'error'));
}

function showSetAsideNotice(started: StartedWork, host: HTMLElement, say: KeepingParts['say'], download: (key: string) => void): void {
  const aside = started.setAside;
  if (!aside) return;
  showSetAside(host, aside.message, started.storage === null || aside.key === '' ? null : () => download(aside.key));
  say(aside.message);
}

/** Offers the set-aside copy under `key` as a file, e.g. set-aside-2026-12-05-21-40-00-000.portwright.json. */
function downloadSetAside(storage: KeptStorage | null, key: string, say: KeepingParts['say']): void {
  if (storage === null) return;
  storage.get(key).then((copy) => {
    const stamp = key.replace(/[^0-9]+/g, '-').replace(/^-|-$/g, '');
    downloadText(`set-aside-${stamp}.portwright.json`, setAsideText(copy as SetAsideCopy));
  }, () => say('The set-aside copy could not be read from this browser.', 'error'));
}

function firstLine(error: unknown): string {
  return (error instanceof Error ? error.message : String(error)).split('\n')[0].replace(/[.\s]+$/, '');
}

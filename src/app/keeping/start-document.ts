/**
 * The document the app starts on, in its store: the work kept from the last visit when it opens (offered back), else
 * the sample; kept work that cannot be opened is set aside, never lost.
 */
import { loadDocument } from '../../document/load.ts';
import { FORMAT_VERSION, type PortDocument } from '../../document/types.ts';
import { applyEdit, EDITS, isEditName } from '../../editor/index.ts';
import { checkDocument, documentProblem } from '../document-check.ts';
import { DocumentStore } from '../document-store.ts';
import { clampEdit } from '../edit-clamp.ts';
import { asKeptWork, asRecentList, LEGACY_KEY, moveLegacyWork, RECENT_KEY, setAside, setAsideCopies, titleOfText, WORK_KEY, type KeptWork, type RecentEntry } from './records.ts';
import { storageProblem, type KeptStorage } from './storage.ts';

/** How the app started and what to say about it. */
export interface StartedWork {
  readonly store: DocumentStore;
  /** Where work is kept, or null when the browser keeps nothing (see keepingProblem). */
  readonly storage: KeptStorage | null;
  /** Why work must not or cannot be kept in this browser, as a clause for "Not saved: … .", or null. */
  readonly keepingProblem: string | null;
  /** The kept work now shown, to offer back (Keep, or Start from the sample); null when the sample is shown. */
  readonly offer: KeptWork | null;
  /** Kept work set aside at this start: the copy's key and the sentences to show. */
  readonly setAside: { readonly key: string; readonly message: string } | null;
  readonly recent: RecentEntry[];
  /** Every set-aside copy in this browser (this start's too), oldest first, for the Recent menu. */
  readonly asides: Array<{ readonly key: string; readonly setAsideAt: number }>;
}

/** Kept work as a document that opens and solves, or the sentence saying why it cannot be opened. */
export function judgeKeptWork(value: unknown, problemOf = documentProblem): { work: KeptWork; doc: PortDocument } | { reason: string } {
  const lead = 'The work kept from your last visit';
  const work = asKeptWork(value);
  if (work === null) return { reason: `${lead} could not be read: it is not a saved section.` };
  const version = versionOfText(work.text);
  if (version !== null && version > FORMAT_VERSION) {
    return { reason: `${lead} was saved by a newer Portwright (format version ${version}); this one reads versions 1 to ${FORMAT_VERSION}.` };
  }
  let doc: PortDocument;
  try {
    doc = loadDocument(work.text);
  } catch (error) {
    const first = (error instanceof Error ? error.message : String(error)).split('\n')[0];
    return { reason: `${lead} could not be read: ${first.replace(/[.\s]+$/, '')}.` };
  }
  const problem = problemOf(doc);
  if (problem !== null) return { reason: `${lead} cannot be solved. ${asSentence(problem)}` };
  return { work: { ...work, title: doc.title }, doc };
}

/** Reads the kept work (bringing the old local-storage autosave over once) and starts the store on it or the sample. */
export async function startStore(sampleText: string, opening: Promise<KeptStorage>, legacyText: string | null, now: number): Promise<StartedWork> {
  const started = await startOn(sampleText, opening, legacyText, now);
  const copies = started.storage === null ? [] : await setAsideCopies(started.storage).catch(() => []);
  return { ...started, asides: copies.map(({ key, copy }) => ({ key, setAsideAt: copy.setAsideAt })) };
}

async function startOn(sampleText: string, opening: Promise<KeptStorage>, legacyText: string | null, now: number): Promise<Omit<StartedWork, 'asides'>> {
  let storage: KeptStorage | null = null;
  let keepingProblem: string | null = null;
  /** The old local-storage work is read from there when it could not be brought over (this once). */
  let legacyUnmoved = true;
  try {
    storage = await opening;
  } catch (error) {
    keepingProblem = storageProblem(error);
  }
  if (storage !== null) legacyUnmoved = !(await moveLegacyWork(storage, legacyText, now).then(() => true, () => false));
  const legacyWork = legacyText === null || !legacyUnmoved ? undefined : { text: legacyText, title: titleOfText(legacyText), changedAt: now, unsaved: true };
  const value = storage === null ? legacyWork : ((await storage.get(WORK_KEY).catch(() => undefined)) ?? legacyWork);
  const recent = storage === null ? [] : asRecentList(await storage.get(RECENT_KEY).catch(() => []));
  const judged = value === undefined ? null : judgeKeptWork(value);
  if (judged !== null && 'doc' in judged) {
    return { store: newStore(judged.doc), storage, keepingProblem, offer: judged.work, setAside: null, recent };
  }
  const store = newStore(loadDocument(sampleText));
  if (judged === null) return { store, storage, keepingProblem, offer: null, setAside: null, recent };
  if (storage === null) {
    const message = `${judged.reason} It is left untouched and the sample is shown.`;
    return { store, storage, keepingProblem, offer: null, setAside: { key: '', message }, recent };
  }
  try {
    const key = await setAside(storage, value, judged.reason, now);
    const message = `${judged.reason} It was set aside in this browser, not deleted, and the sample is shown. "Download the set-aside copy" saves it as a file.`;
    return { store, storage, keepingProblem, offer: null, setAside: { key, message }, recent };
  } catch (error) {
    // Not moved aside: nothing may be written over it, so nothing is kept until the page is opened again.
    const problem = `the unreadable work from your last visit could not be set aside (${storageProblem(error)}), so nothing is written over it`;
    const message = `${judged.reason} It is left untouched and the sample is shown.`;
    return { store, storage: null, keepingProblem: problem, offer: null, setAside: { key: '', message }, recent };
  }
}

/** The old autosave in local storage, or null (none, or the browser keeps no local storage). */
export function readLegacyWork(): string | null {
  try {
    return globalThis.localStorage?.getItem(LEGACY_KEY) ?? null;
  } catch {
    return null;
  }
}

/** The store every change goes through (checked before it lands, named in the undo list). */
function newStore(doc: PortDocument): DocumentStore {
  return new DocumentStore(doc, applyEdit, {
    guard: { check: checkDocument, clamp: clampEdit },
    label: (name) => (isEditName(name) ? EDITS[name].label : name),
  });
}

function versionOfText(text: string): number | null {
  try {
    const version = (JSON.parse(text) as { version?: unknown } | null)?.version;
    return typeof version === 'number' ? version : null;
  } catch {
    return null;
  }
}

/** `text` with a capital first letter and a closing full stop. */
function asSentence(text: string): string {
  const trimmed = text.trim();
  const capital = `${trimmed.charAt(0).toUpperCase()}${trimmed.slice(1)}`;
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

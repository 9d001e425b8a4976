/** What the app keeps in the browser between visits (the work, recent documents, set-aside copies) and how it reads them. */
import type { KeptStorage } from './storage.ts';

/** The autosaved work: the section file's text, its title, when it last changed (ms since 1970, UTC). */
export interface KeptWork {
  readonly text: string;
  readonly title: string;
  readonly changedAt: number;
  /** True when it had changes not in a file the user saved or opened. */
  readonly unsaved: boolean;
}

/** A document opened or worked on lately, newest first in the list. */
export interface RecentEntry {
  readonly title: string;
  /** ms since 1970, UTC. */
  readonly changedAt: number;
  readonly text: string;
}

/** Kept work that could not be opened, moved aside as it was found, never deleted and never written over. */
export interface SetAsideCopy {
  /** Whatever was stored, untouched. */
  readonly value: unknown;
  /** A sentence saying why it was set aside. */
  readonly reason: string;
  /** ms since 1970, UTC. */
  readonly setAsideAt: number;
}

export const WORK_KEY = 'work';
export const RECENT_KEY = 'recent';
/** Set once the old local-storage autosave has been brought over, so it is brought over only once. */
export const MOVED_KEY = 'moved-from-local-storage';
export const SET_ASIDE_PREFIX = 'set-aside:';
/** The old autosave's key in local storage. */
export const LEGACY_KEY = 'portwright.autosave';
/** Documents the Recent menu lists. */
export const RECENT_CAP = 8;

/** A stored value as kept work, or null when it is not shaped as one. */
export function asKeptWork(value: unknown): KeptWork | null {
  if (typeof value !== 'object' || value === null) return null;
  const v = value as Record<string, unknown>;
  if (typeof v.text !== 'string' || typeof v.changedAt !== 'number' || !Number.isFinite(v.changedAt)) return null;
  return { text: v.text, title: typeof v.title === 'string' ? v.title : '', changedAt: v.changedAt, unsaved: v.unsaved !== false };
}

/** The stored recent list; entries not shaped as one are left out. */
export function asRecentList(value: unknown): RecentEntry[] {
  if (!Array.isArray(value)) return [];
  return value.flatMap((item) => {
    const work = asKeptWork(item);
    return work === null ? [] : [{ title: work.title, changedAt: work.changedAt, text: work.text }];
  });
}

/** The list with `entry` first; an older entry of the same title is replaced; at most `cap` entries. */
export function withRecent(list: readonly RecentEntry[], entry: RecentEntry, cap = RECENT_CAP): RecentEntry[] {
  return [entry, ...list.filter((e) => e.title !== entry.title)].slice(0, cap);
}

/** The section file's title, read without trusting the text; '' when it has none. */
export function titleOfText(text: string): string {
  try {
    const parsed: unknown = JSON.parse(text);
    const title = (parsed as { title?: unknown } | null)?.title;
    return typeof title === 'string' ? title : '';
  } catch {
    return '';
  }
}

/**
 * Moves the stored work to a set-aside record of its own (in one transaction: the work record is removed only as
 * the copy lands) and returns the copy's key. Rejects with the browser's error when it could not.
 */
export async function setAside(storage: KeptStorage, value: unknown, reason: string, now: number): Promise<string> {
  const taken = new Set(await storage.keys());
  let key = `${SET_ASIDE_PREFIX}${new Date(now).toISOString()}`;
  for (let n = 2; taken.has(key); n++) key = `${SET_ASIDE_PREFIX}${new Date(now).toISOString()} (${n})`;
  const copy: SetAsideCopy = { value, reason, setAsideAt: now };
  await storage.write([[key, copy]], [WORK_KEY]);
  return key;
}

/** Every set-aside copy, oldest first, with its key. */
export async function setAsideCopies(storage: KeptStorage): Promise<Array<{ key: string; copy: SetAsideCopy }>> {
  const keys = (await storage.keys()).filter((k) => k.startsWith(SET_ASIDE_PREFIX)).sort();
  const copies = await Promise.all(keys.map(async (key) => ({ key, copy: (await storage.get(key)) as SetAsideCopy })));
  return copies.filter(({ copy }) => typeof copy === 'object' && copy !== null && typeof copy.setAsideAt === 'number');
}

/** A set-aside copy as text to download: the section file it held when there is one, else what was stored. */
export function setAsideText(copy: SetAsideCopy): string {
  const { value } = copy;
  if (typeof value === 'string') return value;
  const text = (value as { text?: unknown } | null)?.text;
  if (typeof text === 'string') return text;
  try {
    return JSON.stringify(value, null, 2) ?? String(value);
  } catch {
    return String(value);
  }
}

/**
 * Brings the old local-storage autosave into storage once (unless newer work is already there), and adds it to the
 * recent list. The local-storage copy is left where it was.
 */
export async function moveLegacyWork(storage: KeptStorage, legacyText: string | null, now: number): Promise<void> {
  if (legacyText === null || (await storage.get(MOVED_KEY)) === true) return;
  if ((await storage.get(WORK_KEY)) !== undefined) {
    await storage.write([[MOVED_KEY, true]]);
    return;
  }
  const work: KeptWork = { text: legacyText, title: titleOfText(legacyText), changedAt: now, unsaved: true };
  const recent = asRecentList(await storage.get(RECENT_KEY));
  // Text without a title is no section file: it is kept as the work (and set aside when read), not listed.
  const listed = work.title === '' ? recent : withRecent(recent, { title: work.title, changedAt: now, text: legacyText });
  await storage.write([[WORK_KEY, work], [RECENT_KEY, listed], [MOVED_KEY, true]]);
}

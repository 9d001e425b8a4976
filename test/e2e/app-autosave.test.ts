/**
 * Work kept in the browser, in the app: a reload offers the work back (Keep gives the same document), the old
 * local-storage autosave is brought over, a corrupt or newer-version autosave is set aside with a message and can be
 * downloaded, a storage failure is said, and opening a file or a recent document over unsaved work asks first.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { PortDocument } from '../../src/document/types.ts';
import { appDocument } from './app-fillet.ts';
import { CHECK_MS, waitForFullSolves } from './app-session.ts';
import { appSuite } from './app-suite.ts';

const withApp = appSuite();
const SAMPLES = resolve(import.meta.dirname, '../../samples');
const SAVED = 'Saved in this browser.';

const text = (page: Page, selector: string) => page.locator(selector).innerText();

/** Renames the active variant through the store (as the Rename button does): a committed change. */
function renameVariant(page: Page, to: string): Promise<void> {
  return page.evaluate((name) => {
    const { store } = (window as unknown as { portwright: { store: { doc: PortDocument; edit(n: string, a: unknown): void } } }).portwright;
    store.edit('renameVariant', { from: store.doc.activeVariant, to: name });
  }, to);
}

/** Writes `value` under `key` in the app's IndexedDB store, as another Portwright (or a fault) would have left it. */
function putKept(page: Page, key: string, value: unknown): Promise<void> {
  return page.evaluate(([k, v]) => new Promise<void>((done, fail) => {
    const request = indexedDB.open('portwright', 1);
    request.onupgradeneeded = () => request.result.createObjectStore('kept');
    request.onsuccess = () => {
      const tx = request.result.transaction('kept', 'readwrite');
      tx.objectStore('kept').put(v, k as string);
      tx.oncomplete = () => (request.result.close(), done());
      tx.onabort = () => fail(tx.error);
    };
    request.onerror = () => fail(request.error);
  }), [key, value] as const);
}

/** Every record in the app's IndexedDB store, by key. */
function keptRecords(page: Page): Promise<Record<string, unknown>> {
  return page.evaluate(() => new Promise<Record<string, unknown>>((done, fail) => {
    const request = indexedDB.open('portwright', 1);
    request.onsuccess = () => {
      const store = request.result.transaction('kept').objectStore('kept');
      const keys = store.getAllKeys();
      const values = store.getAll();
      values.onsuccess = () => {
        request.result.close();
        done(Object.fromEntries(keys.result.map((k, i) => [String(k), values.result[i]])));
      };
    };
    request.onerror = () => fail(request.error);
  }));
}

async function reload(page: Page): Promise<void> {
  await page.reload();
  await waitForFullSolves(page, 1);
}

async function chooseFile(page: Page, name: string): Promise<void> {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click('#open-button')]);
  await chooser.setFiles({ name, mimeType: 'application/json', buffer: readFileSync(resolve(SAMPLES, name)) });
}

describe('a reload', () => {
  it('shows the kept work and offers it back; Keep leaves the same document', async () => {
    await withApp(async ({ page, problems }) => {
      await renameVariant(page, 'kept across a reload');
      await expect.poll(() => text(page, '#saved-state')).toBe(SAVED);
      const edited = await appDocument(page);
      await reload(page);
      expect(await text(page, '#kept-offer')).toMatch(/^Keep working on "Street intake, 46 mm valve: short-side radius compared" \(changed today at .+\)\?/);
      // Until the user chooses, the kept work is shown, not the sample.
      expect(await appDocument(page)).toEqual(edited);
      await page.click('#kept-keep');
      expect(await page.locator('#kept-offer').count()).toBe(0);
      expect(await appDocument(page)).toEqual(edited);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

describe('work kept by an older Portwright in local storage', () => {
  it('is brought into IndexedDB once and offered back', async () => {
    await withApp(async ({ page, problems }) => {
      const tight = readFileSync(resolve(SAMPLES, 'street-tight-short-side.json'), 'utf8');
      await page.evaluate((t) => localStorage.setItem('portwright.autosave', t), tight);
      await reload(page);
      expect(await text(page, '#kept-offer')).toMatch(/^Keep working on "Street intake, 46 mm valve: tight short side"/);
      expect((await appDocument(page)).title).toBe('Street intake, 46 mm valve: tight short side');
      const records = await keptRecords(page);
      expect((records.work as { text: string }).text).toBe(tight);
      expect(records['moved-from-local-storage']).toBe(true);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

describe('kept work that cannot be opened', () => {
  it('a corrupt autosave is set aside with a message, downloads as it was, and the next edit leaves it alone', async () => {
    await withApp(async ({ page, problems }) => {
      const garbage = '{"format": "portwright-section", "version": 3, "title": "Half a fi';
      await putKept(page, 'work', { text: garbage, title: 'Half a file', changedAt: Date.now(), unsaved: true });
      await reload(page);
      const message = await text(page, '#set-aside-notice .notice-text');
      expect(message).toMatch(/^The work kept from your last visit could not be read: not valid JSON .+\. It was set aside in this browser, not deleted, and the sample is shown\. "Download the set-aside copy" saves it as a file\.$/);
      expect(await text(page, '#status')).toBe(message);
      expect(await page.locator('#kept-offer').count()).toBe(0);
      const [download] = await Promise.all([page.waitForEvent('download'), page.click('#set-aside-download')]);
      expect(readFileSync(await download.path(), 'utf8')).toBe(garbage);

      await renameVariant(page, 'after the set-aside');
      await expect.poll(() => text(page, '#saved-state')).toBe(SAVED);
      const records = await keptRecords(page);
      const asides = Object.keys(records).filter((k) => k.startsWith('set-aside:'));
      expect(asides).toHaveLength(1);
      expect((records[asides[0]] as { value: { text: string } }).value.text).toBe(garbage);
      expect((records.work as { text: string }).text).toContain('after the set-aside');

      // On a later visit the copy is still there: the Recent menu downloads it.
      await reload(page);
      expect(await page.locator('#set-aside-notice').count()).toBe(0);
      await page.click('#recent-button');
      const item = page.locator('#recent-menu .recent-item', { hasText: 'Download the set-aside copy' });
      expect(await item.innerText()).toMatch(/set aside today at/);
      const [again] = await Promise.all([page.waitForEvent('download'), item.click()]);
      expect(readFileSync(await again.path(), 'utf8')).toBe(garbage);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('an autosave from a newer Portwright is set aside, not written over, with a message that says so', async () => {
    await withApp(async ({ page, problems }) => {
      const sample = JSON.parse(readFileSync(resolve(SAMPLES, 'street-tight-short-side.json'), 'utf8')) as Record<string, unknown>;
      const newer = JSON.stringify({ ...sample, version: 99 });
      await putKept(page, 'work', { text: newer, title: 'From a newer Portwright', changedAt: Date.now(), unsaved: true });
      await reload(page);
      expect(await text(page, '#set-aside-notice .notice-text')).toMatch(/^The work kept from your last visit was saved by a newer Portwright \(format version 99\); this one reads versions 1 to \d+\. It was set aside/);
      await renameVariant(page, 'after the newer one');
      await expect.poll(() => text(page, '#saved-state')).toBe(SAVED);
      const records = await keptRecords(page);
      const aside = Object.entries(records).find(([k]) => k.startsWith('set-aside:'))?.[1] as { value: { text: string } };
      expect(aside.value.text).toBe(newer);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

describe('a storage failure', () => {
  it('says the work was not saved, in the top bar and the status line', async () => {
    await withApp(async ({ page, problems }) => {
      await page.addInitScript(() => {
        IDBObjectStore.prototype.put = function put(): IDBRequest {
          throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
        };
      });
      await reload(page);
      // Every status message, in order: a later full solve may clear an error from the line.
      await page.evaluate(() => {
        const said: string[] = [];
        new MutationObserver(() => said.push(document.getElementById('status')?.textContent ?? '')).observe(document.getElementById('status')!, { childList: true, characterData: true, subtree: true });
        Object.assign(window, { said });
      });
      await renameVariant(page, 'not kept');
      const notSaved = "Not saved: the browser's storage for this page is full. Use Save to keep a file.";
      await expect.poll(() => text(page, '#saved-state')).toBe(notSaved);
      const said = await page.evaluate(() => (window as unknown as { said: string[] }).said);
      expect(said).toContain("Your work was not saved in this browser: the browser's storage for this page is full. Use Save to keep a file.");
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

describe('replacing unsaved work', () => {
  it('opening a file asks first (Escape keeps the work, Replace opens it); a recent document reopens as an undoable open', async () => {
    await withApp(async ({ page, problems }) => {
      await renameVariant(page, 'unsaved change');
      const edited = await appDocument(page);
      await chooseFile(page, 'street-tight-short-side.json');
      await page.locator('#replace-dialog').waitFor();
      expect(await text(page, '#replace-dialog-text')).toBe('"Street intake, 46 mm valve: short-side radius compared" has changes that are not in a saved file, and opening "street-tight-short-side.json" replaces it. Undo brings it back while this page is open.');
      await page.keyboard.press('Escape');
      expect(await page.locator('#replace-dialog').count()).toBe(0);
      expect(await appDocument(page)).toEqual(edited);
      expect(await text(page, '#status')).toBe('Your work is unchanged; nothing was opened.');

      await chooseFile(page, 'street-tight-short-side.json');
      await page.click('#replace-confirm');
      await expect.poll(async () => (await appDocument(page)).title).toBe('Street intake, 46 mm valve: tight short side');
      await waitForFullSolves(page, 2);
      await expect.poll(() => text(page, '#saved-state')).toBe(SAVED);

      // Just opened, nothing unsaved: the recent document reopens without a question, and Undo takes it back.
      await page.click('#recent-button');
      expect(await page.locator('#recent-menu .recent-item').allInnerTexts()).toEqual([
        expect.stringMatching(/^Street intake, 46 mm valve: tight short side\s+changed today at /),
        expect.stringMatching(/^Street intake, 46 mm valve: short-side radius compared\s+changed today at /),
      ]);
      await page.keyboard.press('Escape');
      expect(await page.locator('#recent-menu').isHidden()).toBe(true);
      // From the keys alone: the first item has the focus, the arrow moves to the second, Enter opens it.
      await page.click('#recent-button');
      await page.keyboard.press('ArrowDown');
      await page.keyboard.press('Enter');
      expect(await page.locator('#replace-dialog').count()).toBe(0);
      await expect.poll(() => appDocument(page)).toEqual(edited);
      await page.click('#undo-button');
      await expect.poll(async () => (await appDocument(page)).title).toBe('Street intake, 46 mm valve: tight short side');
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

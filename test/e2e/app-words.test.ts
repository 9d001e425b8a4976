/**
 * Words and edges in the app: names from a file are shown as text and never become markup; a picture dropped on the
 * page is called so; Escape or a click outside closes the keys list and the history list (which fits a small screen);
 * typed boxes show rounded numbers that never nudge the document; the history list undoes and redoes to a step.
 */
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { PortDocument } from '../../src/document/types.ts';
import { appDocument } from './app-fillet.ts';
import { CHECK_MS } from './app-session.ts';
import { appSuite } from './app-suite.ts';

const withApp = appSuite();

/** Markup that would run script if it were ever set as HTML. */
const PAYLOAD = '<img src=x onerror="window.__pwned=1">';

const statusText = (page: Page) => page.locator('#status').innerText();

/** Every variant renamed and every wall name prefixed with PAYLOAD, the title set to it. */
function poisoned(doc: PortDocument): PortDocument {
  const names = new Map(doc.variants.map((v, k) => [v.name, k === 0 ? PAYLOAD : `${PAYLOAD} ${k + 1}`]));
  return {
    ...doc,
    title: PAYLOAD,
    activeVariant: names.get(doc.activeVariant)!,
    variants: doc.variants.map((v) => ({
      ...v,
      name: names.get(v.name)!,
      section: {
        ...v.section,
        outline: {
          ...v.section.outline,
          edges: v.section.outline.edges.map((e) => (e.wallName === undefined ? e : { ...e, wallName: `${PAYLOAD} ${e.wallName}` })),
        },
      },
    })),
  };
}

/** What would show that markup got in: an img element, an onerror attribute, the flag the payload sets. */
function injected(page: Page): Promise<{ images: number; handlers: number; pwned: unknown }> {
  return page.evaluate(() => ({
    images: document.querySelectorAll('img').length,
    handlers: document.querySelectorAll('[onerror]').length,
    pwned: (window as unknown as { __pwned?: unknown }).__pwned,
  }));
}

const partBox = (page: Page, name: RegExp) =>
  page.locator('.lil-controller', { has: page.locator('.lil-name', { hasText: name }) }).locator('input');

describe('names from a file', () => {
  it('a title, variant names and wall names made of markup show as text, and nothing is injected', async () => {
    await withApp(async ({ page, problems }) => {
      const file = poisoned(await appDocument(page));
      const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click('#open-button')]);
      await chooser.setFiles({ name: 'port.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(file)) });
      await expect.poll(() => statusText(page), { timeout: 60_000 }).toBe('Opened "port.json".');
      // The full solve fills the readings and findings with the wall names.
      await expect.poll(() => page.locator('#readings').innerText(), { timeout: 90_000 }).toContain(PAYLOAD);

      expect(await page.locator('#doc-title').innerText()).toBe(PAYLOAD);
      expect(await page.locator('#variant-select option').allInnerTexts()).toEqual(file.variants.map((v) => v.name));
      await page.click('#history-button');
      expect(await page.locator('#history-list').innerText()).toContain('Open "port.json"');
      await page.keyboard.press('Escape');
      expect(await injected(page)).toEqual({ images: 0, handlers: 0, pwned: undefined });
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('a picture dropped on the page is called not a section file, in whole sentences, and the work stays', async () => {
    await withApp(async ({ page, problems }) => {
      const title = await page.locator('#doc-title').innerText();
      await page.evaluate(() => {
        const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
        const data = new DataTransfer();
        data.items.add(new File([png], 'bowl photo.png', { type: 'image/png' }));
        document.body.dispatchEvent(new DragEvent('drop', { dataTransfer: data, bubbles: true, cancelable: true }));
      });
      await expect.poll(() => statusText(page)).toContain('bowl photo.png');
      const said = await statusText(page);
      expect(said).toMatch(/^"bowl photo\.png" was not opened: it is not a text file .*\. Your current work is unchanged\.$/);
      expect(await page.locator('#doc-title').innerText()).toBe(title);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

describe('overlays', () => {
  it('the keys list fits a 1024 x 768 screen and scrolls; Escape, a click outside and ? close it; the history list too', async () => {
    await withApp(async ({ page, problems }) => {
      await page.setViewportSize({ width: 1024, height: 768 });
      const help = page.locator('#help-overlay');
      await page.click('#help-button');
      await expect.poll(() => help.isVisible()).toBe(true);
      const box = (await help.boundingBox())!;
      expect(box.x).toBeGreaterThanOrEqual(0);
      expect(box.y).toBeGreaterThanOrEqual(0);
      expect(box.x + box.width).toBeLessThanOrEqual(1024);
      expect(box.y + box.height).toBeLessThanOrEqual(768);
      // Scrolled to the end, its last line (how to close it) is inside the visible box.
      const end = await help.evaluate((el) => {
        el.scrollTop = el.scrollHeight;
        const last = el.lastElementChild!.getBoundingClientRect();
        return { last: last.bottom, box: el.getBoundingClientRect().bottom, text: el.lastElementChild!.textContent };
      });
      expect(end.last).toBeLessThanOrEqual(end.box + 1);
      expect(end.text).toContain('Escape');

      await page.keyboard.press('Escape');
      await expect.poll(() => help.isVisible()).toBe(false);
      await page.keyboard.press('?');
      await expect.poll(() => help.isVisible()).toBe(true);
      await page.mouse.click(20, 740);
      await expect.poll(() => help.isVisible()).toBe(false);

      const history = page.locator('#history-list');
      await page.click('#history-button');
      await expect.poll(() => history.isVisible()).toBe(true);
      expect(await history.innerText()).toContain('No changes yet.');
      await page.keyboard.press('Escape');
      await expect.poll(() => history.isVisible()).toBe(false);
      await page.click('#history-button');
      await expect.poll(() => history.isVisible()).toBe(true);
      await page.mouse.click(20, 740);
      await expect.poll(() => history.isVisible()).toBe(false);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

describe('typed boxes and the history list', () => {
  it('boxes show rounded numbers, retyping one writes nothing, and the history list goes back and forth by steps', async () => {
    await withApp(async ({ page, problems }) => {
      const start = await appDocument(page);
      const liftOf = async () => {
        const doc = await appDocument(page);
        return doc.variants.find((v) => v.name === doc.activeVariant)!.parts!.valve!.lift;
      };
      const steps = () => page.locator('#undo-button').getAttribute('data-steps');
      await page.locator('.lil-controller', { has: page.locator('.lil-name', { hasText: /^units$/ }) }).locator('select')
        .selectOption({ label: 'inches' });
      await expect.poll(() => page.locator('#status').innerText()).toBe('The drawing is now in inches.');
      const exact = await liftOf();
      expect(exact).not.toBe(Number(exact.toFixed(3)));

      const lift = partBox(page, /^lift, in$/);
      if (!(await lift.isVisible())) await page.locator('.lil-title', { hasText: 'Valve, seat and test bore' }).click();
      await expect.poll(() => lift.inputValue()).toBe(exact.toFixed(3));
      expect(await partBox(page, /^seat angle, °$/).inputValue()).toMatch(/^\d+(\.\d)?$/);
      expect(await steps()).toBe('1');

      // Focused and left, then the shown value typed again: neither changes the document or adds a step.
      await lift.click();
      await lift.press('Tab');
      await lift.fill(exact.toFixed(3));
      await lift.press('Enter');
      await expect.poll(() => lift.inputValue()).toBe(exact.toFixed(3));
      expect(await liftOf()).toBe(exact);
      expect(await steps()).toBe('1');

      // A new number is written exactly as typed (not snapped to the slider step).
      await lift.fill('0.4126');
      await lift.press('Enter');
      await expect.poll(liftOf).toBe(0.4126);
      expect(await lift.inputValue()).toBe('0.413');
      await lift.fill('0.45');
      await lift.press('Enter');
      await expect.poll(liftOf).toBe(0.45);
      const end = await appDocument(page);

      // The list, newest first: Now, then the two lifts and the change of units.
      await page.click('#history-button');
      const items = page.locator('#history-list li');
      await expect.poll(() => items.allInnerTexts()).toEqual(['Now', expect.any(String), expect.any(String), expect.any(String)]);
      await page.locator('#history-list li button').last().click();
      await expect.poll(() => appDocument(page)).toEqual(start);
      await expect.poll(() => items.first().innerText()).not.toBe('Now');
      expect(await items.last().innerText()).toBe('Now');
      expect(await page.locator('#status').innerText()).toMatch(/^Undone 3 steps, back to before .+\.$/);
      await page.locator('#history-list li button').first().click();
      await expect.poll(() => appDocument(page)).toEqual(end);
      expect(await page.locator('#status').innerText()).toMatch(/^Redone 3 steps, up to .+\.$/);
      await page.keyboard.press('Escape');
      await expect.poll(() => page.locator('#history-list').isVisible()).toBe(false);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

/** The whole app in headless chromium: loads clean, draws the field, edits the short side live, saves, opens, rejects bad files. */

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { activeSection } from '../../src/editor/index.ts';
import { appDocument, dragFillet, overlayCircles, pressAndMove, zoomedShortSideGrip } from './app-fillet.ts';
import { fieldPixels } from './app-pixels.ts';
import { CHECK_MS, openApp, solveCount, startApp, waitForFullSolves, withApp, type AppPage, type AppSession } from './app-session.ts';

let session: AppSession;
/** One page opened on the sample, shared by the checks that only look (load, pixels, help). */
let looked: AppPage;

beforeAll(async () => {
  session = await startApp();
  looked = await openApp(session);
}, CHECK_MS);

afterAll(async () => {
  await session?.close();
});

const text = (page: Page, selector: string) => page.locator(selector).innerText();

/** Opens a file through the Open button and the browser's file picker. */
async function openThroughPicker(page: Page, file: string | { name: string; mimeType: string; buffer: Buffer }): Promise<void> {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click('#open-button')]);
  await chooser.setFiles(file);
}

describe('Portwright in a browser', () => {
  it('loads the sample, solves it and draws it with no console errors, warnings or failed requests', async () => {
    const { page, problems } = looked;
    expect(await page.locator('#solve-indicator').getAttribute('data-state')).toBe('idle');
    expect(await page.locator('#status').getAttribute('data-level')).not.toBe('error');
    expect(await text(page, '[data-reading="short-side-peak"]')).toMatch(/^\d+\.\d+$/);
    expect(await text(page, '[data-reading="peak"]')).toMatch(/^\d+\.\d+ at \(/);
    expect(await text(page, '[data-reading="tightest"]')).toMatch(/ mm wide$/);
    expect(problems).toEqual([]);
  }, CHECK_MS);

  it('shows the field: many colours, and colours from both ends of the colour map inside the section', async () => {
    const bins = 10;
    // 20 of 255 per channel: well under the gap between neighbouring tenths of the map, above blending and dithering.
    const pixels = await fieldPixels(looked.page, bins, 20);
    const onMap = pixels.bins.reduce((a, b) => a + b, 0);
    expect(pixels.distinct).toBeGreaterThan(500);
    // The section fills a good part of the view and the field covers the section.
    expect(onMap / pixels.total).toBeGreaterThan(0.2);
    // Auto range: 0 (still air, dark purple) to the 99.5 % speed ratio (yellow): both ends must appear in the field.
    expect(pixels.bins[0], `bins ${pixels.bins}`).toBeGreaterThan(100);
    expect(pixels.bins[bins - 1], `bins ${pixels.bins}`).toBeGreaterThan(100);
    // And the picture is not two flat colours: most of the map in between is used too.
    expect(pixels.bins.filter((n) => n > 100).length, `bins ${pixels.bins}`).toBeGreaterThanOrEqual(8);
  }, CHECK_MS);

  it('a larger short-side radius dragged with the mouse lowers the reported short-side peak speed ratio', async () => {
    await withApp(session, async ({ page, problems }) => {
      const before = await text(page, '[data-reading="short-side-peak"]');
      const grip = await zoomedShortSideGrip(page, 4);
      const nearest = Math.min(...(await overlayCircles(page)).map(([x, y]) => Math.hypot(x - grip.handle[0], y - grip.handle[1])));
      expect(nearest, 'a fillet handle is drawn where the editor puts it').toBeLessThan(1);

      // Mark every handle's drawn shape: a handle the drag does not move must keep its element.
      const shapes = '#view-host svg.editor-overlay > g > :first-child';
      await page.$$eval(shapes, (els) => els.forEach((e) => e.setAttribute('data-kept', '')));
      const fullBefore = await solveCount(page, 'full');
      const target = 10;
      await dragFillet(page, grip, target, 8);
      await waitForFullSolves(page, fullBefore + 1);
      const kept = await page.$$eval(shapes, (els) => els.map((e) => e.hasAttribute('data-kept')));
      expect(kept.length).toBeGreaterThan(10);
      // The dragged handle is redrawn (moved, selected, labelled); the corners and other handles are left alone.
      expect(kept.filter((k) => !k).length).toBeGreaterThanOrEqual(1);
      expect(kept.filter((k) => !k).length).toBeLessThanOrEqual(3);

      const radius = activeSection(await appDocument(page)).outline.vertices[grip.vertex].filletRadius ?? 0;
      // Within a pixel's worth of the aimed radius (the mouse lands on whole or fractional CSS px).
      expect(radius).toBeGreaterThan(9);
      expect(radius).toBeLessThan(11);
      expect(await solveCount(page, 'drag'), 'coarse repaints while dragging').toBeGreaterThan(0);
      const after = await text(page, '[data-reading="short-side-peak"]');
      // [derived] Ideal flow round a convex corner: the tighter the radius the faster the wall flow (a sharp
      // corner has unbounded speed), so opening the radius from 4 to 10 mm must lower the short-side peak.
      expect(Number(after)).toBeLessThan(Number(before));
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('a drag the browser cancels (pointercancel) puts the radius back and solves the full grid again', async () => {
    await withApp(session, async ({ page, problems }) => {
      const grip = await zoomedShortSideGrip(page, 4);
      const radiusOf = async () => activeSection(await appDocument(page)).outline.vertices[grip.vertex].filletRadius;
      const fullBefore = await solveCount(page, 'full');
      await pressAndMove(page, grip.handle, await grip.handleFor(10), 4);
      await expect.poll(radiusOf).toBeGreaterThan(grip.radius + 1);
      // What a browser sends when it takes the pointer over (playwright's mouse is pointer 1).
      await page.evaluate(() => window.dispatchEvent(new PointerEvent('pointercancel', { pointerId: 1 })));
      expect(await radiusOf()).toBe(grip.radius);
      await waitForFullSolves(page, fullBefore + 1);
      // The mouse is let go afterwards: nothing more happens to the document.
      await page.mouse.up();
      expect(await radiusOf()).toBe(grip.radius);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('saves the document and opens the saved file back to the same document', async () => {
    await withApp(session, async ({ page, problems }) => {
      // Make the saved document differ from the sample, and the one open at the time of opening differ from both.
      await page.selectOption('#variant-select', 'generous short side');
      const [download] = await Promise.all([page.waitForEvent('download'), page.click('#save-button')]);
      const saved = await appDocument(page);
      expect(saved.activeVariant).toBe('generous short side');
      expect(download.suggestedFilename()).toMatch(/\.portwright\.json$/);
      const path = await download.path();

      await page.selectOption('#variant-select', 'tight short side');
      expect((await appDocument(page)).activeVariant).toBe('tight short side');
      await openThroughPicker(page, path);
      // Switching the variant after saving is a change not in a file: opening asks first.
      await page.click('#replace-confirm');
      await page.waitForFunction(() => (window as unknown as { portwright: { store: { doc: { activeVariant: string } } } })
        .portwright.store.doc.activeVariant === 'generous short side');
      expect(await appDocument(page)).toEqual(saved);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('a broken file or a bad field is named in an error and the current work is kept', async () => {
    await withApp(session, async ({ page, problems }) => {
      const before = await appDocument(page);
      const fullBefore = await solveCount(page, 'full');
      const good = JSON.stringify(before);

      await openThroughPicker(page, { name: 'cut-short.json', mimeType: 'application/json', buffer: Buffer.from(good.slice(0, good.length / 2)) });
      await page.waitForFunction(() => document.getElementById('status')?.textContent?.includes('cut-short.json'));
      expect(await page.locator('#status').getAttribute('data-level')).toBe('error');
      expect(await text(page, '#status')).toMatch(/not valid JSON.*unchanged/s);

      const bad = JSON.parse(good) as { variants: Array<{ section: { outline: { vertices: Array<{ filletRadius?: number }> } } }> };
      bad.variants[0].section.outline.vertices[3].filletRadius = -3;
      await openThroughPicker(page, { name: 'bad-radius.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bad)) });
      await page.waitForFunction(() => document.getElementById('status')?.textContent?.includes('bad-radius.json'));
      expect(await page.locator('#status').getAttribute('data-level')).toBe('error');
      expect(await text(page, '#status')).toMatch(/vertices\[3\]\.filletRadius.*-3.*unchanged/s);

      expect(await appDocument(page)).toEqual(before);
      expect(await solveCount(page, 'full'), 'no new solve: the drawn field still belongs to the kept work').toBe(fullBefore);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('a fixed colour range with its top below its bottom is refused in plain words, and the colours keep their range', async () => {
    await withApp(session, async ({ page, problems }) => {
      const range = () => page.evaluate(() => (window as unknown as { portwright: { view: { colourRange: { min: number; max: number } } } }).portwright.view.colourRange);
      const before = await range();
      const control = (name: string) => page.locator('.lil-controller', { has: page.locator('.lil-name', { hasText: name }) });
      // The settings sit in a folded group of the panel: open it as a porter would.
      await page.locator('.lil-title', { hasText: 'Colours and lines' }).click();
      for (const [name, text] of [['fixed from', '3'], ['fixed to', '2']]) {
        await control(name).locator('input').fill(text);
        await control(name).locator('input').press('Enter');
      }
      await control('colour range').locator('select').selectOption({ label: 'fixed (compare variants)' });
      await expect.poll(() => page.locator('#status').getAttribute('data-level')).toBe('error');
      expect(await page.locator('#status').innerText()).toMatch(/top above its bottom.*keep their last range/);
      expect(await range()).toEqual(before);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('"?" opens a help overlay that lists keys, and "?" closes it again', async () => {
    const { page } = looked;
    const help = page.locator('#help-overlay');
    expect(await help.isVisible()).toBe(false);
    await page.locator('#view-host').hover();
    await page.keyboard.press('?');
    await expect.poll(() => help.isVisible()).toBe(true);
    expect(await help.locator('kbd').count()).toBeGreaterThan(5);
    expect(await help.innerText()).toMatch(/Keys and pointer/);
    await page.keyboard.press('?');
    await expect.poll(() => help.isVisible()).toBe(false);
    expect(looked.problems).toEqual([]);
  }, CHECK_MS);
});

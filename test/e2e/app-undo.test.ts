/**
 * Undo, redo and a document that is never invalid, in the app: a too-long fillet drag is held at the largest radius
 * that fits (and the saved file passes `check`), a drag undoes and redoes as one step, a typed lift undoes in the
 * document and in its box, and a file with a broken variant is refused by name while the work stays.
 */
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { PortDocument } from '../../src/document/types.ts';
import { activeSection, applyEdit } from '../../src/editor/index.ts';
import { runBin } from '../cli/helpers.ts';
import { appDocument, dragFillet, shortSideCorner, zoomedShortSideGrip } from './app-fillet.ts';
import { CHECK_MS, solveCount, waitForFullSolves } from './app-session.ts';
import { appSuite } from './app-suite.ts';

const withApp = appSuite();

const statusText = (page: Page) => page.locator('#status').innerText();

function shortSideRadius(doc: PortDocument): number {
  const section = activeSection(doc);
  return section.outline.vertices[shortSideCorner(section)].filletRadius ?? 0;
}

async function openThroughPicker(page: Page, name: string, buffer: Buffer): Promise<void> {
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click('#open-button')]);
  await chooser.setFiles({ name, mimeType: 'application/json', buffer });
  await page.waitForFunction((n) => document.getElementById('status')?.textContent?.includes(n), name);
}

describe('a fillet dragged past what fits', () => {
  it('is held at the largest radius that fits, says so, solves, and the saved file passes check', async () => {
    await withApp(async ({ page, problems }) => {
      const grip = await zoomedShortSideGrip(page, 4);
      const full = await solveCount(page, 'full');
      // 40.8 mm was where such a drag used to land; about 25.9 mm is the most that fits on this corner.
      await dragFillet(page, grip, 40.8, 12);
      await waitForFullSolves(page, full + 1);
      const held = shortSideRadius(await appDocument(page));
      expect(held).toBeGreaterThan(20);
      expect(held).toBeLessThan(26);
      expect(await statusText(page)).toMatch(/held at [\d.]+ mm, the largest that fits/);
      expect(await page.locator('#solve-indicator').getAttribute('data-state')).toBe('idle');

      const [download] = await Promise.all([page.waitForEvent('download'), page.click('#save-button')]);
      const checked = runBin(['check', await download.path()]);
      expect(checked.code, checked.stderr + checked.stdout).toBe(0);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

describe('undo and redo', () => {
  it('undoing a drag restores the document exactly, redo re-applies it, from keys and buttons', async () => {
    await withApp(async ({ page, problems }) => {
      const before = await appDocument(page);
      expect(await page.locator('#undo-button').isDisabled()).toBe(true);
      const grip = await zoomedShortSideGrip(page, 4);
      await dragFillet(page, grip, 10, 10);
      await expect.poll(async () => shortSideRadius(await appDocument(page))).toBeGreaterThan(8);
      const after = await appDocument(page);
      expect(await page.locator('#undo-button').getAttribute('title')).toMatch(/^Undo Set fillet radius \(Ctrl\+Z\)$/);

      await page.keyboard.press('Control+z');
      await expect.poll(() => appDocument(page)).toEqual(before);
      expect(await statusText(page)).toBe('Undone: Set fillet radius.');
      expect(await page.locator('#undo-button').isDisabled()).toBe(true);
      await page.keyboard.press('Control+Shift+Z');
      await expect.poll(() => appDocument(page)).toEqual(after);
      await page.click('#undo-button');
      await expect.poll(() => appDocument(page)).toEqual(before);
      await page.keyboard.press('Control+y');
      await expect.poll(() => appDocument(page)).toEqual(after);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('Ctrl+Z after a typed lift restores the lift in the document and in the box; uncommitted typing is the box\'s own', async () => {
    await withApp(async ({ page, problems }) => {
      const liftOf = async () => {
        const doc = await appDocument(page);
        return doc.variants.find((v) => v.name === doc.activeVariant)!.parts!.valve!.lift;
      };
      const lift = await liftOf();
      const box = page.locator('.lil-controller', { has: page.locator('.lil-name', { hasText: /^lift, mm$/ }) }).locator('input');
      if (!(await box.isVisible())) await page.locator('.lil-title', { hasText: 'Valve, seat and test bore' }).click();
      await box.fill('12');
      await box.press('Enter');
      await expect.poll(liftOf).toBe(12);

      await page.keyboard.press('Control+z');
      await expect.poll(liftOf).toBe(lift);
      await expect.poll(async () => Number(await box.inputValue())).toBe(lift);

      // Typing not yet committed: Ctrl+Z belongs to the box, the document does not change.
      await box.click();
      await box.press('End');
      await box.pressSequentially('5');
      await box.press('Control+z');
      expect(await liftOf()).toBe(lift);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

describe('opening a file', () => {
  it('a file with a variant that does not build is refused naming the variant, and the work, title and picture stay; a good one opens and undoes', async () => {
    await withApp(async ({ page, problems }) => {
      const before = await appDocument(page);
      const title = await page.locator('#doc-title').innerText();
      const full = await solveCount(page, 'full');
      const other = before.variants.find((v) => v.name !== before.activeVariant)!.name;
      const onOther = { ...before, activeVariant: other };
      const broken = applyEdit(onOther, 'setFilletRadius', { vertex: shortSideCorner(activeSection(onOther)), radius: 60 });
      const file = { ...broken, activeVariant: before.activeVariant, title: 'Broken port' };

      await openThroughPicker(page, 'broken.json', Buffer.from(JSON.stringify(file)));
      expect(await page.locator('#status').getAttribute('data-level')).toBe('error');
      expect(await statusText(page)).toMatch(
        new RegExp(`^"broken\\.json" was not opened: the variant "${other}" cannot be solved\\. The fillet at corner \\d+ .*does not fit.* Your current work is unchanged\\.$`));
      expect(await page.locator('#doc-title').innerText()).toBe(title);
      expect(await appDocument(page)).toEqual(before);

      // A picture is not JSON: said in plain words.
      const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
      await openThroughPicker(page, 'port-photo.png', png);
      expect(await statusText(page)).toMatch(/^"port-photo\.png" was not opened: it is not a text file \(it looks like a picture/);
      expect(await appDocument(page)).toEqual(before);
      expect(await solveCount(page, 'full'), 'no new solve: the picture still belongs to the kept work').toBe(full);

      // A good file opens, and opening it is a step Ctrl+Z takes back: the work and its title return.
      await openThroughPicker(page, 'other.json', Buffer.from(JSON.stringify({ ...before, title: 'Other port' })));
      await expect.poll(() => page.locator('#doc-title').innerText()).toBe('Other port');
      expect(await page.locator('#undo-button').getAttribute('title')).toMatch(/^Undo Open "other\.json"/);
      await page.keyboard.press('Control+z');
      await expect.poll(() => page.locator('#doc-title').innerText()).toBe(title);
      expect(await appDocument(page)).toEqual(before);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

/**
 * The width profile in the app: started from the side panel, a typed width re-solves the field and is saved in the
 * file (which `check` accepts), a drag in the plan-view strip is one undo step, and undo takes the profile away.
 */
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { PortDocument, WidthProfile } from '../../src/document/types.ts';
import { activeVariant } from '../../src/editor/index.ts';
import { runBin } from '../cli/helpers.ts';
import { appDocument } from './app-fillet.ts';
import { CHECK_MS, solveCount, waitForFullSolves } from './app-session.ts';
import { appSuite } from './app-suite.ts';

const withApp = appSuite();

const profileOf = async (page: Page): Promise<WidthProfile | undefined> => activeVariant(await appDocument(page)).width;
const modelText = (page: Page) => page.locator('[data-reading="width-model"]').innerText();

/** Where the strip draws station `index`'s handle, page CSS px. */
async function stripHandle(page: Page, index: number): Promise<{ x: number; y: number }> {
  return page.evaluate((k) => {
    type Strip = { handleAt(i: number): { x: number; y: number } | null };
    const strip = (window as unknown as { portwright: { widthStrip: Strip } }).portwright.widthStrip;
    const at = strip.handleAt(k);
    if (!at) throw new Error(`no handle for station ${k}`);
    const box = document.getElementById('width-strip-host')!.getBoundingClientRect();
    return { x: box.left + at.x, y: box.top + at.y };
  }, index);
}

describe('the width profile', () => {
  it('starts from the panel, a typed width re-solves and saves, a strip drag is one step, undo removes it', async () => {
    await withApp(async ({ page, problems }) => {
      expect(await modelText(page)).toBe('Model: plane, per unit depth.');
      expect(await page.locator('#width-strip-host').isHidden()).toBe(true);
      const planeConductance = await page.evaluate(() => (window as unknown as { portwright: { lastReply: { conductance: number } } }).portwright.lastReply.conductance);

      let full = await solveCount(page, 'full');
      await page.click('[data-action="width-start"]');
      await expect.poll(() => profileOf(page)).toMatchObject({ stations: [{ along: 0, width: 32 }, { width: 32 }] });
      expect(await modelText(page)).toBe('Model: width profile (width-weighted flow).');
      expect(await page.locator('#width-strip-host').isVisible()).toBe(true);
      await waitForFullSolves(page, full + 1);

      // A typed width: exactly as typed, and the field is solved again with it.
      full = await solveCount(page, 'full');
      const box = page.locator('[data-field="width-width-1"]');
      await box.fill('45');
      await box.press('Tab');
      await expect.poll(async () => (await profileOf(page))?.stations[1].width).toBe(45);
      // The table keeps its rows, so Tab lands on the next control as in any form.
      expect(await page.evaluate(() => (document.activeElement as HTMLElement | null)?.dataset.action)).toBe('width-add-station');
      await waitForFullSolves(page, full + 1);
      const widthConductance = await page.evaluate(() => (window as unknown as { portwright: { lastReply: { conductance: number } } }).portwright.lastReply.conductance);
      // Per unit depth the flux is that of a 1 mm deep passage; 32 to 45 mm deep it carries tens of times more [derived].
      expect(widthConductance).toBeGreaterThan(20 * planeConductance);

      // A refused value is said in a sentence and the box shows the document again.
      await box.fill('-2');
      await box.press('Enter');
      await expect.poll(() => page.locator('#status').innerText()).toBe('A width must be more than 0 mm.');
      expect(await box.inputValue()).toBe('45');

      const [download] = await Promise.all([page.waitForEvent('download'), page.click('#save-button')]);
      const path = await download.path();
      const saved = JSON.parse(readFileSync(path, 'utf8')) as PortDocument;
      expect(activeVariant(saved).width?.stations.map((s) => s.width)).toEqual([32, 45]);
      const checked = runBin(['check', path]);
      expect(checked.code, checked.stderr + checked.stdout).toBe(0);

      // A drag of the second station's handle: many steps, one undo step.
      const beforeDrag = await appDocument(page);
      const grip = await stripHandle(page, 1);
      await page.mouse.move(grip.x, grip.y);
      await page.mouse.down();
      for (let k = 1; k <= 8; k++) await page.mouse.move(grip.x - 3 * k, grip.y - 2 * k);
      await page.mouse.up();
      await expect.poll(async () => (await profileOf(page))?.stations[1].width).toBeGreaterThan(45);
      expect(await page.locator('#undo-button').getAttribute('title')).toMatch(/^Undo Set width profile \(Ctrl\+Z\)/);
      await page.click('#undo-button');
      await expect.poll(() => appDocument(page)).toEqual(beforeDrag);

      // Undo the typed width, then the start: the variant is per unit depth again and the strip goes.
      await page.click('#undo-button');
      await page.click('#undo-button');
      await expect.poll(() => profileOf(page)).toBeUndefined();
      expect(await modelText(page)).toBe('Model: plane, per unit depth.');
      expect(await page.locator('#width-strip-host').isHidden()).toBe(true);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('an obstruction added from the panel is drawn as a notch; Escape mid-drag puts the station back and leaves no step', async () => {
    await withApp(async ({ page, problems }) => {
      await page.click('[data-action="width-start"]');
      await page.click('[data-action="width-add-obstruction"]');
      const stem = activeVariant(await appDocument(page)).parts?.valve?.stemDiameter;
      await expect.poll(async () => (await profileOf(page))?.obstructions?.[0]).toMatchObject({ name: 'valve stem', diameter: stem });
      await expect.poll(() => page.locator('#width-strip-host .strip-notch').count()).toBe(1);

      const before = await appDocument(page);
      const steps = () => page.evaluate(() => (window as unknown as { portwright: { store: { steps(n: number): { undo: string[] } } } }).portwright.store.steps(50).undo.length);
      const stepsBefore = await steps();
      const grip = await stripHandle(page, 0);
      await page.mouse.move(grip.x, grip.y);
      await page.mouse.down();
      for (let k = 1; k <= 5; k++) await page.mouse.move(grip.x + 4 * k, grip.y - 3 * k);
      await expect.poll(async () => (await profileOf(page))?.stations[0].width).toBeGreaterThan(32);
      await page.keyboard.press('Escape');
      await page.mouse.up();
      await expect.poll(() => appDocument(page)).toEqual(before);
      expect(await steps()).toBe(stepsBefore);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

/**
 * The round (axisymmetric) model in the app: the parts panel's toggle solves the active variant round about its valve
 * axis on the chosen side, the saved file carries it (and `check` accepts it), and undo makes the section plane again.
 */
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { PortDocument } from '../../src/document/types.ts';
import { activeVariant } from '../../src/editor/index.ts';
import { runBin } from '../cli/helpers.ts';
import { appDocument } from './app-fillet.ts';
import { CHECK_MS, solveCount, waitForFullSolves } from './app-session.ts';
import { appSuite } from './app-suite.ts';

const withApp = appSuite();

const shownModel = (page: Page) => page.evaluate(() => (window as unknown as { portwright: { lastReply: { reading?: { model: string } } } }).portwright.lastReply.reading?.model);
const roundToggle = (page: Page) => page.getByText('round about the valve axis', { exact: true }).locator('xpath=..').locator('input');

describe('the round model', () => {
  it('the toggle solves the variant round on the manifold side, Save keeps it for check, undo makes it plane again', async () => {
    await withApp(async ({ page, problems }) => {
      expect(await shownModel(page)).toBe('plane');
      let full = await solveCount(page, 'full');
      await roundToggle(page).check();
      await expect.poll(async () => activeVariant(await appDocument(page)).axisymmetric).toEqual({ keep: 'left' });
      await waitForFullSolves(page, full + 1);
      await expect.poll(() => shownModel(page)).toBe('axisymmetric');
      expect(await page.locator('#undo-button').getAttribute('title')).toMatch(/^Undo Set round \(axisymmetric\) model/);

      const [download] = await Promise.all([page.waitForEvent('download'), page.click('#save-button')]);
      const path = await download.path();
      const saved = JSON.parse(readFileSync(path, 'utf8')) as PortDocument;
      expect(activeVariant(saved).axisymmetric).toEqual({ keep: 'left' });
      const checked = runBin(['check', path]);
      expect(checked.code, checked.stderr + checked.stdout).toBe(0);

      // The far side holds no inlet: refused in a sentence, and the document stays round on the manifold side.
      await page.getByText('side solved (looking the way the valve opens)', { exact: true }).locator('xpath=..').locator('select').selectOption('right');
      await expect.poll(() => page.locator('#status').innerText()).toMatch(/inlet .*lies wholly on the other side of the axis/i);
      expect(activeVariant(await appDocument(page)).axisymmetric).toEqual({ keep: 'left' });

      full = await solveCount(page, 'full');
      await page.click('#undo-button');
      await expect.poll(async () => activeVariant(await appDocument(page)).axisymmetric).toBeUndefined();
      await waitForFullSolves(page, full + 1);
      await expect.poll(() => shownModel(page)).toBe('plane');
      expect(await roundToggle(page).isChecked()).toBe(false);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

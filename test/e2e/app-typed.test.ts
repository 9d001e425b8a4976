/** Typed values in the app: an exact short-side radius typed after clicking its handle; a wall named from the panel. */
import { describe, expect, it } from 'vitest';
import { activeSection } from '../../src/editor/index.ts';
import { appDocument, zoomedShortSideGrip } from './app-fillet.ts';
import { CHECK_MS, waitForFullSolves } from './app-session.ts';
import { appSuite } from './app-suite.ts';
const withApp = appSuite();

describe('typed values for the selection', () => {
  it('clicking the short-side fillet handle offers its radius; typing 9.5 sets exactly 9.5 and re-solves', async () => {
    await withApp(async ({ page, problems }) => {
      const grip = await zoomedShortSideGrip(page, 4);
      await page.mouse.click(grip.handle[0], grip.handle[1]);
      const field = page.locator('[data-field="fillet-radius"]');
      await expect.poll(() => field.inputValue()).toBe(String(grip.radius));
      const before = await page.locator('[data-reading="short-side-peak"]').innerText();
      await field.fill('9.5');
      await field.press('Enter');
      await expect.poll(async () => activeSection(await appDocument(page)).outline.vertices[grip.vertex].filletRadius).toBe(9.5);
      await waitForFullSolves(page, 2);
      await expect.poll(() => page.locator('[data-reading="short-side-peak"]').innerText(), { timeout: 60_000 }).not.toBe(before);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

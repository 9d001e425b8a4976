/** Typed values in the app: an exact short-side radius typed after clicking its handle; a wall named from the panel. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { activeSection } from '../../src/editor/index.ts';
import { appDocument, shortSideGrip, zoomAbout } from './app-fillet.ts';
import { openApp, startApp, waitForFullSolves, type AppSession } from './app-session.ts';

const CHECK_MS = 180_000;
let session: AppSession;

beforeAll(async () => {
  session = await startApp();
}, CHECK_MS);

afterAll(async () => {
  await session?.close();
});

describe('typed values for the selection', () => {
  it('clicking the short-side fillet handle offers its radius; typing 9.5 sets exactly 9.5 and re-solves', async () => {
    const { page, context, problems } = await openApp(session);
    try {
      let grip = await shortSideGrip(page);
      await zoomAbout(page, grip.handle, 4);
      grip = await shortSideGrip(page);
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
    } finally {
      await context.close();
    }
  }, CHECK_MS);
});

/** The app after drags that end unusually: let go on a shape that cannot be solved. */

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { PortDocument } from '../../src/document/types.ts';
import { activeVariant, liftHandlePosition } from '../../src/editor/index.ts';
import { appDocument, toPage } from './app-fillet.ts';
import { openApp, startApp, type AppSession } from './app-session.ts';

/** Solves on the standard grid take seconds, longer when the machine is shared: each check gets minutes. */
const CHECK_MS = 180_000;

let session: AppSession;

beforeAll(async () => {
  session = await startApp();
}, CHECK_MS);

afterAll(async () => {
  await session?.close();
});

/** Device px widths of the WebGL picture and of the label layer over it (the same unless drawing mid-drag). */
function layerWidths(page: Page): Promise<{ picture: number; labels: number }> {
  return page.evaluate(() => {
    type View = { scene: { renderer: { domElement: HTMLCanvasElement } }; overlay: { canvas: HTMLCanvasElement } };
    const view = (window as unknown as { portwright: { view: View } }).portwright.view;
    return { picture: view.scene.renderer.domElement.width, labels: view.overlay.canvas.width };
  });
}

const liftOf = (doc: PortDocument) => activeVariant(doc).parts?.valve?.lift;

describe('drags that end unusually', () => {
  it('letting go with the valve shut on its seat (a shape that cannot be solved) ends the drag drawing', async () => {
    const { context, page, problems } = await openApp(session);
    try {
      const valve = activeVariant(await appDocument(page)).parts?.valve;
      if (!valve) throw new Error('the sample has no valve');
      // The lift handle dragged 4 mm past the seat: the tool holds the lift at 0, where the valve head touches the seat.
      const [from, past] = await toPage(page, [liftHandlePosition(valve), liftHandlePosition({ ...valve, lift: -4 })]);
      expect((await layerWidths(page)).picture).toBe((await layerWidths(page)).labels);
      await page.mouse.move(...from);
      await page.mouse.down();
      for (let k = 1; k <= 6; k++) await page.mouse.move(from[0] + (k / 6) * (past[0] - from[0]), from[1] + (k / 6) * (past[1] - from[1]));
      await expect.poll(async () => liftOf(await appDocument(page))).toBe(0);
      await page.mouse.up();
      await expect.poll(() => page.locator('#status').getAttribute('data-level')).toBe('error');
      expect(await page.locator('#status').innerText()).toMatch(/valve head/);
      // The drag is over: the picture is drawn at the view's full resolution again, not left at the drag's half.
      const widths = await layerWidths(page);
      expect(widths.picture).toBe(widths.labels);
      expect(problems).toEqual([]);
    } finally {
      await context.close();
    }
  }, CHECK_MS);

});

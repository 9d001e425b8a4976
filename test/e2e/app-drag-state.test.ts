/** The app during and after drags: let go on a shape that cannot be solved, a second finger on a handle, the speed reference mid-drag. */

import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { PortDocument } from '../../src/document/types.ts';
import { activeSection, activeVariant, liftHandlePosition } from '../../src/editor/index.ts';
import { appDocument, between, pressAndMove, toPage, zoomedShortSideGrip } from './app-fillet.ts';
import { CHECK_MS, solveCount, waitForFullSolves } from './app-session.ts';
import { appSuite } from './app-suite.ts';

const withApp = appSuite();

/** Device px widths of the WebGL picture and of the label layer over it (the same unless drawing mid-drag). */
function layerWidths(page: Page): Promise<{ picture: number; labels: number }> {
  return page.evaluate(() => {
    type View = { scene: { renderer: { domElement: HTMLCanvasElement } }; overlay: { canvas: HTMLCanvasElement } };
    const view = (window as unknown as { portwright: { view: View } }).portwright.view;
    return { picture: view.scene.renderer.domElement.width, labels: view.overlay.canvas.width };
  });
}

const liftOf = (doc: PortDocument) => activeVariant(doc).parts?.valve?.lift;

describe('drags: unusual ends and the picture mid-drag', () => {
  it('dragging the valve shut on its seat (a shape that cannot be solved) stops at the last lift that builds, says why, and ends the drag drawing', async () => {
    await withApp(async ({ page, problems }) => {
      const valve = activeVariant(await appDocument(page)).parts?.valve;
      if (!valve) throw new Error('the sample has no valve');
      // The lift handle dragged 4 mm past the seat: the tool asks for lift 0, where the valve head touches the seat,
      // which the document refuses; the last lift that builds stays.
      const [from, past] = await toPage(page, [liftHandlePosition(valve), liftHandlePosition({ ...valve, lift: -4 })]);
      expect((await layerWidths(page)).picture).toBe((await layerWidths(page)).labels);
      const full = await solveCount(page, 'full');
      await pressAndMove(page, from, past, 6);
      await expect.poll(() => page.locator('#status').innerText()).toMatch(/valve head.*The change was not made\./);
      const held = liftOf(await appDocument(page));
      expect(held).toBeGreaterThan(0);
      expect(held).toBeLessThan(valve.lift);
      await page.mouse.up();
      await waitForFullSolves(page, full + 1);
      expect(liftOf(await appDocument(page))).toBe(held);
      expect(await page.locator('#status').innerText()).toMatch(/valve head/);
      // The drag is over: the picture is drawn at the view's full resolution again, not left at the drag's half.
      const widths = await layerWidths(page);
      expect(widths.picture).toBe(widths.labels);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('a second finger put down on a handle mid-drag does not move the point held by the first', async () => {
    await withApp(async ({ context, page, problems }) => {
      const grip = await zoomedShortSideGrip(page, 4);
      const radiusOf = async () => activeSection(await appDocument(page)).outline.vertices[grip.vertex].filletRadius ?? 0;
      // Another handle in sight: the corner next to the held one.
      const section = activeSection(await appDocument(page));
      const [other] = await toPage(page, [section.outline.vertices[grip.vertex + 1].at]);
      const cdp = await context.newCDPSession(page);
      await cdp.send('Emulation.setTouchEmulationEnabled', { enabled: true, maxTouchPoints: 2 });
      const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', points: ReadonlyArray<readonly [number, number, number]>) =>
        cdp.send('Input.dispatchTouchEvent', { type, touchPoints: points.map(([id, x, y]) => ({ id, x, y })) });
      // First finger: on the fillet handle, then out along the corner's bisector to the handle of a 7 mm radius.
      const to = await grip.handleFor(7);
      await touch('touchStart', [[0, ...grip.handle]]);
      for (let k = 1; k <= 4; k++) await touch('touchMove', [[0, ...between(grip.handle, to, k / 4)]]);
      await expect.poll(radiusOf).toBeGreaterThan(grip.radius + 1);
      const held = await radiusOf();
      // Second finger: down on that corner and moved to where the fillet handle of a 5 mm radius would be, while the
      // first stays still.
      const lure = await grip.handleFor(5);
      await touch('touchStart', [[0, ...to], [1, ...other]]);
      for (let k = 1; k <= 4; k++) await touch('touchMove', [[0, ...to], [1, ...between(other, lure, k / 4)]]);
      // (Touch points listed with touchEnd are the ones lifted.) The second finger is lifted first, then the first.
      await touch('touchEnd', [[1, ...lure]]);
      expect(await radiusOf(), 'the fillet follows the first finger only').toBeCloseTo(held, 6);
      await touch('touchEnd', [[0, ...to]]);
      expect(await radiusOf()).toBeCloseTo(held, 6);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('with speeds against the tightest station, drag previews are scaled as the full solve was (the colour bar holds)', async () => {
    await withApp(async ({ page, problems }) => {
      const choose = page.locator('.lil-controller', { has: page.locator('.lil-name', { hasText: 'ratio of speed to' }) }).locator('select');
      // The setting sits in a folded group of the settings panel.
      await choose.selectOption('tightest station', { force: true });
      // Field shown over the solver's own ratio, at the first cell that is in the flow.
      const shownOverSolved = () => page.evaluate(() => {
        type App = { view: { content: { field: { values: ArrayLike<number> } } }; lastReply: { speedRatio: Float32Array } };
        const app = (window as unknown as { portwright: App }).portwright;
        const solved = app.lastReply.speedRatio;
        const k = solved.findIndex((v) => Number.isFinite(v) && v > 0.5);
        return app.view.content.field.values[k] / solved[k];
      });
      const full = await shownOverSolved();
      // The sample's tightest station is a little faster than the inlet: every ratio is divided by its mean.
      expect(full).toBeLessThan(0.999);
      const grip = await zoomedShortSideGrip(page, 4);
      const drags = await solveCount(page, 'drag');
      await pressAndMove(page, grip.handle, await grip.handleFor(8), 4);
      await expect.poll(() => solveCount(page, 'drag')).toBeGreaterThan(drags);
      expect(await shownOverSolved()).toBeCloseTo(full, 6);
      const fulls = await solveCount(page, 'full');
      await page.mouse.up();
      await waitForFullSolves(page, fulls + 1);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

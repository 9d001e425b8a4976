/** Browser check of the view: draws the exact concentric-bend field in headless chromium and reads the pixels back. */

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { viridis } from '../../src/view/colour-map.ts';
import { bendSpeedRatio } from '../view/bend-field.ts';
import { collectProblems, startSession, type BrowserSession } from './view-browser.ts';

const bend = { r1: 20, r2: 40 };
const WIDTH = 900;
const HEIGHT = 640;
const RATIO = 2;

let session: BrowserSession;
let page: Page;
let problems: string[];

/** Run `fn(harness)` in the page; the harness object is built by test/e2e/harness/view-harness.ts. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
function inPage<R, A = undefined>(fn: (h: any, arg: A) => R | Promise<R>, arg?: A): Promise<R> {
  return page.evaluate(
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    ([src, a]) => new Function('h', 'a', `return (${src})(h, a);`)((window as any).harness, a),
    [fn.toString(), arg] as const,
  ) as Promise<R>;
}

/** Section point at radius r and angle deg on the bend. */
function polar(r: number, deg: number): { x: number; y: number } {
  return { x: r * Math.cos((deg * Math.PI) / 180), y: r * Math.sin((deg * Math.PI) / 180) };
}

function expectColour(rgba: number[], t: number, tolerance: number): void {
  const want = viridis(t).map((c) => c * 255);
  for (let ch = 0; ch < 3; ch++) expect(Math.abs(rgba[ch] - want[ch]), `channel ${ch} of ${rgba} vs ${want}`).toBeLessThan(tolerance);
}

beforeAll(async () => {
  session = await startSession();
  page = await session.browser.newPage({ viewport: { width: WIDTH, height: HEIGHT }, deviceScaleFactor: RATIO });
  problems = collectProblems(page);
  await page.goto(`${session.baseUrl}/test/e2e/harness/view-harness.html`);
  await page.waitForFunction(() => (window as unknown as { harness?: { ready: boolean } }).harness?.ready === true);
  await inPage((h) => h.nextFrame());
});

afterAll(async () => {
  await session?.close();
});

describe('flow view in a browser', () => {
  it('draws a picture sharp on a high-DPI screen, with no console errors or WebGL errors', async () => {
    const stats = await inPage((h) => {
      const { width, height, data } = h.pixels();
      const colours = new Set<number>();
      let lit = 0;
      for (let k = 0; k < data.length; k += 4) {
        colours.add((data[k] << 16) | (data[k + 1] << 8) | data[k + 2]);
        // Background is #17191c; anything clearly brighter is drawn content.
        if (data[k] + data[k + 1] + data[k + 2] > 3 * 0x30) lit++;
      }
      return { width, height, distinct: colours.size, litShare: lit / (width * height), glError: h.glError() };
    });
    expect(stats.width).toBe(WIDTH * RATIO);
    expect(stats.height).toBe(HEIGHT * RATIO);
    expect(stats.glError).toBe(0);
    expect(stats.distinct).toBeGreaterThan(500);
    // The quarter annulus fills about a third of the fitted frame.
    expect(stats.litShare).toBeGreaterThan(0.25);
    expect(problems).toEqual([]);
  });

  it('colours each point by the exact free-vortex speed ratio, across the whole colour map', async () => {
    // Fixed range from the outer-wall to the inner-wall speed ratio: the field should run from one end of the map
    // to the other. Speed ratio (r2 - r1) / (r ln(r2/r1)) [derived, REFERENCES.md 1a].
    const lo = bendSpeedRatio(bend, bend.r2);
    const hi = bendSpeedRatio(bend, bend.r1);
    const radii = [20.3, 24, 28, 32, 36, 39.7];
    const points = radii.map((r) => polar(r, 27));
    const rgba: number[][] = await inPage(
      async (h, a) => {
        h.view.setLayers({ contours: false, streamlines: false, walls: false, flags: false });
        h.view.setColourRange({ mode: 'fixed', min: a.lo, max: a.hi });
        await h.nextFrame();
        const out = h.sample(a.points);
        h.view.setLayers({ contours: true, streamlines: true, walls: true, flags: true });
        return out;
      },
      { lo, hi, points },
    );
    const t = radii.map((r) => (bendSpeedRatio(bend, r) - lo) / (hi - lo));
    radii.forEach((_, k) => expectColour(rgba[k], t[k], 6));
    // The samples beside the two walls sit within 4 % of the two ends of the map, so the field spans it.
    expect(t[0]).toBeGreaterThan(0.96);
    expect(t[radii.length - 1]).toBeLessThan(0.04);
  });

  it('sets the automatic range from 0 to the 99.5th percentile, so the top cells do not set the scale', async () => {
    // Cells at or below the 99.5th percentile speed are those outside r* with (r*^2 - r1^2) / (r2^2 - r1^2) = 0.005,
    // r* = 20.149, speed ratio 1.432; the peak (innermost cell centre) is higher. [derived]
    const range = await inPage(async (h) => {
      h.view.setColourRange({ mode: 'auto', min: 0, max: 1 });
      await h.nextFrame();
      return h.view.colourRange;
    });
    expect(range.min).toBe(0);
    expect(Math.abs(range.max - 1.432)).toBeLessThan(0.006);
  });

  it('zooms about the cursor with the wheel and relabels the scale bar', async () => {
    const before = await inPage((h) => {
      // Record the wheel deltas the browser delivers (it may scale or split them).
      h.deltas = [];
      h.container.addEventListener('wheel', (ev: WheelEvent) => h.deltas.push(ev.deltaY * (ev.deltaMode === 1 ? 16 : 1)));
      return { t: h.view.transform, p: h.view.screenToSection(400, 300), bar: h.view.diagnostics.scaleBarLabel };
    });
    await page.mouse.move(400, 300);
    await page.mouse.wheel(0, -1200);
    const after = await inPage(async (h) => {
      await h.nextFrame();
      return { t: h.view.transform, p: h.view.screenToSection(400, 300), bar: h.view.diagnostics.scaleBarLabel, deltas: h.deltas as number[] };
    });
    // Zoom factor exp(-deltaY * 0.0014) per event (the view's wheel rate); wheel up zooms in.
    const total = after.deltas.reduce((a, b) => a + b, 0);
    expect(total).toBeLessThan(0);
    expect(after.t.scale / before.t.scale).toBeCloseTo(Math.exp(-total * 0.0014), 6);
    expect(after.p.x).toBeCloseTo(before.p.x, 6);
    expect(after.p.y).toBeCloseTo(before.p.y, 6);
    expect(after.bar).not.toBe(before.bar);
  });

  it('pans with a drag, but not while the editor claims the pointer or panning is off', async () => {
    const drag = async (): Promise<{ dx: number; dy: number }> => {
      const t0 = await inPage((h) => h.view.transform);
      await page.mouse.move(300, 300);
      await page.mouse.down();
      await page.mouse.move(360, 340, { steps: 4 });
      await page.mouse.up();
      const t1 = await inPage((h) => h.view.transform);
      return { dx: t1.offsetX - t0.offsetX, dy: t1.offsetY - t0.offsetY };
    };
    const free = await drag();
    expect(free.dx).toBeCloseTo(60, 6);
    expect(free.dy).toBeCloseTo(40, 6);
    await inPage((h) => {
      h.view.claimPointer = () => true;
    });
    expect(await drag()).toEqual({ dx: 0, dy: 0 });
    await inPage((h) => {
      h.view.claimPointer = null;
      h.view.panEnabled = false;
    });
    expect(await drag()).toEqual({ dx: 0, dy: 0 });
    await inPage((h) => {
      h.view.panEnabled = true;
    });
  });

  it('pinches with two fingers so the picture stays under both of them', async () => {
    const r = await inPage(async (h) => {
      const c = h.container as HTMLElement;
      const fire = (type: string, id: number, x: number): void => {
        c.dispatchEvent(new PointerEvent(type, { pointerId: id, pointerType: 'touch', clientX: x, clientY: 300, bubbles: true, cancelable: true }));
      };
      const t0 = h.view.transform;
      const a = h.view.screenToSection(300, 300);
      const b = h.view.screenToSection(500, 300);
      fire('pointerdown', 11, 300);
      fire('pointerdown', 12, 500);
      fire('pointermove', 12, 600);
      fire('pointerup', 12, 600);
      fire('pointerup', 11, 300);
      await h.nextFrame();
      return { ratio: h.view.transform.scale / t0.scale, a: h.view.sectionToScreen(a.x, a.y), b: h.view.sectionToScreen(b.x, b.y) };
    });
    // Fingers 200 px apart, then 300 px: 1.5 times closer.
    expect(r.ratio).toBeCloseTo(1.5, 9);
    expect(r.a.x).toBeCloseTo(300, 6);
    expect(r.b.x).toBeCloseTo(600, 6);
    expect(r.a.y).toBeCloseTo(300, 6);
  });

  it('renders on demand: many requests before a frame make one render', async () => {
    const frames = await inPage(async (h) => {
      await h.nextFrame();
      const before = h.view.diagnostics.frames;
      for (let k = 0; k < 10; k++) h.view.requestRender();
      await h.nextFrame();
      const afterRequests = h.view.diagnostics.frames - before;
      await h.nextFrame();
      const idle = h.view.diagnostics.frames - before - afterRequests;
      return { afterRequests, idle };
    });
    expect(frames).toEqual({ afterRequests: 1, idle: 0 });
  });

  it('fits the section back into view and saves a screenshot', async () => {
    const scale = await inPage(async (h) => {
      h.view.fitToView();
      await h.nextFrame();
      return h.view.transform.scale;
    });
    // Section 40 x 40 mm; free height 640 - 24 - 44 px limits the fit. [derived from the view's insets]
    expect(scale).toBeCloseTo((HEIGHT - 24 - 44) / 40, 9);
    await page.screenshot({ path: '/tmp/view-harness.png' });
  });

  it('rejects a field whose values do not fill its grid and keeps the one it shows', async () => {
    const r = await inPage((h) => {
      const before = h.view.colourRange;
      let message = '';
      try {
        h.view.setField({ nx: 4, ny: 4, x0: 0, y0: 0, h: 1, values: new Float32Array(15) });
      } catch (e) {
        message = `${(e as Error).name}: ${(e as Error).message}`;
      }
      return { message, same: JSON.stringify(before) === JSON.stringify(h.view.colourRange) };
    });
    expect(r.message).toBe('RangeError: Field has 15 values for 4 x 4 cells.');
    expect(r.same).toBe(true);
  });

  it('clears contours, streamlines and flags as a drag step does, again and again, and draws them back the same', async () => {
    const r = await inPage(async (h) => {
      const o = h.overlays;
      const differing = (a: number[], b: number[]) => a.reduce((n, v, k) => n + (v === b[k] ? 0 : 1), 0);
      const dragStep = () => {
        h.view.setContourLevels([]);
        h.view.setStreamlines([]);
        h.view.setFlags({ hatched: [], lines: [], markers: [] });
        h.view.setClip(o.clip);
      };
      const full = h.pixels().data;
      dragStep();
      const cleared = h.pixels().data;
      dragStep();
      dragStep();
      const clearedAgain = h.pixels().data;
      h.view.setContourLevels(o.levels);
      h.view.setStreamlines(o.streamlines);
      h.view.setFlags(o.flags);
      const restored = h.pixels().data;
      return { overlaysDrawn: differing(full, cleared), repeatDiff: differing(cleared, clearedAgain), restoreDiff: differing(full, restored) };
    });
    expect(r.overlaysDrawn).toBeGreaterThan(1000);
    expect(r.repeatDiff).toBe(0);
    expect(r.restoreDiff).toBe(0);
  });

  it('shows each new field of the same grid size (as drag steps bring them), and the first one again pixel for pixel', async () => {
    const r = await inPage((h) => {
      const differing = (a: number[], b: number[]) => a.reduce((n, v, k) => n + (v === b[k] ? 0 : 1), 0);
      const f = h.overlays.field;
      // Contours off: they follow the field in JS, so only the field's own colours tell whether it was uploaded.
      h.view.setContourLevels([]);
      const first = h.pixels().data;
      h.view.setField({ ...f, values: Float32Array.from(f.values).reverse() });
      const mirrored = h.pixels().data;
      h.view.setField(f);
      const back = differing(first, h.pixels().data);
      h.view.setContourLevels(h.overlays.levels);
      return { changed: differing(first, mirrored), back };
    });
    expect(r.changed).toBeGreaterThan(1000);
    expect(r.back).toBe(0);
  });

  it('mid-drag draws at half resolution and holds the colour range through new fields, then refits both on release', async () => {
    const r = await inPage(async (h) => {
      const canvas = h.view.scene.renderer.domElement as HTMLCanvasElement;
      const f = h.overlays.field;
      const full = { width: canvas.width, range: h.view.colourRange };
      h.view.setInteractive(true);
      // A field twice as fast, as a drag step might bring: the colour scale must not move mid-drag.
      h.view.setField({ ...f, values: Float32Array.from(f.values, (v: number) => 2 * v) });
      h.view.renderNow();
      const dragging = { width: canvas.width, range: h.view.colourRange, snapshotWidth: h.view.snapshot().width };
      h.view.setInteractive(false);
      h.view.renderNow();
      const released = { width: canvas.width, range: h.view.colourRange };
      h.view.setField(f);
      h.view.renderNow();
      return { full, dragging, released, back: h.view.colourRange };
    });
    expect(r.dragging.width).toBe(r.full.width / 2);
    // A snapshot mid-drag still has the view's full size.
    expect(r.dragging.snapshotWidth).toBe(r.full.width);
    expect(r.dragging.range).toEqual(r.full.range);
    expect(r.released.width).toBe(r.full.width);
    expect(r.released.range.max).toBeCloseTo(2 * r.full.range.max, 5);
    expect(r.back).toEqual(r.full.range);
  });

  it('leaves the label layer untouched when a frame changes nothing it shows (each drag step), and redraws it on a pan', async () => {
    const r = await inPage(async (h) => {
      const ctx = h.view.overlay.canvas.getContext('2d') as CanvasRenderingContext2D;
      let clears = 0;
      const clearRect = ctx.clearRect.bind(ctx);
      ctx.clearRect = (...a: [number, number, number, number]) => {
        clears++;
        clearRect(...a);
      };
      h.view.setField(h.overlays.field);
      h.view.renderNow();
      const afterField = clears;
      h.view.renderNow();
      const afterRepeat = clears;
      h.view.zoomBy(1.1);
      h.view.renderNow();
      const afterZoom = clears;
      h.view.zoomBy(1 / 1.1);
      h.view.fitToView();
      h.view.renderNow();
      delete (ctx as { clearRect?: unknown }).clearRect;
      return { afterField, afterRepeat, afterZoom };
    });
    // A new field brings new contour labels; the same frame again brings nothing new; a zoom moves every label.
    expect(r.afterField).toBe(1);
    expect(r.afterRepeat).toBe(1);
    expect(r.afterZoom).toBe(2);
  });

  it('frees every GPU object on dispose and leaves the container empty, with no errors', async () => {
    const result = await inPage((h) => {
      const before = h.view.diagnostics.memory;
      const glBefore = h.glError();
      h.view.dispose();
      // Events after disposal must find no listeners.
      h.container.dispatchEvent(new WheelEvent('wheel', { deltaY: -100, bubbles: true, cancelable: true }));
      return { before, glBefore, after: h.view.diagnostics.memory, children: h.container.children.length };
    });
    expect(result.before.geometries).toBeGreaterThan(0);
    expect(result.before.textures).toBeGreaterThan(0);
    expect(result.glBefore).toBe(0);
    expect(result.after).toEqual({ geometries: 0, textures: 0 });
    expect(result.children).toBe(0);
    await inPage((h) => h.nextFrame());
    expect(problems).toEqual([]);
  });
});

/**
 * Interaction benchmark in a real browser: drags the short-side fillet handle of the sample in small mouse steps and
 * reports how long each coarse repaint takes, and how long the full grid takes after release.
 * Run: npm run bench:browser (headless Debian chromium, software WebGL). Writes /tmp/app-after-drag.png.
 */

import { cpus, loadavg } from 'node:os';
import type { Page } from 'playwright-core';
import { shortSideGrip, zoomAbout } from '../test/e2e/app-fillet.ts';
import { openApp, solveCount, startApp, waitForFullSolves } from '../test/e2e/app-session.ts';

/** Mouse moves timed while dragging (one coarse solve and repaint each). */
const STEPS = 40;
/** Short-side radius at the end of the drag, mm: the sample's "generous" variant. */
const END_RADIUS_MM = 14;
/** Zoom on the corner first, so each step moves the handle by a pixel or more. */
const ZOOM = 6;
const SCREENSHOT = '/tmp/app-after-drag.png';

/** One repaint: the app's own timing (edit -> repainted, ms), plus page clock stamps (ms) and the worker's time. */
interface Stamped { kind: string; ms: number; cells: number; doneAt: number; eventAt: number; workerMs: number }

/** Notes, in the page, when each pointer event arrived and when each repaint was done, beside the app's own timing. */
async function instrument(page: Page): Promise<void> {
  await page.evaluate(() => {
    type App = { timings: Array<Record<string, number | string>>; lastReply: { workerMs: number } | null };
    const app = (window as unknown as { portwright: App }).portwright;
    const stamped: unknown[] = [];
    let eventAt = 0;
    for (const type of ['pointermove', 'pointerup']) window.addEventListener(type, (ev) => (eventAt = ev.timeStamp), { capture: true });
    const push = app.timings.push.bind(app.timings);
    app.timings.push = (...entries) => {
      for (const e of entries) stamped.push({ ...e, doneAt: performance.now(), eventAt, workerMs: app.lastReply?.workerMs ?? NaN });
      return push(...entries);
    };
    Object.assign(window, { benchStamps: stamped });
  });
}

const stamps = (page: Page) => page.evaluate(() => (window as unknown as { benchStamps: Stamped[] }).benchStamps);

async function waitForStamps(page: Page, count: number): Promise<void> {
  await page.waitForFunction((n) => (window as unknown as { benchStamps: unknown[] }).benchStamps.length >= n, count, { timeout: 60_000, polling: 'raf' });
}

function quantile(values: readonly number[], q: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))];
}

async function webglRenderer(page: Page): Promise<string> {
  return page.evaluate(() => {
    const gl = document.createElement('canvas').getContext('webgl2');
    const info = gl?.getExtension('WEBGL_debug_renderer_info');
    return gl && info ? String(gl.getParameter(info.UNMASKED_RENDERER_WEBGL)) : 'unknown';
  });
}

/** Drags the handle: one move to start the drag (not timed), then STEPS timed moves, then release. */
async function drag(page: Page): Promise<{ drags: Stamped[]; full: Stamped }> {
  let grip = await shortSideGrip(page);
  await zoomAbout(page, grip.handle, ZOOM);
  grip = await shortSideGrip(page);
  const [x0, y0] = grip.handle;
  const [x1, y1] = await grip.handleFor(END_RADIUS_MM);
  const along = (t: number) => [x0 + t * (x1 - x0), y0 + t * (y1 - y0)] as const;
  // The drag starts past the tool's 4 px threshold: a first move of 6 px along the bisector.
  const start = 6 / Math.hypot(x1 - x0, y1 - y0);
  await instrument(page);
  await page.mouse.move(x0, y0);
  await page.mouse.down();
  await page.mouse.move(...along(start));
  await waitForStamps(page, 1);
  for (let k = 1; k <= STEPS; k++) {
    await page.mouse.move(...along(start + ((1 - start) * k) / STEPS));
    await waitForStamps(page, 1 + k);
  }
  const fullBefore = await solveCount(page, 'full');
  await page.mouse.up();
  await waitForFullSolves(page, fullBefore + 1);
  const all = await stamps(page);
  const drags = all.slice(1, 1 + STEPS);
  const full = all.find((s, k) => k > STEPS && s.kind === 'full');
  if (drags.length !== STEPS || drags.some((s) => s.kind !== 'drag') || !full) throw new Error(`unexpected repaints: ${JSON.stringify(all.map((s) => s.kind))}`);
  return { drags, full };
}

function row(label: string, values: readonly number[], cells: number): string {
  const f = (v: number) => v.toFixed(0).padStart(8);
  return `${label.padEnd(34)}${f(quantile(values, 0.5))}${f(quantile(values, 0.9))}${String(values.length).padStart(6)}${String(cells).padStart(9)}`;
}

async function main(): Promise<void> {
  const session = await startApp();
  try {
    const { page, problems } = await openApp(session);
    const firstFull = (await page.evaluate(() => (window as unknown as { portwright: { timings: Stamped[] } }).portwright.timings))[0];
    const { drags, full } = await drag(page);
    await page.screenshot({ path: SCREENSHOT });

    console.log(`Portwright drag benchmark: short-side fillet 4 -> ${END_RADIUS_MM} mm on the sample, ${STEPS} mouse steps`);
    console.log(`machine: ${cpus().length} cores (${cpus()[0]?.model ?? '?'}), load average ${loadavg().map((l) => l.toFixed(1)).join(' ')}`);
    console.log(`browser: chromium ${session.browser.version()} headless, WebGL ${await webglRenderer(page)}\n`);
    console.log(`${'ms'.padEnd(34)}${'median'.padStart(8)}${'p90'.padStart(8)}${'n'.padStart(6)}${'cells'.padStart(9)}`);
    console.log(row('drag: edit -> coarse repaint', drags.map((s) => s.ms), drags[0].cells));
    console.log(row('  of which the worker', drags.map((s) => s.workerMs), drags[0].cells));
    console.log(row('drag: pointer event -> repaint', drags.map((s) => s.doneAt - s.eventAt), drags[0].cells));
    console.log(row('release: edit -> full repaint', [full.ms], full.cells));
    console.log(row('  of which the worker', [full.workerMs], full.cells));
    console.log(row('release: pointerup -> full repaint', [full.doneAt - full.eventAt], full.cells));
    console.log(row('first full solve (cold, at load)', [firstFull.ms], firstFull.cells));
    console.log('\n"repaint": the field, lines and labels handed to WebGL and the 2D overlay in the page (page clock).');
    console.log('"pointer event": the event\'s own time stamp; moves reach the page with animation frames, so a slow frame');
    console.log('(software WebGL on a busy machine) shows up here as a wait before the edit even starts.');
    console.log(`\nscreenshot after the drag: ${SCREENSHOT}`);
    if (problems.length > 0) console.log(`page problems:\n  ${problems.join('\n  ')}`);
  } finally {
    await session.close();
  }
}

await main();

/**
 * Interaction benchmark in a real browser: drags the short-side fillet handle of the sample and reports how long
 * a pointer movement takes to come back as a repainted coarse field, on the page clock and on the screen, and how
 * long the full grid takes after release.
 * Run: npm run bench:browser (headless chromium: Debian's, or PORTWRIGHT_CHROMIUM; software WebGL). Writes /tmp/app-after-drag.png.
 *
 * Three drags, one after the other on the same page:
 *  1. out to the generous radius in STEPS mouse steps, each waiting for its repaint: page-clock times;
 *  2. back again the same way under a browser trace: when each repaint reached the screen (screen-times.ts);
 *  3. out again at a steady MOVE_HZ without waiting, as a hand would: repaints per second.
 */

import { cpus, loadavg } from 'node:os';
import type { Page } from 'playwright-core';
import { between, zoomedShortSideGrip } from '../test/e2e/app-fillet.ts';
import { openApp, solveCount, startApp, waitForFullSolves, type AppSession } from '../test/e2e/app-session.ts';
import { screenTimes, type TraceEvent } from './screen-times.ts';

/** Mouse moves timed per drag (one coarse solve and repaint each). */
const STEPS = 40;
/** Short-side radius at the end of the drag, mm: the sample's "generous" variant. */
const END_RADIUS_MM = 14;
/** Zoom on the corner first, so each step moves the handle by a pixel or more. */
const ZOOM = 6;
/** The steady drag: pointer moves per second, and for how long. */
const MOVE_HZ = 60;
const STEADY_MS = 2000;
const SCREENSHOT = '/tmp/app-after-drag.png';
const TRACE_CATEGORIES = ['benchmark', 'cc', 'devtools.timeline'];

/** One repaint: the app's own timing (edit -> repainted, ms), plus page clock stamps (ms) and the worker's time. */
interface Stamped { kind: string; ms: number; cells: number; doneAt: number; eventAt: number; workerMs: number }

/**
 * Notes, in the page, when the newest pointer movement happened (its own time stamp, from pointerrawupdate or
 * pointermove, whichever came first) and when each repaint was done, beside the app's own timing; marks both in a
 * browser trace when one runs.
 */
async function instrument(page: Page): Promise<void> {
  await page.evaluate(`(() => {
    const app = window.portwright;
    const stamped = [];
    let eventAt = 0;
    for (const type of ['pointerrawupdate', 'pointermove', 'pointerup']) {
      window.addEventListener(type, (ev) => {
        if (ev.timeStamp <= eventAt) return;
        eventAt = ev.timeStamp;
        console.timeStamp('input ' + (performance.now() - ev.timeStamp));
      }, { capture: true });
    }
    const push = app.timings.push.bind(app.timings);
    app.timings.push = (...entries) => {
      console.timeStamp('repaint');
      for (const e of entries) stamped.push({ ...e, doneAt: performance.now(), eventAt, workerMs: app.lastReply ? app.lastReply.workerMs : NaN });
      return push(...entries);
    };
    window.benchStamps = stamped;
  })()`);
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

type Along = (t: number) => readonly [number, number];

/** Press on `along(0)`, start the drag with a 6 px move (past the tool's 4 px threshold), then STEPS timed moves
 * to `along(1)`, each waiting for its repaint. Returns the repaints of the timed moves; the button stays down. */
async function steppedDrag(page: Page, along: Along, lengthPx: number): Promise<Stamped[]> {
  const start = 6 / lengthPx;
  const before = (await stamps(page)).length;
  await page.mouse.move(...along(0));
  await page.mouse.down();
  await page.mouse.move(...along(start));
  await waitForStamps(page, before + 1);
  for (let k = 1; k <= STEPS; k++) {
    await page.mouse.move(...along(start + ((1 - start) * k) / STEPS));
    await waitForStamps(page, before + 1 + k);
  }
  const timed = (await stamps(page)).slice(before + 1, before + 1 + STEPS);
  if (timed.length !== STEPS || timed.some((s) => s.kind !== 'drag')) throw new Error(`unexpected repaints: ${JSON.stringify(timed.map((s) => s.kind))}`);
  return timed;
}

/** Let go and wait for the full grid; returns its repaint. */
async function release(page: Page): Promise<Stamped> {
  const fullBefore = await solveCount(page, 'full');
  await page.mouse.up();
  await waitForFullSolves(page, fullBefore + 1);
  const full = (await stamps(page)).filter((s) => s.kind === 'full').at(-1);
  if (!full) throw new Error('no full repaint after release');
  return full;
}

/** Moves at MOVE_HZ for STEADY_MS without waiting for anything; returns drag repaints per second. */
async function steadyDrag(page: Page, along: Along): Promise<{ perSecond: number; moves: number }> {
  await page.mouse.move(...along(0));
  await page.mouse.down();
  const before = (await stamps(page)).length;
  const moves = Math.round((MOVE_HZ * STEADY_MS) / 1000);
  const t0 = Date.now();
  for (let k = 1; k <= moves; k++) {
    const wait = t0 + (k * 1000) / MOVE_HZ - Date.now();
    if (wait > 0) await new Promise((r) => setTimeout(r, wait));
    void page.mouse.move(...along(k / moves));
  }
  const seconds = (Date.now() - t0) / 1000;
  const repaints = (await stamps(page)).slice(before).filter((s) => s.kind === 'drag').length;
  return { perSecond: repaints / seconds, moves };
}

function row(label: string, values: readonly number[], extra = ''): string {
  const f = (v: number) => v.toFixed(0).padStart(8);
  return `${label.padEnd(44)}${f(quantile(values, 0.5))}${f(quantile(values, 0.9))}${String(values.length).padStart(6)}${extra}`;
}

async function traced(session: AppSession, page: Page, work: () => Promise<void>): Promise<TraceEvent[]> {
  await session.browser.startTracing(page, { categories: TRACE_CATEGORIES });
  try {
    await work();
  } catch (error) {
    await session.browser.stopTracing();
    throw error;
  }
  const buffer = await session.browser.stopTracing();
  return (JSON.parse(buffer.toString('utf8')) as { traceEvents: TraceEvent[] }).traceEvents;
}

/** The two ways a browser without a GPU puts the page on screen. */
const COMPOSITING = [
  { label: 'compositing by software WebGL (SwiftShader), as the browser checks run', args: [] },
  { label: 'software compositing (--disable-gpu-compositing), WebGL still SwiftShader', args: ['--disable-gpu-compositing'] },
] as const;

async function measure(label: string, args: readonly string[]): Promise<void> {
  const session = await startApp(args);
  try {
    const { page, problems } = await openApp(session);
    const firstFull = (await page.evaluate(() => (window as unknown as { portwright: { timings: Stamped[] } }).portwright.timings))[0];
    const grip = await zoomedShortSideGrip(page, ZOOM);
    const tight = grip.handle;
    const generous = await grip.handleFor(END_RADIUS_MM);
    const lengthPx = Math.hypot(generous[0] - tight[0], generous[1] - tight[1]);
    const out: Along = (t) => between(tight, generous, t);
    const back: Along = (t) => out(1 - t);
    await instrument(page);

    const drags = await steppedDrag(page, out, lengthPx);
    const full = await release(page);
    const onScreen = screenTimes(await traced(session, page, async () => void (await steppedDrag(page, back, lengthPx))));
    await release(page);
    const steady = await steadyDrag(page, out);
    await release(page);
    await page.screenshot({ path: SCREENSHOT });

    console.log(`\n== ${label}`);
    console.log(`browser: chromium ${session.browser.version()} headless, WebGL ${await webglRenderer(page)}`);
    console.log(`coarse grid ${drags[0].cells} cells, full grid ${full.cells} cells; load average ${loadavg().map((l) => l.toFixed(1)).join(' ')}\n`);
    console.log(`${'ms'.padEnd(44)}${'median'.padStart(8)}${'p90'.padStart(8)}${'n'.padStart(6)}`);
    console.log('page clock (drag 1)');
    console.log(row('  edit -> coarse repaint', drags.map((s) => s.ms)));
    console.log(row('    of which the worker', drags.map((s) => s.workerMs)));
    console.log(row('  pointer event -> coarse repaint', drags.map((s) => s.doneAt - s.eventAt)));
    console.log('screen, from a browser trace (drag 2)');
    if (onScreen.length > 0) {
      const floor = quantile(onScreen.map((s) => s.firstFrameMs), 0.5);
      const shown = quantile(onScreen.map((s) => s.onScreenMs), 0.5);
      console.log(row('  pointer event -> coarse repaint (traced)', onScreen.map((s) => s.repaintMs)));
      console.log(row('  pointer event -> that repaint on screen', onScreen.map((s) => s.onScreenMs), `   ${(shown / floor).toFixed(2)} x floor`));
      console.log(row('  floor: pointer event -> next frame on screen', onScreen.map((s) => s.firstFrameMs)));
    } else console.log('  (no presented frames found in the trace)');
    console.log('release');
    console.log(row('  edit -> full repaint', [full.ms]));
    console.log(row('    of which the worker', [full.workerMs]));
    console.log(row('  pointerup -> full repaint', [full.doneAt - full.eventAt]));
    console.log(row('  first full solve (cold, at load)', [firstFull.ms]));
    console.log(`steady drag (3): ${steady.moves} moves at ${MOVE_HZ} Hz without waiting: ${steady.perSecond.toFixed(1)} coarse repaints per second`);
    if (problems.length > 0) console.log(`page problems:\n  ${problems.join('\n  ')}`);
  } finally {
    await session.close();
  }
}

console.log(`Portwright drag benchmark: short-side fillet 4 <-> ${END_RADIUS_MM} mm on the sample, ${STEPS} mouse steps per drag`);
console.log(`machine: ${cpus().length} cores (${cpus()[0]?.model ?? '?'})`);
for (const mode of COMPOSITING) await measure(mode.label, mode.args);
console.log('\n"repaint": the field, lines and labels handed to WebGL and the 2D overlay (page clock).');
console.log('"on screen": the end of the first frame the browser presented after the repaint (trace). The floor is the');
console.log('same for the first frame after the movement, whatever it showed: the browser\'s own frame time.');
console.log('"pointer event": the event\'s own time stamp.');
console.log(`\nscreenshot after the last drags: ${SCREENSHOT}`);

/**
 * Browser check of the "Air and bench" panel: typed numbers, unit switches, messages, the flow-scale button and a
 * reload on its own page; in the app, its inputs kept per variant in the document (undo, Save and Open), in chromium.
 */

import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { cfmToM3s } from '../../src/breathing/index.ts';
import { FORMAT_VERSION, type PortDocument } from '../../src/document/types.ts';
import { appDocument } from './app-fillet.ts';
import { CHECK_MS, solveCount } from './app-session.ts';
import { appSuite } from './app-suite.ts';
import { collectProblems, startSession, type BrowserSession } from './view-browser.ts';

let session: BrowserSession;
let page: Page;
let problems: string[];

/** Calls a method of the mounted panel in the page. */
function panel(method: 'setAreas' | 'setPortArea' | 'setLengthUnits', ...args: unknown[]): Promise<void> {
  return page.evaluate(([m, a]) => {
    const p = (window as unknown as { harness: { panel: () => Record<string, (...x: unknown[]) => void> } }).harness.panel();
    p[m as string](...(a as unknown[]));
  }, [method, args] as const);
}

const type = (field: string, text: string) => page.fill(`.bench-panel input[data-field="${field}"]`, text);
const value = (key: string) => page.textContent(`[data-output="${key}"] .bench-value`);
const note = (key: string) => page.textContent(`[data-output="${key}"] .bench-note`);
const panelText = () => page.textContent('.bench-panel');

beforeAll(async () => {
  session = await startSession();
  page = await session.browser.newPage({ viewport: { width: 360, height: 1500 } });
  problems = collectProblems(page);
  await page.goto(`${session.baseUrl}/test/e2e/harness/bench-panel.html`);
  await page.waitForFunction(() => (window as unknown as { harness?: { ready: boolean } }).harness?.ready === true);
});

afterAll(async () => {
  await session?.close();
});

describe('bench panel in a browser', () => {
  it('opens with room air worked out and says what the other results wait for', async () => {
    expect(await value('density')).toBe('1.1993 kg/m³'); // CIPM-2007 at 20 C, 101325 Pa, 50 % (Picard et al. 2008)
    expect(await value('cd')).toBe('—');
    expect(await note('cd')).toBe('needs measured flow');
    await type('flow', '200');
    expect(await note('cd')).toBe('no valve part');
    expect(problems).toEqual([]);
  });

  it('226.105 CFM at 28 in H2O through a 1000 mm² curtain in standard air reads C_D 1.000 (REFERENCES.md §3b [derived])', async () => {
    await panel('setAreas', { curtain: 1e-3 });
    await type('temperature', '15');
    await type('humidity', '0');
    await page.selectOption('.bench-panel select[id$="-humidityModel"]', 'ideal-mixture');
    await type('flow', '226.105');
    expect(await value('cd')).toBe('1.000');
    expect(await value('flow-28-sqrt')).toBe('226.1 CFM');
  });

  it('B 100, S 90, 6000 rpm through a 45 mm round port from the section: 88.9 m/s (REFERENCES.md §3c [derived])', async () => {
    await panel('setPortArea', (Math.PI / 4) * 0.045 ** 2, 'measured');
    await type('bore', '100');
    await type('stroke', '90');
    await type('rpm', '6000');
    expect(await value('port-speed')).toBe('88.9 m/s');
    expect(await page.textContent('.bench-panel .bench-hint:has-text("from the section")')).toBe('from the section (measured)');
  });

  it('switching units rewrites the inputs and leaves every result the same physical value', async () => {
    await page.selectOption('.bench-panel select[aria-label="Bore unit"]', 'inch');
    expect(await page.inputValue('.bench-panel input[data-field="bore"]')).toBe('3.93701');
    expect(await page.inputValue('.bench-panel input[data-field="stroke"]')).toBe('3.54331');
    expect(await page.inputValue('.bench-panel input[data-field="portArea"]')).toBe('2.46517'); // pi/4 (45/25.4)² in² [derived]
    expect(await value('port-speed')).toBe('88.9 m/s');
    await page.selectOption('.bench-panel select[aria-label="Measured flow unit"]', 'L/s');
    expect(await page.inputValue('.bench-panel input[data-field="flow"]')).toBe('106.71');
    expect(await value('cd')).toBe('1.000');
    await page.selectOption('.bench-panel select[id$="-speed-unit"]', 'ft/s');
    expect(await value('port-speed')).toBe('292 ft/s');
    await panel('setLengthUnits', 'mm');
    expect(await page.inputValue('.bench-panel input[data-field="bore"]')).toBe('100');
  });

  it('puts a message next to a field it cannot use and never shows NaN', async () => {
    await type('humidity', '120');
    await type('flow', '-3');
    await type('bore', 'abc');
    expect(await page.textContent('#' + (await page.getAttribute('.bench-panel input[data-field="humidity"]', 'aria-describedby'))))
      .toBe('Must lie between 0 % and 100 % (a percentage).');
    expect(await page.getAttribute('.bench-panel input[data-field="flow"]', 'aria-invalid')).toBe('true');
    expect(await note('density')).toBe('fix relative humidity');
    expect(await panelText()).not.toMatch(/NaN|Infinity|undefined/);
    for (const field of ['temperature', 'barometric', 'testPressure', 'stroke', 'rpm', 'cylinders', 'portArea', 'valveDiameter', 'flowCoefficient', 'hpPerCfm']) {
      await type(field, field === 'rpm' ? '1e999' : '-');
    }
    expect(await panelText()).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('"use as flow scale" sends the ideal speed at the test pressure in m/s, and is off while it cannot be had', async () => {
    await page.evaluate(() => (window as unknown as { harness: { remount: () => void } }).harness.remount());
    expect(await page.locator('.bench-panel').count()).toBe(1);
    expect(await page.locator('style#bench-panel-style').count()).toBe(1);
    await type('temperature', '15');
    await type('humidity', '0');
    await page.selectOption('.bench-panel select[id$="-humidityModel"]', 'ideal-mixture');
    await page.click('.bench-panel button:has-text("Use as flow scale")');
    const sent = await page.evaluate(() => (window as unknown as { harness: { sent: number[] } }).harness.sent.at(-1));
    expect(sent).toBeCloseTo(106.71, 2); // REFERENCES.md §3b: 106.710 m/s at 28 in H2O, 1.225 kg/m³ [derived]
    await page.selectOption('.bench-panel select[id$="-flow-scale"]', 'mean port speed');
    expect(await page.isDisabled('.bench-panel button:has-text("Use as flow scale")')).toBe(true);
    expect(problems).toEqual([]);
  });

  it('the display units are still there after the page is reloaded; the numbers are not kept in the browser', async () => {
    await page.evaluate(() => (window as unknown as { harness: { remount: () => void } }).harness.remount());
    await page.selectOption('.bench-panel select[aria-label="Bore unit"]', 'inch');
    await page.selectOption('.bench-panel select[aria-label="Measured flow unit"]', 'L/s');
    await type('bore', '4.03');
    // Written once changes pause: wait for it, then switch one more and reload at once (kept when the page goes away).
    await page.waitForFunction(() => localStorage.getItem('portwright.bench')?.includes('L/s') === true);
    await page.selectOption('.bench-panel select[aria-label="Test pressure unit"]', 'Pa');
    await page.reload();
    await page.waitForFunction(() => (window as unknown as { harness?: { ready: boolean } }).harness?.ready === true);
    expect(await page.inputValue('.bench-panel select[aria-label="Bore unit"]')).toBe('inch');
    expect(await page.inputValue('.bench-panel select[aria-label="Measured flow unit"]')).toBe('L/s');
    expect(await page.inputValue('.bench-panel select[aria-label="Test pressure unit"]')).toBe('Pa');
    expect(await page.inputValue('.bench-panel input[data-field="bore"]')).toBe(''); // numbers belong to the document
    expect(await page.inputValue('.bench-panel input[data-field="testPressure"]')).toBe('6974.49'); // 28 in H2O [derived]
    expect(await page.evaluate(() => localStorage.getItem('portwright.bench'))).not.toMatch(/fields|4\.03/);
    expect(problems).toEqual([]);
  });
});

describe('bench inputs in the app: kept per variant in the document', () => {
  const withApp = appSuite();
  const field = (p: Page, key: string) => p.locator(`#bench-host input[data-field="${key}"]`);
  const benchOf = (doc: PortDocument, name: string) => doc.variants.find((v) => v.name === name)?.bench;

  /** Types `text` into a bench field and leaves it (Tab): one entered value. */
  async function enter(p: Page, key: string, text: string): Promise<void> {
    await field(p, key).fill(text);
    await field(p, key).press('Tab');
  }

  it('a typed value is one undo step that solves nothing again, and each variant\'s inputs survive Save and Open', async () => {
    await withApp(async ({ page: app, problems: appProblems }) => {
      // The comparison sample carries bench inputs for each variant (238 and 251 CFM, an 86 mm bore).
      expect(await field(app, 'flow').inputValue()).toBe('238');
      expect(await field(app, 'bore').inputValue()).toBe('86');
      const fullSolves = await solveCount(app, 'full');

      await enter(app, 'bore', '90');
      await expect.poll(async () => benchOf(await appDocument(app), 'tight short side')?.boreM).toBeCloseTo(0.09, 12);
      expect(await app.locator('#solve-indicator').getAttribute('data-state')).toBe('idle');
      expect(await solveCount(app, 'full'), 'a bench input changes no shape: nothing is solved again').toBe(fullSolves);
      expect(await app.locator('#undo-button').getAttribute('title')).toMatch(/^Undo Set bench inputs/);
      await app.click('#undo-button');
      await expect.poll(() => field(app, 'bore').inputValue()).toBe('86');
      expect(benchOf(await appDocument(app), 'tight short side')?.boreM).toBe(0.086);

      await app.selectOption('#variant-select', 'generous short side');
      await expect.poll(() => field(app, 'flow').inputValue()).toBe('251');
      await enter(app, 'flow', '260');
      await expect.poll(async () => benchOf(await appDocument(app), 'generous short side')?.measuredFlowM3PerS)
        .toBeCloseTo(cfmToM3s(260), 12);

      const [download] = await Promise.all([app.waitForEvent('download'), app.click('#save-button')]);
      const saved = JSON.parse(readFileSync(await download.path(), 'utf8')) as PortDocument;
      expect(saved.version).toBe(FORMAT_VERSION);
      expect(benchOf(saved, 'tight short side')?.boreM).toBe(0.086);
      expect(benchOf(saved, 'generous short side')?.measuredFlowM3PerS).toBeCloseTo(cfmToM3s(260), 12);

      // Changed after saving, then the saved file opened: the panel shows the file's inputs, variant by variant.
      await enter(app, 'flow', '300');
      const [chooser] = await Promise.all([app.waitForEvent('filechooser'), app.click('#open-button')]);
      await chooser.setFiles({ name: 'bench-kept.json', mimeType: 'application/json', buffer: readFileSync(await download.path()) });
      // The change after saving is not in a file, so opening asks first.
      await app.click('#replace-confirm');
      await expect.poll(() => field(app, 'flow').inputValue()).toBe('260');
      await app.selectOption('#variant-select', 'tight short side');
      await expect.poll(() => field(app, 'flow').inputValue()).toBe('238');
      expect(await field(app, 'bore').inputValue()).toBe('86');
      expect(appProblems).toEqual([]);
    });
  }, CHECK_MS);
});

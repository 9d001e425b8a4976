/** Browser check of the "Air and bench" panel: typed numbers, unit switches, messages, the flow-scale button, a reload, in chromium. */

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
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

  it('what the porter typed and chose is still there after the page is reloaded', async () => {
    await page.evaluate(() => (window as unknown as { harness: { remount: () => void } }).harness.remount());
    await page.selectOption('.bench-panel select[aria-label="Bore unit"]', 'inch');
    await type('bore', '4.03');
    await page.selectOption('.bench-panel select[aria-label="Measured flow unit"]', 'L/s');
    await type('flow', '98.5');
    // Written once typing pauses: wait for it, then type more and reload at once (kept when the page goes away).
    await page.waitForFunction(() => localStorage.getItem('portwright.bench')?.includes('98.5') === true);
    await type('stroke', '3.25');
    await page.selectOption('.bench-panel select[id$="-humidityModel"]', 'ideal-mixture');
    await page.selectOption('.bench-panel select[id$="-flow-scale"]', 'mean port speed');
    await page.reload();
    await page.waitForFunction(() => (window as unknown as { harness?: { ready: boolean } }).harness?.ready === true);
    expect(await page.inputValue('.bench-panel input[data-field="bore"]')).toBe('4.03');
    expect(await page.inputValue('.bench-panel input[data-field="stroke"]')).toBe('3.25');
    expect(await page.inputValue('.bench-panel input[data-field="flow"]')).toBe('98.5');
    expect(await page.inputValue('.bench-panel select[aria-label="Bore unit"]')).toBe('inch');
    expect(await page.inputValue('.bench-panel select[aria-label="Measured flow unit"]')).toBe('L/s');
    expect(await page.inputValue('.bench-panel select[id$="-humidityModel"]')).toBe('ideal-mixture');
    expect(await page.inputValue('.bench-panel select[id$="-flow-scale"]')).toBe('mean port speed');
    expect(await page.inputValue('.bench-panel input[data-field="temperature"]')).toBe('20'); // untouched: the default
    expect(problems).toEqual([]);
  });
});

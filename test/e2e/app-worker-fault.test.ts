/**
 * A solver worker ended from outside (as a crash would end it), idle or mid-solve: the app replaces it, says so in
 * the status line, draws a new full solve, and a later edit solves.
 */
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { CHECK_MS, solveCount, waitForFullSolves } from './app-session.ts';
import { appSuite } from './app-suite.ts';

const withApp = appSuite();

const RESTARTED = /^The solver stopped (unexpectedly|answering) and was restarted; solving again\.$/;
const SOLVED_AGAIN = 'The solver was restarted after it stopped, and the picture is solved again.';

const statusText = (page: Page) => page.locator('#status').innerText();

function stopSolverWorker(page: Page): Promise<void> {
  return page.evaluate(() => (window as unknown as { portwright: { stopSolverWorker: () => void } }).portwright.stopSolverWorker());
}

/** The restart is said (the status line is polled, since the new solve soon replaces the words). */
async function waitForRestartNote(page: Page): Promise<void> {
  await page.waitForFunction(
    (pattern) => new RegExp(pattern).test(document.getElementById('status')?.textContent ?? ''),
    RESTARTED.source,
    { timeout: 30_000, polling: 20 },
  );
}

async function laterEditSolves(page: Page): Promise<void> {
  const full = await solveCount(page, 'full');
  await page.selectOption('#variant-select', 'tight short side');
  await waitForFullSolves(page, full + 1);
  expect(await page.locator('#solve-indicator').getAttribute('data-state')).toBe('idle');
}

describe('a solver worker that stops', () => {
  it('while idle is replaced, the status line says so, the picture is solved again and a later edit solves', async () => {
    await withApp(async ({ page, problems }) => {
      await page.selectOption('#variant-select', 'generous short side');
      await waitForFullSolves(page, 2);
      const full = await solveCount(page, 'full');
      await stopSolverWorker(page);
      await waitForRestartNote(page);
      await waitForFullSolves(page, full + 1);
      expect(await statusText(page)).toBe(SOLVED_AGAIN);
      await laterEditSolves(page);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);

  it('mid-solve is replaced, the job is run again and drawn, and a later edit solves', async () => {
    await withApp(async ({ page, problems }) => {
      const full = await solveCount(page, 'full');
      await page.selectOption('#variant-select', 'generous short side');
      await stopSolverWorker(page);
      await waitForRestartNote(page);
      await waitForFullSolves(page, full + 1);
      expect(await statusText(page)).toBe(SOLVED_AGAIN);
      // The picture drawn is the generous variant's: its solve was the one run again.
      expect(await page.evaluate(() => (window as unknown as { portwright: { store: { doc: { activeVariant: string } } } })
        .portwright.store.doc.activeVariant)).toBe('generous short side');
      await laterEditSolves(page);
      expect(problems).toEqual([]);
    });
  }, CHECK_MS);
});

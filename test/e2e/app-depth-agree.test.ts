/** The app solves a width profile as `portwright solve` does: the depth reaches the solver worker (one case pipeline). */

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';
import { captureIO, REPO } from '../cli/helpers.ts';
import { CHECK_MS, openApp, startApp, waitForFullSolves, type AppPage, type AppSession } from './app-session.ts';

const WIDTHS = join(REPO, 'samples/street-port-widths.json');
const PLANE = join(REPO, 'samples/street-tight-short-side.json');

let session: AppSession;
let app: AppPage;

beforeAll(async () => {
  session = await startApp();
  app = await openApp(session);
}, CHECK_MS);

afterAll(async () => {
  await session?.close();
});

async function conductance(file: string): Promise<number> {
  const io = captureIO();
  expect(await run(['solve', file, '--json'], io), io.stderr.join('\n')).toBe(0);
  return (JSON.parse(io.stdout.join('\n')) as { conductance: number }).conductance;
}

describe('a file with a width profile in the app', () => {
  it('shows the conductance the command gives, the width-weighted one, not the plane section\'s', async () => {
    const [withWidths, plane] = [await conductance(WIDTHS), await conductance(PLANE)];
    expect(withWidths).toBeGreaterThan(20 * plane);
    const { page } = app;
    const solved = await page.evaluate(() => (window as unknown as { portwright: { timings: Array<{ kind: string }> } }).portwright.timings.filter((t) => t.kind === 'full').length);
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click('#open-button')]);
    await chooser.setFiles({ name: 'street-port-widths.json', mimeType: 'application/json', buffer: readFileSync(WIDTHS) });
    await waitForFullSolves(page, solved + 1);
    const rows = await page.locator('#readings tr').allInnerTexts();
    const row = rows.find((r) => r.startsWith('conductance'));
    const shown = Number(/^conductance\s+([\d.]+)/.exec(row ?? '')?.[1]);
    // The plane comparison (app-command-agree) holds 0.2107 to four decimals, 2.4e-4 of it; the same share here.
    expect(Math.abs(shown / withWidths - 1), rows.join('\n')).toBeLessThan(2.4e-4);
    expect(app.problems).toEqual([]);
  }, CHECK_MS);
});

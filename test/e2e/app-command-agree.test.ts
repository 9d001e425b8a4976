/** The app and `portwright solve --json` give the same numbers for the same file on the same grid (one case pipeline),
 * and the app says so when a wall is thinner than its grid. */

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';
import { captureIO, REPO } from '../cli/helpers.ts';
import { uBendFile } from '../study/drawn-shapes.ts';
import { CHECK_MS, openApp, solveCount, startApp, waitForFullSolves, type AppPage, type AppSession } from './app-session.ts';

/** The app opens on this file (src/main.ts) at its own grid detail, the command's default grid too. */
const SAMPLE = join(REPO, 'samples/short-side-compare.json');

interface SolvedJson {
  readonly conductance: number;
  readonly slowShare: number;
  readonly tightest: { readonly width: number } | null;
  readonly model: string;
  readonly leastArea: { readonly area: number } | null;
  readonly stations: readonly { readonly area: number }[];
  readonly portVolume: number;
  readonly findings: readonly string[];
  readonly walls: readonly { readonly name: string; readonly peakSpeedRatio: number }[];
}

let session: AppSession;
let app: AppPage;

beforeAll(async () => {
  session = await startApp();
  app = await openApp(session);
}, CHECK_MS);

afterAll(async () => {
  await session?.close();
});

async function commandJson(): Promise<SolvedJson> {
  const io = captureIO();
  expect(await run(['solve', SAMPLE, '--json'], io), io.stderr.join('\n')).toBe(0);
  return JSON.parse(io.stdout.join('\n')) as SolvedJson;
}

const slug = (name: string) => name.toLowerCase().replace(/[^a-z0-9]+/g, '-');

describe('app and command on the same file', () => {
  it('show the same model, conductance, wall peaks, tightest section, least area, port volume, slow share and findings', async () => {
    const json = await commandJson();
    const { page } = app;
    const cell = (key: string) => page.locator(`[data-reading="${key}"]`).innerText();
    const doc = JSON.parse(readFileSync(SAMPLE, 'utf8')) as { settings: { gridDetail: string } };
    expect(doc.settings.gridDetail).toBe('standard');

    const rows = await page.locator('#readings tr').allInnerTexts();
    const conductanceRow = rows.find((r) => r.startsWith('conductance'));
    expect(conductanceRow, rows.join('\n')).toContain(json.conductance.toFixed(4));
    expect(await cell('tightest')).toBe(`${json.tightest!.width.toFixed(1)} mm wide`);
    expect(await cell('slow-share')).toBe(`${(100 * json.slowShare).toFixed(1)}% of the port and bowl`);
    for (const wall of ['short side', 'long side']) {
      const inJson = json.walls.find((w) => w.name === wall)!;
      expect(await cell(`${slug(wall)}-peak`), wall).toBe(inJson.peakSpeedRatio.toFixed(3));
    }
    const findings = await page.locator('#readings .findings button').allInnerTexts();
    expect(findings).toEqual(json.findings);
    // the model in words, and the least area and port volume per unit depth (no width profile: the plane model)
    const sig4 = (v: number) => String(Number(v.toPrecision(4)));
    expect(json.model).toBe('plane');
    expect(await cell('model')).toBe('plane, per unit depth');
    expect(await cell('least-area')).toBe(`${sig4(json.leastArea!.area)} mm² per mm of depth`);
    expect(await cell('port-volume')).toBe(`${sig4(json.portVolume)} mm³ per mm of depth`);
    expect(await page.locator('#plots canvas[data-plot="csa"]').count()).toBe(1);
    expect(app.problems).toEqual([]);
  }, CHECK_MS);
});

describe('app and command on the sample with a width profile', () => {
  it('name the width model and show the same conductance, least area, port volume and ranked port area', async () => {
    const file = join(REPO, 'samples/street-port-widths.json');
    const io = captureIO();
    expect(await run(['solve', file, '--json'], io), io.stderr.join('\n')).toBe(0);
    const json = JSON.parse(io.stdout.join('\n')) as SolvedJson & { breathing: { port: { name: string; area: number } } };
    const { page } = app;
    const solved = await solveCount(page, 'full');
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click('#open-button')]);
    await chooser.setFiles({ name: 'street-port-widths.json', mimeType: 'application/json', buffer: readFileSync(file) });
    await waitForFullSolves(page, solved + 1);
    const cell = (key: string) => page.locator(`#readings [data-reading="${key}"]`).innerText();
    expect(json.model).toBe('width');
    expect(await cell('model')).toBe('width profile');
    // The app's worker and the command stop at the same residual from different first guesses, so their numbers
    // agree to about 1e-5 (conductance 9.1583 against 9.1584 on this file), not always to the last digit shown.
    const near = async (key: string, unit: string, expected: number) => {
      const text = await cell(key);
      expect(text, key).toMatch(new RegExp(`^[\\d.]+ ${unit}$`));
      expect(Math.abs(parseFloat(text) / expected - 1), `${key}: ${text} against ${expected}`).toBeLessThan(1e-3);
    };
    await near('conductance', 'mm \\(width profile\\)', json.conductance);
    await near('least-area', 'mm²', json.leastArea!.area);
    await near('port-volume', 'mm³', json.portVolume);
    // the stations' table: one row a station, the least area marked with the command's number
    const table = page.locator('#readings details[data-reading="station-areas"]');
    await table.locator('summary').click();
    const stationRows = await table.locator('tbody tr').allInnerTexts();
    expect(stationRows).toHaveLength(json.stations.length);
    const least = stationRows.filter((r) => r.includes('least'));
    expect(least).toHaveLength(1);
    expect(Math.abs(parseFloat(least[0].split('least ')[1]) / json.leastArea!.area - 1)).toBeLessThan(1e-3);
    // the breathing panel ranks the same solved least area as the command
    const breathing = await page.locator('#breathing tr').allInnerTexts();
    const port = breathing.find((r) => r.startsWith(json.breathing.port.name));
    expect(port, breathing.join('\n')).toMatch(/\t\d+\.\d mm²$/);
    expect(Math.abs(parseFloat(port!.split('\t')[1]) - json.breathing.port.area)).toBeLessThan(0.5);
    expect(app.problems).toEqual([]);
  }, CHECK_MS);
});

describe('a wall thinner than the grid in the app', () => {
  it('is named in the status line after the full solve, with what would resolve it', async () => {
    const { page } = app;
    const solved = await page.evaluate(() => (window as unknown as { portwright: { timings: Array<{ kind: string }> } }).portwright.timings.filter((t) => t.kind === 'full').length);
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click('#open-button')]);
    // The preview grid over this 20 x 2 mm piece has cells of 0.026 mm with rows at y = 0.982 and 1.008 [derived from
    // rasterise/frame.ts]: the 0.005 mm divider at y = 1 lies inside one row, splitting its cells.
    await chooser.setFiles({ name: 'u-bend.json', mimeType: 'application/json', buffer: Buffer.from(uBendFile(0.005, 'preview')) });
    await waitForFullSolves(page, solved + 1);
    const status = page.locator('#status');
    expect(await status.getAttribute('data-level')).toBe('warn');
    expect(await status.innerText()).toMatch(/^Wall "divider" is thinner than a grid cell near \(.+\) mm \(about 0\.005 mm thick\): it is solved as a wall about one cell/);
    expect(await status.innerText()).toContain('None of the grid details would resolve it: thicken the wall in the drawing.');
  }, CHECK_MS);
});

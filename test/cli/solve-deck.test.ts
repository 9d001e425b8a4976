/** solve on the samples judges only the port and bowl: nothing past the deck (in the test bore) is flagged. */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/main.ts';
import { caseSetup } from '../../src/study/index.ts';
import { loadDocument } from '../../src/document/load.ts';
import { deckLine } from '../../src/parts/index.ts';
import { solveFlow } from '../../src/solver/index.ts';
import { readFlow } from '../../src/solver/reading/index.ts';
import { REPO, captureIO } from './helpers.ts';

const SAMPLES = ['street-tight-short-side.json', 'street-generous-short-side.json'];
/** A parsed solve --json report. */
type Json = any;

describe.each(SAMPLES)('%s: flags only above the deck', (file) => {
  const path = join(REPO, 'samples', file);
  const doc = loadDocument(readFileSync(path, 'utf8'));
  const variant = doc.variants.find((v) => v.name === doc.activeVariant)!;
  const deck = deckLine(variant)!;
  let report: Json;

  beforeAll(async () => {
    const io = captureIO();
    expect(await run(['solve', path, '--json'], io)).toBe(0);
    report = JSON.parse(io.stdout.join('\n'));
  }, 60_000);

  it('reports the tightest station above the deck, and slow shares of the judged part only', () => {
    // the samples' deck: 2.3 below the gauge line at y = 2.3
    expect(deck).toEqual({ x: 95, y: 0, normalX: 0, normalY: -1 });
    expect(Math.min(report.tightest.y1, report.tightest.y2)).toBeGreaterThan(deck.y);
    // the still water in the bore's corners and under the valve head no longer counts: under 1% of what is judged
    expect(report.slowShare).toBeLessThan(0.01);
    expect(report.findings.some((f: string) => /moves below/.test(f))).toBe(false);
  });

  it('marks no slow cell and no over-wide or tightest station past the deck, on the command\'s own grid', () => {
    const { domain } = caseSetup(doc, { targetCells: 250_000 });
    const result = solveFlow(domain, { targetCells: 250_000 });
    const reading = readFlow(domain, result, { units: 'mm', deck, streamlineCount: 0 });
    const { grid } = result;
    let pastCells = 0;
    reading.slow.mask.forEach((m, c) => {
      if (m && grid.y0 + (Math.floor(c / grid.nx) + 0.5) * grid.h < deck.y) pastCells++;
    });
    expect(pastCells).toBe(0);
    // stations wholly in the bore are read (and drawn) but not judged
    expect(reading.stations.some((s) => !s.judged)).toBe(true);
    for (const k of [reading.tightest!.index, ...reading.overWide.map((o) => o.index)]) {
      const s = reading.stations[k];
      expect(s.judged).toBe(true);
      expect(s.midY).toBeGreaterThan(deck.y);
    }
    // without the deck the same solve hatches the bore: the rule has work to do on the samples
    const unjudged = readFlow(domain, result, { units: 'mm', streamlineCount: 0 });
    expect(unjudged.slow.mask.some((m, c) => m === 1 && grid.y0 + (Math.floor(c / grid.nx) + 0.5) * grid.h < deck.y)).toBe(true);
  });
});

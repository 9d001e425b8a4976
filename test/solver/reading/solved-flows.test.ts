/** Readings of flows from the solver itself: a channel with a side pocket, and the two street-port samples. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument } from '../../../src/document/load.ts';
import { caseSetup } from '../../../src/study/index.ts';
import { readFlow, readingSummary } from '../../../src/solver/reading/index.ts';
import { solveFlow } from '../../../src/solver/solve.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL } from '../../../src/solver/types.ts';
import { domainOf, ringOf, type Pt } from '../rasterise/shapes.ts';

/** Channel 10 x 1, flow along +x, with a pocket 0.6 wide and 1 deep in its roof at x = 4.7 .. 5.3. */
function pocketChannel() {
  const pts: Pt[] = [[0, 0], [10, 0], [10, 1], [5.3, 1], [5.3, 2], [4.7, 2], [4.7, 1], [0, 1]];
  const marks = [MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_WALL, MARK_WALL, MARK_WALL, MARK_WALL, MARK_INLET];
  const ids = [0, -1, 1, 2, 2, 2, 1, -1];
  return domainOf(ringOf(pts, marks, ids), [], ['floor', 'roof', 'pocket']);
}

describe('over-wide stations in a solved channel with a side pocket', () => {
  const domain = pocketChannel();
  const reading = readFlow(domain, solveFlow(domain, { targetCells: 40_000 }), { streamlineCount: 0 });

  it('flags the stations that dip into the pocket, and only those', () => {
    const flagged = reading.overWide.map((o) => reading.stations[o.index]);
    console.log('pocket: flagged stations', reading.overWide.map((o) => `${reading.stations[o.index].phi.toFixed(4)}: ${o.width.toFixed(3)} vs ${o.envelope.toFixed(3)}`).join('; '));
    expect(flagged.length).toBeGreaterThan(0);
    for (const s of flagged) {
      // the station crosses the channel from the floor at the pocket's mouth and ends up inside the pocket (y > 1)
      expect(Math.min(s.x1, s.x2)).toBeGreaterThan(4.2);
      expect(Math.max(s.x1, s.x2)).toBeLessThan(5.8);
      expect(Math.min(s.y1, s.y2)).toBe(0);
      expect(Math.max(s.y1, s.y2)).toBeGreaterThan(1);
    }
    // stations away from the pocket are one channel width wide
    for (const s of reading.stations) {
      if (Math.abs(s.midX - 5) > 1.5) expect(Math.abs(s.width - 1)).toBeLessThan(0.01);
    }
    expect(reading.findings.some((f) => f.kind === 'over-wide' && /wider than the sections either side/.test(f.text))).toBe(true);
  });

  it('sees the still fluid in the pocket as a slow zone', () => {
    expect(reading.slow.share).toBeGreaterThan(0);
    const patch = reading.slow.largest!;
    expect(patch.y).toBeGreaterThan(1);
    expect(Math.abs(patch.x - 5)).toBeLessThan(0.3);
  });
});

/** Solves and reads the active variant of a sample file. */
function readSample(file: string) {
  const doc = loadDocument(readFileSync(new URL(`../../../samples/${file}`, import.meta.url), 'utf8'));
  const { domain } = caseSetup(doc, { targetCells: 120_000 });
  return readFlow(domain, solveFlow(domain, { targetCells: 120_000 }), { units: doc.units });
}

describe('street-port samples: tight against generous short side', () => {
  const tight = readSample('street-tight-short-side.json');
  const generous = readSample('street-generous-short-side.json');

  it('reads the flow leaving the tight short side sooner than the generous one (or the generous one holding on)', () => {
    const atTight = tight.detachments.find((d) => d.name === 'short side')!.detachment;
    const atGenerous = generous.detachments.find((d) => d.name === 'short side')!.detachment;
    const where = (d: typeof atTight) => (d ? `${d.s.toFixed(1)} mm along (${d.x.toFixed(1)}, ${d.y.toFixed(1)}) by ${d.method}` : 'stays on');
    console.log(`short side, tight: ${where(atTight)}; generous: ${where(atGenerous)}`);
    expect(atTight).not.toBeNull();
    if (atGenerous) expect(atTight!.s).toBeLessThan(atGenerous.s);
    // the tight radius makes the sharper speed peak [derived from 1a: the inside of a tighter turn runs faster]
    const peak = (r: typeof tight) => r.walls.find((w) => w.name === 'short side')!.peak.speedRatio;
    console.log(`short-side peak speed ratio, tight ${peak(tight).toFixed(2)}, generous ${peak(generous).toFixed(2)}`);
    expect(peak(tight)).toBeGreaterThan(peak(generous));
  });

  it('tells the short-side detachment as a finding, and summarises to plain JSON', () => {
    const told = tight.findings.find((f) => f.kind === 'detachment' && f.text.startsWith('Short side:'));
    expect(told?.text).toMatch(/^Short side: flow likely leaves the wall \d+\.\d mm past the speed peak.*; speed ratio falls from \d\.\d\d to \d\.\d\d\.$/);
    for (let k = 1; k < tight.findings.length; k++) expect(tight.findings[k].score).toBeLessThanOrEqual(tight.findings[k - 1].score);
    for (const f of tight.findings) expect(f.radius).toBeGreaterThan(0);
    // the deck and the test bore are read but not told
    expect(tight.detachments.some((d) => d.name.startsWith('deck') && d.detachment)).toBe(true);
    expect(tight.findings.some((f) => /^(Deck|Bore wall|Valve head)/.test(f.text))).toBe(false);
    const summary = readingSummary(tight);
    expect(JSON.parse(JSON.stringify(summary))).toEqual(summary);
    expect(summary.stations.length).toBeGreaterThan(30);
    expect(summary.tightest!.width).toBeGreaterThan(0);
    expect(summary.findings).toContain(told!.text);
    console.log(`tight sample: tightest ${summary.tightest!.width} mm at ${summary.tightest!.distanceFromInlet} mm; findings:\n  ${summary.findings.join('\n  ')}`);
  });
});

/** readFlow on exact flows: the straight channel and the concentric bend. */
import { describe, expect, it } from 'vitest';
import { readFlow } from '../../../src/solver/reading/index.ts';
import { bend, channel } from '../rasterise/shapes.ts';
import { bendFlow, channelFlow, exactResult } from './analytic-flow.ts';
import { assertInDelta } from './helpers.ts';

describe('readFlow, straight channel', () => {
  // REFERENCES.md 1b [derived]: uniform speed, every cross-section W wide and carrying the same flux.
  const domain = channel(4, 1);
  const reading = readFlow(domain, exactResult(domain, 10_000, channelFlow(4, 1)), { streamlineCount: 8 });

  it('has every station W wide at the inlet mean speed and no slow zone', () => {
    expect(reading.stations).toHaveLength(40);
    for (const s of reading.stations) {
      assertInDelta(s.width, 1, 1e-9);
      assertInDelta(s.meanSpeedRatio, 1, 1e-9);
    }
    expect(reading.slow.share).toBe(0);
    expect(reading.slow.mask.every((m) => m === 0)).toBe(true);
    expect(reading.overWide).toHaveLength(0);
    expect(reading.valvePhi).toBeNull();
  });

  it('traces straight, evenly spaced streamlines (equal flux in uniform flow) from inlet to outlet', () => {
    expect(reading.streamlines).toHaveLength(8);
    reading.streamlines.forEach((line, k) => {
      // the outline runs counter-clockwise, so the inlet (x = 0) is walked from y = 1 down to y = 0
      const y = 1 - (k + 0.5) / 8;
      expect(line.end).toBe('outlet');
      for (let p = 0; p < line.xy.length; p += 2) assertInDelta(line.xy[p + 1], y, 1e-9, `streamline ${k}`);
      expect(line.xy[0]).toBe(0);
      assertInDelta(line.xy[line.xy.length - 2], 4, 1e-9);
    });
  });

  it('has no detachment on walls with uniform speed, and says where the tightest section is', () => {
    // both walls marched (an empty list would pass the loop below without reading anything)
    expect(reading.detachments).toHaveLength(2);
    for (const d of reading.detachments) expect(d.detachment).toBeNull();
    expect(reading.findings.map((f) => f.kind)).not.toContain('detachment');
    const tight = reading.findings.find((f) => f.kind === 'tightest');
    expect(tight?.text).toMatch(/^Tightest section: 1\.0 mm wide, \d+\.\d mm from the manifold face\.$/);
  });

  it('words the same reading in inches when the document is in inches', () => {
    const inches = readFlow(domain, exactResult(domain, 10_000, channelFlow(4, 1)), { units: 'inch', streamlineCount: 0 });
    expect(inches.findings.find((f) => f.kind === 'tightest')?.text).toMatch(/^Tightest section: 1\.00 in wide, \d\.\d{2,3} in from the manifold face\.$/);
  });
});

describe('readFlow, exact concentric bend (r2/r1 = 2, 90 deg)', () => {
  const domain = bend(1, 2, 256);
  const reading = readFlow(domain, exactResult(domain, 40_000, bendFlow(1, 2)), { streamlineCount: 12 });

  // REFERENCES.md 1a [derived]: equipotentials are radial cuts r2 - r1 = 1 long, each carrying Q at the inlet mean speed.
  it('has every station 1 wide at the inlet mean speed', () => {
    expect(reading.stations.length).toBeGreaterThan(30);
    for (const s of reading.stations) {
      assertInDelta(s.width, 1, 0.01);
      assertInDelta(s.meanSpeedRatio, 1, 0.01);
    }
  });

  // REFERENCES.md 1a [derived]: streamlines are circles; the flux between r1 and r is K ln(r / r1), so equal-flux
  // seeds sit at r = r1 2^((k + 1/2) / N).
  it('traces circular streamlines at the equal-flux radii', () => {
    expect(reading.streamlines).toHaveLength(12);
    let worst = 0;
    reading.streamlines.forEach((line, k) => {
      const r = 2 ** ((k + 0.5) / 12);
      expect(line.end).toBe('outlet');
      for (let p = 0; p < line.xy.length; p += 2) worst = Math.max(worst, Math.abs(Math.hypot(line.xy[p], line.xy[p + 1]) - r));
    });
    console.log(`bend: worst streamline radius error ${worst.toExponential(2)} (cell size 0.01)`);
    expect(worst).toBeLessThan(0.01);
  });

  it('reads the inner wall (short side) fastest, r2/r1 times the outer wall', () => {
    const inner = reading.walls.find((w) => w.name === 'short side')!;
    const outer = reading.walls.find((w) => w.name === 'long side')!;
    // inner-wall speed / mean = (r2 - r1) / (r1 ln 2) = 1.4427 [derived, REFERENCES.md 1a]
    assertInDelta(inner.peak.speedRatio, 1.4427, 0.03);
    assertInDelta(inner.peak.speedRatio / outer.peak.speedRatio, 2, 0.05);
  });
});

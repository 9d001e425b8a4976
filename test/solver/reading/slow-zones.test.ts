/** Slow zones on exact flows. */
import { describe, expect, it } from 'vitest';
import { readFlow } from '../../../src/solver/reading/index.ts';
import { interpolateDescending } from '../../../src/solver/reading/slow-zones.ts';
import { bend } from '../rasterise/shapes.ts';
import { bendFlow, exactResult } from './analytic-flow.ts';
import { assertInDelta } from './helpers.ts';

describe('slow zones', () => {
  // REFERENCES.md 1a [derived]: in the concentric bend u / u_mean = (r2 - r1) / (r ln(r2 / r1)) = 1 / (r ln 2), the same at
  // every station. Below 0.9 of the mean means r > r0 = 1 / (0.9 ln 2) = 1.60299; that is (4 - r0^2) / (4 - 1) = 0.47680
  // of the annulus' area.
  it('marks the outer part of the concentric bend, by area, when the slow fraction is 0.9', () => {
    const domain = bend(1, 2, 256);
    const reading = readFlow(domain, exactResult(domain, 40_000, bendFlow(1, 2)), { slowFraction: 0.9, streamlineCount: 0 });
    const r0 = 1 / (0.9 * Math.LN2);
    const share = (4 - r0 * r0) / 3;
    assertInDelta(share, 0.4768, 1e-5);
    console.log(`bend: slow share ${reading.slow.share.toFixed(5)}, exact ${share.toFixed(5)}`);
    assertInDelta(reading.slow.share, share, 0.005);
    expect(reading.slow.portShare).toBe(reading.slow.share);
    // one joined patch along the outer wall, centred beyond r0
    const patch = reading.slow.largest!;
    expect(Math.hypot(patch.x, patch.y)).toBeGreaterThan(r0);
    assertInDelta(patch.area, share * (3 * Math.PI) / 4, 0.01);
    const finding = reading.findings.find((f) => f.kind === 'slow');
    expect(finding?.text).toBe('48% of the section moves below 90% of its local mean speed.');
  });

  it('takes each cell\'s station mean from its potential, linear between stations and held beyond them', () => {
    const keys = [0.9, 0.5, 0.1];
    const values = [1, 3, 2];
    expect(interpolateDescending(keys, values, 0.95)).toBe(1);
    expect(interpolateDescending(keys, values, 0.7)).toBeCloseTo(2, 12);
    expect(interpolateDescending(keys, values, 0.2)).toBeCloseTo(2.25, 12);
    expect(interpolateDescending(keys, values, 0)).toBe(2);
  });
});

/** Wall reading: speed peak, the fall after it and the pressure recovered, on made-up wall speed profiles. */
import { describe, expect, it } from 'vitest';
import { extendedPhi } from '../../../src/solver/reading/field.ts';
import { downstreamWalls } from '../../../src/solver/reading/wall-paths.ts';
import { readWall } from '../../../src/solver/reading/walls.ts';
import type { WallSpeeds } from '../../../src/solver/types.ts';
import { channel } from '../rasterise-shapes.ts';
import { channelFlow, exactResult } from './analytic-flow.ts';
import { assertInDelta } from './helpers.ts';

/** Samples x = s, y = 0 for s = 0, 0.1, .. 10 with speed ratio from `ratio`. */
function straightWall(ratio: (s: number) => number): Float64Array {
  const out = new Float64Array(4 * 101);
  for (let q = 0; q <= 100; q++) out.set([q / 10, 0, q / 10, ratio(q / 10)], 4 * q);
  return out;
}

/** Rises 1 -> 1.9 over s = 0..4, falls to 0.7 at s = 8, rises again to 0.9 at s = 10 (piecewise linear). */
function peakThenFall(s: number): number {
  if (s <= 4) return 1 + (0.9 * s) / 4;
  if (s <= 8) return 1.9 - (1.2 * (s - 4)) / 4;
  return 0.7 + (0.2 * (s - 8)) / 2;
}

describe('wall reading', () => {
  it('finds the peak, the lowest speed after it and Cp = 1 - (low / peak)^2', () => {
    const reading = readWall({ name: 'short side', samples: straightWall(peakThenFall) })!;
    assertInDelta(reading.peak.speedRatio, 1.9, 1e-12);
    expect([reading.peak.x, reading.peak.y, reading.peak.s]).toEqual([4, 0, 4]);
    assertInDelta(reading.low.speedRatio, 0.7, 1e-12);
    expect(reading.low.s).toBe(8);
    assertInDelta(reading.fall, 0.7 / 1.9, 1e-12);
    // Bernoulli along the wall [derived]: Cp = 1 - (0.7 / 1.9)^2 = 0.864266
    assertInDelta(reading.pressureRecovered, 0.864266, 1e-6);
  });

  it('reports no fall when the peak is the last sample, and skips samples with no speed', () => {
    const rising = straightWall((s) => (s === 5 ? NaN : 1 + s));
    const reading = readWall({ name: 'roof', samples: rising })!;
    expect(reading.peak.s).toBe(10);
    expect(reading.low.s).toBe(10);
    expect(reading.pressureRecovered).toBe(0);
    expect(readWall({ name: 'nothing', samples: straightWall(() => NaN) })).toBeNull();
  });

  it('turns a wall round when its samples run upstream (potential rising along it)', () => {
    const domain = channel(10, 1);
    const result = exactResult(domain, 4000, channelFlow(10, 1));
    const phi = extendedPhi(result.grid, result.phi);
    // the same profile written from the outlet end back to the inlet end
    const backwards = straightWall((s) => peakThenFall(10 - s));
    for (let q = 0; q <= 100; q++) backwards[4 * q] = 10 - q / 10;
    const walls: WallSpeeds[] = [{ name: 'floor', samples: straightWall(peakThenFall) }, { name: 'roof', samples: backwards }];
    const [floor, roof] = downstreamWalls(walls, result.grid, phi).map((p) => readWall(p)!);
    expect(floor.peak.s).toBe(4);
    // reversed: the roof's samples now start at x = 0 and match the floor's
    expect(roof.samples[0]).toBe(0);
    assertInDelta(roof.peak.s, 4, 1e-12);
    assertInDelta(roof.pressureRecovered, floor.pressureRecovered, 1e-12);
  });
});

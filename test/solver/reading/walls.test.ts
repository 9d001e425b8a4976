/** Wall reading: speed peak, the fall after it and the pressure recovered, on made-up wall speed profiles. */
import { describe, expect, it } from 'vitest';
import { extendedPhi } from '../../../src/solver/reading/field.ts';
import { downstreamWalls, type WallPath } from '../../../src/solver/reading/wall-paths.ts';
import { readWall } from '../../../src/solver/reading/walls.ts';
import type { WallSpeeds } from '../../../src/solver/types.ts';
import { channel } from '../rasterise/shapes.ts';
import { channelFlow, exactResult } from './analytic-flow.ts';
import { assertInDelta } from './helpers.ts';

/** Samples x = s, y = 0 for s = 0, 0.1, .. 10 with speed ratio from `ratio`. */
function straightWall(ratio: (s: number) => number): Float64Array {
  const out = new Float64Array(4 * 101);
  for (let q = 0; q <= 100; q++) out.set([q / 10, 0, q / 10, ratio(q / 10)], 4 * q);
  return out;
}

/** An open wall path starting at potential 1. */
function pathOf(name: string, samples: Float64Array): WallPath {
  return { name, wall: name, samples, fromStagnation: false, upstreamPhi: 1 };
}

/** Rises 1 -> 1.9 over s = 0..4, falls to 0.7 at s = 8, rises again to 0.9 at s = 10 (piecewise linear). */
function peakThenFall(s: number): number {
  if (s <= 4) return 1 + (0.9 * s) / 4;
  if (s <= 8) return 1.9 - (1.2 * (s - 4)) / 4;
  return 0.7 + (0.2 * (s - 8)) / 2;
}

describe('wall reading', () => {
  it('finds the peak, the lowest speed after it and Cp = 1 - (low / peak)^2', () => {
    const reading = readWall(pathOf('short side', straightWall(peakThenFall)))!;
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
    const reading = readWall(pathOf('roof', rising))!;
    expect(reading.peak.s).toBe(10);
    expect(reading.low.s).toBe(10);
    expect(reading.pressureRecovered).toBe(0);
    expect(readWall(pathOf('nothing', straightWall(() => NaN)))).toBeNull();
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

describe('wall paths round an island', () => {
  it('splits a closed wall at its highest potential into two paths that end at its lowest', () => {
    const domain = channel(10, 1);
    const result = exactResult(domain, 4000, channelFlow(10, 1));
    const phi = extendedPhi(result.grid, result.phi);
    // a square island from x = 4 to 6, y = 0.25 to 0.75, walked clockwise from its upper-left corner, speed = x
    const corners = [[4, 0.75], [6, 0.75], [6, 0.25], [4, 0.25], [4, 0.75]];
    const samples: number[] = [];
    let s = 0;
    for (let k = 0; k + 1 < corners.length; k++) {
      const [ax, ay] = corners[k], [bx, by] = corners[k + 1];
      const len = Math.hypot(bx - ax, by - ay);
      for (let q = 0; q < 10; q++) {
        const x = ax + ((bx - ax) * q) / 10, y = ay + ((by - ay) * q) / 10;
        samples.push(x, y, s + (len * q) / 10, x);
      }
      s += len;
    }
    samples.push(4, 0.75, s, 4);
    const paths = downstreamWalls([{ name: 'boss', samples: Float64Array.from(samples) }], result.grid, phi);
    expect(paths.map((p) => p.name).sort()).toEqual(['boss, left of the flow', 'boss, right of the flow']);
    for (const p of paths) {
      expect(p.fromStagnation).toBe(true);
      expect(p.wall).toBe('boss');
      const n = p.samples.length / 4;
      // the flow (along +x) meets the island on its upstream face x = 4 and leaves it from the downstream face x = 6
      expect(p.samples[0]).toBe(4);
      expect(p.samples[4 * (n - 1)]).toBe(6);
      // arc length runs on from 0 without a jump where the path passes the ring's first sample
      for (let q = 1; q < n; q++) {
        const step = Math.hypot(p.samples[4 * q] - p.samples[4 * q - 4], p.samples[4 * q + 1] - p.samples[4 * q - 3]);
        assertInDelta(p.samples[4 * q + 2] - p.samples[4 * q - 2], step, 1e-12);
      }
    }
    // the two ways round make up the whole ring, perimeter 5
    assertInDelta(paths.reduce((sum, p) => sum + p.samples[p.samples.length - 2], 0), 5, 1e-12);
    // flow along +x: the upper path (y = 0.75) is on the flow's left
    const left = paths.find((p) => p.name.includes('left'))!;
    expect(left.samples[4 * 5 + 1]).toBe(0.75);
  });
});

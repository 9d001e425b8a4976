/** Detachment: the boundary-layer march run on wall speeds, in document units, wall after wall. */
import { describe, expect, it } from 'vitest';
import { marchWall } from '../../../src/solver/boundary-layer/march.ts';
import { wallDetachment, wallDetachments } from '../../../src/solver/reading/detachment.ts';
import { readingSettings } from '../../../src/solver/reading/options.ts';
import type { WallPath } from '../../../src/solver/reading/wall-paths.ts';
import { assertInDelta } from './helpers.ts';

/** Speed ratio 1 up to a peak of 2 at s = 40 mm (a bend's inside), then down to 1 at s = 60 mm and level after. */
function bendLike(sMm: number): number {
  if (sMm <= 20) return 1;
  if (sMm <= 40) return 1 + (sMm - 20) / 20;
  if (sMm <= 60) return 2 - (sMm - 40) / 20;
  return 1;
}

/** A straight wall along y = 0 sampled every `step` from s0 to s1 (document units), speed ratio from `ratio(s in mm)`. */
function wallOf(name: string, s0: number, s1: number, step: number, unitMm: number, ratio: (sMm: number) => number): WallPath {
  const count = Math.round((s1 - s0) / step) + 1;
  const samples = new Float64Array(4 * count);
  for (let q = 0; q < count; q++) {
    const s = s0 + q * step;
    samples.set([s, 0, s - s0, ratio(s * unitMm)], 4 * q);
  }
  return { name, wall: name, samples, fromStagnation: false, upstreamPhi: 1 };
}

describe('detachment', () => {
  const mm = readingSettings({ units: 'mm' });

  it('finds none where the speed is uniform', () => {
    const { reading } = wallDetachment(wallOf('floor', 0, 100, 0.5, 1, () => 1), mm);
    expect(reading.detachment).toBeNull();
    expect(reading.offWall).toEqual([]);
  });

  it('reports the earlier of the march and Stratford, in document units from the upstream end', () => {
    const path = wallOf('short side', 0, 100, 0.5, 1, bendLike);
    const { reading } = wallDetachment(path, mm);
    const n = path.samples.length / 4;
    const march = marchWall({
      sM: Float64Array.from({ length: n }, (_, q) => path.samples[4 * q + 2] / 1000),
      speedMs: Float64Array.from({ length: n }, (_, q) => path.samples[4 * q + 3] * 60),
      nuM2s: 1.5e-5,
    });
    const candidates = [march.detachment?.sM, march.stratford?.sM].filter((s): s is number => s !== undefined);
    expect(candidates.length).toBeGreaterThan(0);
    const at = reading.detachment!;
    assertInDelta(at.s, Math.min(...candidates) * 1000, 1e-9);
    // on the straight wall x = s
    assertInDelta(at.x, at.s, 1e-9);
    expect(at.s).toBeGreaterThan(40);
    expect(reading.offWall[0][0]).toBe(at.s);
    console.log(`bend-like wall: leaves at ${at.s.toFixed(2)} mm by ${at.method} (march ${march.detachment?.sM}, Stratford ${march.stratford?.sM})`);
  });

  it('gives the same place in metres whether the document is in mm or inches', () => {
    const inMm = wallDetachment(wallOf('short side', 0, 100, 0.5, 1, bendLike), mm).reading.detachment!;
    const inInch = wallDetachment(wallOf('short side', 0, 100 / 25.4, 0.5 / 25.4, 25.4, bendLike), readingSettings({ units: 'inch' })).reading.detachment!;
    // 1 in = 25.4 mm exactly (NIST SP 811)
    assertInDelta(inInch.s * 25.4, inMm.s, 1e-6);
    expect(inInch.method).toBe(inMm.method);
  });

  it('carries the layer from one wall to the next: a wall cut in two reads nearly as the whole', () => {
    const whole = wallDetachment(wallOf('short side', 0, 100, 0.5, 1, bendLike), mm).reading.detachment!;
    // the same wall as "floor" (0..30 mm) and "short side" (30..100 mm), listed downstream wall first
    const floor = wallOf('floor', 0, 30, 0.5, 1, bendLike);
    const shortSide = wallOf('short side', 30, 100, 0.5, 1, bendLike);
    const [side, flat] = wallDetachments([shortSide, floor], mm);
    expect(flat.detachment).toBeNull();
    // H restarts at the flat-plate 1.4 at the joint, where the layer is near that already
    assertInDelta(side.detachment!.s + 30, whole.s, 0.5);
    // a fresh start at the joint (a flat-plate layer at the local speed) misses the thinning the acceleration did
    const fresh = wallDetachment(shortSide, mm, null).reading.detachment!;
    console.log(`whole wall ${whole.s.toFixed(2)} mm, split ${(side.detachment!.s + 30).toFixed(2)} mm, fresh start ${(fresh.s + 30).toFixed(2)} mm`);
    expect(Math.abs(side.detachment!.s + 30 - whole.s)).toBeLessThan(Math.abs(fresh.s + 30 - whole.s));
  });

  it('keeps the flow off the next wall until the speed climbs back past the speed where it left', () => {
    // leaves near 47 mm on the first wall and is still off at its end (50 mm), where the speed is still falling
    const rising = (sMm: number): number => (sMm <= 60 ? bendLike(sMm) : 1 + (sMm - 60) / 20);
    const first = wallOf('short side', 0, 50, 0.5, 1, rising);
    const next = wallOf('bowl', 50, 100, 0.5, 1, rising);
    const [bowl, side] = wallDetachments([next, first], mm);
    const left = side.detachment!;
    expect(side.offWall[side.offWall.length - 1][1]).toBe(50);
    // speed where it left, as a ratio: the bend-like fall 2 - (s - 40) / 20
    const leftRatio = 2 - (left.s - 40) / 20;
    // the speed passes that ratio again at 60 + 20 (leftRatio - 1) mm; the bowl is off from its start until then
    const back = 60 + 20 * (leftRatio - 1) - 50;
    expect(bowl.offWall[0][0]).toBe(0);
    assertInDelta(bowl.offWall[0][1], back, 0.5);
    // no new detachment on the bowl: the speed only rises after the flow comes back
    expect(bowl.detachment).toBeNull();
  });
});

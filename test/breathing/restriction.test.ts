import { describe, expect, it } from 'vitest';
import { BreathingInputError } from '../../src/breathing/errors.ts';
import {
  crossoverLift,
  greatestRestriction,
  stageBoundaries,
} from '../../src/breathing/valve.ts';
import { expectRoundsTo } from './close.ts';
import { mm, mm2, seatAt, valve } from './valve-fixture.ts';

const seat = seatAt(45);
const ports = { 'pushrod pinch': 700 * mm2, 'manifold face': 1100 * mm2 };

describe('greatestRestriction', () => {
  it('at low lift the valve restricts; the rest follow smallest first', () => {
    const ranking = greatestRestriction(2 * mm, valve, seat, ports);
    expect(ranking.map((c) => c.name)).toEqual(['valve', 'pushrod pinch', 'throat', 'manifold face']);
    // 168.830 mm^2 at 2 mm: REFERENCES.md 3a check table [derived from Heywood 1988 sec. 6.3.1].
    expectRoundsTo(ranking[0].areaM2 / mm2, 168.83, 3);
    expect(ranking[2].kind).toBe('throat');
    expectRoundsTo(ranking[2].areaM2 / mm2, 869.436, 3);
  });

  it('at high lift a named port section restricts', () => {
    const ranking = greatestRestriction(9 * mm, valve, seat, ports);
    expect(ranking[0]).toEqual({ kind: 'port', name: 'pushrod pinch', areaM2: 700 * mm2 });
  });

  it('once throat-limited (stage 3) the throat ranks ahead of the valve on the tie', () => {
    const ranking = greatestRestriction(12 * mm, valve, seat);
    expect(ranking.map((c) => c.kind)).toEqual(['throat', 'valve']);
    expect(ranking[0].areaM2).toBe(ranking[1].areaM2);
  });

  it('rejects a port area that is not a positive number', () => {
    expect(() => greatestRestriction(2 * mm, valve, seat, { bowl: -1 })).toThrow(BreathingInputError);
    expect(() => greatestRestriction(2 * mm, valve, seat, { bowl: Number.NaN })).toThrow(/Port area "bowl"/);
  });
});

describe('crossoverLift', () => {
  it('with only the throat, the crossover is where stage 3 starts (8.5301 mm, REFERENCES.md 3a [derived])', () => {
    const lift = crossoverLift(valve, seat, {}, { fromM: 0, toM: 15 * mm }, 1e-9);
    expect(lift).not.toBeNull();
    expectRoundsTo((lift ?? 0) / mm, 8.5301, 4);
    expectRoundsTo((lift ?? 0) / mm, stageBoundaries(valve, seat).stage3StartM / mm, 6);
  });

  it('a 700 mm^2 pinch takes over inside stage 2, where the stage-2 area reaches it [derived]', () => {
    // Invert Heywood's stage 2: L = w tan b + sqrt((A / (pi D_m))^2 - w^2), D_m = D_v - w.
    const w = 1.5;
    const Dm = 40 - w;
    const expectedMm = w * Math.tan(Math.PI / 4) + Math.sqrt((700 / (Math.PI * Dm)) ** 2 - w * w);
    const lift = crossoverLift(valve, seat, ports, { fromM: 0, toM: 15 * mm }, 1e-10);
    expectRoundsTo((lift ?? 0) / mm, expectedMm, 6);
    expectRoundsTo(expectedMm, 7.0897, 4); // hand value of the same formula
  });

  it('is null when the valve still restricts at the top of the range, or the port already does at the bottom', () => {
    expect(crossoverLift(valve, seat, ports, { fromM: 0, toM: 6 * mm })).toBeNull();
    expect(crossoverLift(valve, seat, ports, { fromM: 8 * mm, toM: 15 * mm })).toBeNull();
  });

  it('rejects an empty lift range', () => {
    expect(() => crossoverLift(valve, seat, ports, { fromM: 5 * mm, toM: 5 * mm })).toThrow(BreathingInputError);
  });
});

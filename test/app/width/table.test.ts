/** The width table's changes: typed values kept or refused in whole sentences, stations kept in order, drags held. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { WidthProfile } from '../../../src/document/types.ts';
import {
  addObstruction, addStation, dragStation, removeObstruction, removeStation, setObstructionValue, setStationValue,
  startProfile, WidthTableError,
} from '../../../src/app/width/table.ts';

const profile: WidthProfile = { stations: [{ along: 0, width: 32 }, { along: 40, width: 30 }, { along: 90, width: 50 }] };
const wholeSentences = (message: string) => message.split(/(?<=\.) /).every((s) => /^[A-Z"].*\.$/.test(s));

function refusal(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(WidthTableError);
    return (error as Error).message;
  }
  throw new Error('the change was not refused');
}

describe('starting a profile', () => {
  it('puts the typical 32 mm width at the manifold face and at the seat (1.26 in in an inch drawing)', () => {
    expect(startProfile(71.5, 'mm')).toEqual({ stations: [{ along: 0, width: 32 }, { along: 71.5, width: 32 }] });
    expect(startProfile(2.8, 'inch').stations.map((s) => s.width)).toEqual([1.26, 1.26]);
  });
  it('without a known seat ends ten widths along, so the stations still ascend', () => {
    expect(startProfile(0, 'mm').stations[1].along).toBe(320);
  });
});

describe('typed station values', () => {
  it('a width is set exactly as typed', () => {
    expect(setStationValue(profile, 1, 'width', 28.25, 'mm').stations[1]).toEqual({ along: 40, width: 28.25 });
  });
  it('a width of 0 or less, or no number, is refused in whole sentences', () => {
    for (const bad of [0, -3, Number.NaN]) {
      const message = refusal(() => setStationValue(profile, 1, 'width', bad, 'mm'));
      expect(wholeSentences(message), message).toBe(true);
    }
    expect(refusal(() => setStationValue(profile, 1, 'width', 0, 'mm'))).toBe('A width must be more than 0 mm.');
  });
  it('a station moved past its neighbour is refused and names the neighbour', () => {
    expect(refusal(() => setStationValue(profile, 1, 'along', 95, 'mm'))).toBe('Station 2 must lie short of station 3 (90 mm).');
    expect(refusal(() => setStationValue(profile, 2, 'along', 40, 'mm'))).toBe('Station 3 must lie farther along the port than station 2 (40 mm).');
    expect(wholeSentences(refusal(() => setStationValue(profile, 0, 'along', -1, 'mm')))).toBe(true);
  });
});

describe('adding and removing', () => {
  it('a station goes halfway across the longest gap, at the mean of its neighbours\' widths', () => {
    expect(addStation(profile).stations[2]).toEqual({ along: 65, width: 40 });
    expect(addStation(profile).stations).toHaveLength(4);
  });
  it('two stations are the least a profile keeps', () => {
    expect(removeStation(profile, 1).stations.map((s) => s.along)).toEqual([0, 90]);
    expect(refusal(() => removeStation(removeStation(profile, 1), 0))).toBe('A width profile needs at least two stations.');
  });
  it('the valve stem comes first, from the valve, then a guide boss; removing the last leaves no empty list', () => {
    const valve = { stemDiameter: 7, stemFrom: 4, stemTo: 44 };
    const one = addObstruction(profile, 'mm', valve);
    expect(one.obstructions).toEqual([{ name: 'valve stem', diameter: 7, from: 4, to: 44 }]);
    const two = addObstruction(one, 'mm', valve);
    expect(two.obstructions?.[1]).toEqual({ name: 'guide boss', diameter: 12.25, from: 24, to: 44 });
    expect(removeObstruction(removeObstruction(two, 1), 0)).toEqual(profile);
  });
});

describe('typed obstruction values', () => {
  const withStem = addObstruction(profile, 'mm', { stemDiameter: 8, stemFrom: 5, stemTo: 40 });
  it('a stretch that ends below its start, a diameter of 0 or an empty name is refused in whole sentences', () => {
    const messages = [
      refusal(() => setObstructionValue(withStem, 0, 'to', 5, 'mm')),
      refusal(() => setObstructionValue(withStem, 0, 'diameter', 0, 'mm')),
      refusal(() => setObstructionValue(withStem, 0, 'name', '  ', 'mm')),
      refusal(() => setObstructionValue(withStem, 0, 'from', Number.NaN, 'mm')),
    ];
    for (const m of messages) expect(wholeSentences(m), m).toBe(true);
  });
  it('a name is trimmed, a number kept as typed', () => {
    expect(setObstructionValue(withStem, 0, 'name', ' stem ', 'mm').obstructions?.[0].name).toBe('stem');
    expect(setObstructionValue(withStem, 0, 'from', 2.345, 'mm').obstructions?.[0].from).toBe(2.345);
  });
});

describe('a dragged station', () => {
  it('is held between its neighbours, at 0 or more along and at the least width, whatever the pointer does', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 }), fc.double({ min: -500, max: 500, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true }), (k, along, width) => {
        const moved = dragStation(profile, k, along, width, 0.64).stations;
        for (let i = 1; i < moved.length; i++) expect(moved[i].along).toBeGreaterThan(moved[i - 1].along);
        expect(moved[0].along).toBeGreaterThanOrEqual(0);
        expect(moved[k].width).toBeGreaterThanOrEqual(0.64);
      }),
      { seed: 12, numRuns: 300 },
    );
  });
  it('lands where the pointer is when that is allowed', () => {
    expect(dragStation(profile, 1, 55, 36, 0.64).stations[1]).toEqual({ along: 55, width: 36 });
  });
});

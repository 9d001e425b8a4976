/** Over-wide stations: widths above the opening envelope of their neighbours. */
import { describe, expect, it } from 'vitest';
import { opening, overWideStations } from '../../../src/solver/reading/over-wide.ts';
import type { Station } from '../../../src/solver/reading/types.ts';

/** Stations with the given widths, potentials falling from near 1, other fields plain. */
function stationsOf(widths: readonly number[]): Station[] {
  return widths.map((width, k) => ({
    phi: 1 - (k + 0.5) / widths.length, lines: [], width, meanSpeedRatio: 1, midX: k, midY: 0,
    distanceFromInlet: k, x1: k, y1: 0, x2: k, y2: width, judged: true, area: width,
  }));
}

describe('over-wide stations', () => {
  it('leaves straight tapers and narrow throats alone: the opening reproduces them', () => {
    const taper = [10, 9.5, 9, 8.5, 8, 7.5, 7];
    expect(opening(taper, 2)).toEqual(taper);
    const throat = [10, 9, 8, 7, 8, 9, 10];
    expect(opening(throat, 2)).toEqual(throat);
    expect(overWideStations(stationsOf(throat), null, 0.1, 5)).toHaveLength(0);
  });

  it('flags a bulge shorter than the window with its excess over the stations either side', () => {
    const widths = [10, 10, 10, 12, 13, 12, 10, 10, 10];
    const flagged = overWideStations(stationsOf(widths), null, 0.1, 5);
    expect(flagged.map((s) => s.index)).toEqual([3, 4, 5]);
    expect(flagged.map((s) => s.excess)).toEqual([2, 3, 2]);
    expect(flagged.every((s) => s.envelope === 10)).toBe(true);
    // under the threshold: 12 is 20% over, 10.5 only 5%
    expect(overWideStations(stationsOf([10, 10, 10, 10.5, 10, 10, 10]), null, 0.1, 5)).toHaveLength(0);
  });

  it('looks only at stations ahead of the valve when there is one', () => {
    const widths = [10, 10, 10, 10, 10, 10, 16, 10, 10];
    const stations = stationsOf(widths);
    expect(overWideStations(stations, null, 0.1, 5).map((s) => s.index)).toEqual([6]);
    expect(overWideStations(stations, stations[5].phi - 1e-9, 0.1, 5)).toHaveLength(0);
  });
});

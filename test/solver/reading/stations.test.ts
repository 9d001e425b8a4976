/** Stations: equipotential cross-sections of exact flows. */
import { describe, expect, it } from 'vitest';
import { extendedPhi } from '../../../src/solver/reading/field.ts';
import { RingIndex } from '../../../src/solver/reading/ring-index.ts';
import { buildStations, evenLevels, tightestStation } from '../../../src/solver/reading/stations.ts';
import type { FlowDomain, SolveResult } from '../../../src/solver/types.ts';
import { bend, channel } from '../rasterise/shapes.ts';
import { bendFlow, channelFlow, exactResult } from './analytic-flow.ts';
import { assertInDelta } from './helpers.ts';

function stationsOf(domain: FlowDomain, result: SolveResult, count = 40) {
  const input = {
    domain,
    grid: result.grid,
    phi: extendedPhi(result.grid, result.phi),
    index: new RingIndex(result.grid, domain),
    conductance: result.conductance,
    inletMeanSpeed: result.inletMeanSpeed,
  };
  return buildStations(input, evenLevels(count));
}

describe('stations', () => {
  // REFERENCES.md 1a [derived]: in the concentric bend every equipotential is a radial cut r1..r2, so every station
  // is r2 - r1 wide and carries the mean speed Q / (r2 - r1) = the inlet mean speed.
  it('are all r2 - r1 wide with the inlet mean speed in the exact concentric bend (r2/r1 = 2)', () => {
    const domain = bend(1, 2, 256);
    const stations = stationsOf(domain, exactResult(domain, 40_000, bendFlow(1, 2)));
    expect(stations).toHaveLength(40);
    let worst = 0;
    for (const s of stations) {
      assertInDelta(s.width, 1, 0.01, `width at phi ${s.phi}`);
      assertInDelta(s.meanSpeedRatio, 1, 0.01, `mean speed at phi ${s.phi}`);
      worst = Math.max(worst, Math.abs(s.width - 1));
    }
    console.log(`bend: worst station width error ${worst.toExponential(2)} (r2 - r1 = 1)`);
    // a station's centroid lies on the radial cut, so the distance along the bend grows with its angle
    const last = stations[stations.length - 1];
    expect(last.distanceFromInlet).toBeGreaterThan(stations[0].distanceFromInlet);
  });

  // REFERENCES.md 1b [derived]: straight channel, every cross-section W wide, mean speed uniform.
  it('are all W wide, evenly spaced, in a straight channel', () => {
    const domain = channel(4, 1);
    const stations = stationsOf(domain, exactResult(domain, 10_000, channelFlow(4, 1)), 20);
    expect(stations).toHaveLength(20);
    stations.forEach((s, k) => {
      assertInDelta(s.width, 1, 1e-9, `width at phi ${s.phi}`);
      assertInDelta(s.meanSpeedRatio, 1, 1e-9);
      // phi = 1 - x / 4, so the station at level phi sits at x = 4 (1 - phi), and that is its distance from the inlet
      assertInDelta(s.midX, 4 * (1 - s.phi), 1e-9);
      assertInDelta(s.distanceFromInlet, 4 * (k + 0.5) / 20, 1e-9);
      expect([s.y1, s.y2].sort()).toEqual([0, 1]);
    });
  });

  it('picks the narrowest station upstream of a given potential as the tightest', () => {
    const domain = channel(4, 1);
    const stations = stationsOf(domain, exactResult(domain, 10_000, channelFlow(4, 1)), 10);
    // without a depth a station's area is its width (unit depth), and the tightest is the one of least area
    const widths = stations.map((s, k) => ({ ...s, width: 1 + Math.abs(k - 6), area: 1 + Math.abs(k - 6) }));
    expect(tightestStation(widths, null)?.index).toBe(6);
    expect(tightestStation(widths, widths[3].phi - 1e-9)?.index).toBe(3);
    expect(tightestStation(widths, 2)).toBeNull();
  });
});

/** Readings in real units: station areas, the least area, the port volume and the slow share under a passage depth. */
import { describe, expect, it } from 'vitest';
import { solveFlow } from '../../../src/solver/solve.ts';
import { readFlow } from '../../../src/solver/reading/index.ts';
import { extendedPhi } from '../../../src/solver/reading/field.ts';
import { cellDepths, portVolume } from '../../../src/solver/reading/port-volume.ts';
import { RingIndex } from '../../../src/solver/reading/ring-index.ts';
import { slowZones } from '../../../src/solver/reading/slow-zones.ts';
import { buildStations, evenLevels } from '../../../src/solver/reading/stations.ts';
import { channelWithDepth, depthAlongX, roundPipe } from '../depth/depth-shapes.ts';
import { channel } from '../rasterise/shapes.ts';
import { channelFlow, exactResult } from './analytic-flow.ts';
import { assertInDelta } from './helpers.ts';

describe('round pipe of radius R and length L, axisymmetric depth b = 2 pi r [derived]', () => {
  // Every cross-section of a round pipe is a disc: area pi R^2 at every station, so the least area is pi R^2 too,
  // and the pipe holds pi R^2 L. The cell-centre sum of b = 2 pi y over whole cells is exact (b is linear in y).
  const lengthL = 4, radiusR = 1;
  const domain = roundPipe(lengthL, radiusR);
  const reading = readFlow(domain, solveFlow(domain, { targetCells: 128 * 32, tolerance: 1e-11 }), { stationCount: 12 });

  it('reads the area pi R^2 at every station and as the least area, and the volume pi R^2 L', () => {
    expect(reading.model).toBe('axisymmetric');
    expect(reading.stations).toHaveLength(12);
    for (const s of reading.stations) assertInDelta(s.area, Math.PI, 1e-9, `area at phi ${s.phi}`);
    assertInDelta(reading.tightest!.area, Math.PI, 1e-9, 'least area');
    assertInDelta(reading.portVolume, Math.PI * lengthL, 1e-9, 'port volume');
  });
});

describe('straight channel L x W whose width falls linearly, b(x) = 2 - x / 4 [derived]', () => {
  // The section is the same width W everywhere, so by width every station ties; by area (W b(x) on the straight
  // cut at x) the least is at the narrow (outlet) end. The volume is W times the integral of b: 1 x (2 L - L^2 / 8)
  // = 6 for L = 4, which the cell-centre sum gives exactly (b is linear).
  const lengthL = 4, widthW = 1;
  const b = (x: number) => 2 - x / 4;
  const domain = channelWithDepth(lengthL, widthW, depthAlongX(lengthL, 9, b));
  const reading = readFlow(domain, solveFlow(domain, { targetCells: 128 * 32, tolerance: 1e-11 }), { stationCount: 20 });

  it('gives each station the area W b(x) and puts the least area at the narrow end', () => {
    expect(reading.model).toBe('width');
    for (const s of reading.stations) {
      assertInDelta(s.width, widthW, 1e-9, `width at phi ${s.phi}`);
      assertInDelta(s.area, widthW * b(s.midX), 1e-6, `area at x ${s.midX}`);
    }
    const last = reading.stations.length - 1;
    expect(reading.tightest!.index).toBe(last);
    expect(reading.tightest!.area).toBe(reading.stations[last].area);
    expect(reading.tightest!.distanceFromInlet).toBeGreaterThan(0.9 * lengthL);
  });

  it('holds the port volume W times the integral of b', () => {
    assertInDelta(reading.portVolume, 6, 1e-9, 'port volume');
  });

  it('tells the least area in its finding, with the width across the section', () => {
    const told = reading.findings.find((f) => f.kind === 'tightest')!;
    expect(told.text).toMatch(/^Least area: 1\.\d mm² \(1\.0 mm across the section\), 3\.9 mm from the manifold face\.$/);
  });
});

describe('slow share by volume [derived]', () => {
  // Cells with x < 1 are made still in a 4 x 1 channel: in the plane they are 1/4 of the area; under b = 2 - x / 4
  // they hold the integral of b from 0 to 1 = 1.875 of the volume 6, a share of 0.3125.
  const domain = channel(4, 1);
  const result = exactResult(domain, 128 * 32, channelFlow(4, 1));
  const { grid } = result;
  const still = result.speedRatio.map((u, c) => (grid.x0 + ((c % grid.nx) + 0.5) * grid.h < 1 ? 0 : u));
  const input = { domain, grid, phi: extendedPhi(grid, result.phi), index: new RingIndex(grid, domain), conductance: result.conductance, inletMeanSpeed: result.inletMeanSpeed };
  const stations = buildStations(input, evenLevels(10));
  const depth = cellDepths(grid, depthAlongX(4, 9, (x) => 2 - x / 4));

  it('weights each cell by its depth when a depth is given, and by its area alone without one', () => {
    assertInDelta(slowZones(grid, result.phi, still, stations, 0.35, null).share, 0.25, 1e-12, 'plane share');
    assertInDelta(slowZones(grid, result.phi, still, stations, 0.35, null, null, depth).share, 1.875 / 6, 1e-12, 'share by volume');
    assertInDelta(portVolume(grid, depth, null), 6, 1e-12, 'volume');
  });
});

describe('plane model (no depth)', () => {
  const domain = channel(4, 1);
  const reading = readFlow(domain, exactResult(domain, 128 * 32, channelFlow(4, 1)), { stationCount: 10 });

  it('gives every station the area width x 1, the tightest its width as area, and the fluid area as volume', () => {
    expect(reading.model).toBe('plane');
    for (const s of reading.stations) expect(s.area).toBe(s.width);
    expect(reading.tightest!.area).toBe(reading.tightest!.width);
    assertInDelta(reading.portVolume, 4, 1e-12, 'fluid area');
    expect(reading.findings.find((f) => f.kind === 'tightest')!.text).toMatch(/^Tightest section: 1\.0 mm wide/);
  });
});

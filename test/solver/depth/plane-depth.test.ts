/** A depth in the plane solver: b = 1 is today's solver, and channels whose width varies along the flow. */
import { describe, expect, it } from 'vitest';
import { solveFlow } from '../../../src/solver/solve.ts';
import { readFlow } from '../../../src/solver/reading/index.ts';
import type { FlowDomain, SampledDepth, SolveOptions, SolveResult } from '../../../src/solver/types.ts';
import { benchDomain } from '../../../bench/bench-problem.ts';
import { bend, channel } from '../rasterise/shapes.ts';
import { cylinderInChannel, expectRelative } from '../solver-shapes.ts';
import { channelWithDepth, depthAlongX } from './depth-shapes.ts';

/** The same depth everywhere: one lattice node. */
const constantDepth = (b: number): SampledDepth => ({ kind: 'sampled', x0: 0, y0: 0, dx: 1, dy: 1, nx: 1, ny: 1, values: Float64Array.of(b) });

/** The existing references (REFERENCES.md 1a, 1b, 1c) and the port sample, each with its grid. */
const REFERENCES: [string, FlowDomain, SolveOptions][] = [
  ['concentric bend (1a)', bend(1, 2, 1024), { targetCells: 4 * 64 * 64 }],
  ['straight channel (1b)', channel(4, 1), { targetCells: 40_000, tolerance: 1e-11 }],
  ['cylinder between walls, d/H = 0.4 (1c)', cylinderInChannel(0.4, 6), { targetCells: 12 * 2.5 * 2.5 * 20 * 20 }],
  ['port sample, 65k cells', benchDomain(65_536), { targetCells: 65_536 }],
];

describe('depth b = 1 on the existing references', () => {
  for (const [name, domain, options] of REFERENCES) {
    it(`${name}: every result is the plane solver's, bit for bit`, () => {
      const plane = solveFlow(domain, options);
      const unit = solveFlow({ ...domain, depth: constantDepth(1) }, options);
      expect(unit.iterations).toBe(plane.iterations);
      expect(unit.conductance).toBe(plane.conductance);
      expect(unit.inletMeanSpeed).toBe(plane.inletMeanSpeed);
      expect(unit.fluxImbalance).toBe(plane.fluxImbalance);
      expect(unit.phi).toEqual(plane.phi);
      expect(unit.speedRatio).toEqual(plane.speedRatio);
      expect(unit.peak).toEqual(plane.peak);
      expect(unit.walls).toEqual(plane.walls);
    });
  }

  it('port sample: the reading is the plane reading to rounding, station areas equal to widths', () => {
    const [, domain, options] = REFERENCES[3];
    const plane = solveFlow(domain, options);
    const unitDomain = { ...domain, depth: constantDepth(1) };
    const unit = solveFlow(unitDomain, options);
    const a = readFlow(domain, plane);
    const b = readFlow(unitDomain, unit);
    expect(b.stations.length).toBe(a.stations.length);
    b.stations.forEach((s, k) => {
      expectRelative(s.area, a.stations[k].width, 1e-12);
      expectRelative(s.meanSpeedRatio, a.stations[k].meanSpeedRatio, 1e-12);
    });
    // the same findings, except that a reading with a depth tells the tightest section by its area
    const told = (r: typeof a) => r.findings.filter((f) => f.kind !== 'tightest').map((f) => f.text);
    expect(told(b)).toEqual(told(a));
    expect(b.findings.map((f) => f.kind)).toEqual(a.findings.map((f) => f.kind));
    expect(b.tightest!.index).toBe(a.tightest!.index);
    expect(b.streamlines).toEqual(a.streamlines);
  });

  it('a constant depth c scales every flux by c and leaves the potential and speeds alone (port sample)', () => {
    const [, domain, options] = REFERENCES[3];
    const plane = solveFlow(domain, options);
    for (const c of [1e-3, 2.5, 1e3]) {
      const deep = solveFlow({ ...domain, depth: constantDepth(c) }, options);
      expect(deep.iterations).toBe(plane.iterations); // the preconditioner ignores the depth's units
      expectRelative(deep.conductance, c * plane.conductance, 1e-12);
      expectRelative(deep.peak.speedRatio, plane.peak.speedRatio, 1e-9);
      expect(maxDifference(deep.phi, plane.phi)).toBeLessThan(1e-10);
    }
  });
});

describe('channel whose width grows linearly, b = b0 (1 + k x) [derived]', () => {
  // div(b grad phi) = 0 in 1D: b phi' is constant, so phi = 1 - ln(1 + k x) / ln(1 + k L), speed = F / b, and the
  // conductance is W b0 k / ln(1 + k L) (W the channel's height in the section).
  const lengthL = 4, b0 = 2, k = 0.5;
  const depth = depthAlongX(lengthL, 2, (x) => b0 * (1 + k * x));
  const result = solveFlow(channelWithDepth(lengthL, 1, depth), { targetCells: 256 * 64, tolerance: 1e-11 });
  const log = Math.log(1 + k * lengthL);

  it('has phi = 1 - ln(1 + k x) / ln(1 + k L), speed ratio b0 / b and the exact conductance, within 0.3%', () => {
    // A cell on the inlet or outlet takes its speed from its one inner face, half a cell away from its centre: there
    // the speed is first order, off by about k h / 2 (0.4% here), in the plane solver as well; held to 1%.
    let phiError = 0, speedError = 0, endError = 0;
    const h = result.grid.h;
    forEachSolved(result, (x, _y, c) => {
      phiError = Math.max(phiError, Math.abs(result.phi[c] - (1 - Math.log(1 + k * x) / log)));
      const error = Math.abs(result.speedRatio[c] * (1 + k * x) - 1);
      if (x < h || x > lengthL - h) endError = Math.max(endError, error);
      else speedError = Math.max(speedError, error);
    });
    console.log(`linear width: worst phi error ${phiError.toExponential(2)}, worst speed-ratio error ${speedError.toExponential(2)} ` +
      `(${endError.toExponential(2)} in the inlet and outlet cells)`);
    expect(phiError).toBeLessThan(0.003);
    expect(speedError).toBeLessThan(0.003);
    expect(endError).toBeLessThan(0.01);
    expectRelative(result.conductance, (b0 * k) / log, 0.003);
    expect(result.fluxImbalance).toBeLessThan(1e-6);
  });
});

describe('channel whose width steps smoothly from b1 to b2 [derived: continuity]', () => {
  it('has speed ratio 1 before the step and b1 / b2 after it, within 0.3%', () => {
    const b1 = 1, b2 = 2;
    const step = (x: number) => (x < 1.5 ? 0 : x > 2.5 ? 1 : 0.5 - 0.5 * Math.cos(Math.PI * (x - 1.5)));
    const depth = depthAlongX(4, 161, (x) => b1 + (b2 - b1) * step(x));
    const result = solveFlow(channelWithDepth(4, 1, depth), { targetCells: 256 * 64, tolerance: 1e-11 });
    let before = 0, after = 0;
    forEachSolved(result, (x, _y, c) => {
      if (x < 1) before = Math.max(before, Math.abs(result.speedRatio[c] - 1));
      if (x > 3) after = Math.max(after, Math.abs(result.speedRatio[c] / (b1 / b2) - 1));
    });
    expect(before).toBeLessThan(0.003);
    expect(after).toBeLessThan(0.003);
  });
});

/** Calls back with the centre and index of every solved cell. */
function forEachSolved(result: SolveResult, visit: (x: number, y: number, c: number) => void): void {
  const { nx, ny, h, x0, y0 } = result.grid;
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) if (Number.isFinite(result.phi[i + j * nx])) visit(x0 + (i + 0.5) * h, y0 + (j + 0.5) * h, i + j * nx);
  }
}

function maxDifference(a: Float64Array, b: Float64Array): number {
  let worst = 0;
  for (let k = 0; k < a.length; k++) if (Number.isFinite(a[k]) || Number.isFinite(b[k])) worst = Math.max(worst, Math.abs(a[k] - b[k]));
  return worst;
}

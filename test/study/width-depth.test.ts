/** The width profile through the file format and the case pipeline: the depth the solver gets, and what it does to the flow. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import { sectionToDomain } from '../../src/geometry/index.ts';
import { depthFunction, type SampledDepth } from '../../src/solver/index.ts';
import { solveFlow } from '../../src/solver/solve.ts';
import { alongFlowMap } from '../../src/study/along-flow.ts';
import { caseSetup, solveCase, StudyError } from '../../src/study/index.ts';
import { widthDepth } from '../../src/study/width-depth.ts';
import { channelFile, forEachSolved, relativeError } from './width-shapes.ts';

const CELLS = 65_536;

describe('a straight channel whose width grows linearly, given as two stations in the file [derived]', () => {
  // div(b grad phi) = 0 in 1D with b = b0 (1 + k x): b phi' is constant, so the speed is F / (H b) and the speed
  // ratio (over the mean inlet speed F / (H b0)) is b0 / b; the conductance is H b0 k / ln(1 + k L).
  const lengthL = 100, heightH = 20, b0 = 20, b1 = 40, k = (b1 / b0 - 1) / lengthL;
  const doc = loadDocument(channelFile(lengthL, heightH, { stations: [{ along: 0, width: b0 }, { along: lengthL, width: b1 }] }));
  const setup = caseSetup(doc, { targetCells: CELLS });
  const { result } = solveCase(setup.domain, { targetCells: CELLS, tolerance: 1e-11 }, null);

  it('is set up as the width model, the depth the profile laid along the channel', () => {
    expect(setup.model).toBe('width');
    const b = depthFunction(setup.domain.depth!);
    // Exact but for the plane solve's stopping tolerance (relative residual 1e-8).
    for (const x of [1, 10, 37.5, 50, 99]) {
      for (const y of [0, 5, 20]) expect(relativeError(b(x, y), b0 * (1 + k * x))).toBeLessThan(1e-7);
    }
    // Within half a lattice spacing of the inlet and outlet faces the width is the one half a spacing inside.
    const spacing = (setup.domain.depth as SampledDepth).dx;
    for (const x of [0, 100]) expect(relativeError(b(x, 10), b0 * (1 + k * x))).toBeLessThan(k * spacing);
  });

  it('has speed ratio b0 / b away from the ends and the exact conductance, within 0.3%', () => {
    let worst = 0;
    const h = result.grid.h;
    forEachSolved(result, (x, _y, c) => {
      if (x > h && x < lengthL - h) worst = Math.max(worst, Math.abs(result.speedRatio[c] * (1 + k * x) - 1));
    });
    expect(worst).toBeLessThan(0.003);
    expect(relativeError(result.conductance, (heightH * b0 * k) / Math.log(1 + k * lengthL))).toBeLessThan(0.003);
  });
});

describe('a constant width w [derived: the depth is a constant factor of every flux]', () => {
  const sample = readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8');
  const plainDoc = loadDocument(sample);
  const w = 32;
  const file = JSON.parse(sample);
  file.variants[0].width = { stations: [{ along: 0, width: w }, { along: 60, width: w }, { along: 200, width: w }] };
  const widthDoc = loadDocument(JSON.stringify(file));

  it('gives the plane solution, the conductance w times the plane one', () => {
    const plane = caseSetup(plainDoc, { targetCells: 20_000 });
    const wide = caseSetup(widthDoc, { targetCells: 20_000 });
    expect(plane.model).toBe('plane');
    expect(plane.domain.depth).toBeUndefined();
    expect(wide.model).toBe('width');
    expect(wide.domain.depth?.kind === 'sampled' && wide.domain.depth.values.every((v) => v === w)).toBe(true);
    const a = solveFlow(plane.domain, { targetCells: 20_000 });
    const b = solveFlow(wide.domain, { targetCells: 20_000 });
    expect(relativeError(b.conductance, w * a.conductance)).toBeLessThan(1e-9);
    expect(relativeError(b.peak.speedRatio, a.peak.speedRatio)).toBeLessThan(1e-9);
    let worst = 0;
    forEachSolved(a, (_x, _y, c) => { worst = Math.max(worst, Math.abs(a.phi[c] - b.phi[c])); });
    expect(worst).toBeLessThan(1e-9);
  });
});

describe('an obstruction on the valve axis', () => {
  // A channel 100 long and 20 high, 30 wide; a vertical axis at x = 50 through the floor (a valve leaning 0 degrees
  // opens toward -y, so "up" the stem is +y); an obstruction of diameter 10 takes the width to 20 for 45 < x < 55.
  // It runs from below the floor to above the roof, as a stem runs on into the metal: an obstruction that ends on a
  // wall leaves the lattice nodes beyond the wall unreduced, and the cells along that wall half a spacing wider.
  const lengthL = 100, heightH = 20, w = 30, d = 10;
  const domain = sectionToDomain(loadDocument(channelFile(lengthL, heightH)).variants[0].section, 1e-3, 'mm');
  const map = alongFlowMap(domain, 30_000);
  const axis = { x: 50, y: 0, inclinationDeg: 0 };
  const profile = (from: number, to: number, diameter = d) => ({
    stations: [{ along: 0, width: w }, { along: lengthL, width: w }],
    obstructions: [{ name: 'valve stem', diameter, from, to }],
  });
  const solve = (from: number, to: number) => solveFlow({ ...domain, depth: widthDepth(map, profile(from, to), axis) }, { targetCells: CELLS, tolerance: 1e-10 });

  it('across the whole height, puts a resistance in series: the conductance and the speed in the band by continuity [derived]', () => {
    const full = solve(-5, heightH + 5);
    // Series resistances: 1 / C = (L - d) / (w H) + d / ((w - d) H).
    expect(relativeError(full.conductance, heightH / ((lengthL - d) / w + d / (w - d)))).toBeLessThan(0.005);
    let worst = 0;
    forEachSolved(full, (x, _y, c) => {
      if (Math.abs(x - 50) < 3) worst = Math.max(worst, relativeError(full.speedRatio[c], w / (w - d)));
      if (Math.abs(x - 50) > 8 && x > 1 && x < lengthL - 1) worst = Math.max(worst, relativeError(full.speedRatio[c], 1));
    });
    expect(worst).toBeLessThan(0.01);
  });

  it('over the lower half only, takes flux from the lower half of the band and less from the whole', () => {
    const none = solveFlow(domain, { targetCells: CELLS }).conductance * w;
    const lower = solve(-5, heightH / 2);
    const full = solve(-5, heightH + 5);
    expect(lower.conductance).toBeLessThan(none);
    expect(lower.conductance).toBeGreaterThan(full.conductance);
    // Flux per unit height through the band's middle, x = 50: speed times width, lower half against upper half.
    const b = depthFunction(widthDepth(map, profile(-5, heightH / 2), axis));
    let below = 0, above = 0;
    forEachSolved(lower, (x, y, c) => {
      if (Math.abs(x - 50) > lower.grid.h / 2) return;
      if (y < heightH / 2 - 1) below += lower.speedRatio[c] * b(x, y);
      else if (y > heightH / 2 + 1) above += lower.speedRatio[c] * b(x, y);
    });
    expect(below).toBeLessThan(0.9 * above);
  });

  it('never leaves less than a tenth of the width', () => {
    const depth = widthDepth(map, profile(-5, heightH + 5, 45), axis);
    expect(depthFunction(depth)(50, 10)).toBeCloseTo(0.1 * w, 9);
    expect(Math.min(...depth.values)).toBeCloseTo(0.1 * w, 9);
  });
});

describe('the case set-up with a width profile', () => {
  it('is the same depth every time (a pure function of the file)', () => {
    const text = channelFile(100, 20, { stations: [{ along: 0, width: 20 }, { along: 30, width: 26 }, { along: 100, width: 22 }] });
    const a = caseSetup(loadDocument(text), { targetCells: 20_000 }).domain.depth;
    const b = caseSetup(loadDocument(text), { targetCells: 80_000 }).domain.depth;
    expect(b).toStrictEqual(a);
  });

  it('says plainly when the section does not solve, so the profile cannot be laid along it', () => {
    const file = JSON.parse(channelFile(100, 20, { stations: [{ along: 0, width: 20 }, { along: 100, width: 22 }] }));
    // No inlet: the manifold face marked as a wall.
    file.variants[0].section.outline.edges[3].role = 'wall';
    const attempt = () => caseSetup(loadDocument(JSON.stringify(file)), { targetCells: 20_000 });
    expect(attempt).toThrow(StudyError);
    expect(attempt).toThrow(/^The width profile cannot be laid along the port, because the section does not solve\. [A-Z].*\.$/);
  });
});

/** Round (axisymmetric) variants through the file format and the case pipeline: a round pipe and the street port. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import type { PortDocument } from '../../src/document/types.ts';
import { partsBreathing } from '../../src/parts/index.ts';
import { AXIS_WALL_NAME, caseSetup, solveCase, StudyError } from '../../src/study/index.ts';
import { runBin, tempDir } from '../cli/helpers.ts';
import { pipeFile } from './axisymmetric-shapes.ts';
import { relativeError } from './width-shapes.ts';

const lengthL = 100, radiusR = 20;
const cells = 60_000;

describe('a round pipe drawn whole and marked round about its axis [derived]', () => {
  // Uniform flow along a pipe: flux = speed x pi R^2, so the conductance is pi R^2 / L and every cross-section
  // (equipotential station) has the area pi R^2.
  const exact = (Math.PI * radiusR * radiusR) / lengthL;
  for (const keep of ['right', 'left'] as const) {
    it(`keeping the ${keep} side: conductance pi R^2 / L within 0.5% and every station's area pi R^2`, () => {
      const setup = caseSetup(loadDocument(pipeFile(lengthL, radiusR, keep)), { targetCells: cells });
      expect(setup.model).toBe('axisymmetric');
      expect(setup.domain.depth).toEqual({ kind: 'axisymmetric', axis: { x: 0, y: 0, dirX: 1, dirY: expect.closeTo(0, 15) } });
      const { result, reading } = solveCase(setup.domain, { targetCells: cells }, setup.reading);
      expect(relativeError(result.conductance, exact)).toBeLessThan(0.005);
      expect(reading!.stations.length).toBeGreaterThan(10);
      for (const station of reading!.stations) expect(relativeError(station.area, Math.PI * radiusR * radiusR)).toBeLessThan(0.005);
    });
  }

  it('turned to lean 120 degrees from straight down: the right side kept is the one the axis turns to counter-clockwise, and the conductance holds', () => {
    const setup = caseSetup(loadDocument(pipeFile(lengthL, radiusR, 'right', 120)), { targetCells: cells });
    const lean = (120 * Math.PI) / 180;
    const right = [Math.cos(lean), Math.sin(lean)];
    const xy = setup.domain.outer.xy;
    for (let k = 0; k < xy.length; k += 2) expect(xy[k] * right[0] + xy[k + 1] * right[1]).toBeGreaterThan(-1e-9);
    const { result } = solveCase(setup.domain, { targetCells: cells }, null);
    expect(relativeError(result.conductance, exact)).toBeLessThan(0.005);
  });

  it('solves the same through `portwright solve --json`: conductance pi R^2 / L within 0.5%', () => {
    const files = tempDir();
    try {
      const ran = runBin(['solve', files.write('pipe.json', pipeFile(lengthL, radiusR, 'right')), '--cells', String(cells), '--json']);
      expect(ran.code).toBe(0);
      expect(relativeError(JSON.parse(ran.stdout).conductance, exact)).toBeLessThan(0.005);
    } finally {
      files.cleanup();
    }
  });
});

const read = (name: string) => loadDocument(readFileSync(new URL(`../../samples/${name}`, import.meta.url), 'utf8'));
const tight = read('street-tight-short-side.json');
const roundSample = read('street-valve-round.json');

function round(doc: PortDocument, keep: 'left' | 'right'): PortDocument {
  return { ...doc, variants: doc.variants.map((v) => ({ ...v, axisymmetric: { keep } })) };
}

describe('the tight street port marked round about its valve axis (samples/street-valve-round.json)', () => {
  it('is the tight street port with the round model on the manifold side of the valve axis', () => {
    expect(roundSample.variants[0].section).toStrictEqual(tight.variants[0].section);
    expect(roundSample.variants[0].axisymmetric).toStrictEqual({ keep: 'left' });
  });

  it('solves on the manifold side of the axis: finite, model axisymmetric, the least station area of the order of the curtain pi D L', () => {
    const setup = caseSetup(roundSample, { targetCells: cells });
    expect(setup.model).toBe('axisymmetric');
    // The valve head straddles its axis, so its kept half joins the outer boundary: no island is left.
    expect(setup.domain.islands).toHaveLength(0);
    // The cut runs along the axis in two pieces (above and below the valve), each a wall named "axis".
    const axisId = setup.domain.wallNames.indexOf(AXIS_WALL_NAME);
    expect(Array.from(setup.domain.outer.wallIds).filter((id) => id === axisId)).toHaveLength(2);
    const { result, reading } = solveCase(setup.domain, { targetCells: cells }, setup.reading);
    expect(Number.isFinite(result.conductance) && result.conductance > 0).toBe(true);
    const valve = setup.variant.parts!.valve!;
    const curtain = Math.PI * valve.diameter * valve.lift;
    const least = Math.min(...reading!.stations.map((s) => s.area));
    // Of the order of: the least flow area through a round valve is the curtain or less (Heywood's stages); this is
    // an order-of-size check, not a reference value.
    const ratio = least / curtain;
    console.log(`street port, round about the valve axis: least station area ${least.toFixed(1)} mm^2, curtain ${curtain.toFixed(1)} mm^2, ratio ${ratio.toFixed(3)}, least valve area (Heywood) ${partsBreathing(setup.variant.parts!, 'mm')!.minValveArea.toFixed(1)} mm^2`);
    expect(ratio).toBeGreaterThan(0.5);
    expect(ratio).toBeLessThan(2);
  });

  it('reads the axis as a line of symmetry, not a wall: no layer marched, never ranked or told, named so by the command', () => {
    const setup = caseSetup(roundSample, { targetCells: cells });
    const { reading } = solveCase(setup.domain, { targetCells: cells }, setup.reading);
    const onAxis = (name: string) => name === AXIS_WALL_NAME || name.startsWith(`${AXIS_WALL_NAME} (`);
    expect(reading!.walls.filter((w) => onAxis(w.name))).toEqual([]);
    expect(reading!.detachments.filter((d) => onAxis(d.name))).toEqual([]);
    expect(reading!.findings.filter((f) => /^axis/i.test(f.text))).toEqual([]);
    const ran = runBin(['solve', new URL('../../samples/street-valve-round.json', import.meta.url).pathname, '--cells', String(cells), '--json']);
    expect(ran.code).toBe(0);
    const walls = JSON.parse(ran.stdout).walls as { name: string; symmetryLine?: true; detachment: unknown }[];
    const axis = walls.filter((w) => onAxis(w.name));
    expect(axis.length).toBe(2);
    expect(axis.every((w) => w.symmetryLine === true && w.detachment === null)).toBe(true);
    expect(walls.filter((w) => !onAxis(w.name)).every((w) => w.symmetryLine === undefined)).toBe(true);
  });

  it('refuses to keep the side away from the manifold: the inlet lies wholly there', () => {
    expect(() => caseSetup(round(tight, 'right'), { targetCells: cells })).toThrow(StudyError);
    expect(() => caseSetup(round(tight, 'right'), { targetCells: cells })).toThrow(/The inlet \(the manifold face\) lies wholly on the other side of the axis from the right side that is solved\./);
  });
});

/** The street-port sample with its invented width profile: what the file holds and the depth the case pipeline builds from it. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import type { PortDocument } from '../../src/document/types.ts';
import { depthFunction } from '../../src/solver/index.ts';
import { caseSetup } from '../../src/study/index.ts';

const doc = loadDocument(readFileSync(new URL('../../samples/street-port-widths.json', import.meta.url), 'utf8'));
const tight = loadDocument(readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8'));
const variant = doc.variants[0];

/** The same document with its obstructions taken out. */
function withoutObstructions(d: PortDocument): PortDocument {
  return { ...d, variants: d.variants.map((v) => ({ ...v, width: { stations: v.width!.stations } })) };
}

describe('the street port with widths (samples/street-port-widths.json)', () => {
  it('is the tight street port with a plausible invented profile: a 30-34 mm port, a 50 mm bowl, an 8 mm stem and a 14 mm guide boss', () => {
    expect(variant.section).toStrictEqual(tight.variants[0].section);
    const port = variant.width!.stations.filter((s) => s.along <= 60).map((s) => s.width);
    expect(Math.min(...port)).toBeGreaterThanOrEqual(30);
    expect(Math.max(...port)).toBeLessThanOrEqual(34);
    expect(Math.max(...variant.width!.stations.filter((s) => s.along < 140).map((s) => s.width))).toBe(50);
    expect(variant.width!.obstructions!.map((o) => [o.name, o.diameter])).toEqual([['valve stem', 8], ['guide boss', 14]]);
  });

  it('sets up as the width model: the runner about 32 mm wide, the bowl 50, less the stem and the boss on the valve axis', () => {
    const setup = caseSetup(doc, { targetCells: 60_000 });
    expect(setup.model).toBe('width');
    const b = depthFunction(setup.domain.depth!);
    const clear = depthFunction(caseSetup(withoutObstructions(doc), { targetCells: 60_000 }).domain.depth!);
    expect(b(30, 50)).toBeGreaterThan(31);
    expect(b(30, 50)).toBeLessThan(33);
    // The valve axis is x = 95 with the gauge line at y = 2.3: the stem alone 30 mm up it, stem and boss 55 mm up.
    expect(clear(95, 32.3) - b(95, 32.3)).toBeCloseTo(8, 9);
    expect(clear(95, 57.3) - b(95, 57.3)).toBeCloseTo(14, 9);
    expect(clear(110, 32.3) - b(110, 32.3)).toBe(0);
    expect(clear(95, 35)).toBeGreaterThan(45);
  });
});

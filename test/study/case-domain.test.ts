/** The study's case set-up: grid-tied flattening, the lift, the variant, parts regenerated. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import { sectionBounds } from '../../src/geometry/index.ts';
import { caseSetup, solveFlattenTolerance, StudyError } from '../../src/study/index.ts';

const doc = loadDocument(readFileSync(new URL('../../samples/short-side-compare.json', import.meta.url), 'utf8'));

/** Lowest y of the valve head island: the valve face, which moves down (into the bore) as the lift grows. */
function valveFaceY(lift?: number): number {
  const { domain } = caseSetup(doc, { targetCells: 30_000, lift });
  const valve = domain.islands.find((ring) => domain.wallNames[ring.wallIds[0]] === 'valve head')!;
  let low = Infinity;
  for (let k = 1; k < valve.xy.length; k += 2) low = Math.min(low, valve.xy[k]);
  return low;
}

describe('caseSetup', () => {
  it('flattens curves within h^2 / (10 D): four times the cells, a quarter of the tolerance', () => {
    const section = caseSetup(doc, { targetCells: 250_000 }).section;
    const b = sectionBounds(section);
    const h = Math.sqrt(((b.maxX - b.minX) * (b.maxY - b.minY)) / 250_000);
    expect(solveFlattenTolerance(section, 250_000)).toBeCloseTo((h * h) / (10 * Math.hypot(b.maxX - b.minX, b.maxY - b.minY)), 12);
    expect(solveFlattenTolerance(section, 1_000_000) / solveFlattenTolerance(section, 250_000)).toBeCloseTo(0.25, 12);
    // A finer grid gets more chords on the same curves.
    const segments = (cells: number) => caseSetup(doc, { targetCells: cells }).domain.outer.marks.length;
    expect(segments(1_000_000)).toBeGreaterThan(segments(250_000));
  });

  it('solves the active variant by default and any other by name', () => {
    expect(caseSetup(doc, { targetCells: 30_000 }).variant.name).toBe(doc.activeVariant);
    expect(caseSetup(doc, { variant: 'generous short side', targetCells: 30_000 }).variant.name).toBe('generous short side');
    expect(() => caseSetup(doc, { variant: 'ported', targetCells: 30_000 })).toThrow(StudyError);
    expect(() => caseSetup(doc, { variant: 'ported', targetCells: 30_000 })).toThrow(/no variant "ported"; the variants are: "tight short side", "generous short side"/);
  });

  it('applies a lift in place of the variant\'s own, leaving the document alone', () => {
    const own = doc.variants[0].parts!.valve!.lift;
    expect(valveFaceY()).toBeCloseTo(valveFaceY(own), 12);
    // Two more millimetres of lift put the valve face two millimetres further from the seat (the axis is upright).
    expect(valveFaceY(own) - valveFaceY(own + 2)).toBeCloseTo(2, 6);
    expect(caseSetup(doc, { targetCells: 30_000, lift: own + 2 }).variant.parts!.valve!.lift).toBe(own + 2);
    expect(doc.variants[0].parts!.valve!.lift).toBe(own);
    expect(() => caseSetup(doc, { targetCells: 30_000, lift: -1 })).toThrow(/lift must be zero or more/);
  });

  it('regenerates the parts from their numbers, whatever geometry the file stored', () => {
    const variant = doc.variants[0];
    const stale = { ...doc, variants: [{ ...variant, section: { ...variant.section, islands: [] } }, ...doc.variants.slice(1)] };
    const setUp = caseSetup(stale, { targetCells: 30_000 });
    expect(setUp.section.islands.map((i) => i.name)).toContain('valve head');
  });
});

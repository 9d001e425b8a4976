/** Converting the drawing between mm and inch: 1 in = 25.4 mm exactly [pub: NIST SP 811, appendix B]. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import { applyEdit } from '../../src/editor/index.ts';

const doc = loadDocument(readFileSync('samples/street-tight-short-side.json', 'utf8'));

describe('setUnits', () => {
  it('scales every coordinate and radius by 1/25.4 and back', () => {
    const inch = applyEdit(doc, 'setUnits', { units: 'inch' });
    expect(inch.units).toBe('inch');
    const v0 = doc.variants[0].section.outline.vertices;
    const v1 = inch.variants[0].section.outline.vertices;
    for (let k = 0; k < v0.length; k++) {
      expect(v1[k].at[0]).toBeCloseTo(v0[k].at[0] / 25.4, 12);
      expect(v1[k].filletRadius ?? 0).toBeCloseTo((v0[k].filletRadius ?? 0) / 25.4, 12);
    }
    const back = applyEdit(inch, 'setUnits', { units: 'mm' });
    const b = back.variants[0].section.outline.vertices;
    for (let k = 0; k < v0.length; k++) expect(b[k].at[1]).toBeCloseTo(v0[k].at[1], 10);
  });

  it('scales parts: lengths by 1/25.4, areas by its square, angles and percentages not at all', () => {
    const parts = doc.variants[0].parts;
    expect(parts?.valve).toBeDefined();
    const withArea = applyEdit(doc, 'setPart', { part: 'port', values: { tightestArea: 1290.32 } });
    const inch = applyEdit(withArea, 'setUnits', { units: 'inch' });
    const p = inch.variants[0].parts!;
    expect(p.valve!.diameter).toBeCloseTo(parts!.valve!.diameter / 25.4, 12);
    expect(p.valve!.seatAngleDeg).toBe(parts!.valve!.seatAngleDeg);
    expect(p.seat!.throatPct).toBe(parts!.seat!.throatPct);
    expect(p.port!.tightestArea).toBeCloseTo(2, 9); // 1290.32 mm^2 = 2 in^2 exactly
  });

  it('keeps the same document when the units do not change', () => {
    expect(applyEdit(doc, 'setUnits', { units: doc.units })).toBe(doc);
  });

  it('rejects units it does not know with a plain message', () => {
    expect(() => applyEdit(doc, 'setUnits', { units: 'furlong' })).toThrow(/units/);
  });
});

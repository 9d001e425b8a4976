import { describe, expect, it } from 'vitest';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import type { BenchInputs } from '../../src/document/types.ts';
import { applyEdit, EDITS } from '../../src/editor/edits.ts';
import { benchOnlyChange, sameBench } from '../../src/editor/edits-bench.ts';
import { boxDocument, deepFreeze } from './fixtures.ts';

/** Invented inputs: 28 in H2O (6974.4892 Pa), 20 °C, an 86 mm bore. */
const BENCH: BenchInputs = deepFreeze({ testPressurePa: 6974.4892, airTemperatureK: 293.15, boreM: 0.086, flowScale: 'mean port speed' });

describe('setBench', () => {
  it('is registered as "Set bench inputs"', () => {
    expect(EDITS.setBench.label).toBe('Set bench inputs');
  });

  it('sets the active variant\'s inputs and leaves the rest of the document the very same objects', () => {
    const doc = boxDocument();
    const after = applyEdit(doc, 'setBench', { bench: BENCH });
    expect(after.variants[0].bench).toEqual(BENCH);
    expect(after.variants[0].section).toBe(doc.variants[0].section);
    expect(after.variants[1]).toBe(doc.variants[1]);
    expect(after.settings).toBe(doc.settings);
    expect(loadDocument(saveDocument(after))).toStrictEqual(after);
  });

  it('sets a named variant\'s inputs, and refuses a variant that is not there', () => {
    const doc = boxDocument();
    const after = applyEdit(doc, 'setBench', { bench: BENCH, variant: 'opened roof' });
    expect(after.variants[1].bench).toEqual(BENCH);
    expect(after.variants[0]).toBe(doc.variants[0]);
    expect(after.activeVariant).toBe('stock');
    expect(() => applyEdit(doc, 'setBench', { bench: BENCH, variant: 'ported' })).toThrow('There is no variant called "ported".');
  });

  it('clears the inputs when none are given, leaving no empty key behind', () => {
    const set = applyEdit(boxDocument(), 'setBench', { bench: BENCH });
    const cleared = applyEdit(set, 'setBench', {});
    expect('bench' in cleared.variants[0]).toBe(false);
    expect(cleared).toStrictEqual(boxDocument());
  });

  it('changes nothing (the same document, so no undo step) for the same numbers again', () => {
    const set = applyEdit(boxDocument(), 'setBench', { bench: BENCH });
    expect(applyEdit(set, 'setBench', { bench: { ...BENCH } })).toBe(set);
    const doc = boxDocument();
    expect(applyEdit(doc, 'setBench', {})).toBe(doc);
  });

  it('refuses numbers the file could not hold', () => {
    expect(() => applyEdit(boxDocument(), 'setBench', { bench: { boreM: -0.086 } })).toThrow(/bench\.boreM: must be a number above 0/);
    expect(() => applyEdit(boxDocument(), 'setBench', { bench: { testPressureInH2O: 28 } })).toThrow(/bench: must be the bench inputs/);
  });

  it('goes with the variant when it is copied, and stays in SI when the drawing changes units', () => {
    const set = applyEdit(boxDocument(), 'setBench', { bench: BENCH });
    const copied = applyEdit(set, 'addVariant', {});
    expect(copied.variants[2].name).toBe('stock copy');
    expect(copied.variants[2].bench).toEqual(BENCH);
    const inches = applyEdit(copied, 'setUnits', { units: 'inch' });
    expect(inches.variants[0].bench).toEqual(BENCH);
    expect(inches.variants[0].section.outline.vertices[1].at[0]).toBeCloseTo(40 / 25.4, 12);
  });
});

describe('sameBench', () => {
  it('compares number for number, an absent key the same as an undefined one', () => {
    expect(sameBench(undefined, undefined)).toBe(true);
    expect(sameBench({}, undefined)).toBe(false);
    expect(sameBench(BENCH, { ...BENCH })).toBe(true);
    expect(sameBench(BENCH, { ...BENCH, boreM: 0.0861 })).toBe(false);
    expect(sameBench({ boreM: 0.086 }, { boreM: 0.086, strokeM: undefined })).toBe(true);
    expect(sameBench({ boreM: 0.086 }, { strokeM: 0.086 })).toBe(false);
  });
});

describe('benchOnlyChange', () => {
  it('is true for setBench and its undo, so the field is not solved again', () => {
    const doc = boxDocument();
    const set = applyEdit(doc, 'setBench', { bench: BENCH, variant: 'opened roof' });
    expect(benchOnlyChange(doc, set)).toBe(true);
    expect(benchOnlyChange(set, doc)).toBe(true);
  });

  it('is false for no change (a drag let go) and for any change a solve must follow', () => {
    const doc = applyEdit(boxDocument(), 'setBench', { bench: BENCH });
    expect(benchOnlyChange(doc, doc)).toBe(false);
    for (const [name, args] of [
      ['setFilletRadius', { vertex: 1, radius: 2 }], ['setActiveVariant', { name: 'opened roof' }], ['setUnits', { units: 'inch' }],
      ['addVariant', {}], ['renameVariant', { from: 'stock', to: 'ported' }],
    ] as const) {
      expect(benchOnlyChange(doc, applyEdit(doc, name, args)), name).toBe(false);
    }
    expect(benchOnlyChange(doc, { ...doc, settings: { gridDetail: 'fine' } })).toBe(false);
    const benchAndShape = applyEdit(applyEdit(doc, 'setBench', {}), 'setFilletRadius', { vertex: 1, radius: 2 });
    expect(benchOnlyChange(doc, benchAndShape)).toBe(false);
  });
});

import { describe, expect, it } from 'vitest';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import type { PortDocument, WidthProfile } from '../../src/document/types.ts';
import { applyEdit, EDITS } from '../../src/editor/edits.ts';
import { sameWidthProfile } from '../../src/editor/edits-width.ts';
import { boxDocument, deepFreeze } from './fixtures.ts';

/** Invented: a port 32 mm wide at the manifold face opening to 34 mm 40 mm along. */
const PROFILE: WidthProfile = deepFreeze({ stations: [{ along: 0, width: 32 }, { along: 40, width: 34 }] });
const STEM = deepFreeze({ name: 'valve stem', diameter: 8, from: 12, to: 40 });

/** The box document with a small valve part on its first variant, so obstructions have an axis to stand on. */
function withValve(): PortDocument {
  const doc = boxDocument();
  const valve = {
    diameter: 10, seatAngleDeg: 45, seatFaceWidth: 1, margin: 0.5, backCutAngleDeg: 30, headThickness: 2,
    stemDiameter: 2, stemLength: 5, axis: { x: 20, y: 10, inclinationDeg: 0 }, lift: 0,
  };
  return deepFreeze({ ...doc, variants: [{ ...doc.variants[0], parts: { valve } }, doc.variants[1]] });
}

describe('setWidthProfile', () => {
  it('is registered as "Set width profile"', () => {
    expect(EDITS.setWidthProfile.label).toBe('Set width profile');
  });

  it('sets the active variant\'s profile, written before the section, and leaves the rest the very same objects', () => {
    const doc = boxDocument();
    const after = applyEdit(doc, 'setWidthProfile', { width: PROFILE });
    expect(after.variants[0].width).toStrictEqual(PROFILE);
    expect(after.variants[0].section).toBe(doc.variants[0].section);
    expect(after.variants[1]).toBe(doc.variants[1]);
    expect(Object.keys(after.variants[0])).toEqual(['name', 'width', 'section']);
    const text = saveDocument(after);
    expect(text.indexOf('"width"')).toBeLessThan(text.indexOf('"section"'));
    expect(loadDocument(text)).toStrictEqual(after);
  });

  it('sets a named variant\'s profile, and refuses a variant that is not there', () => {
    const doc = boxDocument();
    const after = applyEdit(doc, 'setWidthProfile', { width: PROFILE, variant: 'opened roof' });
    expect(after.variants[1].width).toStrictEqual(PROFILE);
    expect(after.variants[0]).toBe(doc.variants[0]);
    expect(() => applyEdit(doc, 'setWidthProfile', { width: PROFILE, variant: 'ported' })).toThrow('There is no variant called "ported".');
  });

  it('removes the profile with null, leaving no empty key behind', () => {
    const set = applyEdit(boxDocument(), 'setWidthProfile', { width: PROFILE });
    const removed = applyEdit(set, 'setWidthProfile', { width: null });
    expect('width' in removed.variants[0]).toBe(false);
    expect(removed).toStrictEqual(boxDocument());
  });

  it('changes nothing (the same document, so no undo step) for the same numbers again', () => {
    const set = applyEdit(boxDocument(), 'setWidthProfile', { width: PROFILE });
    expect(applyEdit(set, 'setWidthProfile', { width: structuredClone(PROFILE) })).toBe(set);
    expect(applyEdit(set, 'setWidthProfile', { width: { ...PROFILE, obstructions: [] } })).toBe(set);
    const doc = boxDocument();
    expect(applyEdit(doc, 'setWidthProfile', { width: null })).toBe(doc);
  });

  it('refuses a profile the file could not hold, naming the place', () => {
    const doc = boxDocument();
    expect(() => applyEdit(doc, 'setWidthProfile', { width: { stations: [{ along: 0, width: 32 }] } })).toThrow(/width\.stations: must be a list of 2 to 200/);
    expect(() => applyEdit(doc, 'setWidthProfile', { width: { stations: [{ along: 10, width: 32 }, { along: 10, width: 30 }] } }))
      .toThrow(/width\.stations\[1\]\.along: must be further along the port than the station before it \(10\)/);
    expect(() => applyEdit(doc, 'setWidthProfile', { width: { stations: [{ along: 0, width: 0 }, { along: 10, width: 30 }] } }))
      .toThrow(/width\.stations\[0\]\.width: must be a number above 0/);
    expect(() => applyEdit(doc, 'setWidthProfile', {})).toThrow(/setWidthProfile: width:/);
  });

  it('takes an obstruction only on a variant with a valve, whole sentences saying why', () => {
    const width = { ...PROFILE, obstructions: [STEM] };
    expect(() => applyEdit(boxDocument(), 'setWidthProfile', { width }))
      .toThrow('An obstruction stands on the valve axis, so the variant "stock" needs a valve before it can take one.');
    const after = applyEdit(withValve(), 'setWidthProfile', { width });
    expect(after.variants[0].width?.obstructions).toStrictEqual([STEM]);
    expect(() => applyEdit(withValve(), 'setWidthProfile', { width: { ...PROFILE, obstructions: [{ ...STEM, from: 40, to: 12 }] } }))
      .toThrow(/obstructions\[0\]\.to: must be above from \(40\)/);
  });

  it('goes with the variant when it is copied, and is converted with the other lengths when the units change', () => {
    const width = { ...PROFILE, obstructions: [STEM] };
    const set = applyEdit(withValve(), 'setWidthProfile', { width });
    const copied = applyEdit(set, 'addVariant', {});
    expect(copied.variants[2].width).toStrictEqual(width);
    const inches = applyEdit(copied, 'setUnits', { units: 'inch' });
    const w = inches.variants[0].width!;
    expect(w.stations[1].along).toBeCloseTo(40 / 25.4, 12);
    expect(w.stations[0].width).toBeCloseTo(32 / 25.4, 12);
    expect(w.obstructions![0]).toMatchObject({ name: 'valve stem' });
    expect(w.obstructions![0].diameter).toBeCloseTo(8 / 25.4, 12);
    expect(w.obstructions![0].from).toBeCloseTo(12 / 25.4, 12);
    expect(w.obstructions![0].to).toBeCloseTo(40 / 25.4, 12);
    const back = applyEdit(inches, 'setUnits', { units: 'mm' });
    expect(back.variants[0].width!.stations[1].along).toBeCloseTo(40, 10);
  });
});

describe('sameWidthProfile', () => {
  it('compares number for number, absent obstructions the same as none', () => {
    expect(sameWidthProfile(undefined, undefined)).toBe(true);
    expect(sameWidthProfile(PROFILE, undefined)).toBe(false);
    expect(sameWidthProfile(PROFILE, { ...PROFILE, obstructions: [] })).toBe(true);
    expect(sameWidthProfile(PROFILE, { stations: [{ along: 0, width: 32 }, { along: 40, width: 34.01 }] })).toBe(false);
    expect(sameWidthProfile({ ...PROFILE, obstructions: [STEM] }, { ...PROFILE, obstructions: [{ ...STEM, name: 'guide boss' }] })).toBe(false);
  });
});

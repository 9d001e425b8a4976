import { describe, expect, it } from 'vitest';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import type { AxisymmetricModel, PortDocument } from '../../src/document/types.ts';
import { applyEdit, EDITS } from '../../src/editor/edits.ts';
import { EditError } from '../../src/editor/errors.ts';
import { boxDocument, deepFreeze } from './fixtures.ts';

const ROUND: AxisymmetricModel = deepFreeze({ axis: { x: 0, y: 10, inclinationDeg: 90 }, keep: 'right' });

/** The box document with a small valve part on its first variant, so the valve's axis can be turned about. */
function withValve(): PortDocument {
  const doc = boxDocument();
  const valve = {
    diameter: 10, seatAngleDeg: 45, seatFaceWidth: 1, margin: 0.5, backCutAngleDeg: 30, headThickness: 2,
    stemDiameter: 2, stemLength: 5, axis: { x: 20, y: 10, inclinationDeg: 0 }, lift: 0,
  };
  return deepFreeze({ ...doc, variants: [{ ...doc.variants[0], parts: { valve } }, doc.variants[1]] });
}

describe('setAxisymmetric', () => {
  it('is registered as "Set round (axisymmetric) model"', () => {
    expect(EDITS.setAxisymmetric.label).toBe('Set round (axisymmetric) model');
  });

  it('sets the active variant\'s round model, written just before the section, and leaves the rest the very same objects', () => {
    const doc = boxDocument();
    const after = applyEdit(doc, 'setAxisymmetric', { axisymmetric: ROUND });
    expect(after.variants[0].axisymmetric).toStrictEqual(ROUND);
    expect(after.variants[0].section).toBe(doc.variants[0].section);
    expect(after.variants[1]).toBe(doc.variants[1]);
    expect(Object.keys(after.variants[0])).toEqual(['name', 'axisymmetric', 'section']);
    expect(loadDocument(saveDocument(after))).toStrictEqual(after);
  });

  it('sets a named variant, removes the model with null, and returns the document itself for the same model', () => {
    const doc = boxDocument();
    const name = doc.variants[1].name;
    const after = applyEdit(doc, 'setAxisymmetric', { axisymmetric: ROUND, variant: name });
    expect(after.variants[1].axisymmetric).toStrictEqual(ROUND);
    expect(applyEdit(after, 'setAxisymmetric', { axisymmetric: { ...ROUND, axis: { ...ROUND.axis! } }, variant: name })).toBe(after);
    const plain = applyEdit(after, 'setAxisymmetric', { axisymmetric: null, variant: name });
    expect('axisymmetric' in plain.variants[1]).toBe(false);
    expect(() => applyEdit(doc, 'setAxisymmetric', { axisymmetric: ROUND, variant: 'no such variant' })).toThrow(EditError);
  });

  it('takes the valve\'s axis when none is given, and refuses that without a valve in a whole sentence', () => {
    const after = applyEdit(withValve(), 'setAxisymmetric', { axisymmetric: { keep: 'left' } });
    expect(after.variants[0].axisymmetric).toStrictEqual({ keep: 'left' });
    expect(() => applyEdit(boxDocument(), 'setAxisymmetric', { axisymmetric: { keep: 'left' } })).toThrow(
      /has no valve whose axis it could turn about\. Give the round model an axis, or add a valve\.$/,
    );
  });

  it('refuses a variant with a width profile, and a side that is neither left nor right', () => {
    const widths = applyEdit(boxDocument(), 'setWidthProfile', { width: { stations: [{ along: 0, width: 30 }, { along: 40, width: 34 }] } });
    expect(() => applyEdit(widths, 'setAxisymmetric', { axisymmetric: ROUND })).toThrow(/has a width profile.*Remove the width profile first\.$/);
    expect(() => applyEdit(boxDocument(), 'setAxisymmetric', { axisymmetric: { keep: 'up' } } as never)).toThrow(EditError);
  });

  it('is copied with its variant, and setUnits converts the axis point but not its angle', () => {
    const round = applyEdit(boxDocument(), 'setAxisymmetric', { axisymmetric: ROUND });
    const copied = applyEdit(round, 'addVariant', {});
    expect(copied.variants.at(-1)!.axisymmetric).toBe(round.variants[0].axisymmetric);
    const inches = applyEdit(round, 'setUnits', { units: round.units === 'mm' ? 'inch' : 'mm' });
    const factor = round.units === 'mm' ? 1 / 25.4 : 25.4;
    expect(inches.variants[0].axisymmetric).toStrictEqual({ axis: { x: 0, y: 10 * factor, inclinationDeg: 90 }, keep: 'right' });
  });
});

describe('the round model beside other edits', () => {
  it('setWidthProfile refuses a round variant in a whole sentence', () => {
    const round = applyEdit(boxDocument(), 'setAxisymmetric', { axisymmetric: ROUND });
    expect(() => applyEdit(round, 'setWidthProfile', { width: { stations: [{ along: 0, width: 30 }, { along: 40, width: 34 }] } })).toThrow(
      /is solved as round, which takes its depth from the axis\. Set it back to a plane section before giving it a width profile\.$/,
    );
  });

  it('removeParts keeps a round model about the valve\'s axis round about that same axis', () => {
    const round = applyEdit(withValve(), 'setAxisymmetric', { axisymmetric: { keep: 'left' } });
    const after = applyEdit(round, 'removeParts', {});
    expect(after.variants[0].axisymmetric).toStrictEqual({ axis: { x: 20, y: 10, inclinationDeg: 0 }, keep: 'left' });
    expect(loadDocument(saveDocument(after))).toStrictEqual(after);
  });
});

/** Edits of the parametric parts, and applyEdit keeping generated geometry on its numbers after other edits. */

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { PortDocument } from '../../src/document/types.ts';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import { applyEdit } from '../../src/editor/edits.ts';
import { EditError } from '../../src/editor/errors.ts';
import { applyParts } from '../../src/parts/apply.ts';
import { active, deepFreeze } from './fixtures.ts';

/** The tight-short-side street sample (parts: 46 mm valve at 10 mm lift, 91 % throat, 88 x 60 bore). */
const sample = (): PortDocument =>
  deepFreeze(loadDocument(readFileSync(new URL('../../samples/short-side-compare.json', import.meta.url), 'utf8')));
const valveFaceY = (doc: PortDocument): number => active(doc).islands[0].outline.vertices[0].at[1];
const anchorIndex = (doc: PortDocument): number => active(doc).outline.vertices.findIndex((v) => v.anchor);

describe('setLift and setPart', () => {
  it('lift the valve: the island moves down the axis by the change, the outline stays', () => {
    const doc = sample();
    const next = applyEdit(doc, 'setLift', { lift: 12.5 });
    expect(next.variants[0].parts?.valve?.lift).toBe(12.5);
    expect(valveFaceY(next) - valveFaceY(doc)).toBeCloseTo(-2.5, 12);
    expect(active(next).outline).toEqual(active(doc).outline);
    expect(next.variants[1]).toBe(doc.variants[1]);
    expect(applyEdit(doc, 'setLift', { lift: 10 })).toBe(doc);
    expect(loadDocument(saveDocument(next))).toEqual(next);
  });

  it('lift another variant by name', () => {
    const doc = sample();
    const next = applyEdit(doc, 'setLift', { variant: 'generous short side', lift: 6 });
    expect(next.variants[1].parts?.valve?.lift).toBe(6);
    expect(next.variants[0]).toBe(doc.variants[0]);
    expect(() => applyEdit(doc, 'setLift', { variant: 'no such', lift: 6 })).toThrow(/no variant called "no such"/);
  });

  it('change a few numbers of a part, the rest kept, and the geometry follows', () => {
    const doc = sample();
    const next = applyEdit(doc, 'setPart', { part: 'seat', values: { throatPct: 89 } });
    expect(next.variants[0].parts?.seat).toEqual({ ...doc.variants[0].parts?.seat, throatPct: 89 });
    const throatX = (d: PortDocument) => active(d).outline.vertices[anchorIndex(d) + 1].at[0];
    expect(throatX(next) - 95).toBeCloseTo(-0.89 * 23, 9);
    const moved = applyEdit(doc, 'setPart', { part: 'valve', values: { axis: { x: 96 } } });
    expect(moved.variants[0].parts?.valve?.axis).toEqual({ x: 96, y: 2.3, inclinationDeg: 0 });
    // The parts edits regenerate their variant once, themselves: what they leave is what the numbers build.
    for (const d of [next, moved, applyEdit(doc, 'setLift', { lift: 7 })]) {
      expect(applyParts(active(d), d.variants[0].parts)).toEqual(active(d));
      expect(active(d)).not.toEqual(active(doc));
    }
  });

  it('refuse bad numbers with the part, field and rule, and shapes that cannot be built', () => {
    const doc = sample();
    expect(() => applyEdit(doc, 'setPart', { part: 'valve', values: { diameter: -46 } })).toThrow(EditError);
    expect(() => applyEdit(doc, 'setPart', { part: 'valve', values: { diameter: -46 } })).toThrow(/valve\.diameter: must be a number above 0/);
    expect(() => applyEdit(doc, 'setPart', { part: 'seat', values: { throatOffsetPct: 20 } })).toThrow(/throat reaches past the seat/);
    expect(() => applyEdit(doc, 'setPart', { part: 'port', values: {} })).toThrow(/port\.tightestArea: .*must be a number above 0/);
    expect(() => applyEdit(doc, 'setPart', { part: 'wheel', values: {} })).toThrow(EditError);
    const bare = applyEdit(doc, 'removeParts', {});
    expect(() => applyEdit(bare, 'setLift', { lift: 3 })).toThrow(/has no valve part to lift/);
  });
});

describe('setParts and removeParts', () => {
  it('remove the parts and keep their last geometry as drawn', () => {
    const doc = sample();
    const bare = applyEdit(doc, 'removeParts', {});
    expect(bare.variants[0].parts).toBeUndefined();
    expect(active(bare)).toBe(active(doc));
    expect(applyEdit(bare, 'removeParts', {})).toBe(bare);
  });

  it('add valve, seat and bore at once; a seat without its bore is refused', () => {
    const doc = sample();
    const parts = doc.variants[0].parts!;
    const bare = applyEdit(doc, 'removeParts', {});
    const back = applyEdit(bare, 'setParts', { parts: { ...parts, valve: { ...parts.valve!, lift: 4 } } });
    expect(back.variants[0].parts?.valve?.lift).toBe(4);
    expect(active(back)).toEqual(applyParts(active(doc), back.variants[0].parts));
    expect(() => applyEdit(bare, 'setParts', { parts: { valve: parts.valve, seat: parts.seat } })).toThrow(/generated together/);
    expect(() => applyEdit(bare, 'setParts', { parts: { valve: { ...parts.valve!, margin: -1 } } })).toThrow(/parts\.valve\.margin: must be a number from 0/);
  });
});

describe('other edits on a variant with parts', () => {
  it('moving an anchor moves the generated throat with it', () => {
    const doc = sample();
    const i = anchorIndex(doc);
    const [x, y] = active(doc).outline.vertices[i].at;
    const next = applyEdit(doc, 'movePoint', { point: { kind: 'vertex', vertex: i }, to: [x, y + 2] });
    const outline = active(next).outline;
    expect(outline.vertices[i].at).toEqual([x, y + 2]);
    expect(outline.vertices[i].anchor).toBe(true);
    // the throat wall still runs from the anchor down to the bottom cut, now 2 longer
    const throatLength = (d: PortDocument) => active(d).outline.vertices[i].at[1] - active(d).outline.vertices[i + 1].at[1];
    expect(throatLength(next) - throatLength(doc)).toBeCloseTo(2, 12);
  });

  it('a hand move of a generated corner is undone by its numbers', () => {
    const doc = sample();
    const seatCorner = anchorIndex(doc) + 2;
    const next = applyEdit(doc, 'movePoint', { point: { kind: 'vertex', vertex: seatCorner }, to: [70, 5] });
    expect(active(next)).toEqual(active(doc));
  });

  it('deleting an anchor is refused, saying why', () => {
    expect(() => applyEdit(sample(), 'deleteVertex', { vertex: anchorIndex(sample()) })).toThrow(/This corner is an anchor, where the seat and test bore join the port; it cannot be deleted/);
  });

  it('edits that leave sections alone do not regenerate them', () => {
    const doc = sample();
    const renamed = applyEdit(doc, 'renameVariant', { from: 'tight short side', to: 'tight' });
    expect(renamed.variants[0].section).toBe(doc.variants[0].section);
    const copied = applyEdit(doc, 'addVariant', {});
    expect(copied.variants[2].section).toBe(doc.variants[0].section);
  });
});

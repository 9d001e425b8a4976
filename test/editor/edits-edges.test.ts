import { describe, expect, it } from 'vitest';
import type { ArcEdge } from '../../src/document/types.ts';
import { NEW_ARC_BULGE } from '../../src/editor/edits-edges.ts';
import { applyEdit } from '../../src/editor/edits.ts';
import { active, boxDocument } from './fixtures.ts';

describe('setEdgeRole and setWallName', () => {
  it('marks an edge and drops the wall name when it stops being a wall', () => {
    const doc = boxDocument();
    const next = applyEdit(doc, 'setEdgeRole', { edge: 0, role: 'inlet' });
    expect(active(next).outline.edges[0]).toEqual({ kind: 'line', role: 'inlet' });
    expect(active(next).outline.edges[1]).toBe(active(doc).outline.edges[1]);
    expect(applyEdit(doc, 'setEdgeRole', { edge: 1, role: 'outlet' })).toBe(doc);
  });

  it('keeps island edges walls', () => {
    expect(() => applyEdit(boxDocument(), 'setEdgeRole', { edge: 0, island: 0, role: 'outlet' }))
      .toThrow(/Islands are walls .* edge 1 of island "valve head" cannot be an outlet/);
  });

  it('names, renames and unnames a wall; only walls carry names', () => {
    const doc = boxDocument();
    const named = applyEdit(doc, 'setWallName', { edge: 0, name: '  short side ' });
    expect(active(named).outline.edges[0]).toEqual({ kind: 'line', role: 'wall', wallName: 'short side' });
    const unnamed = applyEdit(doc, 'setWallName', { edge: 2, name: '' });
    expect(active(unnamed).outline.edges[2]).toEqual({ kind: 'arc', role: 'wall', through: [20, 40] });
    expect(applyEdit(doc, 'setWallName', { edge: 0, name: 'floor' })).toBe(doc);
    expect(() => applyEdit(doc, 'setWallName', { edge: 3, name: 'bowl' })).toThrow(/is an inlet; only walls carry a name/);
    expect(() => applyEdit(doc, 'setWallName', { edge: 0, name: 'x'.repeat(61) })).toThrow(/at most 60 characters/);
    // A name with a line break was taken before, and the document could then not be saved.
    expect(() => applyEdit(doc, 'setWallName', { edge: 0, name: 'short\nside' })).toThrow(/must fit on one line/);
  });
});

describe('makeArc, makeCurve, makeLine', () => {
  it('bows a line out of the outline by a tenth of its length, or through a given point', () => {
    const doc = boxDocument();
    // Floor (0,0)-(40,0) of a counter-clockwise outline: outside is below, so the middle goes to (20, -4).
    const bowed = applyEdit(doc, 'makeArc', { edge: 0 });
    expect(active(bowed).outline.edges[0]).toEqual({ kind: 'arc', role: 'wall', wallName: 'floor', through: [20, -40 * NEW_ARC_BULGE] });
    const given = applyEdit(doc, 'makeArc', { edge: 1, through: [38, 15] });
    expect((active(given).outline.edges[1] as ArcEdge).through).toEqual([38, 15]);
    expect(applyEdit(doc, 'makeArc', { edge: 2 })).toBe(doc);
  });

  it('turns a curve into an arc through its via nearest the middle', () => {
    // Island edge 1 runs (25,10) -> (20,18); of its vias (23,15) lies nearer the chord's bisector.
    const next = applyEdit(boxDocument(), 'makeArc', { edge: 1, island: 0 });
    expect(active(next).islands[0].outline.edges[1]).toEqual({ kind: 'arc', role: 'wall', through: [23, 15] });
  });

  it('refuses an arc whose through point is in line with its ends but outside them', () => {
    expect(() => applyEdit(boxDocument(), 'makeArc', { edge: 0, through: [50, 0] })).toThrow(/in line with its ends but outside/);
  });

  it('makes a line a curve through its middle and an arc a curve through its through point', () => {
    const doc = boxDocument();
    const fromLine = applyEdit(doc, 'makeCurve', { edge: 1 });
    expect(active(fromLine).outline.edges[1]).toEqual({ kind: 'curve', role: 'outlet', via: [[40, 15]] });
    const fromArc = applyEdit(doc, 'makeCurve', { edge: 2 });
    expect(active(fromArc).outline.edges[2]).toEqual({ kind: 'curve', role: 'wall', wallName: 'roof', via: [[20, 40]] });
    expect(() => applyEdit(doc, 'makeCurve', { edge: 1, via: [] })).toThrow(/at least one via point/);
  });

  it('straightens an arc or a curve, keeping role and name', () => {
    const doc = boxDocument();
    expect(active(applyEdit(doc, 'makeLine', { edge: 2 })).outline.edges[2]).toEqual({ kind: 'line', role: 'wall', wallName: 'roof' });
    expect(active(applyEdit(doc, 'makeLine', { edge: 1, island: 0 })).islands[0].outline.edges[1]).toEqual({ kind: 'line', role: 'wall' });
    expect(applyEdit(doc, 'makeLine', { edge: 0 })).toBe(doc);
  });
});

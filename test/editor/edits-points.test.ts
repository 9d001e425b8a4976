import { describe, expect, it } from 'vitest';
import type { ArcEdge } from '../../src/document/types.ts';
import { applyEdit } from '../../src/editor/edits.ts';
import { EditError } from '../../src/editor/errors.ts';
import { active, boxDocument, expectPointNear } from './fixtures.ts';

describe('movePoint', () => {
  it('moves a corner and shares every untouched part', () => {
    const doc = boxDocument();
    const before = JSON.stringify(doc);
    const next = applyEdit(doc, 'movePoint', { point: { kind: 'vertex', vertex: 2 }, to: [42, 31] });
    expect(JSON.stringify(doc)).toBe(before);
    expect(active(next).outline.vertices[2].at).toEqual([42, 31]);
    expect(active(next).outline.vertices[1]).toBe(active(doc).outline.vertices[1]);
    expect(active(next).outline.edges).toBe(active(doc).outline.edges);
    expect(active(next).islands).toBe(active(doc).islands);
    expect(next.variants[1]).toBe(doc.variants[1]);
  });

  it('moves an arc through point, a curve via point and an island corner', () => {
    const doc = boxDocument();
    const roof = applyEdit(doc, 'movePoint', { point: { kind: 'through', edge: 2 }, to: [20, 45] });
    expect((active(roof).outline.edges[2] as ArcEdge).through).toEqual([20, 45]);
    const via = applyEdit(doc, 'movePoint', { point: { kind: 'via', edge: 1, via: 1, island: 0 }, to: [23, 17] });
    const curve = active(via).islands[0].outline.edges[1];
    expect(curve.kind === 'curve' && curve.via).toEqual([[23, 15], [23, 17]]);
    const corner = applyEdit(doc, 'movePoint', { point: { kind: 'vertex', vertex: 2, island: 0 }, to: [20, 19] });
    expect(active(corner).islands[0].outline.vertices[2].at).toEqual([20, 19]);
    expect(active(corner).outline).toBe(active(doc).outline);
  });

  it('returns the same document when the point does not move', () => {
    const doc = boxDocument();
    expect(applyEdit(doc, 'movePoint', { point: { kind: 'vertex', vertex: 0 }, to: [0, 0] })).toBe(doc);
  });

  it('refuses points that do not exist or would collapse an edge', () => {
    const doc = boxDocument();
    const move = (point: unknown, to: unknown) => () => applyEdit(doc, 'movePoint', { point, to });
    expect(move({ kind: 'vertex', vertex: 9 }, [1, 1])).toThrow(/no corner 10: the section outline has 4/);
    expect(move({ kind: 'through', edge: 0 }, [1, 1])).toThrow(/edge 1 of the section outline is a line/);
    expect(move({ kind: 'via', edge: 1, via: 2, island: 0 }, [1, 1])).toThrow(/has 2 via points, not 3/);
    expect(move({ kind: 'vertex', vertex: 0, island: 3 }, [1, 1])).toThrow(/no island 4/);
    expect(move({ kind: 'vertex', vertex: 1 }, [0, 0])).toThrow(/both ends of edge 1 .* same place/);
    expect(move({ kind: 'through', edge: 2 }, [50, 30])).toThrow(/in line with its ends but outside/);
    expect(move({ kind: 'through', edge: 2 }, [40, 30])).toThrow(EditError);
  });
});

describe('insertVertex and deleteVertex', () => {
  it('refuses to delete an anchor corner (an outline has none or two), with or without parts', () => {
    const doc = boxDocument();
    const section = active(doc);
    const anchored = { ...doc, variants: doc.variants.map((v) => (v.name === doc.activeVariant ? {
      ...v, section: { ...section, outline: { ...section.outline, vertices: section.outline.vertices.map((c, i) => (i === 0 || i === 2 ? { ...c, anchor: true as const } : c)) } },
    } : v)) };
    expect(() => applyEdit(anchored, 'deleteVertex', { vertex: 2 })).toThrow(/This corner is an anchor, where the seat and test bore join the port; it cannot be deleted\. Move it instead\./);
    expect(active(applyEdit(anchored, 'deleteVertex', { vertex: 1 })).outline.vertices.filter((c) => c.anchor)).toHaveLength(2);
  });

  it('splits a line at the nearest point of the edge, both halves keeping role and name', () => {
    const doc = boxDocument();
    const next = applyEdit(doc, 'insertVertex', { edge: 0, at: [10, 0.4] });
    const outline = active(next).outline;
    expect(outline.vertices.map((v) => v.at)).toEqual([[0, 0], [10, 0], [40, 0], [40, 30], [0, 30]]);
    expect(outline.edges.slice(0, 2)).toEqual([
      { kind: 'line', role: 'wall', wallName: 'floor' }, { kind: 'line', role: 'wall', wallName: 'floor' },
    ]);
    expect(outline.vertices[2]).toBe(active(doc).outline.vertices[1]);
  });

  it('splits an arc into two arcs on the same circle, each through its own middle', () => {
    // Roof circle: centre (20, 15), radius 25 (see fixtures). Split at the top, angle 90 degrees.
    const next = applyEdit(boxDocument(), 'insertVertex', { edge: 2, at: [20, 41] });
    const outline = active(next).outline;
    expectPointNear(outline.vertices[3].at, [20, 40]);
    const a = outline.edges[2] as ArcEdge, b = outline.edges[3] as ArcEdge;
    // The first half runs from angle atan2(15, 20) to 90 deg; its middle is at the mean angle.
    const mid1 = (Math.atan2(15, 20) + Math.PI / 2) / 2, mid2 = Math.PI - mid1;
    expectPointNear(a.through, [20 + 25 * Math.cos(mid1), 15 + 25 * Math.sin(mid1)]);
    expectPointNear(b.through, [20 + 25 * Math.cos(mid2), 15 + 25 * Math.sin(mid2)]);
    expect([a.wallName, b.wallName]).toEqual(['roof', 'roof']);
  });

  it('splits a curve at its via point nearest the click; an empty piece becomes a line', () => {
    const next = applyEdit(boxDocument(), 'insertVertex', { island: 0, edge: 1, at: [22.5, 15.5] });
    const outline = active(next).islands[0].outline;
    expect(outline.vertices[2].at).toEqual([23, 15]);
    expect(outline.edges[1]).toEqual({ kind: 'line', role: 'wall' });
    expect(outline.edges[2]).toEqual({ kind: 'curve', role: 'wall', via: [[22, 17]] });
  });

  it('insert then delete gives back the original, for a line, an arc and a curve', () => {
    const doc = boxDocument();
    const cases = [
      { edge: 0, at: [13, -1] as const },
      { edge: 2, at: [5, 35] as const },
      { edge: 1, island: 0, at: [22, 17.2] as const },
    ];
    for (const { edge, island, at } of cases) {
      const inserted = applyEdit(doc, 'insertVertex', { edge, island, at });
      const back = applyEdit(inserted, 'deleteVertex', { vertex: edge + 1, island });
      const [want, got] = island === undefined ? [active(doc).outline, active(back).outline] : [active(doc).islands[0].outline, active(back).islands[0].outline];
      expect(got.vertices).toEqual(want.vertices);
      expect(got.edges.map((e) => e.kind)).toEqual(want.edges.map((e) => e.kind));
      got.edges.forEach((e, k) => {
        const w = want.edges[k];
        expect({ ...e, through: undefined }).toEqual({ ...w, through: undefined });
        if (e.kind === 'arc' && w.kind === 'arc') expectPointNear(e.through, w.through, 1e-9);
      });
    }
  });

  it('deleting a corner between a line and an arc leaves a curve through their points', () => {
    const next = applyEdit(boxDocument(), 'deleteVertex', { vertex: 2 });
    const outline = active(next).outline;
    expect(outline.vertices.map((v) => v.at)).toEqual([[0, 0], [40, 0], [0, 30]]);
    // The first edge (outlet) keeps its role; the curve passes the old corner and the roof's middle.
    expect(outline.edges[1]).toEqual({ kind: 'curve', role: 'outlet', via: [[40, 30], [20, 40]] });
  });

  it('deleting corner 0 joins the last and the first edge', () => {
    const next = applyEdit(boxDocument(), 'deleteVertex', { vertex: 0 });
    const outline = active(next).outline;
    expect(outline.vertices.map((v) => v.at)).toEqual([[40, 0], [40, 30], [0, 30]]);
    expect(outline.edges[2]).toEqual({ kind: 'line', role: 'inlet' });
    expect(outline.edges[0]).toEqual({ kind: 'line', role: 'outlet' });
  });

  it('keeps at least 3 corners and refuses a split on a corner', () => {
    const doc = boxDocument();
    expect(() => applyEdit(doc, 'deleteVertex', { vertex: 0, island: 0 })).toThrow(/at least 3 corners; island "valve head" has 3/);
    expect(() => applyEdit(doc, 'insertVertex', { edge: 0, at: [-5, 0] })).toThrow(/further from the ends of edge 1/);
  });
});

describe('setFilletRadius', () => {
  it('sets, changes and clears a radius', () => {
    const doc = boxDocument();
    const set = applyEdit(doc, 'setFilletRadius', { vertex: 2, radius: 4.5 });
    expect(active(set).outline.vertices[2]).toEqual({ at: [40, 30], filletRadius: 4.5 });
    const cleared = applyEdit(doc, 'setFilletRadius', { vertex: 1, radius: 0 });
    expect(active(cleared).outline.vertices[1]).toEqual({ at: [40, 0] });
    expect(applyEdit(doc, 'setFilletRadius', { vertex: 1, radius: 3 })).toBe(doc);
  });

  it('refuses a negative or missing radius with a plain message', () => {
    const doc = boxDocument();
    expect(() => applyEdit(doc, 'setFilletRadius', { vertex: 1, radius: -1 })).toThrow(/fillet radius cannot be negative/);
    expect(() => applyEdit(doc, 'setFilletRadius', { vertex: 1, radius: Number.NaN })).toThrow(EditError);
    expect(() => applyEdit(doc, 'setFilletRadius', { vertex: 1 })).toThrow(/radius/);
  });
});

/** Generated geometry gets no handles and cannot be hit; the valve's lift and axis handles are listed and hit instead. */

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { PortDocument, Section } from '../../src/document/types.ts';
import { loadDocument } from '../../src/document/load.ts';
import { generatedGeometry } from '../../src/editor/generated.ts';
import { handlePosition, listHandles } from '../../src/editor/handles.ts';
import { hitTest } from '../../src/editor/hit-test.ts';
import { pocketAnchors } from '../../src/parts/anchors.ts';
import { applyParts } from '../../src/parts/apply.ts';
import { handDrawnPort, PARTS_40, VALVE_40 } from '../parts/helpers.ts';
import { active, boxSection } from './fixtures.ts';

/** The tight-short-side street sample: 46 mm valve on the axis (95, 2.3) at 10 mm lift with a 1.2 margin. */
const doc: PortDocument = loadDocument(readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8'));
const section = active(doc);
const parts = doc.variants[0].parts!;
const { from, to } = pocketAnchors(section.outline);
const n = section.outline.vertices.length;
/** Outline corners strictly between the anchors: what the seat, deck and bore generate. */
const pocketCorners = Array.from({ length: n }, (_, k) => k).filter((k) => (k - from + n) % n > 0 && (k - from + n) % n < (to - from + n) % n);
const valveIsland = section.islands.findIndex((i) => i.name === 'valve head');

describe('generated geometry', () => {
  it('is the pocket between the anchors and the valve head island, for a sample with valve, seat and bore', () => {
    const g = generatedGeometry(section, parts);
    expect([...g.outlineVertices].sort((a, b) => a - b)).toEqual(pocketCorners);
    // one edge more than corners: the edge leaving the first anchor
    expect(g.outlineEdges.size).toBe(pocketCorners.length + 1);
    expect(g.outlineEdges.has(from)).toBe(true);
    expect(g.outlineEdges.has(to)).toBe(false);
    expect([...g.islands]).toEqual([valveIsland]);
  });

  it('is only the valve island with a valve alone, nothing without parts or when the anchors split off no pocket', () => {
    const valveOnly = applyParts(handDrawnPort(), { valve: VALVE_40 });
    expect(generatedGeometry(valveOnly, { valve: VALVE_40 })).toEqual({ outlineVertices: new Set(), outlineEdges: new Set(), islands: new Set([0]) });
    expect(generatedGeometry(section, undefined).islands.size).toBe(0);
    // the box has no anchor corners: nothing of its outline counts as generated
    expect(generatedGeometry(boxSection(), PARTS_40).outlineEdges.size).toBe(0);
  });
});

describe('listHandles with parts', () => {
  const handles = listHandles(section, parts);
  const outlineVertices = handles.flatMap((h) => (h.ref.kind === 'vertex' && h.ref.island === undefined ? [h.ref.vertex] : []));

  it('lists the hand-drawn corners and the two anchors, none of the seat, deck or bore corners', () => {
    expect(outlineVertices).toHaveLength(n - pocketCorners.length);
    expect(outlineVertices).toContain(from);
    expect(outlineVertices).toContain(to);
    for (const k of pocketCorners) expect(outlineVertices).not.toContain(k);
    const fillets = handles.flatMap((h) => (h.ref.kind === 'fillet' && h.ref.island === undefined ? [h.ref.vertex] : []));
    for (const k of pocketCorners) expect(fillets).not.toContain(k);
  });

  it('lists nothing on the valve head island', () => {
    expect(handles.filter((h) => 'island' in h.ref && h.ref.island === valveIsland)).toEqual([]);
  });

  it('adds the lift handle at the centre of the valve face and the axis handle at the gauge line, last', () => {
    // face: margin 1.2 + lift 10 below the gauge-line centre (95, 2.3)
    expect(handles.slice(-2)).toEqual([
      { ref: { kind: 'lift' }, at: [95, 2.3 - 11.2] },
      { ref: { kind: 'valve-axis' }, at: [95, 2.3] },
    ]);
    expect(handlePosition(section, { kind: 'lift' }, parts)).toEqual([95, 2.3 - 11.2]);
    expect(handlePosition(section, { kind: 'valve-axis' }, parts)).toEqual([95, 2.3]);
    expect(handlePosition(section, { kind: 'lift' })).toBeNull();
  });

  it('lists every corner and no part handle when no parts are given, as before', () => {
    const all = listHandles(section);
    expect(all.filter((h) => h.ref.kind === 'vertex' && h.ref.island === undefined)).toHaveLength(n);
    expect(all.some((h) => h.ref.kind === 'vertex' && h.ref.island === valveIsland)).toBe(true);
    expect(all.some((h) => h.ref.kind === 'lift' || h.ref.kind === 'valve-axis')).toBe(false);
  });
});

describe('hitTest with parts', () => {
  const seatCorner = section.outline.vertices[pocketCorners[2]].at;
  const islandCorner = section.islands[valveIsland].outline.vertices[0].at;
  const mid = (s: Section, edge: number) => {
    const a = s.outline.vertices[edge].at, b = s.outline.vertices[(edge + 1) % n].at;
    return [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2] as const;
  };
  const deckEdge = section.outline.edges.findIndex((e) => e.wallName?.startsWith('deck'));

  it('misses generated corners and edges, and the valve island, which are hit without parts', () => {
    expect(hitTest(section, seatCorner, 0.2, { parts })).toBeNull();
    expect(hitTest(section, seatCorner, 0.2)?.ref).toEqual({ kind: 'vertex', vertex: pocketCorners[2] });
    expect(hitTest(section, mid(section, deckEdge), 0.2, { parts })).toBeNull();
    expect(hitTest(section, mid(section, deckEdge), 0.2)?.ref).toEqual({ kind: 'edge', edge: deckEdge });
    expect(hitTest(section, islandCorner, 0.2, { parts })).toBeNull();
    expect(hitTest(section, islandCorner, 0.2)?.ref).toMatchObject({ island: valveIsland });
  });

  it('still hits the anchors and the hand-drawn edges', () => {
    expect(hitTest(section, section.outline.vertices[from].at, 0.2, { parts })?.ref).toEqual({ kind: 'vertex', vertex: from });
    const floor = section.outline.edges.findIndex((e) => e.wallName === 'floor');
    expect(hitTest(section, mid(section, floor), 0.2, { parts })?.ref).toEqual({ kind: 'edge', edge: floor });
  });

  it('hits the lift and axis handles, the nearer of the two when the valve is shut', () => {
    expect(hitTest(section, [95.3, -8.7], 1, { parts })?.ref).toEqual({ kind: 'lift' });
    expect(hitTest(section, [94.8, 2.2], 1, { parts })?.ref).toEqual({ kind: 'valve-axis' });
    expect(hitTest(section, [95.3, -8.7], 1, { parts, kinds: ['vertex'] })).toBeNull();
    // shut, the face centre is the margin (1.2) below the gauge line: a pointer 0.5 below the gauge line picks the axis
    const shut = { ...parts, valve: { ...parts.valve!, lift: 0 } };
    expect(hitTest(section, [95, 1.8], 1, { parts: shut })?.ref).toEqual({ kind: 'valve-axis' });
    expect(hitTest(section, [95, 1.0], 1, { parts: shut })?.ref).toEqual({ kind: 'lift' });
  });
});

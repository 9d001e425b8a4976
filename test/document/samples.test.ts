import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import type { PortDocument, Section } from '../../src/document/types.ts';
import { defaultTolerance, regionArea, sectionToDomain } from '../../src/geometry/index.ts';
import type { Ring } from '../../src/solver/types.ts';
import { buildSamples } from '../../samples/make-samples.ts';
import { applyParts } from '../../src/parts/apply.ts';

const read = (name: string): PortDocument => loadDocument(readFileSync(new URL(`../../samples/${name}`, import.meta.url), 'utf8'));
const TIGHT = 'street-tight-short-side.json';
const GENEROUS = 'street-generous-short-side.json';
const section = (name: string): Section => read(name).variants[0].section;
const vertexAt = (s: Section, i: number) => s.outline.vertices[i].at;
/** Outline vertex 3 is the short-side corner (see samples/make-samples.ts). */
const SHORT_SIDE_VERTEX = 3;

describe('sample files', () => {
  it.each(Object.entries(buildSamples()))('%s is exactly what samples/make-samples.ts writes', (name, doc) => {
    expect(readFileSync(new URL(`../../samples/${name}`, import.meta.url), 'utf8')).toBe(saveDocument(doc));
  });

  it.each(Object.keys(buildSamples()))('%s is valid geometry for the solver', (name) => {
    for (const variant of read(name).variants) {
      expect(() => sectionToDomain(variant.section, defaultTolerance(variant.section), 'mm')).not.toThrow();
    }
  });

  it('holds one variant each, two in the comparison file', () => {
    expect(read(TIGHT).variants.map((v) => v.name)).toEqual(['tight short side']);
    expect(read(GENEROUS).variants.map((v) => v.name)).toEqual(['generous short side']);
    expect(read('short-side-compare.json').variants.map((v) => v.name)).toEqual(['tight short side', 'generous short side']);
    expect(read('street-port-widths.json').variants.map((v) => v.name)).toEqual(['tight short side, widths']);
    expect(read('street-valve-round.json').variants.map((v) => v.name)).toEqual(['tight short side, round']);
  });

  it('carry their valve, seat and test bore as parts, and the section is what the parts generate', () => {
    for (const name of Object.keys(buildSamples())) {
      for (const variant of read(name).variants) {
        expect(variant.parts?.valve?.diameter).toBe(46);
        expect(variant.parts?.seat?.throatPct).toBe(91);
        expect(variant.parts?.bore).toEqual({ diameter: 88, depth: 60, valveEdgeToWall: 8 });
        expect(applyParts(variant.section, variant.parts)).toEqual(variant.section);
      }
    }
  });

  it('differ only in the short-side fillet radius, 4 mm against 14 mm', () => {
    const tight = section(TIGHT), generous = section(GENEROUS);
    expect(tight.outline.vertices[SHORT_SIDE_VERTEX].filletRadius).toBe(4);
    expect(generous.outline.vertices[SHORT_SIDE_VERTEX].filletRadius).toBe(14);
    expect(tight.outline.edges[SHORT_SIDE_VERTEX]).toMatchObject({ wallName: 'short side' });
    expect(tight.outline.edges[SHORT_SIDE_VERTEX - 1]).toMatchObject({ wallName: 'short side' });
    const sameRadius = structuredClone(generous) as unknown as { outline: { vertices: { filletRadius?: number }[] } };
    sameRadius.outline.vertices[SHORT_SIDE_VERTEX].filletRadius = 4;
    expect(sameRadius).toEqual(tight);
  });
});

describe('sample proportions (46 mm valve)', () => {
  const s = section(TIGHT);
  const valve = s.islands[0].outline.vertices.map((v) => v.at);

  it('has a 46 mm valve head and a throat of 91% of it', () => {
    expect(s.islands[0].name).toBe('valve head');
    // island vertex 0 is the right end of the valve face, the last one the left end
    expect(valve[0][0] - valve[valve.length - 1][0]).toBeCloseTo(46, 6);
    // Seat throat 88-93% of the valve, 90-91% the usual choice [practice, REFERENCES.md 3a].
    const throat = vertexAt(s, 18)[0] - vertexAt(s, 5)[0];
    expect(throat).toBeCloseTo(0.91 * 46, 1);
  });

  it('shows the valve 10 mm off its seat (L/D 0.22)', () => {
    // Seat face (outline vertices 7-8) and the valve's seat face on the same side (island vertices 9-10) are
    // parallel 45 deg lines; at 45 deg the vertical offset between them is the lift.
    const seatLine = vertexAt(s, 7)[1] - vertexAt(s, 7)[0];
    expect(vertexAt(s, 8)[1] - vertexAt(s, 8)[0]).toBeCloseTo(seatLine, 6);
    const valveLine = valve[9][1] - valve[9][0];
    expect(valve[10][1] - valve[10][0]).toBeCloseTo(valveLine, 6);
    expect(seatLine - valveLine).toBeCloseTo(10, 6);
    expect(read(TIGHT).variants[0].note).toContain('10.0 mm lift (L/D 0.22)');
  });

  it('has a 42 mm manifold opening, a 65 deg turn and an 88 x 60 mm test bore', () => {
    expect(vertexAt(s, 0)[1] - vertexAt(s, 1)[1]).toBe(42);
    const [cx, cy] = vertexAt(s, SHORT_SIDE_VERTEX), [bx, by] = vertexAt(s, SHORT_SIDE_VERTEX + 1);
    expect((Math.atan2(cy - by, bx - cx) * 180) / Math.PI).toBeCloseTo(65, 0);
    expect(vertexAt(s, 12)[0] - vertexAt(s, 11)[0]).toBe(88);
    expect(vertexAt(s, 10)[1] - vertexAt(s, 11)[1]).toBe(60);
    expect(s.outline.edges[11].role).toBe('outlet');
  });

  it('gains the fillet area R^2 (tan(t/2) - t/2) when the short side opens from 4 to 14 mm', () => {
    // [derived] a fillet of radius R in a convex corner turning by t removes R^2 (tan(t/2) - t/2) of wall.
    const [ax, ay] = vertexAt(s, SHORT_SIDE_VERTEX - 1), [cx, cy] = vertexAt(s, SHORT_SIDE_VERTEX), [bx, by] = vertexAt(s, SHORT_SIDE_VERTEX + 1);
    const turn = Math.abs(Math.atan2(by - cy, bx - cx) - Math.atan2(cy - ay, cx - ax));
    const expected = (14 ** 2 - 4 ** 2) * (Math.tan(turn / 2) - turn / 2);
    const fineArea = (sec: Section): number => regionArea(sectionToDomain(sec, 1e-4));
    expect(fineArea(section(GENEROUS)) - fineArea(s)).toBeCloseTo(expected, 2);
  });

  it('leaves flow room on both sides of the valve, and the valve clear of the seat', () => {
    const domain = sectionToDomain(s, defaultTolerance(s));
    const island = domain.islands[0];
    const axisX = (valve[0][0] + valve[valve.length - 1][0]) / 2;
    expect(ringGap(island, domain.outer, (x) => x < axisX)).toBeGreaterThan(5);
    expect(ringGap(island, domain.outer, (x) => x > axisX)).toBeGreaterThan(5);
    // The valve moved straight down its axis, so its face is not opposite the seat face: the nearest seat point
    // is on the 30 deg top cut, 7.9 mm from the valve's seat face. Anything over 5 mm is clearly off the seat.
    for (const name of ['seat (short side)', 'seat (long side)']) {
      const seat = domain.wallNames.indexOf(name);
      expect(seat, name).toBeGreaterThanOrEqual(0);
      expect(ringGap(island, domain.outer, () => true, seat)).toBeGreaterThan(5);
    }
  });
});

/** Smallest distance between two closed polylines, from island points on the chosen side, to wall segments (optionally of one wall id). */
function ringGap(island: Ring, outer: Ring, side: (x: number) => boolean, wallId?: number): number {
  let best = Infinity;
  const n = outer.xy.length / 2, m = island.xy.length / 2;
  for (let k = 0; k < n; k++) {
    if (wallId !== undefined && outer.wallIds[k] !== wallId) continue;
    const j = (k + 1) % n;
    const ax = outer.xy[2 * k], ay = outer.xy[2 * k + 1], bx = outer.xy[2 * j], by = outer.xy[2 * j + 1];
    for (let i = 0; i < m; i++) {
      const px = island.xy[2 * i], py = island.xy[2 * i + 1];
      if (side(px)) best = Math.min(best, pointToSegment(px, py, ax, ay, bx, by));
    }
  }
  return best;
}

function pointToSegment(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax, dy = by - ay;
  const t = Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(px - ax - t * dx, py - ay - t * dy);
}

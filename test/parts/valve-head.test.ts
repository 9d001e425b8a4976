/** The generated valve head island: its measures read back from the island, and lift moving it along the axis. */

import { describe, expect, it } from 'vitest';
import type { Island, Point, Section, ValvePart } from '../../src/document/types.ts';
import { VALVE_ISLAND_NAME, valveIsland } from '../../src/parts/valve-head.ts';
import { applyParts } from '../../src/parts/apply.ts';
import { PartsError } from '../../src/parts/errors.ts';
import { defaultTolerance, sectionToDomain } from '../../src/geometry/index.ts';
import { PARTS_40, VALVE_40, angleTo, assertInDelta, distanceToLine, handDrawnPort, length, unit } from './helpers.ts';

const pts = (island: Island): Point[] => island.outline.vertices.map((v) => v.at);
const edge = (p: Point[], i: number) => ({ a: p[i], b: p[(i + 1) % p.length] });

/**
 * Island corners, as generated: 0 face right, 1 margin top, 2 seat face top, 3 back cut top, 4 neck, 5 stem top,
 * then the mirror 6..11 from the left stem top down to the face left (11). The face is edge 11 -> 0.
 */
function measure(island: Island) {
  const p = pts(island);
  const face = edge(p, 11);
  const faceDir = unit(face);
  return {
    diameter: length(face),
    margin: length(edge(p, 0)),
    marginSquare: angleTo(edge(p, 0), faceDir),
    seatAngle: angleTo(edge(p, 1), faceDir),
    seatFace: length(edge(p, 1)),
    backCut: angleTo(edge(p, 2), faceDir),
    thickness: distanceToLine(p[3], face),
    backFlat: angleTo(edge(p, 3), faceDir),
    stem: distanceToLine(p[4], edge(p, 6)),
    stemTop: distanceToLine(p[5], face),
    mirrorSeatAngle: angleTo(edge(p, 9), faceDir),
  };
}

describe('valve head island', () => {
  it('has the diameter, seat angle, margin, back cut, thickness and stem it was given', () => {
    const island = valveIsland(VALVE_40);
    expect(island.name).toBe(VALVE_ISLAND_NAME);
    expect(island.outline.edges.every((e) => e.role === 'wall')).toBe(true);
    const m = measure(island);
    assertInDelta(m.diameter, 40);
    assertInDelta(m.margin, 1);
    assertInDelta(m.marginSquare, 90);
    assertInDelta(m.seatAngle, 45);
    assertInDelta(m.mirrorSeatAngle, 45);
    assertInDelta(m.seatFace, 2.5);
    assertInDelta(m.backCut, 30);
    assertInDelta(m.thickness, 7);
    assertInDelta(m.backFlat, 0);
    assertInDelta(m.stem, 7);
    assertInDelta(m.stemTop, 18);
  });

  it('keeps those measures on a leaning axis with other angles', () => {
    const valve: ValvePart = { ...VALVE_40, seatAngleDeg: 30, backCutAngleDeg: 20, headThickness: 6, axis: { x: 3, y: -1, inclinationDeg: -17 } };
    const m = measure(valveIsland(valve));
    assertInDelta(m.diameter, 40);
    assertInDelta(m.seatAngle, 30);
    assertInDelta(m.backCut, 20);
    assertInDelta(m.thickness, 6);
    assertInDelta(m.stem, 7);
    // The stem runs along the opening direction: (sin i, -cos i) for i = -17 deg.
    const i = (-17 * Math.PI) / 180;
    const p = pts(valveIsland(valve));
    assertInDelta(angleTo({ a: p[4], b: p[5] }, [Math.sin(i), -Math.cos(i)]), 0, 1e-9);
  });

  it('sits with its seat face on the gauge line when shut: face a margin below the axis point', () => {
    const p = pts(valveIsland({ ...VALVE_40, lift: 0 }));
    // axis point (0, 2); margin 1; the outer edge of the seat face (corner 1) is at the gauge line's right end
    expect(p[1][0]).toBeCloseTo(20, 12);
    expect(p[1][1]).toBeCloseTo(2, 12);
    expect(p[0][1]).toBeCloseTo(1, 12);
  });

  it('moves along the opening direction by exactly the lift, every corner', () => {
    for (const inclinationDeg of [0, 11, -23]) {
      const axis = { x: 5, y: 2, inclinationDeg };
      const i = (inclinationDeg * Math.PI) / 180;
      const open: Point = [Math.sin(i), -Math.cos(i)];
      const low = pts(valveIsland({ ...VALVE_40, axis, lift: 0 }));
      for (const lift of [0.5, 4, 12.25]) {
        const high = pts(valveIsland({ ...VALVE_40, axis, lift }));
        high.forEach((q, k) => {
          assertInDelta(q[0] - low[k][0], lift * open[0], 1e-12);
          assertInDelta(q[1] - low[k][1], lift * open[1], 1e-12);
          assertInDelta(Math.hypot(q[0] - low[k][0], q[1] - low[k][1]), lift, 1e-12);
        });
      }
    }
  });

  it('is placed in the section by applyParts, replacing an island of its name and keeping the others', () => {
    const triangle = (name: string, points: Point[]): Island => ({
      name,
      outline: { vertices: points.map((at) => ({ at })), edges: points.map(() => ({ kind: 'line', role: 'wall' })) },
    });
    const drawn: Section = {
      ...handDrawnPort(),
      islands: [triangle('guide boss', [[-40, 45], [-35, 45], [-37, 50]]), triangle(VALVE_ISLAND_NAME, [[-5, -5], [5, -5], [0, 0]])],
    };
    const section = applyParts(drawn, PARTS_40);
    expect(section.islands.map((i) => i.name)).toEqual(['guide boss', VALVE_ISLAND_NAME]);
    expect(section.islands[1]).toEqual(valveIsland(VALVE_40));
    expect(() => sectionToDomain(section, defaultTolerance(section))).not.toThrow();
  });

  it('at lift 0 sits on its seat, which the geometry kernel refuses as touching (no passage)', () => {
    const shut = applyParts(handDrawnPort(), { ...PARTS_40, valve: { ...VALVE_40, lift: 0 } });
    expect(() => sectionToDomain(shut, defaultTolerance(shut))).toThrow(/cross or touch/);
  });

  it('refuses numbers that make no head, saying which', () => {
    const bad = (v: Partial<ValvePart>, message: RegExp) => {
      expect(() => valveIsland({ ...VALVE_40, ...v })).toThrow(PartsError);
      expect(() => valveIsland({ ...VALVE_40, ...v })).toThrow(message);
    };
    bad({ stemDiameter: 40 }, /stem \(40\) must be thinner than the valve head/);
    bad({ headThickness: 2 }, /must be thicker than its margin and seat face together/);
    bad({ backCutAngleDeg: 10, headThickness: 9 }, /back cut at 10 degrees reaches the stem/);
    bad({ stemLength: 7 }, /stem length \(7\) must be more than the head thickness/);
  });
});

import { describe, expect, it } from 'vitest';
import type { Section } from '../../src/document/types.ts';
import { signedArea } from '../../src/geometry/area.ts';
import { defaultTolerance, sectionBounds } from '../../src/geometry/bounds.ts';
import { GeometryError } from '../../src/geometry/errors.ts';
import { sectionToDomain } from '../../src/geometry/to-domain.ts';
import { wallRuns } from '../../src/geometry/wall-runs.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL, type Ring } from '../../src/solver/types.ts';
import { circleOutline, section } from './helpers.ts';

/**
 * A straight channel 100 long and 20 high, drawn clockwise on purpose: up the inlet at x = 0, along the roof,
 * down the outlet at x = 100, back along the floor. A round "valve" island sits in the middle, drawn counter-clockwise.
 */
const channel: Section = section(
  {
    vertices: [{ at: [0, 0] }, { at: [0, 20] }, { at: [100, 20] }, { at: [100, 0] }],
    edges: [
      { kind: 'line', role: 'inlet', wallName: 'ignored on an inlet' },
      { kind: 'line', role: 'wall', wallName: 'roof' },
      { kind: 'line', role: 'outlet' },
      { kind: 'line', role: 'wall', wallName: 'floor' },
    ],
  },
  [{ name: 'valve', outline: circleOutline(50, 10, 4) }],
);

/** Per segment of the ring: which side of the channel its midpoint is on. */
function sideOf(ring: Ring, k: number): 'inlet' | 'outlet' | 'roof' | 'floor' {
  const n = ring.marks.length, j = (k + 1) % n;
  const mx = (ring.xy[2 * k] + ring.xy[2 * j]) / 2, my = (ring.xy[2 * k + 1] + ring.xy[2 * j + 1]) / 2;
  if (mx === 0) return 'inlet';
  if (mx === 100) return 'outlet';
  return my === 20 ? 'roof' : 'floor';
}

describe('sectionToDomain on a small channel', () => {
  const domain = sectionToDomain(channel, 0.01);

  it('orients the outer ring counter-clockwise and the island clockwise', () => {
    expect(signedArea(domain.outer.xy)).toBe(2000);
    expect(signedArea(domain.islands[0].xy)).toBeLessThan(0);
  });

  it('names walls once each, outline walls in edge order then islands', () => {
    expect(domain.wallNames).toEqual(['roof', 'floor', 'valve']);
  });

  it('marks every segment by the side it lies on, after the ring was turned round', () => {
    const outer = domain.outer;
    expect(outer.marks.length).toBe(4);
    expect(Array.from(outer.xy.slice(0, 2))).toEqual([0, 0]); // still starts at vertex 0
    const expected = { inlet: [MARK_INLET, -1], outlet: [MARK_OUTLET, -1], roof: [MARK_WALL, 0], floor: [MARK_WALL, 1] };
    for (let k = 0; k < outer.marks.length; k++) {
      expect([outer.marks[k], outer.wallIds[k]]).toEqual(expected[sideOf(outer, k)]);
    }
  });

  it('island segments are walls carrying the island name', () => {
    const island = domain.islands[0];
    expect(island.marks.every((m) => m === MARK_WALL)).toBe(true);
    expect(island.wallIds.every((id) => id === 2)).toBe(true);
    expect(island.xy.length / 2).toBe(island.marks.length);
  });

  it('splits the outer ring into runs: floor, outlet, roof, inlet', () => {
    const runs = wallRuns(domain.outer);
    expect(runs.map((r) => [r.mark, r.wallId])).toEqual([[MARK_WALL, 1], [MARK_OUTLET, -1], [MARK_WALL, 0], [MARK_INLET, -1]]);
    expect(Array.from(runs[0].xy)).toEqual([0, 0, 100, 0]);
  });

  it('an unnamed wall gets id -1 and adds no name', () => {
    const plain = sectionToDomain(section({ ...channel.outline, edges: channel.outline.edges.map((e) => (e.role === 'wall' ? { kind: 'line', role: 'wall' } : e)) }), 0.01);
    expect(plain.wallNames).toEqual([]);
    expect(Array.from(plain.outer.wallIds)).toEqual([-1, -1, -1, -1]);
  });

  it('rejects a tolerance that is not a positive length', () => {
    for (const bad of [0, -1, NaN, Infinity]) {
      expect(() => sectionToDomain(channel, bad)).toThrow(expect.objectContaining({ code: 'bad-tolerance' }));
    }
  });

  it('rejects an outline with too few corners or mismatched edges, and non-finite numbers', () => {
    const two = section({ vertices: [{ at: [0, 0] }, { at: [1, 0] }], edges: [{ kind: 'line', role: 'wall' }, { kind: 'line', role: 'wall' }] });
    expect(() => sectionToDomain(two, 0.01)).toThrow(GeometryError);
    const short = section({ ...channel.outline, edges: channel.outline.edges.slice(1) });
    expect(() => sectionToDomain(short, 0.01)).toThrow(expect.objectContaining({ code: 'bad-outline' }));
    const nan = section({ ...channel.outline, vertices: [{ at: [NaN, 0] }, ...channel.outline.vertices.slice(1)] });
    expect(() => sectionToDomain(nan, 0.01)).toThrow(expect.objectContaining({ code: 'bad-outline', vertexIndex: 0 }));
  });
});

describe('wallRuns keeps a run whole across the ring start', () => {
  it('segments 4, 5, 0, 1 of one wall form one run', () => {
    const ring: Ring = {
      xy: Float64Array.of(0, 0, 1, 0, 2, 0, 2, 1, 1, 1, 0, 1),
      marks: Uint8Array.of(0, 0, 1, 1, 0, 0),
      wallIds: Int32Array.of(3, 3, -1, -1, 3, 3),
    };
    const runs = wallRuns(ring);
    expect(runs.map((r) => [r.mark, r.wallId, r.firstSegment, r.segmentCount])).toEqual([[1, -1, 2, 2], [0, 3, 4, 4]]);
    expect(Array.from(runs[1].xy)).toEqual([1, 1, 0, 1, 0, 0, 1, 0, 2, 0]);
  });
});

describe('bounds and default tolerance', () => {
  it('counts an arc bulging past its three points', () => {
    // Three arcs make a circle of radius 10 about (3, 4); no corner or through point sits at its top, bottom or right.
    const b = sectionBounds(section(circleOutline(3, 4, 10)));
    expect(b.minX).toBeCloseTo(-7, 12);
    expect(b.maxX).toBeCloseTo(13, 12);
    expect(b.minY).toBeCloseTo(-6, 12);
    expect(b.maxY).toBeCloseTo(14, 12);
  });

  it('is 2e-4 of the diagonal', () => {
    // Channel box 100 x 20.
    expect(defaultTolerance(channel)).toBeCloseTo(2e-4 * Math.hypot(100, 20), 15);
  });
});

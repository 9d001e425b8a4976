import { describe, expect, it } from 'vitest';
import { handlePosition, listHandles } from '../../src/editor/handles.ts';
import { hitTest } from '../../src/editor/hit-test.ts';
import { boxSection, expectPointNear } from './fixtures.ts';

// Box section (fixtures): corner 1 at (40, 0) has a radius-3 fillet whose handle is at (37 + 3/sqrt2, 3 - 3/sqrt2).
const section = boxSection();

describe('hitTest', () => {
  it('picks the nearest point handle of each kind', () => {
    expect(hitTest(section, [40.3, 0.2], 1)?.ref).toEqual({ kind: 'vertex', vertex: 1 });
    expect(hitTest(section, [39.2, 0.9], 1)?.ref).toEqual({ kind: 'fillet', vertex: 1 });
    expect(hitTest(section, [20, 40.2], 1)?.ref).toEqual({ kind: 'through', edge: 2 });
    expect(hitTest(section, [22, 17.1], 0.5)?.ref).toEqual({ kind: 'via', edge: 1, via: 1, island: 0 });
    expect(hitTest(section, [15.1, 10], 0.5)?.ref).toEqual({ kind: 'vertex', vertex: 0, island: 0 });
  });

  it('reports the distance and respects the tolerance', () => {
    const hit = hitTest(section, [40.3, 0.4], 1);
    expect(hit?.distance).toBeCloseTo(0.5, 12);
    expect(hitTest(section, [40.3, 0.4], 0.45)?.ref.kind).toBe('edge');
    expect(hitTest(section, [41, 1], 0.5)).toBeNull();
    expect(hitTest(section, [30, 20], 2)).toBeNull();
  });

  it('falls back to the nearest edge, giving the point on it where a corner would go', () => {
    const floor = hitTest(section, [12, 0.4], 1);
    expect(floor?.ref).toEqual({ kind: 'edge', edge: 0 });
    expectPointNear(floor!.at, [12, 0]);
    // Roof arc, centre (20, 15), radius 25: a pointer 0.5 outside at 60 degrees hits the arc 0.5 away.
    const c = Math.cos(Math.PI / 3), s = Math.sin(Math.PI / 3);
    const roof = hitTest(section, [20 + 25.5 * c, 15 + 25.5 * s], 1);
    expect(roof?.ref).toEqual({ kind: 'edge', edge: 2 });
    expect(roof!.distance).toBeCloseTo(0.5, 12);
    expectPointNear(roof!.at, [20 + 25 * c, 15 + 25 * s], 1e-12);
    // Island curve between its vias (23, 15) and (22, 17): picked on the curve, not on a straight chord.
    const curve = hitTest(section, [22.6, 16.1], 0.5);
    expect(curve?.ref).toEqual({ kind: 'edge', edge: 1, island: 0 });
    expect(curve!.distance).toBeLessThan(0.2);
  });

  it('lets a corner win over its own zero-radius fillet handle unless only fillets are asked for', () => {
    expect(hitTest(section, [0.1, 0.1], 1)?.ref).toEqual({ kind: 'vertex', vertex: 0 });
    const fillet = hitTest(section, [0.1, 0.1], 1, { kinds: ['fillet'] });
    expect(fillet?.ref).toEqual({ kind: 'fillet', vertex: 0 });
    expect(fillet?.at).toEqual([0, 0]);
    expect(hitTest(section, [12, 0.4], 1, { kinds: ['vertex'] })).toBeNull();
  });

  it('rejects a tolerance that is not a positive length', () => {
    expect(() => hitTest(section, [0, 0], 0)).toThrow(RangeError);
  });
});

describe('listHandles and handlePosition', () => {
  it('lists corners, through and via points, and a fillet handle per corner', () => {
    const kinds = listHandles(section).map((h) => h.ref.kind);
    expect(kinds.filter((k) => k === 'vertex')).toHaveLength(7);
    expect(kinds.filter((k) => k === 'through')).toHaveLength(1);
    expect(kinds.filter((k) => k === 'via')).toHaveLength(2);
    expect(kinds.filter((k) => k === 'fillet')).toHaveLength(7);
    expect(kinds.indexOf('fillet')).toBeGreaterThan(kinds.lastIndexOf('vertex'));
  });

  it('finds where a handle is now, and null for one that is gone', () => {
    expect(handlePosition(section, { kind: 'via', edge: 1, via: 0, island: 0 })).toEqual([23, 15]);
    expectPointNear(handlePosition(section, { kind: 'edge', edge: 0 })!, [20, 0]);
    expectPointNear(handlePosition(section, { kind: 'edge', edge: 2 })!, [20, 40], 1e-3);
    expect(handlePosition(section, { kind: 'vertex', vertex: 4 })).toBeNull();
    expect(handlePosition(section, { kind: 'through', edge: 0 })).toBeNull();
    expect(handlePosition(section, { kind: 'vertex', vertex: 0, island: 1 })).toBeNull();
  });
});

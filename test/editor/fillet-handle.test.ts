import { describe, expect, it } from 'vitest';
import type { Section } from '../../src/document/types.ts';
import { cornerShape, filletHandlePosition, handleDistance, radiusFromHandleDrag } from '../../src/editor/fillet-handle.ts';
import { boxSection, expectPointNear } from './fixtures.ts';

/** Equilateral triangle: every corner 60 degrees. Corner 0 at the origin, bisector at 30 degrees. */
function triangle(radius: number): Section {
  return {
    outline: {
      vertices: [{ at: [0, 0], filletRadius: radius }, { at: [10, 0] }, { at: [5, 5 * Math.sqrt(3)] }],
      edges: [{ kind: 'line', role: 'wall' }, { kind: 'line', role: 'outlet' }, { kind: 'line', role: 'inlet' }],
    },
    islands: [],
  };
}

function boxWithFillet(radius: number): Section {
  const s = boxSection();
  const vertices = s.outline.vertices.map((v, k) => (k === 1 ? { ...v, filletRadius: radius } : v));
  return { ...s, outline: { ...s.outline, vertices } };
}

describe('fillet-radius handle', () => {
  it('sits at the fillet arc midpoint of a 90 degree corner', () => {
    // [derived] corner (40, 0) between the floor y = 0 and the wall x = 40: a radius-3 fillet is centred
    // at (37, 3), 3 from both; its midpoint is the centre plus 3 along (1, -1)/sqrt 2.
    const h = Math.SQRT1_2 * 3;
    expectPointNear(filletHandlePosition(boxWithFillet(3), 1)!, [37 + h, 3 - h], 1e-12);
  });

  it('sits at the fillet arc midpoint of a 60 degree corner', () => {
    // [derived] the radius-2 fillet centre is 2 / sin 30 = 4 along the 30 degree bisector, (2 sqrt 3, 2);
    // the midpoint is 2 nearer the corner: (sqrt 3, 1).
    expectPointNear(filletHandlePosition(triangle(2), 0)!, [Math.sqrt(3), 1], 1e-12);
  });

  it('round-trips: the radius read back from the handle position is the radius', () => {
    for (const r of [0, 0.5, 3, 7.25]) {
      expect(radiusFromHandleDrag(boxWithFillet(r), 1, filletHandlePosition(boxWithFillet(r), 1)!)).toBeCloseTo(r, 12);
      expect(radiusFromHandleDrag(triangle(r), 0, filletHandlePosition(triangle(r), 0)!)).toBeCloseTo(r, 12);
    }
  });

  it('reads a drag off the bisector by its projection, and a drag behind the corner as 0', () => {
    const section = triangle(0);
    const onBisector = filletHandlePosition(triangle(2), 0)!;
    // Moving across the bisector (along its normal) does not change the radius.
    const normal = [-0.5, Math.sqrt(3) / 2];
    expect(radiusFromHandleDrag(section, 0, [onBisector[0] + 0.7 * normal[0], onBisector[1] + 0.7 * normal[1]])).toBeCloseTo(2, 12);
    expect(radiusFromHandleDrag(section, 0, [-3, -1])).toBe(0);
  });

  it('uses the arc tangent at a corner between a line and an arc', () => {
    // Corner (40, 30): the outlet comes up x = 40; the roof arc (centre (20, 15), radius 25) leaves
    // counter-clockwise along (-0.6, 0.8). [derived] cos(angle) = (0, -1).(-0.6, 0.8) = -0.8.
    const corner = cornerShape(boxSection(), 2)!;
    expect(corner.angle).toBeCloseTo(Math.acos(-0.8), 9);
    expectPointNear(corner.bisector, [-0.6 / Math.hypot(0.6, 0.2), -0.2 / Math.hypot(0.6, 0.2)], 1e-6);
    expect(handleDistance(Math.PI / 2, 3)).toBeCloseTo(3 * (Math.SQRT2 - 1), 12);
  });

  it('has no handle on a straight-through corner or a missing one', () => {
    const withMid: Section = {
      outline: {
        vertices: [{ at: [0, 0] }, { at: [5, 0] }, { at: [10, 0] }, { at: [5, 8] }],
        edges: [{ kind: 'line', role: 'wall' }, { kind: 'line', role: 'wall' }, { kind: 'line', role: 'outlet' }, { kind: 'line', role: 'inlet' }],
      },
      islands: [],
    };
    expect(filletHandlePosition(withMid, 1)).toBeNull();
    expect(radiusFromHandleDrag(withMid, 1, [5, 1])).toBeNull();
    expect(filletHandlePosition(withMid, 7)).toBeNull();
    expect(filletHandlePosition(withMid, 0, 2)).toBeNull();
  });
});

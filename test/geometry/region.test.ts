import { describe, expect, it } from 'vitest';
import { pointInRegion, pointInRing } from '../../src/geometry/region.ts';
import { sectionToDomain } from '../../src/geometry/to-domain.ts';
import { circleOutline, polygon, section } from './helpers.ts';

describe('point in region', () => {
  // A 40 x 20 box with a round island of radius 5 at (20, 10).
  const domain = sectionToDomain(section(polygon([[0, 0], [40, 0], [40, 20], [0, 20]]), [{ name: 'valve', outline: circleOutline(20, 10, 5) }]), 0.001);

  it.each([
    [[2, 2], true, 'in the flow near a corner'],
    [[20, 17], true, 'in the gap above the island'],
    [[20, 10], false, 'at the island centre'],
    [[23, 13], false, 'inside the island near its edge (4.24 from centre)'],
    [[23.6, 13.6], true, 'just outside the island (5.09 from centre)'],
    [[-1, 10], false, 'left of the box'],
    [[20, 21], false, 'above the box'],
  ] as [readonly [number, number], boolean, string][])('(%j) -> %s: %s', (p, expected) => {
    expect(pointInRegion(domain, p[0], p[1])).toBe(expected);
  });

  it('pointInRing does not care which way the ring runs', () => {
    const ccw = Float64Array.of(0, 0, 4, 0, 2, 3), cw = Float64Array.of(0, 0, 2, 3, 4, 0);
    for (const ring of [ccw, cw]) {
      expect(pointInRing(ring, 2, 1)).toBe(true);
      expect(pointInRing(ring, 3.5, 2)).toBe(false);
    }
  });

  it('a concave ring: the notch of a U is outside', () => {
    const u = Float64Array.of(0, 0, 9, 0, 9, 9, 6, 9, 6, 3, 3, 3, 3, 9, 0, 9);
    expect(pointInRing(u, 4.5, 6)).toBe(false);
    expect(pointInRing(u, 1.5, 6)).toBe(true);
    expect(pointInRing(u, 4.5, 1.5)).toBe(true);
  });
});

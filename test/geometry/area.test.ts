import { describe, expect, it } from 'vitest';
import { regionArea, signedArea } from '../../src/geometry/area.ts';
import { sectionToDomain } from '../../src/geometry/to-domain.ts';
import { circleOutline, polygon, section } from './helpers.ts';

describe('signedArea (shoelace)', () => {
  it('a 7 x 3 rectangle: +21 counter-clockwise, -21 clockwise', () => {
    expect(signedArea(Float64Array.of(0, 0, 7, 0, 7, 3, 0, 3))).toBe(21);
    expect(signedArea(Float64Array.of(0, 0, 0, 3, 7, 3, 7, 0))).toBe(-21);
  });

  it('a right triangle with legs 4 and 3 has area 6', () => {
    expect(signedArea(Float64Array.of(0, 0, 4, 0, 0, 3))).toBe(6);
  });

  it('stays exact far from the origin', () => {
    const x = 1e9, y = -3e9;
    expect(signedArea(Float64Array.of(x, y, x + 0.5, y, x + 0.5, y + 0.25, x, y + 0.25))).toBe(0.125);
  });

  it('fewer than three points have no area', () => {
    expect(signedArea(Float64Array.of(0, 0, 1, 1))).toBe(0);
  });
});

describe('areas of flattened sections', () => {
  it('a circle of radius 5 from three arc edges: pi r^2 less at most the inscribed-polygon shortfall', () => {
    const r = 5, tol = 0.001;
    const area = signedArea(sectionToDomain(section(circleOutline(2, -1, r)), tol).outer.xy);
    // [derived] Each chord of half-angle phi cuts a sector of area r^2 phi down to a triangle r^2 sin(2 phi) / 2;
    // sin(2 phi)/(2 phi) falls with phi and phi <= acos(1 - tol / r), so the polygon keeps at least that share.
    const phi = Math.acos(1 - tol / r);
    expect(area).toBeLessThan(Math.PI * r * r);
    expect(area).toBeGreaterThanOrEqual(Math.PI * r * r * (Math.sin(2 * phi) / (2 * phi)));
  });

  it('a square of side 10 with one corner rounded to radius 4 loses r^2 (1 - pi / 4), within the fillet chord bound', () => {
    const r = 4, tol = 0.001;
    const area = signedArea(sectionToDomain(section(polygon([[0, 0], [10, 0], [10, 10], [0, 10]], undefined, [0, 0, r, 0])), tol).outer.xy);
    const exact = 100 - r * r * (1 - Math.PI / 4);
    // [derived] The quarter-circle fillet is flattened by inscribed chords: shortfall at most its sector area
    // pi r^2 / 4 times 1 - sin(2 phi)/(2 phi).
    const phi = Math.acos(1 - tol / r);
    expect(area).toBeLessThan(exact);
    expect(exact - area).toBeLessThanOrEqual(((Math.PI * r * r) / 4) * (1 - Math.sin(2 * phi) / (2 * phi)));
  });

  it('a ring: 20 x 20 square around a 6 x 4 island gives region area 400 - 24', () => {
    const island = { name: 'boss', outline: polygon([[7, 8], [13, 8], [13, 12], [7, 12]]) };
    const domain = sectionToDomain(section(polygon([[0, 0], [20, 0], [20, 20], [0, 20]]), [island]), 0.01);
    expect(signedArea(domain.outer.xy)).toBe(400);
    expect(signedArea(domain.islands[0].xy)).toBe(-24);
    expect(regionArea(domain)).toBe(376);
  });

  it('a disc with a round hole: pi (R^2 - r^2) within the two inscribed-polygon bounds', () => {
    const tol = 0.0005;
    const domain = sectionToDomain(section(circleOutline(0, 0, 10), [{ name: 'valve', outline: circleOutline(1, 0, 3) }]), tol);
    const share = (r: number): number => { const phi = Math.acos(1 - tol / r); return Math.sin(2 * phi) / (2 * phi); };
    const area = regionArea(domain);
    // Outer polygon short by up to (1 - share) of pi R^2; the hole's polygon too small, so the region gains up to that.
    expect(area).toBeGreaterThanOrEqual(Math.PI * 100 * share(10) - Math.PI * 9);
    expect(area).toBeLessThanOrEqual(Math.PI * 100 - Math.PI * 9 * share(3));
  });
});

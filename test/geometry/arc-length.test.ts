import { describe, expect, it } from 'vitest';
import { flattenEdge } from '../../src/geometry/flatten-edge.ts';
import { cumulativeLengths, pointAtLength, polylineLength, slicePolyline } from '../../src/geometry/arc-length.ts';
import { assertInDelta } from './helpers.ts';

const place = { edgeIndex: 0 };

describe('arc length of a flattened quarter circle', () => {
  const r = 10;
  // Tolerances chosen to give both an even (18) and an odd (13) chord count.
  it.each([0.01, 0.02, 0.1])('tol %f: length is pi r / 2 less at most the chord shortfall allowed by the tolerance', (tol) => {
    const edge = flattenEdge([r, 0], { kind: 'arc', role: 'wall', through: [r * Math.SQRT1_2, r * Math.SQRT1_2] }, [0, r], tol, place);
    const length = polylineLength(edge.xy);
    // [derived] A chord of half-angle phi is 2 r sin(phi) against 2 r phi of arc; its sagitta r (1 - cos phi) <= tol
    // caps phi at acos(1 - tol / r), and sin(phi)/phi falls with phi, so the polyline is short by at most that ratio.
    const phiMax = Math.acos(1 - tol / r);
    const exact = (Math.PI * r) / 2;
    expect(length).toBeLessThan(exact);
    expect(exact - length).toBeLessThanOrEqual(exact * (1 - Math.sin(phiMax) / phiMax));
    // [derived] Equal chords: n chords of half-angle pi / (4 n).
    const n = (edge.xy.length >> 1) - 1;
    assertInDelta(length, 2 * n * r * Math.sin(Math.PI / (4 * n)), 1e-12 * exact);
  });

  it.each([0.01, 0.02])('tol %f: the point at half the length lies on the 45 degree ray, within tol of the circle, heading (-1, 1)/sqrt 2', (tol) => {
    const edge = flattenEdge([r, 0], { kind: 'arc', role: 'wall', through: [r * Math.SQRT1_2, r * Math.SQRT1_2] }, [0, r], tol, place);
    const p = pointAtLength(edge.xy, polylineLength(edge.xy) / 2);
    assertInDelta(p.x, p.y, 1e-12 * r);
    const fromCentre = Math.hypot(p.x, p.y);
    expect(fromCentre).toBeLessThanOrEqual(r * (1 + 1e-12));
    expect(fromCentre).toBeGreaterThanOrEqual(r - tol);
    assertInDelta(p.tx, -Math.SQRT1_2, 1e-12);
    assertInDelta(p.ty, Math.SQRT1_2, 1e-12);
  });
});

describe('polyline helpers', () => {
  // Two 3-4-5 legs and a closing side of 8.
  const vee = Float64Array.of(0, 0, 3, 4, 0, 8);
  it('cumulative lengths of an open and a closed polyline', () => {
    expect(Array.from(cumulativeLengths(vee))).toEqual([0, 5, 10]);
    expect(Array.from(cumulativeLengths(vee, true))).toEqual([0, 5, 10, 18]);
    expect(polylineLength(vee, true)).toBe(18);
  });

  it('point at a length inside a segment, at a join (mean tangent) and clamped beyond the end', () => {
    const mid = pointAtLength(vee, 2.5);
    expect([mid.x, mid.y, mid.tx, mid.ty, mid.segment]).toEqual([1.5, 2, 0.6, 0.8, 0]);
    const join = pointAtLength(vee, 5);
    expect([join.x, join.y, join.tx, join.ty]).toEqual([3, 4, 0, 1]);
    const end = pointAtLength(vee, 99);
    expect([end.x, end.y, end.tx, end.ty]).toEqual([0, 8, -0.6, 0.8]);
    // Closed: the start is a join of the closing side (heading -y) and the first leg.
    const start = pointAtLength(vee, 0, true);
    const mean = Math.hypot(0.6, -0.2);
    expect([start.x, start.y]).toEqual([0, 0]);
    assertInDelta(start.tx, 0.6 / mean, 1e-15);
    assertInDelta(start.ty, -0.2 / mean, 1e-15);
  });

  it('slice between two lengths keeps the whole points in between', () => {
    expect(Array.from(slicePolyline(vee, 2.5, 7.5))).toEqual([1.5, 2, 3, 4, 1.5, 6]);
    expect(Array.from(slicePolyline(vee, 0, 10))).toEqual(Array.from(vee));
  });
});

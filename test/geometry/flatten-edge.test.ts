import { describe, expect, it } from 'vitest';
import type { Point } from '../../src/document/types.ts';
import { catmullRomSpans, spanPoint } from '../../src/geometry/catmull-rom.ts';
import { edgePath } from '../../src/geometry/edge-path.ts';
import { GeometryError } from '../../src/geometry/errors.ts';
import { flattenEdge } from '../../src/geometry/flatten-edge.ts';
import { polylineLength } from '../../src/geometry/arc-length.ts';
import { assertInDelta, worstOffCircle } from './helpers.ts';

const place = { edgeIndex: 4 };

/** Largest distance from each chord's midpoint to the circle: the sagitta of the worst chord. */
function worstSagitta(xy: Float64Array, cx: number, cy: number, r: number): number {
  let worst = 0;
  for (let k = 0; k + 3 < xy.length; k += 2) {
    worst = Math.max(worst, r - Math.hypot((xy[k] + xy[k + 2]) / 2 - cx, (xy[k + 1] + xy[k + 3]) / 2 - cy));
  }
  return worst;
}

describe('arc edges', () => {
  it('an arc through three points: points on the circle, chords within the tolerance, ends exact', () => {
    // Circle centre (1, 2), radius 5: (6, 2), (1, 7) and (-4, 2) lie on it.
    const tol = 0.003;
    const flat = flattenEdge([6, 2], { kind: 'arc', role: 'wall', through: [1, 7] }, [-4, 2], tol, place);
    expect(worstOffCircle(flat.xy, 1, 2, 5)).toBeLessThanOrEqual(1e-12);
    expect(worstSagitta(flat.xy, 1, 2, 5)).toBeLessThanOrEqual(tol);
    expect(Array.from(flat.xy.slice(0, 2))).toEqual([6, 2]);
    expect(Array.from(flat.xy.slice(-2))).toEqual([-4, 2]);
    // Over the top, counter-clockwise: leaving (6, 2) heading +y.
    for (let k = 1; k < flat.xy.length; k += 2) expect(flat.xy[k]).toBeGreaterThanOrEqual(2);
    assertInDelta(flat.startDir[0], 0, 1e-12);
    assertInDelta(flat.startDir[1], 1, 1e-12);
  });

  it('the through point picks the side: the same ends through (1, -3) give the lower half', () => {
    const flat = flattenEdge([6, 2], { kind: 'arc', role: 'wall', through: [1, -3] }, [-4, 2], 0.003, place);
    for (let k = 1; k < flat.xy.length; k += 2) expect(flat.xy[k]).toBeLessThanOrEqual(2);
  });

  it('a major arc: from (5, 0) through (0, -5) to (0, 5) runs three quarters of the circle', () => {
    const tol = 1e-4;
    const flat = flattenEdge([5, 0], { kind: 'arc', role: 'wall', through: [0, -5] }, [0, 5], tol, place);
    const exact = (3 * Math.PI * 5) / 2;
    // [derived] as in the quarter-circle test: shortfall at most the exact length times 1 - sin(phi)/phi.
    const phi = Math.acos(1 - tol / 5);
    expect(exact - polylineLength(flat.xy)).toBeLessThanOrEqual(exact * (1 - Math.sin(phi) / phi));
    expect(exact - polylineLength(flat.xy)).toBeGreaterThan(0);
  });

  it('collinear through point between the ends gives a straight line', () => {
    const flat = flattenEdge([0, 0], { kind: 'arc', role: 'wall', through: [3, 3] }, [10, 10], 0.01, place);
    expect(Array.from(flat.xy)).toEqual([0, 0, 10, 10]);
  });

  it.each([
    ['on an end', [10, 0] as Point],
    ['in line beyond an end', [15, 0] as Point],
  ])('through point %s is a bad arc naming the edge', (_, through) => {
    let caught: unknown;
    try { flattenEdge([0, 0], { kind: 'arc', role: 'wall', through }, [10, 0], 0.01, place); } catch (e) { caught = e; }
    expect(caught).toBeInstanceOf(GeometryError);
    const err = caught as GeometryError;
    expect(err.code).toBe('bad-arc');
    expect(err.edgeIndex).toBe(4);
    expect(err.where).toEqual(through);
    expect(err.message).toContain('Edge 5 of the section outline is an arc');
  });
});

/**
 * Centripetal Catmull-Rom by the Barry-Goldman pyramid (P. J. Barry and R. N. Goldman, "A recursive evaluation
 * algorithm for a class of Catmull-Rom splines", SIGGRAPH 1988), written out independently of the Hermite form.
 */
function barryGoldman(p0: Point, p1: Point, p2: Point, p3: Point, u: number): Point {
  const k = (a: Point, b: Point): number => Math.sqrt(Math.hypot(b[0] - a[0], b[1] - a[1]));
  const t0 = 0, t1 = k(p0, p1), t2 = t1 + k(p1, p2), t3 = t2 + k(p2, p3);
  const t = t1 + u * (t2 - t1);
  const lerp = (a: Point, b: Point, ta: number, tb: number): Point => {
    const w = (t - ta) / (tb - ta);
    return [a[0] + w * (b[0] - a[0]), a[1] + w * (b[1] - a[1])];
  };
  const a1 = lerp(p0, p1, t0, t1), a2 = lerp(p1, p2, t1, t2), a3 = lerp(p2, p3, t2, t3);
  const b1 = lerp(a1, a2, t0, t2), b2 = lerp(a2, a3, t1, t3);
  return lerp(b1, b2, t1, t2);
}

describe('curve edges (centripetal Catmull-Rom)', () => {
  const points: Point[] = [[0, 0], [4, 3], [5, 9], [11, 10], [14, 2]];

  it('the Hermite spans equal the Barry-Goldman pyramid at interior points', () => {
    const spans = catmullRomSpans(points);
    // Inner spans have real neighbours on both sides: span 1 is 4,3 -> 5,9 between 0,0 and 11,10.
    for (const [k, p0, p1, p2, p3] of [[1, 0, 1, 2, 3], [2, 1, 2, 3, 4]] as const) {
      for (const u of [0.1, 0.37, 0.5, 0.9]) {
        const mine = spanPoint(spans[k], u, [0, 0]);
        const ref = barryGoldman(points[p0], points[p1], points[p2], points[p3], u);
        assertInDelta(mine[0], ref[0], 1e-12);
        assertInDelta(mine[1], ref[1], 1e-12);
      }
    }
  });

  it('passes through every via point and stays within the tolerance of the true curve', () => {
    const tol = 0.002;
    const flat = flattenEdge(points[0], { kind: 'curve', role: 'wall', via: points.slice(1, -1) }, points[4], tol, place);
    const pts = Array.from({ length: flat.xy.length / 2 }, (_, k) => `${flat.xy[2 * k]},${flat.xy[2 * k + 1]}`);
    for (const p of points) expect(pts).toContain(`${p[0]},${p[1]}`);
    // Dense samples of the true curve lie within tol of the polyline.
    const path = edgePath(points[0], { kind: 'curve', role: 'wall', via: points.slice(1, -1) }, points[4], place);
    let worst = 0;
    for (let s = 0; s <= 4000; s++) worst = Math.max(worst, distanceToPolyline(path.point(s / 4000), flat.xy));
    expect(worst).toBeLessThanOrEqual(tol);
  });

  it('leaves its first vertex aimed at the first via point (mirrored end neighbour)', () => {
    const flat = flattenEdge([0, 0], { kind: 'curve', role: 'wall', via: [[3, 4], [9, 4]] }, [12, 0], 0.01, place);
    assertInDelta(flat.startDir[0], 0.6, 1e-12);
    assertInDelta(flat.startDir[1], 0.8, 1e-12);
    assertInDelta(flat.endDir[0], -0.6, 1e-12);
    assertInDelta(flat.endDir[1], 0.8, 1e-12);
  });

  it('a curve with no via points is a line; two consecutive points alike are a zero-length error', () => {
    expect(Array.from(flattenEdge([0, 0], { kind: 'curve', role: 'wall', via: [] }, [2, 1], 0.01, place).xy)).toEqual([0, 0, 2, 1]);
    expect(() => flattenEdge([0, 0], { kind: 'curve', role: 'wall', via: [[1, 1], [1, 1]] }, [2, 0], 0.01, place))
      .toThrow(expect.objectContaining({ code: 'zero-length', edgeIndex: 4 }));
  });

  it('a part of a curve flattened between two parameters starts and ends on the curve there', () => {
    const path = edgePath(points[0], { kind: 'curve', role: 'wall', via: points.slice(1, -1) }, points[4], place);
    const part = path.flatten(0.3, 0.8, 0.001);
    const a = path.point(0.3), b = path.point(0.8);
    expect(Array.from(part.xy.slice(0, 2))).toEqual(a);
    expect(Array.from(part.xy.slice(-2))).toEqual(b);
    expect(part.t[0]).toBe(0.3);
    assertInDelta(part.t[part.t.length - 1], 0.8, 1e-15);
  });
});

function distanceToPolyline(p: readonly number[], xy: Float64Array): number {
  let best = Infinity;
  for (let k = 0; k + 3 < xy.length; k += 2) {
    const ax = xy[k], ay = xy[k + 1], dx = xy[k + 2] - ax, dy = xy[k + 3] - ay;
    const t = Math.max(0, Math.min(1, ((p[0] - ax) * dx + (p[1] - ay) * dy) / (dx * dx + dy * dy)));
    best = Math.min(best, Math.hypot(p[0] - ax - t * dx, p[1] - ay - t * dy));
  }
  return best;
}

import { describe, expect, it } from 'vitest';
import type { Outline, Point } from '../../src/document/types.ts';
import { edgePath } from '../../src/geometry/edge-path.ts';
import { solvePathFillet } from '../../src/geometry/fillet-solve.ts';
import { filletPoints, lineCornerFillet, type CornerFillet } from '../../src/geometry/fillet.ts';
import { GeometryError } from '../../src/geometry/errors.ts';
import { sectionToDomain } from '../../src/geometry/to-domain.ts';
import { MARK_INLET, MARK_WALL } from '../../src/solver/types.ts';
import { assertInDelta, polygon, section, wall } from './helpers.ts';

/** Distance from p to the infinite line through a and b. */
function distanceToLine(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  return Math.abs(dx * (p[1] - a[1]) - dy * (p[0] - a[0])) / Math.hypot(dx, dy);
}

/**
 * [derived] Tangency of a circle of radius r in a corner of angle theta: the tangent points lie on the two
 * lines at r / tan(theta / 2) from the corner, the centre is r from both lines, and each radius to a
 * tangent point is square to its line.
 */
function expectTangent(f: CornerFillet, prev: Point, corner: Point, next: Point, r: number, theta: number): void {
  const d = r / Math.tan(theta / 2);
  const eps = 1e-12 * d;
  assertInDelta(Math.hypot(f.tangentIn[0] - corner[0], f.tangentIn[1] - corner[1]), d, eps);
  assertInDelta(Math.hypot(f.tangentOut[0] - corner[0], f.tangentOut[1] - corner[1]), d, eps);
  assertInDelta(distanceToLine(f.tangentIn, prev, corner), 0, eps);
  assertInDelta(distanceToLine(f.tangentOut, corner, next), 0, eps);
  assertInDelta(distanceToLine(f.centre, prev, corner), r, eps);
  assertInDelta(distanceToLine(f.centre, corner, next), r, eps);
  const square = (t: Point, from: Point): number =>
    (f.centre[0] - t[0]) * (from[0] - corner[0]) + (f.centre[1] - t[1]) * (from[1] - corner[1]);
  assertInDelta(square(f.tangentIn, prev), 0, eps * d);
  assertInDelta(square(f.tangentOut, next), 0, eps * d);
}

describe('line-line fillet', () => {
  it('90 degree corner: tangent points (2, 0) and (0, 2), centre (2, 2) for radius 2', () => {
    const f = lineCornerFillet([10, 0], [0, 0], [0, 10], 2)!;
    expectTangent(f, [10, 0], [0, 0], [0, 10], 2, Math.PI / 2);
    assertInDelta(f.tangentIn[0], 2, 1e-14);
    assertInDelta(f.tangentOut[1], 2, 1e-14);
    assertInDelta(f.centre[0], 2, 1e-14);
    assertInDelta(f.centre[1], 2, 1e-14);
  });

  it('60 degree corner: tangent points r sqrt 3 from the corner, centre r from both lines', () => {
    const next: Point = [10 * Math.cos(Math.PI / 3), 10 * Math.sin(Math.PI / 3)];
    const f = lineCornerFillet([10, 0], [0, 0], next, 3)!;
    expectTangent(f, [10, 0], [0, 0], next, 3, Math.PI / 3);
    assertInDelta(f.tangentDistance, 3 * Math.sqrt(3), 1e-12);
    assertInDelta(f.centre[1], 3, 1e-12);
  });

  it.each([
    ['left turn, 120 degrees, off the origin', [7, 3], [2, 1], [2 + 5 * Math.cos(2.5), 1 + 5 * Math.sin(2.5)]],
    ['right turn, 45 degrees', [-4, 0], [0, 0], [-4, -4]],
  ] as const)('%s: tangency holds and the arc bulges toward the corner', (_, prev, corner, next) => {
    const u = [prev[0] - corner[0], prev[1] - corner[1]], w = [next[0] - corner[0], next[1] - corner[1]];
    const theta = Math.acos((u[0] * w[0] + u[1] * w[1]) / (Math.hypot(u[0], u[1]) * Math.hypot(w[0], w[1])));
    const f = lineCornerFillet(prev, corner, next, 1.5)!;
    expectTangent(f, prev, corner, next, 1.5, theta);
    const xy = filletPoints(f, 1e-3);
    const n = xy.length >> 1;
    expect((n - 1) % 2).toBe(0);
    expect([xy[0], xy[1]]).toEqual([f.tangentIn[0], f.tangentIn[1]]);
    expect([xy[2 * n - 2], xy[2 * n - 1]]).toEqual([f.tangentOut[0], f.tangentOut[1]]);
    // The middle point is the arc point nearest the corner: centre + r toward the corner.
    const m = (n - 1) / 2, toCorner = Math.hypot(corner[0] - f.centre[0], corner[1] - f.centre[1]);
    assertInDelta(xy[2 * m], f.centre[0] + (1.5 * (corner[0] - f.centre[0])) / toCorner, 1e-12);
    assertInDelta(xy[2 * m + 1], f.centre[1] + (1.5 * (corner[1] - f.centre[1])) / toCorner, 1e-12);
  });

  it('a straight-through corner needs no fillet', () => {
    expect(lineCornerFillet([-1, 0], [0, 0], [3, 0], 1)).toBeNull();
  });
});

function catchGeometry(run: () => unknown): GeometryError {
  try {
    run();
  } catch (e) {
    if (e instanceof GeometryError) return e;
    throw e;
  }
  throw new Error('expected a GeometryError');
}

describe('fillet too large', () => {
  const square: Point[] = [[0, 0], [10, 0], [10, 10], [0, 10]];

  it('90 degree corner between 10-long edges: at most radius 10 fits', () => {
    const err = catchGeometry(() => sectionToDomain(section(polygon(square, undefined, [0, 0, 12, 0])), 0.01, 'mm'));
    expect(err.code).toBe('fillet-too-large');
    expect(err.vertexIndex).toBe(2);
    expect(err.radius).toBe(12);
    assertInDelta(err.largestRadius!, 10, 1e-12);
    expect(err.where).toEqual([10, 10]);
    expect(err.message).toBe('The fillet at corner 3 (radius 12 mm) does not fit: at most 10 mm fits between its neighbouring edges.');
  });

  it('an edge filleted at both ends lends each fillet half of itself', () => {
    const err = catchGeometry(() => sectionToDomain(section(polygon(square, undefined, [0, 1, 6, 0])), 0.01));
    expect(err.vertexIndex).toBe(2);
    assertInDelta(err.largestRadius!, 5, 1e-12);
    expect(err.message).toContain('at most 5 units fits');
  });

  it('60 degree corner of an equilateral triangle of side 10: at most 10 tan 30 deg = 5.7735 fits (shown rounded down)', () => {
    const tri: Point[] = [[0, 0], [10, 0], [5, 5 * Math.sqrt(3)]];
    const err = catchGeometry(() => sectionToDomain(section(polygon(tri, undefined, [6, 0, 0])), 0.01, 'mm'));
    assertInDelta(err.largestRadius!, 10 * Math.tan(Math.PI / 6), 1e-12);
    expect(err.message).toContain('at most 5.77 mm');
    // The largest radius itself fits.
    expect(() => sectionToDomain(section(polygon(tri, undefined, [err.largestRadius!, 0, 0])), 0.01)).not.toThrow();
  });

  it('names the island in the message', () => {
    const outer = polygon([[-50, -50], [50, -50], [50, 50], [-50, 50]]);
    const err = catchGeometry(() => sectionToDomain(section(outer, [{ name: 'valve', outline: polygon(square, undefined, [3, 12, 0, 0]) }]), 0.01));
    expect(err.islandName).toBe('valve');
    expect(err.message).toContain('corner 2 of island "valve"');
  });
});

describe('fillets in the traced outline', () => {
  it('a fillet between inlet and wall: first half inlet, second half wall, split at the arc middle', () => {
    // Counter-clockwise channel; the inlet is edge 3 (x = 0) and the corner at (0, 0) is vertex 0.
    const outline = polygon([[0, 0], [40, 0], [40, 10], [0, 10]],
      [wall('floor'), { kind: 'line', role: 'outlet' }, wall(), { kind: 'line', role: 'inlet' }], [4, 0, 0, 0]);
    const ring = sectionToDomain(section(outline), 0.001).outer;
    const onFillet: number[] = [];
    for (let k = 0; k < ring.marks.length; k++) {
      const j = (k + 1) % ring.marks.length;
      const r0 = Math.hypot(ring.xy[2 * k] - 4, ring.xy[2 * k + 1] - 4), r1 = Math.hypot(ring.xy[2 * j] - 4, ring.xy[2 * j + 1] - 4);
      if (Math.abs(r0 - 4) < 1e-9 && Math.abs(r1 - 4) < 1e-9) onFillet.push(k);
    }
    const marks = onFillet.map((k) => ring.marks[k]);
    const half = marks.length / 2;
    expect(marks.length).toBeGreaterThan(2);
    expect(marks.slice(0, half).every((m) => m === MARK_INLET)).toBe(true);
    expect(marks.slice(half).every((m) => m === MARK_WALL)).toBe(true);
    // The switch happens at the arc middle, on the 45 degree line through the centre (4, 4).
    const mid = onFillet[half];
    assertInDelta(ring.xy[2 * mid], 4 - 4 * Math.SQRT1_2, 1e-12);
    assertInDelta(ring.xy[2 * mid + 1], 4 - 4 * Math.SQRT1_2, 1e-12);
  });

  it('a fillet beside an arc edge is tangent to the true arc: centre R - r from the arc centre and r above the floor', () => {
    // Edge 1 is an arc from (20, 0) through (25, 10) to (20, 20): centre O = (12.5, 10), radius R = 12.5.
    // [derived] A radius-3 fillet inside the turn has its centre C 3 above the floor and R - 3 = 9.5 from O:
    // C = (12.5 + sqrt(9.5^2 - 7^2), 3); it touches the floor below C and the arc at O + R (C - O) / 9.5.
    const outline = {
      vertices: [{ at: [0, 0] as Point }, { at: [20, 0] as Point, filletRadius: 3 }, { at: [20, 20] as Point }, { at: [0, 20] as Point }],
      edges: [wall(), { kind: 'arc' as const, role: 'wall' as const, through: [25, 10] as Point }, wall(), wall()],
    };
    const ring = sectionToDomain(section(outline), 1e-3).outer;
    const cx = 12.5 + Math.sqrt(9.5 ** 2 - 49);
    const touch: Point = [12.5 + (12.5 * (cx - 12.5)) / 9.5, 10 + (12.5 * (3 - 10)) / 9.5];
    let floorEnd = -Infinity, onFillet = 0, nearTouch = Infinity;
    for (let k = 0; k < ring.xy.length; k += 2) {
      const x = ring.xy[k], y = ring.xy[k + 1];
      if (y === 0) floorEnd = Math.max(floorEnd, x);
      if (Math.abs(Math.hypot(x - cx, y - 3) - 3) <= 1e-9) onFillet++;
      nearTouch = Math.min(nearTouch, Math.hypot(x - touch[0], y - touch[1]));
    }
    assertInDelta(floorEnd, cx, 1e-9);
    expect(onFillet).toBeGreaterThan(2);
    expect(nearTouch).toBeLessThanOrEqual(1e-9);
  });
});

describe('fillets beside curves', () => {
  it('between a line and a curve: centre r from the line and r from the curve along its normal', () => {
    const inPath = edgePath([-10, 0], { kind: 'line', role: 'wall' }, [0, 0], { edgeIndex: 0 });
    const outPath = edgePath([0, 0], { kind: 'curve', role: 'wall', via: [[3, 4], [9, 4]] }, [12, 0], { edgeIndex: 1 });
    const f = solvePathFillet(inPath, outPath, 1, 0.9, 0.1)!;
    expect(f).not.toBeNull();
    // Tangent to the line y = 0 from above (left turn).
    assertInDelta(f.centre[1], 1, 1e-12);
    assertInDelta(f.tangentIn[0], f.centre[0], 1e-12);
    assertInDelta(f.tangentIn[1], 0, 1e-12);
    // Tangent to the curve: radius 1 to the touching point, square to the curve's direction there.
    const t = outPath.point(f.tOut), d = outPath.derivative(f.tOut);
    assertInDelta(Math.hypot(f.centre[0] - t[0], f.centre[1] - t[1]), 1, 1e-12);
    assertInDelta(((f.centre[0] - t[0]) * d[0] + (f.centre[1] - t[1]) * d[1]) / Math.hypot(d[0], d[1]), 0, 1e-10);
  });

  it('too large beside an arc: the largest radius reported fits and one 1% larger does not', () => {
    const outline = (r: number): Outline => ({
      vertices: [{ at: [0, 0] }, { at: [10, 0], filletRadius: r }, { at: [10, 10] }, { at: [0, 10] }],
      edges: [{ kind: 'arc', role: 'wall', through: [5, -2] }, wall(), wall(), wall()],
    });
    const err = catchGeometry(() => sectionToDomain(section(outline(50)), 0.001));
    expect(err.code).toBe('fillet-too-large');
    const largest = err.largestRadius!;
    expect(largest).toBeGreaterThan(1);
    expect(() => sectionToDomain(section(outline(largest)), 0.001)).not.toThrow();
    expect(() => sectionToDomain(section(outline(largest * 1.01)), 0.001)).toThrow(GeometryError);
  });

  it('a small fillet beside an arc far from the origin is found (found by the geometry fuzz: it was called too large)', () => {
    // Corner about 600 units out: the centres cannot agree to 1e-12 of a 0.001 radius in doubles, only to their rounding.
    const inPath = edgePath([-500, -500], { kind: 'line', role: 'wall' }, [-433.4873743355274, 420.1076030731201], { edgeIndex: 0 });
    const outPath = edgePath([-433.4873743355274, 420.1076030731201], { kind: 'arc', role: 'wall', through: [-486.27671550089883, 397.6389064228763] }, [-500, 341.93227905780077], { edgeIndex: 1 });
    for (const radius of [0.001, 0.02, 0.0448]) {
      const f = solvePathFillet(inPath, outPath, radius, 0.99, 0.01);
      expect(f, `radius ${radius}`).not.toBeNull();
      const t = outPath.point(f!.tOut);
      assertInDelta(Math.hypot(f!.centre[0] - t[0], f!.centre[1] - t[1]), radius, 1e-9);
    }
  });
});

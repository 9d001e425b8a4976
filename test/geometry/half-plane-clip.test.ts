/** The half-plane clip of a flow domain's rings: exact pieces, kept roles, the cut along the line a wall. */
import { describe, expect, it } from 'vitest';
import { clipToHalfPlane } from '../../src/geometry/half-plane-clip.ts';
import { signedArea } from '../../src/geometry/index.ts';
import { MARK_INLET, MARK_OUTLET, MARK_WALL, type Ring } from '../../src/solver/types.ts';

function ring(points: readonly (readonly [number, number])[], marks: readonly number[], ids: readonly number[] = marks.map(() => -1)): Ring {
  return { xy: Float64Array.from(points.flat()), marks: Uint8Array.from(marks), wallIds: Int32Array.from(ids) };
}

function points(r: Ring): number[][] {
  return Array.from({ length: r.xy.length / 2 }, (_, k) => [r.xy[2 * k], r.xy[2 * k + 1]]);
}

/** A counter-clockwise square -1 .. 1: floor wall (id 0), outlet on the right, roof wall (id 1), inlet on the left. */
const square = ring([[-1, -1], [1, -1], [1, 1], [-1, 1]], [MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_INLET], [0, -1, 1, -1]);
const above = { x: 0, y: 0, normalX: 0, normalY: 1 };

describe('clipToHalfPlane [derived: exact polygon clipping]', () => {
  it('keeps the upper half of a square: the cut inlet and outlet keep their roles, the new side along y = 0 is an unnamed wall', () => {
    const { outers, holes } = clipToHalfPlane(square, [], above);
    expect(holes).toEqual([]);
    expect(outers).toHaveLength(1);
    const r = outers[0];
    expect(points(r)).toEqual([[1, 0], [1, 1], [-1, 1], [-1, 0]]);
    expect(Array.from(r.marks)).toEqual([MARK_OUTLET, MARK_WALL, MARK_INLET, MARK_WALL]);
    expect(Array.from(r.wallIds)).toEqual([-1, 1, -1, -1]);
    expect(signedArea(r.xy)).toBe(2);
  });

  it('keeps a ring wholly on the kept side as it is and drops one wholly on the other side', () => {
    const hole = (cy: number) => ring([[-0.2, cy - 0.1], [-0.2, cy + 0.1], [0.2, cy + 0.1], [0.2, cy - 0.1]], [0, 0, 0, 0], [2, 2, 2, 2]);
    const kept = hole(0.5), gone = hole(-0.5);
    const { outers, holes } = clipToHalfPlane(square, [kept, gone], above);
    expect(outers).toHaveLength(1);
    expect(holes).toEqual([kept]);
  });

  it('joins an island the line cuts in half to the outer boundary: axis, half island, axis', () => {
    // A clockwise square island -0.5 .. 0.5 (the valve head on its axis).
    const island = ring([[-0.5, -0.5], [-0.5, 0.5], [0.5, 0.5], [0.5, -0.5]], [0, 0, 0, 0], [2, 2, 2, 2]);
    const { outers, holes } = clipToHalfPlane(square, [island], above);
    expect(holes).toEqual([]);
    expect(outers).toHaveLength(1);
    const r = outers[0];
    expect(points(r)).toEqual([[1, 0], [1, 1], [-1, 1], [-1, 0], [-0.5, 0], [-0.5, 0.5], [0.5, 0.5], [0.5, 0]]);
    expect(Array.from(r.wallIds)).toEqual([-1, 1, -1, -1, 2, 2, 2, -1]);
    expect(signedArea(r.xy)).toBeCloseTo(2 - 0.5, 12);
  });

  it('keeps the side the normal points to: the lower half of the square turns counter-clockwise too', () => {
    const { outers } = clipToHalfPlane(square, [], { x: 0, y: 0, normalX: 0, normalY: -3 });
    expect(points(outers[0])).toEqual([[-1, 0], [-1, -1], [1, -1], [1, 0]]);
    expect(Array.from(outers[0].marks)).toEqual([MARK_INLET, MARK_WALL, MARK_OUTLET, MARK_WALL]);
    expect(signedArea(outers[0].xy)).toBe(2);
  });

  it('gives two pieces where the kept side holds two separate parts of a U-shaped outline', () => {
    const u = ring([[0, 0], [3, 0], [3, 2], [2, 2], [2, 1], [1, 1], [1, 2], [0, 2]], [0, 0, 0, 0, 0, 0, 0, 0]);
    const { outers } = clipToHalfPlane(u, [], { x: 0, y: 1.5, normalX: 0, normalY: 1 });
    expect(outers.map((r) => signedArea(r.xy)).sort()).toEqual([0.5, 0.5]);
  });

  it('leaves nothing when the whole outline lies on the other side, and treats points on the line as outside', () => {
    expect(clipToHalfPlane(square, [], { x: 0, y: 1, normalX: 0, normalY: 1 }).outers).toEqual([]);
  });

  it('keeps an edge drawn on the line itself as the wall along the line', () => {
    const half = ring([[-1, 0], [1, 0], [1, 1], [-1, 1]], [MARK_WALL, MARK_OUTLET, MARK_WALL, MARK_INLET], [3, -1, 1, -1]);
    const { outers } = clipToHalfPlane(half, [], above);
    expect(outers).toHaveLength(1);
    expect(signedArea(outers[0].xy)).toBe(2);
    expect(Array.from(outers[0].marks).filter((m) => m === MARK_INLET)).toHaveLength(1);
  });
});

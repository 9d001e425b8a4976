/** Generated edges and outlines for the geometry fuzz, each with what is known of it exactly (area, circle, crossings). */

import fc from 'fast-check';
import type { Edge, Outline, Point, Section } from '../../src/document/types.ts';

/** Uniform over the range: fc.double draws over the bit patterns (most of them tiny) and favours 0 and the bounds. */
const uniform = (min: number, max: number): fc.Arbitrary<number> =>
  fc.noBias(fc.integer({ min: 0, max: 1 << 30 })).map((k) => min + ((max - min) * k) / (1 << 30));
const coordinate = uniform(-500, 500);
const pointArb = fc.tuple(coordinate, coordinate) as fc.Arbitrary<Point>;

/** A chordal tolerance from a thousandth of a millimetre up to a tenth of `size`. */
export const toleranceFor = (size: number, k: number): number => Math.max(1e-3, size * 10 ** -(1 + (k % 4)));

/** One edge between two distinct points: an arc through a point off its chord, or a curve through 1..4 points. */
export interface EdgeCase {
  readonly start: Point;
  readonly edge: Edge;
  readonly end: Point;
  readonly tolPick: number;
}

/** A point at fraction `along` of the chord a-b, pushed `off` chord lengths to its left. */
export function offChord(a: Point, b: Point, along: number, off: number): Point {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  return [a[0] + along * dx - off * dy, a[1] + along * dy + off * dx];
}

/** Now and then exactly on an end or in line with the chord, where an arc or curve must be refused plainly. */
const fraction = fc.oneof({ weight: 9, arbitrary: uniform(-0.5, 1.5) }, { weight: 1, arbitrary: fc.constantFrom(0, 1, -0.5, 1.5) });
const offset = fc.oneof({ weight: 9, arbitrary: uniform(-1.5, 1.5) }, { weight: 1, arbitrary: fc.constant(0) });

export const edgeCaseArb: fc.Arbitrary<EdgeCase> = fc
  .record({
    start: pointArb, end: pointArb, arc: fc.boolean(), tolPick: fc.nat(),
    bends: fc.array(fc.tuple(fraction, offset), { minLength: 1, maxLength: 4 }),
  })
  .filter(({ start, end }) => Math.hypot(end[0] - start[0], end[1] - start[1]) > 1e-3)
  .map(({ start, end, arc, tolPick, bends }) => {
    const points = bends.map(([along, off]) => offChord(start, end, along, off));
    const edge: Edge = arc ? { kind: 'arc', role: 'wall', through: points[0] } : { kind: 'curve', role: 'wall', via: points };
    return { start, edge, end, tolPick };
  });

/** An outline with a known area: a circle of 3..8 arcs, a rectangle with filleted corners, or a stadium. */
export interface KnownArea {
  readonly outline: Outline;
  /** Exact area of the true (unflattened) shape, length units squared. */
  readonly area: number;
  /** Length of the curved part of the boundary: the flattened area may fall short by at most this times the tolerance. */
  readonly curvedLength: number;
  readonly size: number;
}

const wall = (through?: Point): Edge => (through === undefined ? { kind: 'line', role: 'wall' } : { kind: 'arc', role: 'wall', through });

function circle(cx: number, cy: number, r: number, n: number, turn: number, clockwise: boolean): KnownArea {
  const at = (k: number): Point => [cx + r * Math.cos(turn + (2 * Math.PI * k) / n), cy + r * Math.sin(turn + (2 * Math.PI * k) / n)];
  const ks = Array.from({ length: n }, (_, k) => (clockwise ? n - k : k));
  const step = clockwise ? -0.5 : 0.5;
  return {
    outline: { vertices: ks.map((k) => ({ at: at(k) })), edges: ks.map((k) => wall(at(k + step))) },
    area: Math.PI * r * r, curvedLength: 2 * Math.PI * r, size: 2 * r,
  };
}

function roundedRectangle(x: number, y: number, w: number, h: number, share: number): KnownArea {
  const r = share * 0.5 * Math.min(w, h);
  const corners: Point[] = [[x, y], [x + w, y], [x + w, y + h], [x, y + h]];
  return {
    outline: { vertices: corners.map((at) => ({ at, filletRadius: r })), edges: corners.map(() => wall()) },
    area: w * h - (4 - Math.PI) * r * r, curvedLength: 2 * Math.PI * r, size: Math.hypot(w, h),
  };
}

function stadium(x: number, y: number, w: number, r: number): KnownArea {
  const vertices: Point[] = [[x, y], [x + w, y], [x + w, y + 2 * r], [x, y + 2 * r]];
  return {
    outline: {
      vertices: vertices.map((at) => ({ at })),
      edges: [wall(), wall([x + w + r, y + r]), wall(), wall([x - r, y + r])],
    },
    area: 2 * r * w + Math.PI * r * r, curvedLength: 2 * Math.PI * r, size: w + 2 * r,
  };
}

const place = fc.double({ min: -1000, max: 1000, noNaN: true });
const length = fc.double({ min: 0.05, max: 300, noNaN: true });

export const knownAreaArb: fc.Arbitrary<KnownArea> = fc.oneof(
  fc.tuple(place, place, length, fc.integer({ min: 3, max: 8 }), fc.double({ min: 0, max: 7, noNaN: true }), fc.boolean())
    .map(([cx, cy, r, n, turn, cw]) => circle(cx, cy, r, n, turn, cw)),
  fc.tuple(place, place, length, length, fc.double({ min: 0.01, max: 0.99, noNaN: true }))
    .map(([x, y, w, h, share]) => roundedRectangle(x, y, w, h, share)),
  fc.tuple(place, place, length, length).map(([x, y, w, r]) => stadium(x, y, w, r)),
);

/**
 * 1..3 closed rings of 3..9 points on a small integer grid: many touch, overlap or fold back, and the arithmetic is
 * exact. Half the rings have their points sorted by angle about their middle, which mostly makes them simple.
 */
export const gridRingsArb: fc.Arbitrary<Point[][]> = fc.array(
  fc.tuple(
    fc.array(fc.tuple(fc.integer({ min: 0, max: 12 }), fc.integer({ min: 0, max: 12 })) as fc.Arbitrary<Point>, { minLength: 3, maxLength: 9 }),
    fc.boolean(),
  ).map(([ring, sorted]) => (sorted ? byAngle(ring) : ring)),
  { minLength: 1, maxLength: 3 },
);

function byAngle(ring: Point[]): Point[] {
  const mx = ring.reduce((s, p) => s + p[0], 0) / ring.length, my = ring.reduce((s, p) => s + p[1], 0) / ring.length;
  return [...ring].sort((p, q) => Math.atan2(p[1] - my, p[0] - mx) - Math.atan2(q[1] - my, q[0] - mx));
}

/** A corner between two edges of any kind (line, arc or curve) for the fillet fuzz: three points and the bends. */
export interface CornerCase {
  readonly before: Point;
  readonly corner: Point;
  readonly after: Point;
  readonly edgeIn: Edge;
  readonly edgeOut: Edge;
  /** Radius as a share of the shorter chord. */
  readonly share: number;
}

function bentEdge(a: Point, b: Point, kind: number, off: number, off2: number): Edge {
  if (kind === 0) return { kind: 'line', role: 'wall' };
  if (kind === 1) return { kind: 'arc', role: 'wall', through: offChord(a, b, 0.5, off) };
  return { kind: 'curve', role: 'wall', via: [offChord(a, b, 0.35, off), offChord(a, b, 0.7, off2)] };
}

const bend = uniform(-0.4, 0.4);

export const cornerCaseArb: fc.Arbitrary<CornerCase> = fc
  .record({
    before: pointArb, corner: pointArb, after: pointArb, kindIn: fc.integer({ min: 0, max: 2 }), kindOut: fc.integer({ min: 0, max: 2 }),
    b1: bend, b2: bend, b3: bend, b4: bend, share: fc.double({ min: 0.001, max: 3, noNaN: true }),
  })
  .filter(({ before, corner, after }) => Math.min(dist(before, corner), dist(corner, after), dist(before, after)) > 1)
  .map(({ before, corner, after, kindIn, kindOut, b1, b2, b3, b4, share }) => ({
    before, corner, after, share,
    edgeIn: bentEdge(before, corner, kindIn, b1, b2),
    edgeOut: bentEdge(corner, after, kindOut, b3, b4),
  }));

export function dist(a: Point, b: Point): number {
  return Math.hypot(b[0] - a[0], b[1] - a[1]);
}

/** The triangle before-corner-after closed by a straight edge, the corner filleted with `radius`. */
export function cornerSection(c: CornerCase, radius: number): Section {
  return {
    outline: {
      vertices: [{ at: c.before }, { at: c.corner, filletRadius: radius }, { at: c.after }],
      edges: [c.edgeIn, c.edgeOut, { kind: 'line', role: 'wall' }],
    },
    islands: [],
  };
}

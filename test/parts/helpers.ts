/** An invented test port round a 40 mm valve, its parts, and measures taken back from generated outlines. */

import { expect } from 'vitest';
import type { Edge, Outline, Parts, Point, Section, Vertex } from '../../src/document/types.ts';

/** 40 mm valve, 45 deg seat face 2.5 wide, 1 margin, 30 deg back cut, 7 thick, 7 mm stem drawn 18 up; axis (0, 2), 8 lift. */
export const VALVE_40 = {
  diameter: 40, seatAngleDeg: 45, seatFaceWidth: 2.5, margin: 1, backCutAngleDeg: 30, headThickness: 7,
  stemDiameter: 7, stemLength: 18, axis: { x: 0, y: 2, inclinationDeg: 0 }, lift: 8,
} as const;

/** 91 % throat, 1.5 wide seat, 30 deg top and 60 deg bottom cuts, gauge line 2 above the deck (y = 0). */
export const SEAT_91 = { throatPct: 91, seatWidth: 1.5, topCutAngleDeg: 30, bottomCutAngleDeg: 60, throatOffsetPct: 0, recess: 2 } as const;

/** 80 mm bore, 50 deep, 6 from the valve edge to the nearer wall. */
export const BORE_80 = { diameter: 80, depth: 50, valveEdgeToWall: 6 } as const;

export const PARTS_40: Parts = { valve: VALVE_40, seat: SEAT_91, bore: BORE_80 };

const wall = (wallName: string): Edge => ({ kind: 'line', role: 'wall', wallName });
const at = (x: number, y: number, anchor = false): Vertex => (anchor ? { at: [x, y], anchor: true } : { at: [x, y] });

/**
 * The hand-drawn port, counter-clockwise from the top of the manifold face (x = -60): floor, short side, bowl down to
 * the anchors at y = `anchorY` either side of the axis (x = -/+ `anchorX`), one placeholder edge between them, bowl,
 * long side, roof. `mirror` flips it left for right (manifold on the right).
 */
export function handDrawnPort(options: { anchorX?: number; anchorY?: number; mirror?: boolean } = {}): Section {
  const ax = options.anchorX ?? 18.2, ay = options.anchorY ?? 8;
  const vertices = [
    at(-60, 60), at(-60, 30), at(-25, 30), at(-23, 15), at(-ax, ay, true), at(ax, ay, true), at(23, 15), at(12, 60),
  ];
  const edges: Edge[] = [
    { kind: 'line', role: 'inlet' }, wall('floor'), wall('short side'), wall('bowl (short side)'), wall('seat'), wall('bowl (long side)'),
    wall('long side'), wall('roof'),
  ];
  if (!options.mirror) return { outline: { vertices, edges }, islands: [] };
  // Mirrored in x the outline runs clockwise; reverse it so edge i still runs from vertex i to i + 1.
  const flipped = vertices.map((v) => ({ ...v, at: [-v.at[0], v.at[1]] as Point }));
  const n = vertices.length;
  return {
    outline: {
      vertices: flipped.map((_, i) => flipped[(n - i) % n]),
      edges: edges.map((_, i) => edges[(2 * n - 1 - i) % n]),
    },
    islands: [],
  };
}

/** One edge of an outline as two points, with its name and role. */
export interface Run {
  readonly name: string | undefined;
  readonly role: Edge['role'];
  readonly a: Point;
  readonly b: Point;
}

/** The edges from the anchor `from` forward to the next anchor, as drawn. */
export function runFromAnchor(outline: Outline, from: number): Run[] {
  const n = outline.vertices.length, out: Run[] = [];
  for (let k = from; ; k = (k + 1) % n) {
    const e = outline.edges[k];
    out.push({ name: e.wallName, role: e.role, a: outline.vertices[k].at, b: outline.vertices[(k + 1) % n].at });
    if (outline.vertices[(k + 1) % n].anchor) return out;
  }
}

export const length = (r: { a: Point; b: Point }): number => Math.hypot(r.b[0] - r.a[0], r.b[1] - r.a[1]);
export const unit = (r: { a: Point; b: Point }): Point => {
  const l = length(r);
  return [(r.b[0] - r.a[0]) / l, (r.b[1] - r.a[1]) / l];
};

/** Acute angle in degrees between the line of `r` and a line of direction `d` (unit). */
export function angleTo(r: { a: Point; b: Point }, d: Point): number {
  const u = unit(r);
  const c = Math.min(1, Math.abs(u[0] * d[0] + u[1] * d[1]));
  return (Math.acos(c) * 180) / Math.PI;
}

/** Distance from point p to the infinite line through r. */
export function distanceToLine(p: Point, r: { a: Point; b: Point }): number {
  const u = unit(r);
  return Math.abs((p[0] - r.a[0]) * u[1] - (p[1] - r.a[1]) * u[0]);
}

/** Checks `actual` is within `delta` of `expected` (one helper for every approximate comparison). */
export function assertInDelta(actual: number, expected: number, delta = 1e-9): void {
  expect(Math.abs(actual - expected), `${actual} vs ${expected}`).toBeLessThanOrEqual(delta);
}

/** Freezes a value and everything in it, so a test proves the code under test never mutates it. */
export { deepFreeze } from '../editor/fixtures.ts';

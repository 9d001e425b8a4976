import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Point } from '../../src/document/types.ts';
import { signedArea } from '../../src/geometry/area.ts';
import { findCrossing } from '../../src/geometry/crossings.ts';
import { sectionToDomain } from '../../src/geometry/to-domain.ts';
import { polygon, section } from './helpers.ts';

// Fixed seed: the same cases every run.
const runs = { seed: 20250611, numRuns: 300 };

/** Convex polygons: corners on an ellipse at distinct angles (tenths of a degree), optionally clockwise. */
const convexPolygon = fc.record({
  steps: fc.uniqueArray(fc.integer({ min: 0, max: 3599 }), { minLength: 3, maxLength: 24 }),
  cx: fc.double({ min: -1e3, max: 1e3, noNaN: true }),
  cy: fc.double({ min: -1e3, max: 1e3, noNaN: true }),
  a: fc.double({ min: 0.1, max: 500, noNaN: true }),
  b: fc.double({ min: 0.1, max: 500, noNaN: true }),
  clockwise: fc.boolean(),
}).map(({ steps, cx, cy, a, b, clockwise }) => {
  const sorted = [...steps].sort((p, q) => p - q);
  const points = sorted.map((s): Point => [cx + a * Math.cos((s * Math.PI) / 1800), cy + b * Math.sin((s * Math.PI) / 1800)]);
  return clockwise ? points.reverse() : points;
});

describe('properties', () => {
  it('random convex polygons never report a crossing, and come out counter-clockwise', () => {
    fc.assert(fc.property(convexPolygon, (points) => {
      const xy = Float64Array.from(points.flat());
      expect(findCrossing([{ xy }])).toBeNull();
      const domain = sectionToDomain(section(polygon(points)), 1e-3);
      expect(signedArea(domain.outer.xy)).toBeGreaterThan(0);
    }), runs);
  });

  it("random rectangles' area is w * h, whichever way they are drawn", () => {
    const rect = fc.record({
      x: fc.double({ min: -1e4, max: 1e4, noNaN: true }),
      y: fc.double({ min: -1e4, max: 1e4, noNaN: true }),
      w: fc.double({ min: 1e-2, max: 1e3, noNaN: true }),
      h: fc.double({ min: 1e-2, max: 1e3, noNaN: true }),
      clockwise: fc.boolean(),
    });
    fc.assert(fc.property(rect, ({ x, y, w, h, clockwise }) => {
      const corners: Point[] = [[x, y], [x + w, y], [x + w, y + h], [x, y + h]];
      const domain = sectionToDomain(section(polygon(clockwise ? corners.reverse() : corners)), 1e-3 * Math.min(w, h));
      // The corners themselves are rounded to doubles: compare with the rounded sides.
      const area = signedArea(domain.outer.xy), exact = ((x + w) - x) * ((y + h) - y);
      expect(Math.abs(area - exact)).toBeLessThanOrEqual(1e-12 * exact);
    }), runs);
  });

  it('a filleted convex polygon (small radius at every corner) stays free of crossings', () => {
    fc.assert(fc.property(convexPolygon, fc.double({ min: 0.01, max: 0.99, noNaN: true }), (points, share) => {
      // Every fillet fits when its tangent distance r / tan(angle / 2) stays under half the shortest edge at the
      // sharpest corner: r = share * (shortest / 2) * tan(sharpest / 2), share < 1.
      const n = points.length;
      const edge = (i: number): [number, number] => [points[(i + 1) % n][0] - points[i][0], points[(i + 1) % n][1] - points[i][1]];
      const shortest = Math.min(...points.map((_, i) => Math.hypot(...edge(i))));
      const sharpest = Math.min(...points.map((_, i) => {
        const u = edge((i - 1 + n) % n), w = edge(i);
        return Math.PI - Math.atan2(Math.abs(u[0] * w[1] - u[1] * w[0]), u[0] * w[0] + u[1] * w[1]);
      }));
      const r = share * (shortest / 2) * Math.tan(sharpest / 2);
      const domain = sectionToDomain(section(polygon(points, undefined, points.map(() => r))), 1e-4 * shortest);
      expect(findCrossing([{ xy: domain.outer.xy }])).toBeNull();
    }), { ...runs, numRuns: 100 });
  });
});

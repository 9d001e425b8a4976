/** Geometry-kernel fuzz: flattening within tolerance, areas against exact ones, crossings against brute force, fillets. */

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Point } from '../../src/document/types.ts';
import {
  edgePath, findCrossing, flattenEdge, GeometryError, sectionToDomain, signedArea, solvePathFillet,
} from '../../src/geometry/index.ts';
import { GEOMETRY_RUNS, SEEDS } from './counts.ts';
import { bruteCrossings, segmentDistance } from './brute-geometry.ts';
import { cornerCaseArb, cornerSection, dist, edgeCaseArb, gridRingsArb, knownAreaArb, toleranceFor } from './shapes.ts';

const runs = (numRuns: number) => ({ seed: SEEDS.geometry, numRuns });
const PLACE = { edgeIndex: 0 };


/** The messages a porter may see: one or more whole sentences, no code showing through. */
function expectPlainGeometryError(error: unknown, codes: readonly string[]): void {
  expect(error, String(error)).toBeInstanceOf(GeometryError);
  expect(codes).toContain((error as GeometryError).code);
  expect((error as Error).message).toMatch(/^[A-Z].*\.$/s);
  expect((error as Error).message).not.toMatch(/NaN|undefined|\[object /);
}

describe(`geometry fuzz: ${Object.values(GEOMETRY_RUNS).reduce((a, b) => a + b, 0)} generated shapes`, () => {
  it(`flattens ${GEOMETRY_RUNS.flatten} arcs and curves with every chord within the tolerance of the true edge`, () => {
    let flattened = 0;
    fc.assert(fc.property(edgeCaseArb, ({ start, edge, end, tolPick }) => {
      const tol = toleranceFor(dist(start, end), tolPick);
      let flat;
      try {
        flat = flattenEdge(start, edge, end, tol, PLACE);
      } catch (error) {
        expectPlainGeometryError(error, ['bad-arc', 'zero-length']);
        return;
      }
      flattened++;
      const path = edgePath(start, edge, end, PLACE);
      const { xy, t } = flat;
      const last = xy.length - 2;
      expect([xy[0], xy[1], xy[last], xy[last + 1]]).toEqual([start[0], start[1], end[0], end[1]]);
      let worst = 0;
      for (let k = 0; k + 1 < t.length; k++) {
        expect(t[k + 1]).toBeGreaterThan(t[k]);
        const a: Point = [xy[2 * k], xy[2 * k + 1]], b: Point = [xy[2 * k + 2], xy[2 * k + 3]];
        // The true edge between the two points' parameters, sampled finely, stays within tol of their chord.
        for (let j = 1; j < 16; j++) worst = Math.max(worst, segmentDistance(path.point(t[k] + ((t[k + 1] - t[k]) * j) / 16), a, b));
      }
      const allowed = tol * (1 + 1e-6) + 1e-9;
      expect(worst, `${t.length - 1} chords, tolerance ${tol}`).toBeLessThanOrEqual(allowed);
    }), runs(GEOMETRY_RUNS.flatten));
    expect(flattened).toBeGreaterThan(GEOMETRY_RUNS.flatten / 2);
  });

  it(`gives ${GEOMETRY_RUNS.area} circles, filleted rectangles and stadiums their exact area, less at most tolerance x curved length`, () => {
    fc.assert(fc.property(knownAreaArb, fc.nat(), ({ outline, area, curvedLength, size }, tolPick) => {
      const tol = toleranceFor(size, tolPick);
      const domain = sectionToDomain({ outline, islands: [] }, tol);
      const flatArea = signedArea(domain.outer.xy);
      // Every chord lies inside the true edge (arcs and fillets bulge outwards) and within tol of it.
      const rounding = 1e-9 * (area + size * size);
      expect(flatArea).toBeLessThanOrEqual(area + rounding);
      expect(area - flatArea).toBeLessThanOrEqual(tol * curvedLength + rounding);
    }), runs(GEOMETRY_RUNS.area));
  });

  it(`finds a crossing in ${GEOMETRY_RUNS.crossings} sets of rings exactly when a brute-force test of every segment pair does`, () => {
    let crossing = 0;
    fc.assert(fc.property(gridRingsArb, (rings) => {
      const asXy = rings.map((ring) => ({ xy: Float64Array.from(ring.flat()) }));
      const found = findCrossing(asXy);
      const brute = bruteCrossings(rings);
      expect(found !== null, `brute force found ${brute.length} crossing pairs`).toBe(brute.length > 0);
      if (found === null) return;
      crossing++;
      expect(brute).toContainEqual([found.ringA, found.segmentA, found.ringB, found.segmentB]);
    }), runs(GEOMETRY_RUNS.crossings));
    expect(crossing).toBeGreaterThan(GEOMETRY_RUNS.crossings / 10);
    expect(crossing).toBeLessThan(GEOMETRY_RUNS.crossings * 0.9);
  });

  it(`rounds ${GEOMETRY_RUNS.fillets} corners of lines, arcs and curves with a tangent arc of the asked radius, or says the largest that fits`, () => {
    let solved = 0;
    fc.assert(fc.property(cornerCaseArb, (c) => {
      const radius = c.share * Math.min(dist(c.before, c.corner), dist(c.corner, c.after)) * 0.5;
      let inPath, outPath;
      try {
        inPath = edgePath(c.before, c.edgeIn, c.corner, PLACE);
        outPath = edgePath(c.corner, c.edgeOut, c.after, { edgeIndex: 1 });
      } catch (error) {
        expectPlainGeometryError(error, ['bad-arc', 'zero-length']);
        return;
      }
      const fillet = solvePathFillet(inPath, outPath, radius, 0.5, 0.5);
      if (fillet !== null) {
        solved++;
        expectTangent(inPath, fillet.tIn, fillet.centre, radius);
        expectTangent(outPath, fillet.tOut, fillet.centre, radius);
        expect(fillet.arc.r).toBe(radius);
      }
      expectLargestFits(c, radius);
    }), runs(GEOMETRY_RUNS.fillets));
    expect(solved).toBeGreaterThan(GEOMETRY_RUNS.fillets / 10);
  });
});

/** The fillet's circle touches `path` at t: one radius from its centre, the radius square to the edge there. */
function expectTangent(path: ReturnType<typeof edgePath>, t: number, centre: Point, radius: number): void {
  expect(t).toBeGreaterThanOrEqual(-1e-9);
  expect(t).toBeLessThanOrEqual(1 + 1e-9);
  const p = path.point(t), d = path.derivative(t);
  const rx = p[0] - centre[0], ry = p[1] - centre[1];
  expect(Math.abs(Math.hypot(rx, ry) - radius)).toBeLessThanOrEqual(1e-6 * radius);
  expect(Math.abs(rx * d[0] + ry * d[1]) / (Math.hypot(rx, ry) * Math.hypot(d[0], d[1]))).toBeLessThanOrEqual(1e-6);
}

/**
 * Through the whole kernel: the corner's fillet is placed, or refused with a plain message; when refused as too
 * large, the largest radius it names does fit (the editor clamps a fillet drag to it).
 */
function expectLargestFits(c: Parameters<typeof cornerSection>[0], radius: number): void {
  const tol = 1e-3 * Math.min(dist(c.before, c.corner), dist(c.corner, c.after));
  const tooLarge = (r: number): GeometryError | null => {
    try {
      sectionToDomain(cornerSection(c, r), tol);
      return null;
    } catch (error) {
      expectPlainGeometryError(error, ['fillet-too-large', 'self-crossing', 'bad-arc', 'zero-length', 'bad-outline']);
      return (error as GeometryError).code === 'fillet-too-large' && (error as GeometryError).vertexIndex === 1 ? (error as GeometryError) : null;
    }
  };
  const refused = tooLarge(radius);
  // A corner folded back on itself takes no fillet at all ("at most 0 fits"): there is no largest to try.
  if (refused === null || refused.largestRadius === undefined || refused.largestRadius < 1e-9 * tol) return;
  expect(refused.largestRadius).toBeLessThan(radius);
  // As the store's clamp tries it (src/app/document-store.ts): the largest itself, else a hair less. Beside a curve
  // the fit is not monotone within about 1e-4 of the largest, so a hair less alone is not always enough.
  const fits = tooLarge(refused.largestRadius) === null || tooLarge(refused.largestRadius * (1 - 1e-6)) === null;
  expect(fits, refused.message).toBe(true);
}

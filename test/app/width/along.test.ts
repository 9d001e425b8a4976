/** Places along the port for the strip: points projected onto the path through the station centroids. */
import { describe, expect, it } from 'vitest';
import type { ValvePart } from '../../../src/document/types.ts';
import { alongOfPoint, obstructionSpans, pointUpAxis, seatAlong } from '../../../src/app/width/along.ts';

/** An L-shaped path [derived]: 0 at (0, 0), 10 along at (10, 0), 20 along at (10, -10). */
const path = [
  { midX: 0, midY: 0, distanceFromInlet: 0 },
  { midX: 10, midY: 0, distanceFromInlet: 10 },
  { midX: 10, midY: -10, distanceFromInlet: 20 },
];

const valve = {
  diameter: 40, seatAngleDeg: 45, seatFaceWidth: 2, margin: 1, backCutAngleDeg: 30, headThickness: 4, stemDiameter: 7,
  stemLength: 40, lift: 10, axis: { x: 10, y: -10, inclinationDeg: 0 },
} satisfies ValvePart;

describe('alongOfPoint', () => {
  it('measures a point beside the path by its foot on the nearest leg [derived]', () => {
    expect(alongOfPoint(path, 4, 3)).toBeCloseTo(4, 12);
    expect(alongOfPoint(path, 13, -6)).toBeCloseTo(16, 12);
  });
  it('reaches past the ends: ahead of the first centroid is held at 0, past the last keeps counting', () => {
    expect(alongOfPoint(path, -5, 0)).toBe(0);
    expect(alongOfPoint(path, 10, -14)).toBeCloseTo(24, 12);
  });
  it('has nothing to measure without stations', () => {
    expect(alongOfPoint([], 1, 1)).toBeNull();
  });
});

describe('the valve axis along the port', () => {
  it('up the axis is against the opening direction: 10 degrees of lean opens toward +x, so up goes toward -x [derived]', () => {
    const leaning = { ...valve, axis: { x: 0, y: 0, inclinationDeg: 10 } };
    const [x, y] = pointUpAxis(leaning, 10);
    expect(x).toBeCloseTo(-10 * Math.sin(Math.PI / 18), 12);
    expect(y).toBeCloseTo(10 * Math.cos(Math.PI / 18), 12);
  });
  it('the seat is the gauge-line centre, and a stem from 2 to 8 up the axis covers 12..18 along, widened by its radius', () => {
    expect(seatAlong(valve, path)).toBeCloseTo(20, 12);
    const [span] = obstructionSpans([{ name: 'valve stem', diameter: 7, from: 2, to: 8 }], valve, path);
    expect(span.start).toBeCloseTo(12 - 3.5, 12);
    expect(span.end).toBeCloseTo(18 + 3.5, 12);
    expect(obstructionSpans([{ name: 'valve stem', diameter: 7, from: 2, to: 8 }], undefined, path)).toEqual([]);
  });
});

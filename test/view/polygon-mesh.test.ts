import { describe, expect, it } from 'vitest';
import { segmentPositions } from '../../src/view/line-layer.ts';
import { polygonTriangles } from '../../src/view/polygon-mesh.ts';

function triangleArea(positions: Float32Array, indices: Uint32Array): number {
  let area = 0;
  for (let k = 0; k < indices.length; k += 3) {
    const [a, b, c] = [indices[k], indices[k + 1], indices[k + 2]].map((i) => [positions[3 * i], positions[3 * i + 1]]);
    area += Math.abs((b[0] - a[0]) * (c[1] - a[1]) - (c[0] - a[0]) * (b[1] - a[1])) / 2;
  }
  return area;
}

describe('polygon triangles for the clipped field and hatched flags', () => {
  it('covers the outline less its hole, whatever the winding', () => {
    // 10 x 6 rectangle with a 2 x 2 hole: 60 - 4 = 56 [derived].
    const outer = { xy: Float64Array.from([0, 0, 10, 0, 10, 6, 0, 6]), closed: true };
    const hole = { xy: Float64Array.from([4, 2, 6, 2, 6, 4, 4, 4]), closed: true };
    const ccw = polygonTriangles(outer, [hole]);
    expect(triangleArea(ccw.positions, ccw.indices)).toBeCloseTo(56, 9);
    const cw = polygonTriangles({ xy: Float64Array.from([0, 0, 0, 6, 10, 6, 10, 0, 0, 0]), closed: true }, []);
    expect(triangleArea(cw.positions, cw.indices)).toBeCloseTo(60, 9);
  });

  it('gives nothing for a degenerate ring', () => {
    expect(polygonTriangles({ xy: Float64Array.from([0, 0, 1, 1]), closed: true }, []).indices.length).toBe(0);
  });
});

describe('line segments for fat lines', () => {
  it('lays out two points per segment, closing rings and skipping single points', () => {
    const out = segmentPositions([
      { xy: [0, 0, 1, 0, 1, 1], closed: false },
      { xy: [5, 5, 6, 5, 6, 6], closed: true },
      { xy: [9, 9] },
    ]);
    expect(Array.from(out)).toEqual([
      0, 0, 0, 1, 0, 0,
      1, 0, 0, 1, 1, 0,
      5, 5, 0, 6, 5, 0,
      6, 5, 0, 6, 6, 0,
      6, 6, 0, 5, 5, 0,
    ]);
  });
});

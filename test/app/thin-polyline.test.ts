import { describe, expect, it } from 'vitest';
import { thinPolyline } from '../../src/app/thin-polyline.ts';

describe('thinPolyline', () => {
  it('keeps the ends and one point per spacing along a straight run', () => {
    const xy = new Float64Array(202);
    for (let k = 0; k <= 100; k++) xy[2 * k] = k * 0.1; // 0 .. 10 in steps of 0.1
    const thin = thinPolyline(xy, 1);
    expect(Array.from(thin.filter((_, i) => i % 2 === 0)).map((x) => Math.round(x * 10) / 10)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
  });

  it('returns short lines untouched', () => {
    const xy = new Float64Array([0, 0, 1, 1]);
    expect(thinPolyline(xy, 5)).toBe(xy);
  });
});

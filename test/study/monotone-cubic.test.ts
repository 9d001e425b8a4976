import { describe, expect, it } from 'vitest';
import { monotoneCubic } from '../../src/study/monotone-cubic.ts';

describe('monotoneCubic (Fritsch and Carlson, SIAM J. Numer. Anal. 17, 1980)', () => {
  it('is the straight line through two points, held at the end values beyond them', () => {
    const f = monotoneCubic([0, 10], [30, 34]);
    expect(f(5)).toBeCloseTo(32, 12);
    expect(f(2.5)).toBeCloseTo(31, 12);
    expect(f(-4)).toBe(30);
    expect(f(12)).toBe(34);
  });

  it('goes through every point and gives exactly a constant width for equal widths', () => {
    const xs = [0, 12, 40, 55, 80], ys = [32, 31, 34, 50, 50];
    const f = monotoneCubic(xs, ys);
    xs.forEach((x, k) => expect(f(x)).toBeCloseTo(ys[k], 12));
    const flat = monotoneCubic([0, 7, 30], [32, 32, 32]);
    for (const x of [0.1, 3, 7.5, 29.99]) expect(flat(x)).toBe(32);
  });

  it('never overshoots: rising data give a rising curve, a narrowest station stays the narrowest [derived]', () => {
    const xs = [0, 12, 40, 55, 80], ys = [32, 31, 34, 50, 50];
    const f = monotoneCubic(xs, ys);
    let before = f(12);
    for (let x = 12; x <= 80; x += 0.25) {
      const y = f(x);
      expect(y).toBeGreaterThanOrEqual(before - 1e-12);
      expect(y).toBeLessThanOrEqual(50 + 1e-12);
      before = y;
    }
    for (let x = 0; x <= 40; x += 0.25) expect(f(x)).toBeGreaterThanOrEqual(31 - 1e-12);
  });

  it('is smooth: the slope is continuous at an inner point', () => {
    const f = monotoneCubic([0, 10, 30], [30, 34, 44]);
    const slope = (x: number, e: number) => (f(x + e) - f(x)) / e;
    expect(slope(10, 1e-6)).toBeCloseTo(slope(10 - 1e-6, 1e-6), 4);
  });

  it('refuses fewer than two points', () => {
    expect(() => monotoneCubic([1], [30])).toThrow(RangeError);
  });
});

import { describe, expect, it } from 'vitest';
import { finiteMax, quantile, resolveColourRange } from '../../src/view/colour-range.ts';

describe('colour range', () => {
  it('takes the nearest-rank quantile of the finite values only', () => {
    expect(quantile([3, 1, 2, NaN], 0.5)).toBe(2);
    expect(quantile([5, NaN, Infinity], 1)).toBe(5);
    expect(quantile([NaN], 0.5)).toBeNaN();
    // Ordered by value, not as text (which would put 100 before 2) [derived: -1, 2, 9, 10, 100, rank 3].
    expect(quantile(Float32Array.from([10, 9, -1, 100, 2]), 0.6)).toBe(9);
    expect(() => quantile([1], 1.5)).toThrow(RangeError);
  });

  it('keeps a single corner singularity from washing out the automatic scale', () => {
    // 999 ordinary cells at 1.2 and one at a sharp convex corner where ideal speed is unbounded (REFERENCES.md 1:
    // speed ~ r^(pi/alpha - 1) grows without limit at a convex edge [derived]).
    const values = new Float32Array(1000).fill(1.2);
    values[17] = 250;
    const range = resolveColourRange({ mode: 'auto', min: 0, max: 0 }, values);
    expect(range).toEqual({ min: 0, max: Math.fround(1.2) });
    expect(finiteMax(values)).toBe(250);
  });

  it('uses a fixed range as given and rejects an empty one with a readable message', () => {
    expect(resolveColourRange({ mode: 'fixed', min: 0.5, max: 2 }, null)).toEqual({ min: 0.5, max: 2 });
    expect(() => resolveColourRange({ mode: 'fixed', min: 2, max: 2 }, null)).toThrow(/top above its bottom/);
  });

  it('falls back to 0..1 with no field or a still field', () => {
    expect(resolveColourRange({ mode: 'auto', min: 0, max: 0 }, null)).toEqual({ min: 0, max: 1 });
    expect(resolveColourRange({ mode: 'auto', min: 0, max: 0 }, new Float32Array(4))).toEqual({ min: 0, max: 1 });
  });
});

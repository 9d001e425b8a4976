import { describe, expect, it } from 'vitest';
import { formatNice, niceFloor, scaleBar, ticks } from '../../src/view/nice-numbers.ts';

describe('round numbers', () => {
  it('floors to 1, 2 or 5 times a power of ten', () => {
    expect([0.37, 1, 1.99, 2, 4.9, 5, 9.99, 10, 730].map(niceFloor)).toEqual([0.2, 1, 1, 2, 2, 5, 5, 10, 500]);
    expect(() => niceFloor(0)).toThrow(RangeError);
  });

  it('formats with only the digits needed', () => {
    expect([0.05, 0.5, 2, 20, 500].map(formatNice)).toEqual(['0.05', '0.5', '2', '20', '500']);
  });

  it('picks the longest round scale-bar length that fits', () => {
    // 4 px per mm, at most 120 px: 30 mm fits, the round length below is 20 mm = 80 px.
    expect(scaleBar(4, 120, 'mm')).toEqual({ length: 20, px: 80, label: '20 mm' });
    // 150 px per inch, at most 120 px: 0.8 in fits, round length 0.5 in = 75 px.
    expect(scaleBar(150, 120, 'inch')).toEqual({ length: 0.5, px: 75, label: '0.5 in' });
  });

  it('places colour-bar ticks on round values inside the range', () => {
    expect(ticks(0, 1.44, 8)).toEqual({ step: 0.2, values: [0, 0.2, 0.4, 0.6, 0.8, 1, 1.2, 1.4] });
    expect(ticks(0.7, 1.45, 4)).toEqual({ step: 0.2, values: [0.8, 1, 1.2, 1.4] });
    expect(ticks(0, 1, 5).values).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    // 1.44 / 6 = 0.24: a 2.5 step rather than jumping to 0.5.
    expect(ticks(0, 1.44, 6)).toEqual({ step: 0.25, values: [0, 0.25, 0.5, 0.75, 1, 1.25] });
  });
});

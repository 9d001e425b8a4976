import { describe, expect, it } from 'vitest';
import { cellMaskInside, clipPolyline, ringsInside } from '../../src/view/clip.ts';

const square = ringsInside({ outer: { xy: Float64Array.from([0, 0, 10, 0, 10, 10, 0, 10]), closed: true }, holes: [] });

describe('clipping to the fluid', () => {
  it('tells inside from outside by the even-odd rule, holes included', () => {
    const withHole = ringsInside({
      outer: { xy: Float64Array.from([0, 0, 10, 0, 10, 10, 0, 10]), closed: true },
      holes: [{ xy: Float64Array.from([4, 4, 4, 6, 6, 6, 6, 4]), closed: true }],
    });
    expect([withHole(1, 1), withHole(5, 5), withHole(11, 5), withHole(3, 5)]).toEqual([true, false, false, true]);
  });

  it('cuts a line where it leaves, to well under a pixel', () => {
    const runs = clipPolyline([-5, 5, 5, 5, 15, 5], false, square);
    expect(runs).toHaveLength(1);
    const [x0, y0, x1, y1, x2, y2] = runs[0];
    expect(Math.abs(x0)).toBeLessThan(1e-3);
    expect([y0, x1, y1, y2]).toEqual([5, 5, 5, 5]);
    expect(Math.abs(x2 - 10)).toBeLessThan(1e-3);
  });

  it('splits a line that leaves and comes back into two runs', () => {
    const runs = clipPolyline([2, 2, 2, 12, 8, 12, 8, 2], false, square);
    expect(runs).toHaveLength(2);
  });

  it('keeps a closed ring that stays inside whole, and rejoins one that is cut open', () => {
    const whole = clipPolyline([2, 2, 8, 2, 8, 8, 2, 8], true, square);
    expect(whole).toEqual([[2, 2, 8, 2, 8, 8, 2, 8, 2, 2]]);
    // Starts inside, dips out through the right edge, closes inside: one run from re-entry round to the exit.
    const cut = clipPolyline([2, 2, 8, 2, 12, 5, 8, 8, 2, 8], true, square);
    expect(cut).toHaveLength(1);
    const run = cut[0];
    expect(run).toHaveLength(12);
    expect(Math.abs(run[0] - 10)).toBeLessThan(1e-3);
    expect(run.slice(2, 10)).toEqual([8, 8, 2, 8, 2, 2, 8, 2]);
    expect(Math.abs(run[10] - 10)).toBeLessThan(1e-3);
  });

  it('reads the fluid from the field cells', () => {
    const inside = cellMaskInside({ nx: 2, ny: 1, x0: 0, y0: 0, h: 1, values: Float32Array.from([1, NaN]) });
    expect([inside(0.5, 0.5), inside(1.5, 0.5), inside(-0.1, 0.5), inside(0.5, 1.2)]).toEqual([true, false, false, false]);
  });
});

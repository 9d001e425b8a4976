import { describe, expect, it } from 'vitest';
import { COLOUR_MAP_SIZE, colourMapBytes, viridis } from '../../src/view/colour-map.ts';

/** sRGB component (0..1) to linear light, IEC 61966-2-1. [pub: IEC 61966-2-1:1999, the sRGB standard] */
function toLinear(c: number): number {
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

describe('viridis colour map', () => {
  // Published viridis table entries (matplotlib _cm_listed, van der Walt & Smith 2015, CC0):
  // first [0.267004, 0.004874, 0.329415] (#440154), entry 128 [0.127568, 0.566949, 0.550556],
  // last [0.993248, 0.906157, 0.143936] (#fde725). [memory: recalled, not re-read]
  // The fit is a polynomial, so allow 0.02 per channel (under 6/255).
  it.each([
    [0, [0.267004, 0.004874, 0.329415]],
    [128 / 255, [0.127568, 0.566949, 0.550556]],
    [1, [0.993248, 0.906157, 0.143936]],
  ])('matches the published table at t = %f', (t, expected) => {
    const got = viridis(t);
    for (let ch = 0; ch < 3; ch++) expect(Math.abs(got[ch] - expected[ch])).toBeLessThan(0.02);
  });

  it('rises in luminance from end to end, so darker always means slower', () => {
    // Perceptual maps are designed with monotonic lightness [pub: van der Walt & Smith, "A better default colormap
    // for Matplotlib", SciPy 2015]; relative luminance Y per ITU-R BT.709 weights.
    let previous = -Infinity;
    for (let k = 0; k < COLOUR_MAP_SIZE; k++) {
      const [r, g, b] = viridis(k / (COLOUR_MAP_SIZE - 1)).map(toLinear);
      const y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
      expect(y).toBeGreaterThan(previous);
      previous = y;
    }
  });

  it('builds a 256 x 1 RGBA texture whose entries are the map at k / 255', () => {
    const bytes = colourMapBytes();
    expect(bytes.length).toBe(COLOUR_MAP_SIZE * 4);
    for (const k of [0, 77, 255]) {
      const [r, g, b] = viridis(k / 255);
      expect([bytes[4 * k], bytes[4 * k + 1], bytes[4 * k + 2], bytes[4 * k + 3]]).toEqual([
        Math.round(r * 255),
        Math.round(g * 255),
        Math.round(b * 255),
        255,
      ]);
    }
  });

  it('clamps t outside 0..1 to the ends', () => {
    expect(viridis(-3)).toEqual(viridis(0));
    expect(viridis(7)).toEqual(viridis(1));
  });
});

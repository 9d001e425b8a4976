import { describe, expect, it } from 'vitest';
import { ringsInside } from '../../src/view/clip.ts';
import { contourLines, labelAnchors } from '../../src/view/contour-lines.ts';
import type { FieldImage } from '../../src/view/types.ts';
import { bendClip, bendField, bendSpeedRatio, insideBend } from './bend-field.ts';

function ramp(nx: number, ny: number): FieldImage {
  const values = new Float32Array(nx * ny);
  for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) values[i + j * nx] = i;
  return { nx, ny, x0: 100, y0: -50, h: 2, values };
}

describe('contour lines', () => {
  it('puts a level of a linear ramp exactly between the two cell centres', () => {
    // Value i at cell centre x0 + (i + 0.5) h: level 2.5 lies at x0 + 3 h = 106 [derived].
    const lines = contourLines(ramp(6, 4), [2.5]);
    expect(lines).toHaveLength(1);
    const xy = lines[0].xy;
    const ys: number[] = [];
    for (let k = 0; k < xy.length; k += 2) {
      expect(xy[k]).toBeCloseTo(106, 9);
      ys.push(xy[k + 1]);
    }
    // Clipped to the grid: from its bottom edge (y0 = -50) to its top edge (-50 + 4 h = -42), nothing along the edge.
    expect(Math.min(...ys)).toBeCloseTo(-50, 2);
    expect(Math.max(...ys)).toBeCloseTo(-42, 2);
  });

  it('draws the free-vortex speed contours as circles r = K / level', () => {
    // Concentric bend, speed ratio (r2 - r1) / (r ln(r2/r1)) [derived, REFERENCES.md 1a]. Linear interpolation of
    // 1/r between cell centres moves a contour by at most about h^2 / (4 r) [derived from the interpolation error].
    const bend = { r1: 20, r2: 40 };
    const h = 0.5;
    const field = bendField(bend, h);
    const bound = (h * h) / (4 * bend.r1);
    for (const level of [0.8, 1.0, 1.2, 1.4]) {
      const radius = bendSpeedRatio(bend, 1) / level;
      const lines = contourLines(field, [level]);
      expect(lines.length).toBeGreaterThan(0);
      for (const line of lines) {
        for (let k = 0; k < line.xy.length; k += 2) {
          const r = Math.hypot(line.xy[k], line.xy[k + 1]);
          expect(Math.abs(r - radius)).toBeLessThan(1.2 * bound);
        }
      }
    }
  });

  it('keeps every line inside the fluid outline when clipped by it', () => {
    const bend = { r1: 20, r2: 40 };
    const field = bendField(bend, 1);
    const lines = contourLines(field, [0.75, 0.9, 1.1, 1.3], ringsInside(bendClip(bend)));
    let points = 0;
    for (const line of lines) {
      for (let k = 0; k < line.xy.length; k += 2) {
        // Inside the sector, or on its edge to within the bisection tolerance.
        const x = line.xy[k];
        const y = line.xy[k + 1];
        const nudged = insideBend(bend, x + 1e-3, y + 1e-3) || insideBend(bend, x, y) || insideBend(bend, x - 1e-3, y + 1e-3);
        expect(nudged).toBe(true);
        points++;
      }
    }
    expect(points).toBeGreaterThan(100);
  });

  it('draws nothing along the walls for a level below the whole field', () => {
    const field = bendField({ r1: 20, r2: 40 }, 1);
    expect(contourLines(field, [0.1])).toEqual([]);
  });

  it('rejects a field whose values do not fill its grid', () => {
    expect(() => contourLines({ nx: 3, ny: 3, x0: 0, y0: 0, h: 1, values: new Float32Array(8) }, [1])).toThrow(/9|3 x 3/);
  });
});

describe('contour label places', () => {
  it('spreads labels evenly along a line and skips short lines', () => {
    const long = { level: 1.2, xy: Float64Array.from([0, 0, 10, 0]) };
    const short = { level: 0.8, xy: Float64Array.from([0, 5, 1, 5]) };
    expect(labelAnchors([long, short], 4, 2)).toEqual([
      { x: 2.5, y: 0, level: 1.2, rank: 0, line: 0 },
      { x: 7.5, y: 0, level: 1.2, rank: 0, line: 0 },
    ]);
  });

  it('offers every line its middle label before any line gets another', () => {
    const a = { level: 1, xy: Float64Array.from([0, 0, 50, 0]) };
    const b = { level: 2, xy: Float64Array.from([0, 9, 10, 9]) };
    const anchors = labelAnchors([a, b], 10, 2);
    expect(anchors.map((p) => [p.level, p.rank])).toEqual([
      [1, 0],
      [2, 0],
      [1, 1],
      [1, 1],
      [1, 2],
      [1, 2],
    ]);
    expect(anchors[0].x).toBe(25);
  });
});

/** Speed-ratio contour lines from the field (marching squares by d3-contour), clipped to the fluid, in section units. */

import { contours } from 'd3-contour';
import { cellMaskInside, clipPolyline, type InsideTest } from './clip.ts';
import type { ContourLevels, FieldImage } from './types.ts';

/** One connected piece of a contour line. */
export interface ContourLine {
  /** Speed ratio along this line. */
  readonly level: number;
  /** x0, y0, x1, y1, ... section units. */
  readonly xy: Float64Array;
}

/** Solid cells added around the grid: one ring takes the extended values, the next stays NaN, so a ring that
 * closes along the grid edge does so outside the grid, where clipping removes it. */
const PAD = 2;

/**
 * The values on a grid grown by PAD cells each side (NaN there), where each solid cell beside the fluid takes the
 * mean of its fluid 4-neighbours. Marching squares then runs a line on past the last fluid cell centre instead of
 * bending it along the wall; clipping cuts it where the fluid ends. Cells further out stay NaN, which d3-contour
 * treats as below every level. Layout: row-major i + j * (nx + 2 PAD), cell (i, j) of the field at (i + PAD, j + PAD).
 */
function paddedForContours(field: FieldImage): Float64Array {
  const { nx, ny, values } = field;
  const px = nx + 2 * PAD;
  const py = ny + 2 * PAD;
  const src = new Float64Array(px * py).fill(NaN);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) src[i + PAD + (j + PAD) * px] = values[i + j * nx];
  }
  const out = Float64Array.from(src);
  for (let j = 0; j < py; j++) {
    for (let i = 0; i < px; i++) {
      const c = i + j * px;
      if (Number.isFinite(src[c])) continue;
      let sum = 0;
      let count = 0;
      for (const k of [i > 0 ? c - 1 : -1, i < px - 1 ? c + 1 : -1, j > 0 ? c - px : -1, j < py - 1 ? c + px : -1]) {
        if (k >= 0 && Number.isFinite(src[k])) {
          sum += src[k];
          count++;
        }
      }
      if (count > 0) out[c] = sum / count;
    }
  }
  return out;
}

/**
 * Contour lines at each level, clipped by `inside` (default: the field's own fluid cells).
 * d3-contour places value k of a row at k + 0.5 grid units; padded cell k is field cell k - PAD, centred at
 * x0 + (k - PAD + 0.5) h.
 */
export function contourLines(field: FieldImage, levels: ContourLevels, inside?: InsideTest): ContourLine[] {
  const { nx, ny, x0, y0, h } = field;
  if (nx < 2 || ny < 2) return [];
  if (field.values.length !== nx * ny) {
    throw new RangeError(`Field has ${field.values.length} values but ${nx} x ${ny} cells.`);
  }
  const test = inside ?? cellMaskInside(field);
  const extended = paddedForContours(field);
  const maker = contours().size([nx + 2 * PAD, ny + 2 * PAD]);
  const lines: ContourLine[] = [];
  for (const level of levels) {
    if (!Number.isFinite(level)) continue;
    const shape = maker.contour(extended as unknown as number[], level);
    for (const polygon of shape.coordinates) {
      for (const ring of polygon) {
        const xy = new Float64Array(ring.length * 2);
        ring.forEach(([gx, gy], k) => {
          xy[2 * k] = x0 + (gx - PAD) * h;
          xy[2 * k + 1] = y0 + (gy - PAD) * h;
        });
        // d3 rings repeat their first point at the end; drop it and treat the ring as closed.
        const open = xy.subarray(0, xy.length - 2);
        for (const run of clipPolyline(open, true, test)) lines.push({ level, xy: Float64Array.from(run) });
      }
    }
  }
  return lines;
}

/** A place to write a contour's level. */
export interface LabelAnchor {
  readonly x: number;
  readonly y: number;
  readonly level: number;
  /** 0 for the place nearest the middle of its line, then 1, 2... outward: labels are placed in this order. */
  readonly rank: number;
  /** Index of the line in the list given to labelAnchors. */
  readonly line: number;
}

/**
 * Candidate label places along each line, about `spacing` section units apart, centred on the line; lines shorter
 * than `minLength` get none (a label would hide them). The view thins these out on screen so labels never crowd.
 */
export function labelAnchors(lines: readonly ContourLine[], spacing: number, minLength: number): LabelAnchor[] {
  const anchors: LabelAnchor[] = [];
  lines.forEach((line, index) => {
    const cum = cumulativeLength(line.xy);
    const total = cum[cum.length - 1];
    if (total < minLength) return;
    const count = Math.max(1, Math.floor(total / spacing));
    for (let k = 0; k < count; k++) {
      const p = pointAt(line.xy, cum, ((k + 0.5) * total) / count);
      anchors.push({ x: p[0], y: p[1], level: line.level, rank: Math.floor(Math.abs(k - (count - 1) / 2)), line: index });
    }
  });
  // Every line's middle label first, so each level gets one before any gets a second (sort is stable).
  return anchors.sort((a, b) => a.rank - b.rank);
}

function cumulativeLength(xy: Float64Array): Float64Array {
  const n = xy.length / 2;
  const cum = new Float64Array(n);
  for (let k = 1; k < n; k++) {
    cum[k] = cum[k - 1] + Math.hypot(xy[2 * k] - xy[2 * k - 2], xy[2 * k + 1] - xy[2 * k - 1]);
  }
  return cum;
}

function pointAt(xy: Float64Array, cum: Float64Array, s: number): [number, number] {
  let k = 1;
  while (k < cum.length - 1 && cum[k] < s) k++;
  const seg = cum[k] - cum[k - 1];
  const t = seg > 0 ? (s - cum[k - 1]) / seg : 0;
  return [xy[2 * k - 2] + t * (xy[2 * k] - xy[2 * k - 2]), xy[2 * k - 1] + t * (xy[2 * k + 1] - xy[2 * k - 1])];
}

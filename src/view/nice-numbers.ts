/** Round numbers for the scale bar and the colour-bar ticks (1, 2 or 5 times a power of ten). */

import type { LengthUnits } from './types.ts';

/** Largest 1, 2 or 5 x 10^k not above `limit` (limit > 0). Example: niceFloor(0.37) = 0.2. */
export function niceFloor(limit: number): number {
  if (!(limit > 0 && Number.isFinite(limit))) throw new RangeError(`niceFloor: need a positive finite number, got ${limit}`);
  const power = 10 ** Math.floor(Math.log10(limit));
  // Guard against log10 rounding just below an exact power of ten.
  const m = limit / power;
  const mant = m >= 5 - 1e-9 ? 5 : m >= 2 - 1e-9 ? 2 : m >= 1 - 1e-9 ? 1 : 0.5;
  return mant * power;
}

/** Format a length with just the digits its size needs: 0.5, 2, 20, 0.05. */
export function formatNice(value: number): string {
  if (value === 0) return '0';
  const decimals = Math.max(0, -Math.floor(Math.log10(Math.abs(value)) + 1e-9));
  return value.toFixed(Math.min(6, decimals));
}

export interface ScaleBar {
  /** Bar length, section units. */
  readonly length: number;
  /** Bar length, CSS px. */
  readonly px: number;
  /** e.g. "10 mm", "0.5 in". */
  readonly label: string;
}

/**
 * The longest round length whose bar fits in `maxPx` CSS px at `pxPerUnit` CSS px per section unit.
 * Example: 4 px/mm, 120 px max -> 20 mm drawn 80 px long.
 */
export function scaleBar(pxPerUnit: number, maxPx: number, units: LengthUnits): ScaleBar {
  const length = niceFloor(maxPx / pxPerUnit);
  const unitLabel = units === 'mm' ? 'mm' : 'in';
  return { length, px: length * pxPerUnit, label: `${formatNice(length)} ${unitLabel}` };
}

/**
 * Round tick values on [min, max]: the step is the smallest 1, 2, 2.5 or 5 x 10^k not below (max - min) / intervals.
 * Example: ticks(0, 1.44, 8) -> step 0.2, values 0, 0.2, ..., 1.4.
 */
export function ticks(min: number, max: number, intervals: number): { step: number; values: number[] } {
  if (!(max > min) || !(intervals >= 1)) return { step: 0, values: [min] };
  const raw = (max - min) / intervals;
  let step = niceFloor(raw);
  if (step < raw * (1 - 1e-9)) step = nextNice(step);
  const values: number[] = [];
  const first = Math.ceil(min / step - 1e-9);
  for (let k = first; k * step <= max + step * 1e-9; k++) values.push(roundTo(k * step, step));
  return { step, values };
}

/** The next tick step above a round step: 1 -> 2 -> 2.5 -> 5 -> 10 (2.5 fills the wide gap between 2 and 5). */
function nextNice(step: number): number {
  const power = 10 ** Math.floor(Math.log10(step) + 1e-9);
  const mant = step / power;
  const next = [2, 2.5, 5, 10].find((m) => m > mant + 1e-9) ?? 10;
  return next * power;
}

/** Remove binary noise such as 0.30000000000000004 by rounding to the step's decimals. */
function roundTo(value: number, step: number): number {
  const decimals = Math.max(0, -Math.floor(Math.log10(step)) + 1);
  return Number(value.toFixed(decimals));
}

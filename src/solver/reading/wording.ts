/** Numbers in porter's words: lengths with units, speed ratios and percentages. */
import type { LengthUnits, PassageModel } from './types.ts';

/** The model in words, as the app's readings and the command's report name it. */
export const MODEL_WORDS: Readonly<Record<PassageModel, string>> = {
  plane: 'plane, per unit depth',
  width: 'width profile',
  axisymmetric: 'axisymmetric, round about the axis',
};

/** A length in document units with its unit: "23.1 mm", "0.91 in". */
export function lengthText(value: number, units: LengthUnits): string {
  const size = Math.abs(value);
  if (units === 'inch') return `${value.toFixed(size >= 10 ? 1 : size >= 1 ? 2 : 3)} in`;
  return `${value.toFixed(size >= 100 ? 0 : 1)} mm`;
}

/** An area in document units squared with its unit: "1240 mm²", "1.92 in²". */
export function areaText(value: number, units: LengthUnits): string {
  const size = Math.abs(value);
  if (units === 'inch') return `${value.toFixed(size >= 10 ? 1 : size >= 1 ? 2 : 3)} in²`;
  return `${value.toFixed(size >= 100 ? 0 : 1)} mm²`;
}

/** A speed ratio: "1.92". */
export function ratioText(value: number): string {
  return value.toFixed(2);
}

/** A share as a whole percentage: "18%"; "under 1%" for a small non-zero share. */
export function percentText(share: number): string {
  const pct = Math.round(share * 100);
  return pct === 0 && share > 0 ? 'under 1%' : `${pct}%`;
}

/** The wall's name with a capital first letter, to open a sentence. */
export function opening(name: string): string {
  return name.length > 0 ? name[0].toUpperCase() + name.slice(1) : name;
}

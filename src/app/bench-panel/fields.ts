/** The bench panel's input fields: what each measures, its limits, and the message a porter sees when a number won't do. */

import { BENCH_BOUNDS } from '../../document/limits.ts';
import { fieldFromSI, fieldToSI, fieldUnitLabel, numberText, parseNumber, type FieldKind, type PanelUnits } from './units.ts';

export type FieldKey =
  | 'temperature' | 'barometric' | 'humidity'
  | 'testPressure' | 'flow'
  | 'bore' | 'stroke' | 'rpm' | 'cylinders' | 'portArea' | 'valveDiameter' | 'flowCoefficient' | 'hpPerCfm';

export interface FieldSpec {
  readonly label: string;
  /** Name used in "needs ..." notes when the label is long. */
  readonly short?: string;
  readonly kind: FieldKind;
  /** Unit printed after a plain number ('%', 'rpm'); switchable kinds print their unit select instead. */
  readonly plainUnit?: string;
  /** Lowest allowed value, SI; `aboveMin` makes it strict. */
  readonly min?: number;
  readonly aboveMin?: boolean;
  /** Highest allowed value, SI. */
  readonly max?: number;
  /** A sanity ceiling far above any real reading (SI), so absurd typing cannot overflow into Infinity. */
  readonly ceiling?: number;
  readonly ceilingWhy?: string;
  readonly integer?: boolean;
  /** Said after a range message: why the limit is there. */
  readonly why?: string;
  /** Grey hint inside an empty field. */
  readonly placeholder?: string;
  /** Small print under the field: what the number means, when the label alone would leave a porter guessing. */
  readonly note?: string;
}

// The file holds the same bounds (src/document/limits.ts BENCH_BOUNDS): whatever the panel takes, a saved file takes.
// Limits keep out typing and unit slips, not rare workshops: room air from -40 to 60 C, a barometer from about
// 5000 m altitude to a deep low, and the common humid-air formulas are made for room air anyway.
export const FIELDS: { readonly [K in FieldKey]: FieldSpec } = {
  temperature: { label: 'Room temperature', kind: 'temperature', min: 233.15, max: 333.15, why: 'room air; check the unit' },
  barometric: {
    label: 'Barometric pressure', kind: 'barometer', min: 50e3, max: 110e3,
    why: 'the room\'s own pressure; 1013 hPa is 101300 Pa; check the unit',
    note: 'the room\'s own pressure, not a weather report\'s sea-level one',
  },
  humidity: { label: 'Relative humidity', kind: 'plain', plainUnit: '%', min: 0, max: 100, why: 'a percentage' },
  testPressure: {
    label: 'Test pressure', kind: 'pressure', min: 0, aboveMin: true,
    ceiling: BENCH_BOUNDS.testPressurePa.max, ceilingWhy: 'a quarter of the highest barometer, more than any flow bench pulls; check the unit',
  },
  // Upper limits far above any bench or engine keep absurd typing (1e308) from overflowing into Infinity.
  flow: { label: 'Measured flow', kind: 'flow', min: 0, ceiling: 10, ceilingWhy: 'a bench reading (10 m³/s is over 21,000 CFM)' },
  bore: { label: 'Bore', kind: 'length', min: 0, aboveMin: true, ceiling: 1, ceilingWhy: 'a cylinder bore' },
  stroke: { label: 'Stroke', kind: 'length', min: 0, aboveMin: true, ceiling: 1, ceilingWhy: 'a stroke' },
  rpm: { label: 'Engine speed', kind: 'plain', plainUnit: 'rpm', min: 0, max: 30000, why: 'crankshaft revolutions per minute' },
  cylinders: { label: 'Cylinders', kind: 'plain', min: 1, max: 24, integer: true },
  portArea: { label: 'Port area', kind: 'area', min: 0, aboveMin: true, ceiling: 0.1, ceilingWhy: 'a port cross-section' },
  valveDiameter: { label: 'Inlet valve diameter', kind: 'length', min: 0, aboveMin: true, ceiling: 0.5, ceilingWhy: 'a valve head' },
  flowCoefficient: {
    label: 'Mean flow coefficient C_i', short: 'mean flow coefficient', kind: 'plain', min: 0, aboveMin: true, max: 1,
    why: 'against the valve head area, averaged over the open period',
    note: 'vs valve head area, mean over the open period (for the Mach index)',
  },
  hpPerCfm: {
    label: 'k, hp per CFM at 28 in H2O', short: 'k', kind: 'plain', plainUnit: 'hp/CFM', min: 0, aboveMin: true, max: 1,
    note: 'a setting; common practice: 0.25–0.27 for a good naturally aspirated four-stroke',
  },
};

export const FIELD_KEYS = Object.keys(FIELDS) as FieldKey[];

/** A field's text as typed (or as re-shown after a unit switch) and the exact SI value behind it. */
export interface FieldEntry {
  readonly text: string;
  /** SI value (m, m², m³/s, Pa, K, or the plain number); null when the text is empty or not a number. */
  readonly valueSI: number | null;
}

export const EMPTY_ENTRY: FieldEntry = { text: '', valueSI: null };

/** Unit label printed beside a field. */
export function unitLabel(key: FieldKey, units: PanelUnits): string {
  const spec = FIELDS[key];
  return spec.kind === 'plain' ? (spec.plainUnit ?? '') : fieldUnitLabel(spec.kind, units);
}

/** A limit, SI, as the porter reads it in the field's unit. */
function shownLimit(key: FieldKey, units: PanelUnits, valueSI: number): string {
  const unit = unitLabel(key, units);
  const number = numberText(fieldFromSI(FIELDS[key].kind, units, valueSI)).replace(/^-/, '−');
  return unit === '' ? number : `${number} ${unit}`;
}

/** Why the entry cannot be used, in the field's unit; null when it is usable or simply empty. */
export function fieldProblem(key: FieldKey, entry: FieldEntry, units: PanelUnits): string | null {
  const spec = FIELDS[key];
  if (entry.text.trim() === '') return null;
  const v = entry.valueSI;
  if (v === null) return `“${entry.text.trim()}” is not a number.`;
  if (spec.integer && !Number.isInteger(v)) return 'Must be a whole number.';
  const tooLow = spec.min !== undefined && (spec.aboveMin ? v <= spec.min : v < spec.min);
  const tooHigh = spec.max !== undefined && v > spec.max;
  if (!tooLow && spec.ceiling !== undefined && v > spec.ceiling) {
    return `Must be at most ${shownLimit(key, units, spec.ceiling)}${spec.ceilingWhy ? ` (${spec.ceilingWhy})` : ''}.`;
  }
  if (!tooLow && !tooHigh) return null;
  const why = spec.why ? ` (${spec.why})` : '';
  if (spec.min !== undefined && spec.max !== undefined) {
    return `Must lie between ${shownLimit(key, units, spec.min)} and ${shownLimit(key, units, spec.max)}${why}.`;
  }
  if (spec.min === 0) return spec.aboveMin ? `Must be above zero${why}.` : `Cannot be negative${why}.`;
  return `Must be at least ${shownLimit(key, units, spec.min ?? 0)}${why}.`;
}

/** The entry for text typed into a field shown in `units`. */
export function entryFromText(key: FieldKey, text: string, units: PanelUnits): FieldEntry {
  const shown = parseNumber(text);
  return { text, valueSI: shown === null ? null : fieldToSI(FIELDS[key].kind, units, shown) };
}

/** The entry for an SI value, shown in `units`. */
export function entryFromSI(key: FieldKey, valueSI: number, units: PanelUnits): FieldEntry {
  return { text: numberText(fieldFromSI(FIELDS[key].kind, units, valueSI)), valueSI };
}

/** The same entry re-shown in new units: the SI value stays exactly, only the text changes. Bad text stays as typed. */
export function reshowEntry(key: FieldKey, entry: FieldEntry, units: PanelUnits): FieldEntry {
  return entry.valueSI === null ? entry : entryFromSI(key, entry.valueSI, units);
}


/** Display units of the bench panel's fields: the unit table of src/breathing plus room temperature, text in and out. */

import { areaUnitFor, unitSpec, type UnitChoices, type UnitSpec } from '../../breathing/index.ts';

/** Room temperature as typed: degrees Celsius or Fahrenheit (kelvin inside). */
export type TemperatureUnit = 'C' | 'F';

/** The unit choices the panel offers. Area follows `length`. */
export interface PanelUnits {
  readonly length: UnitChoices['length'];
  readonly speed: UnitChoices['speed'];
  readonly flow: UnitChoices['flow'];
  /** Test pressure. */
  readonly pressure: UnitChoices['pressure'];
  /** Barometric pressure: its own choice, so the barometer can stay in Pa while the bench reads inches of water. */
  readonly barometer: UnitChoices['pressure'];
  readonly temperature: TemperatureUnit;
}
export type PanelQuantity = keyof PanelUnits;

/** What a field measures: a switchable quantity, area (follows length), or a plain number kept as typed. */
export type FieldKind = 'length' | 'area' | 'flow' | 'pressure' | 'barometer' | 'temperature' | 'plain';

/** Bench in the units most benches read (CFM at inches of water), engine in millimetres. */
export const DEFAULT_PANEL_UNITS: PanelUnits = { length: 'mm', speed: 'm/s', flow: 'CFM', pressure: 'inH2O', barometer: 'Pa', temperature: 'C' };

/** Choices offered in each unit select, with the label printed. */
export const UNIT_OPTIONS: { readonly [Q in PanelQuantity]: ReadonlyArray<{ value: PanelUnits[Q]; label: string }> } = {
  length: [{ value: 'mm', label: 'mm' }, { value: 'inch', label: 'in' }],
  speed: [{ value: 'm/s', label: 'm/s' }, { value: 'ft/s', label: 'ft/s' }],
  flow: [{ value: 'CFM', label: 'CFM' }, { value: 'L/s', label: 'L/s' }],
  pressure: [{ value: 'inH2O', label: 'in H2O' }, { value: 'Pa', label: 'Pa' }],
  barometer: [{ value: 'Pa', label: 'Pa' }, { value: 'inH2O', label: 'in H2O' }],
  temperature: [{ value: 'C', label: '°C' }, { value: 'F', label: '°F' }],
};

// Kelvin from Celsius and Fahrenheit: exact by definition (NIST SP 811, appendix B).
const ZERO_CELSIUS_K = 273.15;
const KELVIN_PER_FAHRENHEIT = 5 / 9;

/** Kinds whose unit comes from the breathing unit table (everything but temperature and plain numbers). */
type TableKind = Exclude<FieldKind, 'temperature' | 'plain'>;

/** The table unit a field shows now: area follows length, the barometer has its own pressure choice. */
function tableUnit(kind: TableKind, units: PanelUnits): UnitSpec {
  if (kind === 'area') return unitSpec('area', areaUnitFor(units.length));
  if (kind === 'barometer') return unitSpec('pressure', units.barometer);
  return unitSpec(kind, units[kind] as never);
}

/** SI value (m, m², m³/s, Pa, K) of a number shown in the field's current unit. */
export function fieldToSI(kind: FieldKind, units: PanelUnits, shown: number): number {
  if (kind === 'plain') return shown;
  if (kind === 'temperature') {
    return units.temperature === 'C' ? shown + ZERO_CELSIUS_K : (shown - 32) * KELVIN_PER_FAHRENHEIT + ZERO_CELSIUS_K;
  }
  return shown * tableUnit(kind, units).siPerUnit;
}

/** The number a field shows for an SI value, in its current unit. */
export function fieldFromSI(kind: FieldKind, units: PanelUnits, valueSI: number): number {
  if (kind === 'plain') return valueSI;
  if (kind === 'temperature') {
    const celsius = valueSI - ZERO_CELSIUS_K;
    return units.temperature === 'C' ? celsius : celsius / KELVIN_PER_FAHRENHEIT + 32;
  }
  return valueSI / tableUnit(kind, units).siPerUnit;
}

/** Label of the field's current unit ('' for a plain number). */
export function fieldUnitLabel(kind: FieldKind, units: PanelUnits): string {
  if (kind === 'plain') return '';
  if (kind === 'temperature') return units.temperature === 'C' ? '°C' : '°F';
  return tableUnit(kind, units).label;
}

/** The switchable quantity whose select drives a field's unit (area follows length), or null. */
export function quantityOf(kind: FieldKind): PanelQuantity | null {
  if (kind === 'plain') return null;
  return kind === 'area' ? 'length' : kind;
}

/**
 * A number as it is put back into a field after a unit switch: six significant digits, no trailing zeros, so
 * 100 mm reads 3.93701 in and switching back reads 100 again. The exact SI value is kept beside the text.
 */
export function numberText(value: number): string {
  if (!Number.isFinite(value)) return '';
  if (value === 0) return '0';
  const text = value.toPrecision(6);
  if (/e/.test(text)) return String(Number(text));
  return text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
}

/** A typed number, or null: accepts "1.5", "-3", ".5", "1e3" and spaces between digit groups ("101 325"). */
export function parseNumber(text: string): number | null {
  const compact = text.trim().replace(/[\s\u2009\u202f]/g, '');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(compact)) return null;
  const value = Number(compact);
  return Number.isFinite(value) ? value : null;
}

/** Unit conversions between SI (used everywhere inside) and the units porters read on a bench, plus display labels. */

// Factors from NIST SP 811 (2008), appendix B. Inch and foot are exact by definition.
/** Pa per inch of water, conventional (NIST SP 811 B.8: 2.490 889 E+02). */
export const PA_PER_INH2O = 249.0889;
/** m^3/s per cubic foot per minute (NIST SP 811 B.8: 4.719 474 E-04). */
export const M3S_PER_CFM = 4.719474e-4;
/** m per inch, exact. */
export const M_PER_INCH = 0.0254;
/** m/s per foot per second, exact. */
export const MPS_PER_FTPS = 0.3048;
/** m^3/s per litre per second, exact. */
export const M3S_PER_LPS = 1e-3;

/** Pressure: inches of water (conventional) to Pa. */
export const inH2OToPa = (inH2O: number): number => inH2O * PA_PER_INH2O;
/** Pressure: Pa to inches of water (conventional). */
export const paToInH2O = (pa: number): number => pa / PA_PER_INH2O;
/** Flow: cubic feet per minute to m^3/s. */
export const cfmToM3s = (cfm: number): number => cfm * M3S_PER_CFM;
/** Flow: m^3/s to cubic feet per minute. */
export const m3sToCfm = (m3s: number): number => m3s / M3S_PER_CFM;
/** Flow: litres per second to m^3/s. */
export const lpsToM3s = (lps: number): number => lps * M3S_PER_LPS;
/** Flow: m^3/s to litres per second. */
export const m3sToLps = (m3s: number): number => m3s / M3S_PER_LPS;
/** Flow: cubic feet per minute to litres per second. */
export const cfmToLps = (cfm: number): number => m3sToLps(cfmToM3s(cfm));
/** Flow: litres per second to cubic feet per minute. */
export const lpsToCfm = (lps: number): number => m3sToCfm(lpsToM3s(lps));
/** Speed: feet per second to m/s. */
export const ftpsToMps = (ftps: number): number => ftps * MPS_PER_FTPS;
/** Speed: m/s to feet per second. */
export const mpsToFtps = (mps: number): number => mps / MPS_PER_FTPS;
/** Length: inches to mm. */
export const inchToMm = (inch: number): number => (inch * M_PER_INCH) / 1e-3;
/** Length: mm to inches. */
export const mmToInch = (mm: number): number => (mm * 1e-3) / M_PER_INCH;
/** Area: square inches to mm^2. */
export const in2ToMm2 = (in2: number): number => (in2 * M_PER_INCH * M_PER_INCH) / 1e-6;
/** Area: mm^2 to square inches. */
export const mm2ToIn2 = (mm2: number): number => (mm2 * 1e-6) / (M_PER_INCH * M_PER_INCH);

/** The display units a porter can choose, per quantity. Area follows the length choice. */
export interface UnitChoices {
  length: 'mm' | 'inch';
  area: 'mm2' | 'in2';
  speed: 'm/s' | 'ft/s';
  flow: 'CFM' | 'L/s';
  pressure: 'Pa' | 'inH2O';
}
export type Quantity = keyof UnitChoices;

/** How one display unit relates to SI and how it is printed. */
export interface UnitSpec {
  /** Label printed after the number. */
  readonly label: string;
  /** SI value of one of this unit (m, m^2, m/s, m^3/s or Pa). */
  readonly siPerUnit: number;
  /** Decimals shown by default: enough to read a bench change, not more than a porter can measure. */
  readonly decimals: number;
}

/** Every display unit, keyed by quantity then unit name. */
export const UNIT_TABLE: { readonly [Q in Quantity]: { readonly [U in UnitChoices[Q]]: UnitSpec } } = {
  length: {
    mm: { label: 'mm', siPerUnit: 1e-3, decimals: 2 },
    inch: { label: 'in', siPerUnit: M_PER_INCH, decimals: 3 },
  },
  area: {
    mm2: { label: 'mm²', siPerUnit: 1e-6, decimals: 1 },
    in2: { label: 'in²', siPerUnit: M_PER_INCH * M_PER_INCH, decimals: 3 },
  },
  speed: {
    'm/s': { label: 'm/s', siPerUnit: 1, decimals: 1 },
    'ft/s': { label: 'ft/s', siPerUnit: MPS_PER_FTPS, decimals: 0 },
  },
  flow: {
    CFM: { label: 'CFM', siPerUnit: M3S_PER_CFM, decimals: 1 },
    'L/s': { label: 'L/s', siPerUnit: M3S_PER_LPS, decimals: 1 },
  },
  pressure: {
    Pa: { label: 'Pa', siPerUnit: 1, decimals: 0 },
    inH2O: { label: 'in H2O', siPerUnit: PA_PER_INH2O, decimals: 1 },
  },
};

/** Look up the spec of one display unit. */
export function unitSpec<Q extends Quantity>(quantity: Q, unit: UnitChoices[Q]): UnitSpec {
  const row = UNIT_TABLE[quantity] as Readonly<Record<string, UnitSpec>>;
  const spec = row[unit];
  if (spec === undefined) throw new RangeError(`Unknown ${quantity} unit "${String(unit)}".`);
  return spec;
}

/** Convert a value in a display unit to SI. */
export function toSI<Q extends Quantity>(quantity: Q, unit: UnitChoices[Q], value: number): number {
  return value * unitSpec(quantity, unit).siPerUnit;
}

/** Convert an SI value to a display unit. */
export function fromSI<Q extends Quantity>(quantity: Q, unit: UnitChoices[Q], valueSI: number): number {
  return valueSI / unitSpec(quantity, unit).siPerUnit;
}

/**
 * Print an SI value in a display unit, e.g. formatQuantity('flow', 'CFM', 0.1067) -> "226.1 CFM".
 * Non-finite values print as an em dash so a missing number never shows as "NaN".
 */
export function formatQuantity<Q extends Quantity>(
  quantity: Q,
  unit: UnitChoices[Q],
  valueSI: number,
  decimals?: number,
): string {
  const spec = unitSpec(quantity, unit);
  if (!Number.isFinite(valueSI)) return `— ${spec.label}`;
  const shown = (valueSI / spec.siPerUnit).toFixed(decimals ?? spec.decimals);
  // Avoid "-0.0": a rounded zero carries no sign.
  const clean = /^-0(\.0+)?$/.test(shown) ? shown.slice(1) : shown;
  return `${clean} ${spec.label}`;
}

/** The units the app shows numbers in. Area follows `length`. */
export interface UnitSystem {
  readonly length: UnitChoices['length'];
  readonly speed: UnitChoices['speed'];
  readonly flow: UnitChoices['flow'];
  readonly pressure: UnitChoices['pressure'];
}

/** Metric workshop: mm, m/s, L/s, Pa. */
export const METRIC_UNITS: UnitSystem = { length: 'mm', speed: 'm/s', flow: 'L/s', pressure: 'Pa' };
/** Inch workshop, as most flow benches read: inch, ft/s, CFM, in H2O. */
export const INCH_UNITS: UnitSystem = { length: 'inch', speed: 'ft/s', flow: 'CFM', pressure: 'inH2O' };

/** The one spelling of a length unit on screen and in messages: "mm" or "in" (the document says "inch"). */
export function lengthLabel(length: UnitChoices['length']): string {
  return UNIT_TABLE.length[length].label;
}

/** The one spelling of an area unit on screen: "mm²" or "in²". */
export function areaLabel(length: UnitChoices['length']): string {
  return UNIT_TABLE.area[areaUnitFor(length)].label;
}

/** The area unit that goes with a length unit. */
export function areaUnitFor(length: UnitChoices['length']): UnitChoices['area'] {
  return length === 'mm' ? 'mm2' : 'in2';
}

/** The display unit a system uses for a quantity. */
export function unitIn<Q extends Quantity>(system: UnitSystem, quantity: Q): UnitChoices[Q] {
  const unit = quantity === 'area' ? areaUnitFor(system.length) : system[quantity as Exclude<Quantity, 'area'>];
  return unit as UnitChoices[Q];
}

/** Print an SI value in the unit a system uses, e.g. formatIn(INCH_UNITS, 'length', 0.0364) -> "1.433 in". */
export function formatIn(system: UnitSystem, quantity: Quantity, valueSI: number, decimals?: number): string {
  return formatQuantity(quantity, unitIn(system, quantity), valueSI, decimals);
}

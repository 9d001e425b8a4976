/** Bounds a section file must keep: big enough for any real port, small enough that a hostile file cannot stall the app. */

/** Largest file accepted, bytes of UTF-8 text (5 MB). A traced section with thousands of points is well under 1 MB. */
export const MAX_FILE_BYTES = 5_000_000;
/** Largest |x| or |y|, document units (100 m in mm: far beyond any head, so only nonsense is refused). */
export const MAX_COORDINATE = 1e5;
/** Largest fillet radius, document units. */
export const MAX_FILLET_RADIUS = 1e5;
/** Most vertices in one section, outline and islands together. */
export const MAX_SECTION_VERTICES = 20_000;
/** Most `via` points on one curve edge. */
export const MAX_VIA_POINTS = 200;
/** Most islands in one section. */
export const MAX_ISLANDS = 100;
/** Most variants in one file. */
export const MAX_VARIANTS = 100;
/** Length of a variant, island or wall name, characters. */
export const MAX_NAME_LENGTH = 80;
/** A character a name or title may not hold: they are one-line labels in the view and the command output. */
export const CONTROL_CHARACTER = /[\u0000-\u001f\u007f]/;
/** Length of the title, characters. */
export const MAX_TITLE_LENGTH = 120;
/** Length of a variant note, characters. */
export const MAX_NOTE_LENGTH = 4000;

/** A file size for a message, in MB to one decimal: "5.0 MB". */
export function formatMegabytes(bytes: number): string {
  return `${(bytes / 1e6).toFixed(1)} MB`;
}

/** UTF-8 byte length of `text` without building the encoded bytes. */
export function utf8Length(text: string): number {
  let bytes = 0;
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (code < 0x80) bytes += 1;
    else if (code < 0x800) bytes += 2;
    else if (code >= 0xd800 && code <= 0xdbff && i + 1 < text.length) {
      const next = text.charCodeAt(i + 1);
      if (next >= 0xdc00 && next <= 0xdfff) {
        bytes += 4;
        i++;
      } else bytes += 3;
    } else bytes += 3;
  }
  return bytes;
}

/** Longest length a part may have (diameters, widths, lift), document units: the same bound as a coordinate. */
export const MAX_PART_LENGTH = MAX_COORDINATE;
/** Largest measured port area, document units squared. */
export const MAX_PORT_AREA = MAX_COORDINATE * MAX_COORDINATE;
/** Largest lean of the valve axis from straight down, degrees (real heads lean well under this). */
export const MAX_VALVE_INCLINATION_DEG = 75;

/** Most stations in one width profile. */
export const MAX_WIDTH_STATIONS = 200;
/** Most obstructions (stems, guide bosses) in one width profile. */
export const MAX_WIDTH_OBSTRUCTIONS = 20;
/** Largest distance of a width station along the port, document units (a path may wind far longer than the box). */
export const MAX_WIDTH_ALONG = 10 * MAX_COORDINATE;
/** Narrowest the passage is left where an obstruction stands, as a fraction of the width there. */
export const OBSTRUCTED_WIDTH_FLOOR = 0.1;

/** Bounds of one bench input: from `min` (excluded when `aboveMin`) to `max`, a whole number when `integer`. */
export interface BenchBound {
  readonly min: number;
  readonly aboveMin?: true;
  readonly max: number;
  readonly integer?: true;
  /** What the number is, for the message: "kelvin", "pascals"... */
  readonly unit: string;
}

/**
 * Bounds of the bench inputs (BenchInputs in types.ts), the same as the bench panel's own limits: they keep out
 * typing and unit slips, not rare workshops (room air from -40 to 60 °C, a barometer from about 5000 m altitude to a
 * deep low), and ceilings far above any real bench or engine keep absurd numbers out.
 */
export const BENCH_BOUNDS = {
  airTemperatureK: { min: 233.15, max: 333.15, unit: 'kelvin' },
  barometricPressurePa: { min: 50e3, max: 110e3, unit: 'pascals' },
  relativeHumidityPct: { min: 0, max: 100, unit: 'percent' },
  /** A quarter of the highest barometer: no flow bench pulls more. */
  testPressurePa: { min: 0, aboveMin: true, max: 27_500, unit: 'pascals' },
  /** 10 m³/s is over 21,000 CFM. */
  measuredFlowM3PerS: { min: 0, max: 10, unit: 'cubic metres a second' },
  boreM: { min: 0, aboveMin: true, max: 1, unit: 'metres' },
  strokeM: { min: 0, aboveMin: true, max: 1, unit: 'metres' },
  engineSpeedRpm: { min: 0, max: 30_000, unit: 'revolutions a minute' },
  cylinderCount: { min: 1, max: 24, integer: true, unit: 'cylinders' },
  portAreaM2: { min: 0, aboveMin: true, max: 0.1, unit: 'square metres' },
  valveDiameterM: { min: 0, aboveMin: true, max: 0.5, unit: 'metres' },
  meanFlowCoefficient: { min: 0, aboveMin: true, max: 1, unit: 'a fraction of the valve head area' },
  hpPerCfm: { min: 0, aboveMin: true, max: 1, unit: 'hp per CFM at 28 in H2O' },
} as const satisfies Record<string, BenchBound>;

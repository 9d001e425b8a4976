/** Defaults and range checks for the flow-reading settings. */
import { DEFAULT_SHAPE_FACTOR_LIMIT } from '../boundary-layer/march.ts';
import { ReadingSettingError } from './errors.ts';
import type { DeckLine, LengthUnits, ReadingOptions } from './types.ts';

/** Metres per document unit for each units label (1 in = 25.4 mm exactly, NIST SP 811). */
const METRES_PER_UNIT: Readonly<Record<LengthUnits, number>> = { mm: 0.001, inch: 0.0254 };

/** Every setting filled in. */
export interface ReadingSettings {
  readonly stationCount: number;
  readonly valveIslandName: string;
  readonly slowFraction: number;
  readonly overWideThreshold: number;
  readonly overWideWindow: number;
  readonly units: LengthUnits;
  readonly metresPerUnit: number;
  /** m/s */
  readonly inletMeanSpeedMs: number;
  /** m^2/s */
  readonly kinematicViscosityM2s: number;
  readonly start: 'turbulent' | 'laminar';
  readonly shapeFactorLimit: number;
  readonly streamlineCount: number;
  /** Past this line nothing is judged; null: everything is. */
  readonly deck: DeckLine | null;
}

/** Fills in defaults (see ReadingOptions) and throws ReadingSettingError for a value out of range. */
export function readingSettings(options: ReadingOptions = {}): ReadingSettings {
  const units = options.units ?? 'mm';
  if (units !== 'mm' && units !== 'inch') {
    throw new ReadingSettingError('units', `Lengths can be in 'mm' or 'inch', not '${String(units)}'.`);
  }
  const start = options.start ?? 'turbulent';
  if (start !== 'turbulent' && start !== 'laminar') {
    throw new ReadingSettingError('start', `The wall layer can start 'turbulent' or 'laminar', not '${String(start)}'.`);
  }
  const window = inRange('overWideWindow', 'over-wide smoothing window (stations)', options.overWideWindow ?? 5, 3, 41, true);
  if (window % 2 === 0) throw new ReadingSettingError('overWideWindow', `The over-wide smoothing window must be an odd number of stations, not ${window}.`);
  return {
    stationCount: inRange('stationCount', 'number of stations', options.stationCount ?? 40, 3, 1000, true),
    valveIslandName: options.valveIslandName ?? 'valve head',
    slowFraction: inRange('slowFraction', 'slow-zone share of the local mean speed', options.slowFraction ?? 0.35, 0.01, 0.99),
    overWideThreshold: inRange('overWideThreshold', 'over-wide threshold', options.overWideThreshold ?? 0.1, 0.001, 10),
    overWideWindow: window,
    units,
    metresPerUnit: inRange('metresPerUnit', 'metres per length unit', options.metresPerUnit ?? METRES_PER_UNIT[units], 1e-9, 1e3),
    inletMeanSpeedMs: inRange('inletMeanSpeedMs', 'mean inlet speed (m/s)', options.inletMeanSpeedMs ?? 60, 0.01, 1000),
    kinematicViscosityM2s: inRange('kinematicViscosityM2s', 'air kinematic viscosity (m²/s)', options.kinematicViscosityM2s ?? 1.5e-5, 1e-9, 1),
    start,
    shapeFactorLimit: inRange('shapeFactorLimit', 'detachment shape factor', options.shapeFactorLimit ?? DEFAULT_SHAPE_FACTOR_LIMIT, 1.5, 4),
    streamlineCount: inRange('streamlineCount', 'number of streamlines', options.streamlineCount ?? 24, 0, 1000, true),
    deck: deckSetting(options.deck),
  };
}

/** The deck as given, checked: finite numbers and a normal that points somewhere. */
function deckSetting(deck: DeckLine | undefined): DeckLine | null {
  if (deck === undefined) return null;
  const { x, y, normalX, normalY } = deck;
  if (![x, y, normalX, normalY].every(Number.isFinite) || Math.hypot(normalX, normalY) === 0) {
    throw new ReadingSettingError('deck', `The deck line needs a point and a direction into the bore, not (${x}, ${y}) towards (${normalX}, ${normalY}).`);
  }
  return { x, y, normalX, normalY };
}

function inRange(setting: string, label: string, value: number, min: number, max: number, whole = false): number {
  if (!Number.isFinite(value) || value < min || value > max || (whole && !Number.isInteger(value))) {
    const kind = whole ? 'a whole number' : 'a number';
    throw new ReadingSettingError(setting, `The ${label} is ${value}; it must be ${kind} from ${min} to ${max}.`);
  }
  return value;
}

/** One output row of the bench panel: its value when every input it needs is usable, else what it is waiting for. */

import { BreathingInputError, airProperties, type AirProperties } from '../../breathing/index.ts';
import type { FieldKey } from './fields.ts';
import { fieldName, fieldProblems, usableInputs, type BenchPanelState } from './model.ts';

export type OutputGroup = 'air' | 'bench' | 'engine';

export interface OutputRow {
  /** Stable name for the DOM and tests, e.g. 'density', 'cd'. */
  readonly key: string;
  readonly group: OutputGroup;
  readonly label: string;
  /** The value as shown, unit included; null when it cannot be had yet. */
  readonly text: string | null;
  /** The value in SI (or the plain number), when there is one. */
  readonly valueSI: number | null;
  /** Small print under the value: the source, the formula's setting, a caveat. */
  readonly note?: string;
  /** What the row is waiting for when `text` is null ("needs bore, stroke"). */
  readonly missing?: string;
  /** The value is past a knee worth a look (Mach index above 0.6). */
  readonly flag?: boolean;
}

/** What a row's computation returns. */
export interface Computed {
  readonly valueSI: number;
  readonly text: string;
  readonly note?: string;
  readonly flag?: boolean;
}

/** Every usable input, SI, looked up by field; only the ones a row declared are read. */
export type Inputs = Readonly<Record<FieldKey, number>>;

/** What the rows are computed from: the state, its usable inputs and the field problems. */
export interface RowContext {
  readonly state: BenchPanelState;
  readonly usable: Partial<Record<FieldKey, number>>;
  readonly problems: Partial<Record<FieldKey, string>>;
}

export function rowContext(state: BenchPanelState): RowContext {
  return { state, usable: usableInputs(state), problems: fieldProblems(state) };
}

/** The inputs room air needs. */
export const AIR_FIELDS: readonly FieldKey[] = ['temperature', 'barometric', 'humidity'];

/** Room air of the usable inputs by the chosen humid-air formula (humidity typed in %, used as a fraction). */
export function roomAir(ctx: RowContext, v: Inputs): AirProperties {
  const air = { temperatureK: v.temperature, pressurePa: v.barometric, relativeHumidity: v.humidity / 100 };
  return airProperties(air, ctx.state.humidityModel);
}

/** Why a row cannot be computed yet: a faulty field first ("fix ..."), else the empty ones ("needs ..."). */
function waitingFor(ctx: RowContext, needs: readonly FieldKey[]): string | null {
  const faulty = needs.filter((k) => ctx.problems[k] !== undefined);
  if (faulty.length > 0) return `fix ${faulty.map(fieldName).join(', ')}`;
  const empty = needs.filter((k) => ctx.usable[k] === undefined);
  return empty.length > 0 ? `needs ${empty.map(fieldName).join(', ')}` : null;
}

/**
 * A row computed from the inputs it `needs`. A BreathingInputError from src/breathing becomes the row's message;
 * a non-finite result is never shown.
 */
export function makeRow(
  ctx: RowContext,
  head: Pick<OutputRow, 'key' | 'group' | 'label'>,
  needs: readonly FieldKey[],
  compute: (v: Inputs) => Computed | string,
): OutputRow {
  const waiting = waitingFor(ctx, needs);
  if (waiting) return { ...head, text: null, valueSI: null, missing: waiting };
  try {
    const out = compute(ctx.usable as Inputs);
    if (typeof out === 'string') return { ...head, text: null, valueSI: null, missing: out };
    if (!Number.isFinite(out.valueSI)) return { ...head, text: null, valueSI: null, missing: 'cannot be had from these numbers' };
    return { ...head, ...out };
  } catch (err) {
    if (err instanceof BreathingInputError || err instanceof RangeError) {
      return { ...head, text: null, valueSI: null, missing: err.message };
    }
    throw err;
  }
}

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹',
};

/** A small number as a porter writes it: 1.8134 × 10⁻⁵. */
export function scientific(value: number, digits: number): string {
  const [mantissa, exponent] = value.toExponential(digits).split('e');
  const power = String(Number(exponent)).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);
  return `${mantissa} × 10${power}`;
}

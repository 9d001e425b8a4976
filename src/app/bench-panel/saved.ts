/**
 * The bench panel's display units, kept in the browser between visits (a viewing preference), and the inputs a
 * browser kept before the file held them (format version 4), read once so they can be adopted into the document.
 */

import { z } from 'zod';
import { entryFromSI, FIELD_KEYS, FIELDS, type FieldKey } from './fields.ts';
import { REFERENCE_AREA_KEYS, setChoice, setUnit, typeField, type BenchPanelState, type FlowScaleSource } from './model.ts';
import { quantityOf, UNIT_OPTIONS, type PanelQuantity, type PanelUnits } from './units.ts';
import type { HumidAirModel } from '../../breathing/index.ts';

/** What the browser keeps now: the display units only; the inputs live in each variant of the document. */
export const SAVED_BENCH_VERSION = 2;
/** What it kept before: the units, every field as typed and the three choices, one set for all files. */
export const LEGACY_BENCH_VERSION = 1;

/** Longest field text read back from a version-1 store: far beyond any number a porter types. */
export const MAX_SAVED_TEXT = 100;

export interface SavedBench {
  readonly version: typeof SAVED_BENCH_VERSION;
  readonly units: PanelUnits;
}

/** The panel's display units as plain JSON. */
export function savedBench(state: BenchPanelState): SavedBench {
  return { version: SAVED_BENCH_VERSION, units: { ...state.units } };
}

// Every choice the panel offers, checked against its type so a new choice cannot be forgotten here.
const HUMIDITY_MODELS = { 'cipm-2007': true, 'ideal-mixture': true } satisfies Record<HumidAirModel, true>;
const FLOW_SCALES = { 'ideal speed': true, 'bench flow / port area': true, 'mean port speed': true } satisfies Record<FlowScaleSource, true>;

function oneOf<T extends string>(choices: Readonly<Record<T, unknown>>) {
  return z.enum(Object.keys(choices) as [T, ...T[]]);
}

const anyVersion = z.object({ version: z.union([z.literal(SAVED_BENCH_VERSION), z.literal(LEGACY_BENCH_VERSION)]) });
const legacyShell = z.object({ version: z.literal(LEGACY_BENCH_VERSION) });
const table = z.record(z.string(), z.unknown());
const fieldShape = z.object({ text: z.string().max(MAX_SAVED_TEXT), si: z.unknown().optional() });
const choiceShapes = {
  humidityModel: oneOf(HUMIDITY_MODELS),
  referenceArea: oneOf(REFERENCE_AREA_KEYS),
  flowScale: oneOf(FLOW_SCALES),
} as const;

/** An own property of a parsed table, or undefined (never one from the prototype, such as "constructor"). */
function own(t: Record<string, unknown> | undefined, key: string): unknown {
  return t !== undefined && Object.hasOwn(t, key) ? t[key] : undefined;
}

/** The kept display units put onto `base` (from a store of either version); `base` when none are usable. Never throws. */
export function restoreUnits(saved: unknown, base: BenchPanelState): BenchPanelState {
  return withUnits(saved, base).state;
}

function withUnits(saved: unknown, base: BenchPanelState): { state: BenchPanelState; known: Set<PanelQuantity> } {
  const known = new Set<PanelQuantity>();
  if (!anyVersion.safeParse(saved).success) return { state: base, known };
  const units = table.safeParse(own(saved as Record<string, unknown>, 'units')).data;
  let state = base;
  for (const quantity of Object.keys(UNIT_OPTIONS) as PanelQuantity[]) {
    const unit = own(units, quantity);
    if (!UNIT_OPTIONS[quantity].some((o) => o.value === unit)) continue;
    known.add(quantity);
    if (unit !== state.units[quantity]) state = setUnit(state, quantity, unit as never);
  }
  return { state, known };
}

/**
 * A version-1 store's inputs put back onto `base` through the panel's own edits, so they are exactly what typing
 * would give; null for a store of another version. Whatever is unknown or malformed is ignored part by part; never throws.
 */
export function restoreLegacyBench(saved: unknown, base: BenchPanelState): BenchPanelState | null {
  if (!legacyShell.safeParse(saved).success) return null;
  const record = saved as Record<string, unknown>;
  const fields = table.safeParse(own(record, 'fields')).data;
  let { state, known } = withUnits(saved, base);
  for (const key of FIELD_KEYS) {
    const field = fieldShape.safeParse(own(fields, key));
    const quantity = quantityOf(FIELDS[key].kind);
    // A number without the unit it was typed in cannot be read back; it is left at the base value.
    if (field.success && (quantity === null || known.has(quantity))) state = restoreField(state, key, field.data);
  }
  for (const key of Object.keys(choiceShapes) as Array<keyof typeof choiceShapes>) {
    const choice = choiceShapes[key].safeParse(own(record, key));
    if (choice.success) state = setChoice(state, key, choice.data as never);
  }
  return state;
}

/** Type the kept text; a re-shown number gets back its exact value, if the kept value is the one the text shows. */
function restoreField(state: BenchPanelState, key: FieldKey, saved: { text: string; si?: unknown }): BenchPanelState {
  const typed = typeField(state, key, saved.text);
  const si = z.number().safeParse(saved.si);
  if (!si.success) return typed;
  const reshown = entryFromSI(key, si.data, typed.units);
  // A value that does not print as the kept text was edited in the store, not re-shown by the panel: the text wins.
  if (reshown.text !== saved.text) return typed;
  return { ...typed, fields: { ...typed.fields, [key]: reshown } };
}

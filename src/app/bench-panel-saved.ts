/** What the porter typed and chose in the "Air and bench" panel, as plain JSON to keep between visits, and how it comes back. */

import { z } from 'zod';
import type { HumidAirModel } from '../breathing/index.ts';
import { entryFromSI, entryFromText, FIELD_KEYS, FIELDS, type FieldKey } from './bench-panel-fields.ts';
import {
  REFERENCE_AREA_KEYS, setChoice, setUnit, typeField, type BenchPanelState, type FlowScaleSource, type FollowingField,
} from './bench-panel-model.ts';
import { quantityOf, UNIT_OPTIONS, type PanelQuantity, type PanelUnits } from './bench-panel-units.ts';

/** Raise when the meaning of a kept field changes; a store of another version is left unread. */
export const SAVED_BENCH_VERSION = 1;

/** Longest field text kept: far beyond any number a porter types, small enough that a broken store stays harmless. */
export const MAX_SAVED_TEXT = 100;

export interface SavedField {
  /** The field's text as typed, or as re-shown after a unit switch. */
  readonly text: string;
  /**
   * The exact SI value behind a re-shown text (m, m², m³/s, Pa, K, or the plain number), kept because six digits lose
   * a little; left out when typing the text again gives the same value.
   */
  readonly si?: number;
}

export interface SavedBench {
  readonly version: typeof SAVED_BENCH_VERSION;
  readonly units: PanelUnits;
  /** The porter's fields; a port area or valve diameter that follows the document is not kept. */
  readonly fields: Partial<Record<FieldKey, SavedField>>;
  readonly humidityModel: HumidAirModel;
  readonly referenceArea: BenchPanelState['referenceArea'];
  readonly flowScale: FlowScaleSource;
}

function follows(state: BenchPanelState, key: FieldKey): boolean {
  return (key === 'portArea' || key === 'valveDiameter') && state.follows[key as FollowingField];
}

/** The panel's own inputs as plain JSON; the areas and port area the app supplies are left out. */
export function savedBench(state: BenchPanelState): SavedBench {
  const fields: Partial<Record<FieldKey, SavedField>> = {};
  for (const key of FIELD_KEYS) {
    const { text, valueSI } = state.fields[key];
    if (follows(state, key) || text.length > MAX_SAVED_TEXT) continue;
    const retyped = entryFromText(key, text, state.units).valueSI;
    const exact = valueSI !== null && Number.isFinite(valueSI) && valueSI !== retyped;
    fields[key] = exact ? { text, si: valueSI } : { text };
  }
  const { units, humidityModel, referenceArea, flowScale } = state;
  return { version: SAVED_BENCH_VERSION, units: { ...units }, fields, humidityModel, referenceArea, flowScale };
}

// Every choice the panel offers, checked against its type so a new choice cannot be forgotten here.
const HUMIDITY_MODELS = { 'cipm-2007': true, 'ideal-mixture': true } satisfies Record<HumidAirModel, true>;
const FLOW_SCALES = { 'ideal speed': true, 'bench flow / port area': true, 'mean port speed': true } satisfies Record<FlowScaleSource, true>;

function oneOf<T extends string>(choices: Readonly<Record<T, unknown>>) {
  return z.enum(Object.keys(choices) as [T, ...T[]]);
}

const shell = z.object({ version: z.literal(SAVED_BENCH_VERSION) });
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

/**
 * The kept panel put back onto `base` through the panel's own edits, so it is exactly what typing would give. Whatever
 * is unknown, malformed or of another version is ignored part by part; never throws.
 */
export function restoreBench(saved: unknown, base: BenchPanelState): BenchPanelState {
  if (!shell.safeParse(saved).success) return base;
  const record = saved as Record<string, unknown>;
  const units = table.safeParse(own(record, 'units')).data;
  const fields = table.safeParse(own(record, 'fields')).data;
  let state = base;
  const unitKnown = new Set<PanelQuantity>();
  for (const quantity of Object.keys(UNIT_OPTIONS) as PanelQuantity[]) {
    const unit = own(units, quantity);
    if (!UNIT_OPTIONS[quantity].some((o) => o.value === unit)) continue;
    unitKnown.add(quantity);
    if (unit !== state.units[quantity]) state = setUnit(state, quantity, unit as never);
  }
  for (const key of FIELD_KEYS) {
    const field = fieldShape.safeParse(own(fields, key));
    const quantity = quantityOf(FIELDS[key].kind);
    // A number without the unit it was typed in cannot be read back; it is left at the base value.
    if (field.success && (quantity === null || unitKnown.has(quantity))) state = restoreField(state, key, field.data);
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

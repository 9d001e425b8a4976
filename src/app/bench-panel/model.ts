/** State of the "Air and bench" panel and the pure edits on it: typed numbers, unit switches, areas from the app. */

import { DEFAULT_HP_PER_CFM, inH2OToPa, type HumidAirModel, type ReferenceArea } from '../../breathing/index.ts';
import {
  EMPTY_ENTRY, entryFromSI, entryFromText, FIELD_KEYS, fieldProblem, FIELDS, reshowEntry, type FieldEntry, type FieldKey,
} from './fields.ts';
import { DEFAULT_PANEL_UNITS, fieldFromSI, numberText, type PanelQuantity, type PanelUnits } from './units.ts';

/** Reference areas of the active variant at its lift, m², computed by the app from its valve part. */
export interface BenchAreas {
  readonly curtain?: number;
  readonly throat?: number;
  readonly valveHead?: number;
}

/** Which of the app's areas each C_D reference is. */
export const REFERENCE_AREA_KEYS: Readonly<Record<ReferenceArea, keyof BenchAreas>> = {
  curtain: 'curtain',
  throat: 'throat',
  'valve head': 'valveHead',
};

/** The port area the app offers for the mean port speed, m², and how it was had ("measured", "round-port assumption"). */
export interface AppPortArea {
  readonly m2: number;
  readonly source?: string;
}

/** Which speed "use as flow scale" sends to the boundary-layer march. */
export type FlowScaleSource = 'ideal speed' | 'bench flow / port area' | 'mean port speed';

/** Fields that take the app's number until the porter types their own. */
export type FollowingField = 'portArea' | 'valveDiameter';

export interface BenchPanelState {
  readonly units: PanelUnits;
  readonly fields: { readonly [K in FieldKey]: FieldEntry };
  readonly humidityModel: HumidAirModel;
  readonly referenceArea: ReferenceArea;
  readonly areasM2: BenchAreas;
  readonly appPortArea: AppPortArea | null;
  /** True while the field shows the app's number; typing into it makes it the porter's own. */
  readonly follows: { readonly [K in FollowingField]: boolean };
  readonly flowScale: FlowScaleSource;
}

/** Room air of a mild day at sea level and a bench at 28 in H2O; the porter's own numbers are left empty. */
export function initialBenchState(units: Partial<PanelUnits> = {}): BenchPanelState {
  const shown = { ...DEFAULT_PANEL_UNITS, ...units };
  const fields = Object.fromEntries(FIELD_KEYS.map((k) => [k, EMPTY_ENTRY])) as Record<FieldKey, FieldEntry>;
  fields.temperature = entryFromSI('temperature', 293.15, shown);
  fields.barometric = entryFromSI('barometric', 101325, shown);
  fields.humidity = entryFromSI('humidity', 50, shown);
  fields.testPressure = entryFromSI('testPressure', inH2OToPa(28), shown);
  fields.hpPerCfm = entryFromSI('hpPerCfm', DEFAULT_HP_PER_CFM, shown);
  return {
    units: shown,
    fields,
    humidityModel: 'cipm-2007',
    referenceArea: 'curtain',
    areasM2: {},
    appPortArea: null,
    follows: { portArea: true, valveDiameter: true },
    flowScale: 'ideal speed',
  };
}

/** The porter typed `text` into a field (in the unit it shows). */
export function typeField(state: BenchPanelState, key: FieldKey, text: string): BenchPanelState {
  const fields = { ...state.fields, [key]: entryFromText(key, text, state.units) };
  const follows = key === 'portArea' || key === 'valveDiameter' ? { ...state.follows, [key]: false } : state.follows;
  return { ...state, fields, follows };
}

/** Switch a quantity's unit: every field of it is re-shown so the physical value stays exactly the same. */
export function setUnit<Q extends PanelQuantity>(state: BenchPanelState, quantity: Q, unit: PanelUnits[Q]): BenchPanelState {
  const units = { ...state.units, [quantity]: unit };
  const fields = Object.fromEntries(FIELD_KEYS.map((k) => [k, reshowEntry(k, state.fields[k], units)])) as Record<FieldKey, FieldEntry>;
  return { ...state, units, fields };
}

/** Inlet valve diameter, m, of a head area pi D²/4 (the inverse of src/breathing's circleArea). */
function diameterOfArea(areaM2: number): number {
  return Math.sqrt((4 * areaM2) / Math.PI);
}

/** New reference areas from the app; the valve diameter follows the head area unless the porter typed one. */
export function setAreas(state: BenchPanelState, areasM2: BenchAreas): BenchPanelState {
  const next = { ...state, areasM2: { ...areasM2 } };
  return state.follows.valveDiameter ? followApp(next, 'valveDiameter') : next;
}

/** New port area from the app (null: none known); the field follows it unless the porter typed one. */
export function setPortArea(state: BenchPanelState, m2: number | null, source?: string): BenchPanelState {
  const appPortArea = m2 !== null && Number.isFinite(m2) && m2 > 0 ? { m2, source } : null;
  const next = { ...state, appPortArea };
  return state.follows.portArea ? followApp(next, 'portArea') : next;
}

/** The number the app offers for a following field, SI, or null. */
export function appValue(state: BenchPanelState, key: FollowingField): number | null {
  if (key === 'portArea') return state.appPortArea?.m2 ?? null;
  const head = state.areasM2.valveHead;
  return head !== undefined && head > 0 ? diameterOfArea(head) : null;
}

/** Put the app's number back into a field and follow it again. */
export function followApp(state: BenchPanelState, key: FollowingField): BenchPanelState {
  const value = appValue(state, key);
  const entry = value === null ? EMPTY_ENTRY : entryFromSI(key, value, state.units);
  return { ...state, fields: { ...state.fields, [key]: entry }, follows: { ...state.follows, [key]: true } };
}

/** Pick the humid-air formula, the C_D reference area or the flow-scale speed. */
export function setChoice<K extends 'humidityModel' | 'referenceArea' | 'flowScale'>(
  state: BenchPanelState,
  key: K,
  value: BenchPanelState[K],
): BenchPanelState {
  return { ...state, [key]: value };
}

/** A test pressure above this share of the barometer is no flow bench's: most likely a unit slip. */
const MAX_TEST_PRESSURE_SHARE = 0.25;

/** What is wrong with each field, in its own unit; fields not listed are usable or empty. */
export function fieldProblems(state: BenchPanelState): Partial<Record<FieldKey, string>> {
  const problems: Partial<Record<FieldKey, string>> = {};
  for (const key of FIELD_KEYS) {
    const problem = fieldProblem(key, state.fields[key], state.units);
    if (problem) problems[key] = problem;
  }
  const test = state.fields.testPressure.valueSI;
  const baro = state.fields.barometric.valueSI;
  if (!problems.testPressure && !problems.barometric && test !== null && baro !== null && test > MAX_TEST_PRESSURE_SHARE * baro) {
    const limit = numberText(fieldFromSI('pressure', state.units, MAX_TEST_PRESSURE_SHARE * baro));
    problems.testPressure = `Above a quarter of the barometric pressure (${limit} ${unitOf(state)}): no flow bench pulls that; check the unit.`;
  }
  return problems;
}

function unitOf(state: BenchPanelState): string {
  return state.units.pressure === 'inH2O' ? 'in H2O' : 'Pa';
}

/** SI values of the fields that can be used: empty and faulty fields are left out. */
export type UsableInputs = Partial<Record<FieldKey, number>>;

export function usableInputs(state: BenchPanelState): UsableInputs {
  const problems = fieldProblems(state);
  const usable: UsableInputs = {};
  for (const key of FIELD_KEYS) {
    const v = state.fields[key].valueSI;
    if (v !== null && !problems[key]) usable[key] = v;
  }
  return usable;
}

/** Lower-case field name for "needs ..." notes. */
export function fieldName(key: FieldKey): string {
  const { label, short } = FIELDS[key];
  return short ?? label.charAt(0).toLowerCase() + label.slice(1);
}

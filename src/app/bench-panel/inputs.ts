/** The bench panel's state and a variant's bench inputs in the document (SI numbers, the panel's choices), both ways. */

import type { BenchInputs } from '../../document/types.ts';
import { EMPTY_ENTRY, entryFromSI, FIELD_KEYS, type FieldEntry, type FieldKey } from './fields.ts';
import { fieldProblems, followApp, initialBenchState, type BenchPanelState } from './model.ts';

type BenchNumberKey = Exclude<keyof BenchInputs, 'humidityModel' | 'referenceArea' | 'flowScale'>;

/** Where each of the panel's fields is kept in the file; every field is there (the compiler checks both ways). */
export const BENCH_KEYS: { readonly [K in FieldKey]: BenchNumberKey } = {
  temperature: 'airTemperatureK',
  barometric: 'barometricPressurePa',
  humidity: 'relativeHumidityPct',
  testPressure: 'testPressurePa',
  flow: 'measuredFlowM3PerS',
  bore: 'boreM',
  stroke: 'strokeM',
  rpm: 'engineSpeedRpm',
  cylinders: 'cylinderCount',
  portArea: 'portAreaM2',
  valveDiameter: 'valveDiameterM',
  flowCoefficient: 'meanFlowCoefficient',
  hpPerCfm: 'hpPerCfm',
};

/** A port area or valve diameter that shows the app's number rather than the porter's. */
function follows(state: BenchPanelState, key: FieldKey): boolean {
  return (key === 'portArea' || key === 'valveDiameter') && state.follows[key];
}

/**
 * The inputs to keep for the panel as it stands: each usable number in SI, the choices, and nothing for an empty field
 * or one that follows the app. A field the panel cannot use (a typing slip, a number out of range) keeps the number
 * the document held, `kept`, so a slip never removes a good value from the file.
 */
export function benchInputsOf(state: BenchPanelState, kept: BenchInputs | undefined): BenchInputs {
  const problems = fieldProblems(state);
  const numbers: Partial<Record<BenchNumberKey, number>> = {};
  for (const key of FIELD_KEYS) {
    const name = BENCH_KEYS[key];
    const value = problems[key] ? kept?.[name] : state.fields[key].valueSI;
    if (value !== null && value !== undefined && !follows(state, key)) numbers[name] = value;
  }
  return { ...numbers, humidityModel: state.humidityModel, referenceArea: state.referenceArea, flowScale: state.flowScale };
}

/**
 * The panel showing `bench` (a variant's inputs) in the units it shows now, with the app's areas it already has.
 * No inputs at all is the panel as on a first visit (room air of a mild day, 28 in H2O); otherwise a number left out
 * is an empty field, and a port area or valve diameter left out follows the app's number.
 */
export function stateWithInputs(current: BenchPanelState, bench: BenchInputs | undefined): BenchPanelState {
  const fresh = initialBenchState(current.units);
  let state: BenchPanelState = { ...fresh, areasM2: current.areasM2, appPortArea: current.appPortArea };
  if (bench !== undefined) {
    const fields = Object.fromEntries(FIELD_KEYS.map((key) => {
      const value = bench[BENCH_KEYS[key]];
      return [key, value === undefined ? EMPTY_ENTRY : entryFromSI(key, value, current.units)];
    })) as Record<FieldKey, FieldEntry>;
    state = {
      ...state,
      fields,
      follows: { portArea: bench.portAreaM2 === undefined, valveDiameter: bench.valveDiameterM === undefined },
      humidityModel: bench.humidityModel ?? fresh.humidityModel,
      referenceArea: bench.referenceArea ?? fresh.referenceArea,
      flowScale: bench.flowScale ?? fresh.flowScale,
    };
  }
  if (state.follows.portArea) state = followApp(state, 'portArea');
  if (state.follows.valveDiameter) state = followApp(state, 'valveDiameter');
  return state;
}

/** The bench panel's state and a variant's bench inputs in the document: SI both ways, the panel's bounds the file's. */

import { describe, expect, it } from 'vitest';
import { inH2OToPa } from '../../../src/breathing/index.ts';
import { FIELD_KEYS, FIELDS } from '../../../src/app/bench-panel/fields.ts';
import { BENCH_KEYS, benchInputsOf, stateWithInputs } from '../../../src/app/bench-panel/inputs.ts';
import {
  fieldProblems, initialBenchState, setAreas, setChoice, setPortArea, setUnit, typeField, type BenchPanelState,
} from '../../../src/app/bench-panel/model.ts';
import { benchInputsSchema } from '../../../src/document/bench-schema.ts';
import { BENCH_BOUNDS } from '../../../src/document/limits.ts';

const inInches = (): BenchPanelState => setUnit(initialBenchState(), 'length', 'inch');

describe('the panel\'s inputs as the document keeps them', () => {
  it('a first visit\'s panel is room air of a mild day and 28 in H2O, in SI, with its choices', () => {
    expect(benchInputsOf(initialBenchState(), undefined)).toEqual({
      airTemperatureK: 293.15, barometricPressurePa: 101325, relativeHumidityPct: 50, testPressurePa: inH2OToPa(28), hpPerCfm: 0.26,
      humidityModel: 'cipm-2007', referenceArea: 'curtain', flowScale: 'ideal speed',
    });
  });

  it('keeps numbers in SI whatever unit they were typed in', () => {
    let s = typeField(inInches(), 'bore', '4.03');
    s = typeField(setUnit(s, 'flow', 'L/s'), 'flow', '98.5');
    s = typeField(setUnit(s, 'temperature', 'F'), 'temperature', '68');
    const bench = benchInputsOf(s, undefined);
    expect(bench.boreM).toBeCloseTo(4.03 * 0.0254, 15); // 1 in = 25.4 mm exactly (NIST SP 811)
    expect(bench.measuredFlowM3PerS).toBeCloseTo(0.0985, 15);
    expect(bench.airTemperatureK).toBeCloseTo(293.15, 12); // 68 °F is 20 °C [derived]
  });

  it('leaves out empty fields and the app\'s port area and valve diameter; keeps typed ones', () => {
    let s = setPortArea(setAreas(initialBenchState(), { valveHead: 1.6e-3 }), 1.2e-3, 'measured');
    s = typeField(s, 'temperature', '');
    let bench = benchInputsOf(s, undefined);
    expect(bench).not.toHaveProperty('airTemperatureK');
    expect(bench).not.toHaveProperty('portAreaM2');
    expect(bench).not.toHaveProperty('valveDiameterM');
    s = typeField(s, 'portArea', '1500');
    bench = benchInputsOf(s, undefined);
    expect(bench.portAreaM2).toBeCloseTo(1.5e-3, 15);
  });

  it('a field the panel cannot use keeps the number the document held, so a slip removes nothing from the file', () => {
    const kept = { boreM: 0.086, airTemperatureK: 290 };
    const s = typeField(typeField(initialBenchState(), 'bore', '8o'), 'temperature', '900');
    const bench = benchInputsOf(s, kept);
    expect(bench.boreM).toBe(0.086);
    expect(bench.airTemperatureK).toBe(290);
    expect(benchInputsOf(s, undefined)).not.toHaveProperty('boreM');
  });

  it('shows a variant\'s inputs in the units the panel shows, and a variant without any as a first visit', () => {
    const shown = stateWithInputs(inInches(), { boreM: 0.102362, testPressurePa: 2490.889, flowScale: 'mean port speed' });
    expect(shown.fields.bore.text).toBe('4.03');
    expect(shown.fields.testPressure.text).toBe('10');
    expect(shown.fields.temperature.text).toBe('');
    expect(shown.flowScale).toBe('mean port speed');
    expect(shown.humidityModel).toBe('cipm-2007');
    expect(shown.units.length).toBe('inch');
    const fresh = stateWithInputs(shown, undefined);
    expect(fresh.fields).toEqual(inInches().fields);
    expect(fresh.flowScale).toBe('ideal speed');
  });

  it('a port area left out follows the drawing again, a typed one does not', () => {
    const app = setPortArea(initialBenchState(), 2e-3, 'measured');
    expect(stateWithInputs(app, {}).fields.portArea.text).toBe('2000');
    expect(stateWithInputs(app, {}).follows.portArea).toBe(true);
    const typed = stateWithInputs(app, { portAreaM2: 1.5e-3 });
    expect(typed.fields.portArea.text).toBe('1500');
    expect(typed.follows.portArea).toBe(false);
  });

  it('shown and kept again gives the same inputs, exactly', () => {
    let s = typeField(typeField(inInches(), 'stroke', '3.48031'), 'cylinders', '6');
    s = setChoice(typeField(s, 'rpm', '7200'), 'referenceArea', 'throat');
    const bench = benchInputsOf(s, undefined);
    expect(benchInputsOf(stateWithInputs(initialBenchState(), bench), undefined)).toEqual(bench);
    expect(benchInputsOf(stateWithInputs(inInches(), bench), undefined)).toEqual(bench);
  });
});

describe('whatever the panel takes, the file takes', () => {
  it.each(FIELD_KEYS)('%s has the file\'s bounds', (key) => {
    const spec = FIELDS[key];
    const bound = BENCH_BOUNDS[BENCH_KEYS[key]] as { min: number; max: number; aboveMin?: true; integer?: true };
    expect(spec.min).toBe(bound.min);
    expect(spec.aboveMin ?? false).toBe(bound.aboveMin ?? false);
    expect(spec.max ?? spec.ceiling).toBe(bound.max);
    expect(spec.integer ?? false).toBe(bound.integer ?? false);
  });

  it('the highest and lowest values the panel takes pass the file\'s schema', () => {
    for (const key of FIELD_KEYS) {
      const bound = BENCH_BOUNDS[BENCH_KEYS[key]] as { min: number; max: number; aboveMin?: true };
      const lowest = bound.aboveMin ? bound.max * 1e-9 : bound.min;
      for (const value of [lowest, bound.max]) {
        const s = { ...initialBenchState(), fields: { ...initialBenchState().fields, [key]: { text: String(value), valueSI: value } } };
        if (fieldProblems(s)[key]) continue; // refused by the panel (a cross-field rule): nothing to keep
        const bench = benchInputsOf(s, undefined);
        expect(benchInputsSchema.safeParse(bench).success, `${key} = ${value}`).toBe(true);
      }
    }
  });
});

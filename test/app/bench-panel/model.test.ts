/** The bench panel's model against the REFERENCES.md §3–4 check values, typed in as a porter would type them. */

import { describe, expect, it } from 'vitest';
import { cfmToM3s } from '../../../src/breathing/index.ts';
import { benchOutputs, flowScaleSpeed } from '../../../src/app/bench-panel/outputs.ts';
import {
  fieldProblems, followApp, initialBenchState, setAreas, setChoice, setPortArea, setUnit, typeField, type BenchPanelState,
} from '../../../src/app/bench-panel/model.ts';
import type { FieldKey } from '../../../src/app/bench-panel/fields.ts';
import { expectRelClose, expectRoundsTo } from '../../breathing/close.ts';

/** Type several fields in turn. */
function typed(state: BenchPanelState, entries: Partial<Record<FieldKey, string>>): BenchPanelState {
  return Object.entries(entries).reduce((s, [k, text]) => typeField(s, k as FieldKey, text as string), state);
}

function out(state: BenchPanelState, key: string): number {
  const row = benchOutputs(state).find((r) => r.key === key);
  if (!row || row.valueSI === null) throw new Error(`row ${key} has no value: ${row?.missing}`);
  return row.valueSI;
}

function rowOf(state: BenchPanelState, key: string) {
  const row = benchOutputs(state).find((r) => r.key === key);
  if (!row) throw new Error(`no row ${key}`);
  return row;
}

/** Dry air at 15 C and 101325 Pa by the ideal mixture: 1.22498 kg/m³, the standard 1.2250 to 4 decimals. */
const standardAir = (s: BenchPanelState) =>
  setChoice(typed(s, { temperature: '15', humidity: '0', barometric: '101325' }), 'humidityModel', 'ideal-mixture');

describe('room air through the panel', () => {
  it('CIPM-2007 at 20 C, 101325 Pa, 50 % RH gives 1.19931 kg/m³; the ideal mixture 1.19883 (Picard et al., Metrologia 45, 2008; REFERENCES.md §4)', () => {
    const s = initialBenchState({ barometer: 'Pa' });
    expectRoundsTo(out(s, 'density'), 1.19931, 5);
    expectRoundsTo(out(setChoice(s, 'humidityModel', 'ideal-mixture'), 'density'), 1.19883, 5);
  });

  it('Sutherland viscosity at 20 C is 1.81341e-5 Pa s (US Standard Atmosphere 1976, eq. 51; REFERENCES.md §4)', () => {
    const s = initialBenchState();
    expectRoundsTo(out(s, 'viscosity') * 1e5, 1.81341, 5);
    expectRelClose(out(s, 'kinematic'), out(s, 'viscosity') / out(s, 'density'), 1e-12);
  });

  it('68 F is the same air as 20 C', () => {
    const s = setUnit(initialBenchState(), 'temperature', 'F');
    expect(s.fields.temperature.text).toBe('68');
    const f = typeField(s, 'temperature', '68');
    expectRelClose(out(f, 'density'), 1.19931, 5e-6);
  });

  it('dry standard air: 1.2250 kg/m³ and speed of sound 340.294 m/s at 288.15 K (US Standard Atmosphere 1976; REFERENCES.md §4)', () => {
    const s = standardAir(initialBenchState());
    expectRoundsTo(out(s, 'density'), 1.225, 4);
    expectRoundsTo(out(s, 'sound'), 340.294, 3);
  });
});

describe('bench numbers through the panel (REFERENCES.md §3b)', () => {
  it('ideal speed at 28 in H2O in 1.225 kg/m³ air is 106.710 m/s = 350.10 ft/s [derived]', () => {
    // The ideal-mixture density is 2e-5 below 1.2250, so the speed is within 1e-5 of the check value.
    const s = standardAir(initialBenchState());
    expectRelClose(out(s, 'ideal-speed'), 106.71, 1.5e-5);
    expect(rowOf(setUnit(s, 'speed', 'ft/s'), 'ideal-speed').text).toBe('350 ft/s');
  });

  it('226.105 CFM at 28 in H2O through a 1000 mm² curtain is C_D = 1 [derived: C_D A 1000 mm² passes 226.105 CFM]', () => {
    const s = setAreas(typed(standardAir(initialBenchState()), { flow: '226.105' }), { curtain: 1000e-6, throat: 800e-6 });
    expectRoundsTo(out(s, 'cd'), 1, 4);
    expect(rowOf(s, 'cd').text).toBe('1.000');
    expect(rowOf(s, 'cd').note).toContain('1000.0 mm²');
    expectRoundsTo(out(setChoice(s, 'referenceArea', 'throat'), 'cd'), 1.25, 4);
  });

  it('C_D says which area is missing', () => {
    const s = typed(initialBenchState(), { flow: '200' });
    expect(rowOf(s, 'cd').missing).toBe('no valve part');
    const noThroat = setChoice(setAreas(s, { curtain: 1e-3 }), 'referenceArea', 'throat');
    expect(rowOf(noThroat, 'cd').missing).toBe('no throat area for this variant');
  });

  it('25 -> 28 in H2O: x 1.058301 by the square-root law, x 1.053816 with compressibility [derived; practice]', () => {
    const s = typed(initialBenchState(), { testPressure: '25', flow: '100', barometric: '101325' });
    expectRoundsTo(out(s, 'flow-28-sqrt') / cfmToM3s(100), 1.058301, 6);
    expectRoundsTo(out(s, 'flow-28-comp') / cfmToM3s(100), 1.053816, 6);
    expect(rowOf(s, 'flow-28-sqrt').text).toBe('105.8 CFM');
  });

  it('flow in standard air equals the reading in standard air, and scales by sqrt(rho / 1.2250) otherwise', () => {
    const std = typed(standardAir(initialBenchState()), { flow: '200' });
    expectRelClose(out(std, 'flow-standard'), cfmToM3s(200), 2e-5);
    const warm = typed(initialBenchState(), { flow: '200' });
    expectRelClose(out(warm, 'flow-standard'), cfmToM3s(200) * Math.sqrt(1.19931 / 1.225), 1e-5);
  });
});

describe('engine numbers through the panel (REFERENCES.md §3c)', () => {
  const engine = (s: BenchPanelState) => typed(s, { bore: '100', stroke: '90', rpm: '6000' });

  it('B 100, S 90, 6000 rpm: piston 18.000 m/s; a 45 mm round port 88.889 m/s [pub: Heywood 1988 ch. 2; derived]', () => {
    const s = setPortArea(engine(initialBenchState()), (Math.PI / 4) * 0.045 ** 2, 'measured');
    expectRoundsTo(out(s, 'piston-speed'), 18, 3);
    expectRoundsTo(out(s, 'port-speed'), 88.889, 3);
    expect(rowOf(s, 'port-speed').note).toContain('from the section (measured)');
  });

  it('a typed port area replaces the app one until the porter asks for it back', () => {
    let s = setPortArea(engine(initialBenchState()), (Math.PI / 4) * 0.045 ** 2);
    s = typeField(s, 'portArea', '1000');
    s = setPortArea(s, 2e-3);
    expect(s.fields.portArea.text).toBe('1000');
    expectRoundsTo(out(s, 'port-speed'), (Math.PI / 4) * 0.01 * 18 / 1e-3, 6);
    s = followApp(s, 'portArea');
    expect(s.fields.portArea.text).toBe('2000');
  });

  it('inlet Mach index by its formula, flagged past the 0.6 knee (Livengood, Rogowski & Taylor 1952 — recalled from memory)', () => {
    const s = typed(engine(standardAir(initialBenchState())), { valveDiameter: '45', flowCoefficient: '0.35' });
    // [derived] Z = (B/D_i)² S_p / (C_i a) with S_p 18 m/s and a 340.294 m/s at 288.15 K.
    const z = (100 / 45) ** 2 * 18 / (0.35 * 340.294);
    expectRelClose(out(s, 'mach-index'), z, 1e-6);
    expect(rowOf(s, 'mach-index').flag).toBe(true);
    // The knee's source is named on screen as a reader cites it (author, work, year); the 0.6 itself is [memory].
    expect(rowOf(s, 'mach-index').note).toBe(
      'past the 0.6 knee, above which volumetric efficiency falls quickly (C. F. Taylor, The Internal-Combustion Engine in Theory and Practice, vol. 1, 2nd ed., 1985)',
    );
    expect(rowOf(s, 'mach-index').note).not.toMatch(/memory|recalled/);
  });

  it('the valve diameter follows the head area the app sends', () => {
    const s = setAreas(initialBenchState(), { valveHead: (Math.PI / 4) * 0.046 ** 2 });
    expect(s.fields.valveDiameter.text).toBe('46');
  });

  it('power estimate: hp = k x CFM at 28 in H2O x cylinders, k a setting [practice: arithmetic only]', () => {
    const s = typed(initialBenchState(), { flow: '226.105', cylinders: '4', hpPerCfm: '0.25' });
    expectRelClose(out(s, 'power') / 745.6999, 0.25 * 226.105 * 4, 1e-9);
    expect(rowOf(s, 'power').text).toBe('226 hp (169 kW)');
    expect(rowOf(s, 'power').note).toContain('common practice');
  });
});

describe('flow scale for the boundary-layer march', () => {
  it('sends the ideal speed, or the mean port speed when chosen', () => {
    let s = setPortArea(typed(standardAir(initialBenchState()), { bore: '100', stroke: '90', rpm: '6000' }), (Math.PI / 4) * 0.045 ** 2);
    expectRelClose(flowScaleSpeed(s)?.ms ?? 0, 106.71, 1.5e-5);
    s = setChoice(s, 'flowScale', 'mean port speed');
    expectRoundsTo(flowScaleSpeed(s)?.ms ?? 0, 88.889, 3);
    expect(flowScaleSpeed(typeField(s, 'rpm', ''))).toBeNull();
  });
});

describe('inputs a porter can get wrong', () => {
  it('negative flow, humidity above 100 % and words get a message next to the field; the results wait', () => {
    const s = typed(initialBenchState(), { flow: '-5', humidity: '120', bore: 'abc' });
    const problems = fieldProblems(s);
    expect(problems.flow).toBe('Cannot be negative.');
    expect(problems.humidity).toBe('Must lie between 0 % and 100 % (a percentage).');
    expect(problems.bore).toBe('“abc” is not a number.');
    expect(rowOf(s, 'density').missing).toBe('fix relative humidity');
    expect(rowOf(s, 'flow-28-sqrt').missing).toBe('fix measured flow');
  });

  it('a test pressure typed in Pa while the field shows in H2O is caught as a unit slip', () => {
    const s = typeField(initialBenchState(), 'testPressure', '6974');
    expect(fieldProblems(s).testPressure).toMatch(/check the unit/);
  });

  it('limits are stated in the unit the field shows', () => {
    const s = typeField(setUnit(initialBenchState(), 'temperature', 'F'), 'temperature', '200');
    expect(fieldProblems(s).temperature).toBe('Must lie between −40 °F and 140 °F (room air; check the unit).');
  });
});

describe('flow scale from the bench', () => {
  it('bench flow over port area: 1000 L/s through 0.02 m2 is 50 m/s [derived: continuity]', () => {
    let state = setUnit(initialBenchState(), 'flow', 'L/s');
    state = typeField(state, 'flow', '1000');
    state = setPortArea(state, 0.02, 'measured');
    state = setChoice(state, 'flowScale', 'bench flow / port area');
    const row = benchOutputs(state).find((r) => r.key === 'bench-port-speed');
    expectRelClose(row?.valueSI ?? NaN, 50, 1e-12);
    expectRelClose(flowScaleSpeed(state)?.ms ?? NaN, 50, 1e-12);
  });
});

/** The bench panel's unit switches keep the physical quantity; no text a porter types ever shows NaN. */

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { benchOutputs } from '../../../src/app/bench-panel/outputs.ts';
import { initialBenchState, setAreas, setPortArea, setUnit, typeField, type BenchPanelState } from '../../../src/app/bench-panel/model.ts';
import { FIELD_KEYS, type FieldKey } from '../../../src/app/bench-panel/fields.ts';
import { numberText, parseNumber, UNIT_OPTIONS, type PanelQuantity } from '../../../src/app/bench-panel/units.ts';

/** Every number input filled with a plausible reading of an invented small-block head on a bench. */
function filled(): BenchPanelState {
  const texts: Partial<Record<FieldKey, string>> = {
    flow: '212.4', testPressure: '25', bore: '101.6', stroke: '88.4', rpm: '6800', cylinders: '8',
    valveDiameter: '51', flowCoefficient: '0.32', portArea: '1650', humidity: '38', temperature: '24',
  };
  let s = Object.entries(texts).reduce((acc, [k, t]) => typeField(acc, k as FieldKey, t as string), initialBenchState());
  s = setAreas(s, { curtain: 2.1e-3, throat: 1.75e-3, valveHead: 2.04e-3 });
  return s;
}

const QUANTITIES = Object.keys(UNIT_OPTIONS) as PanelQuantity[];
const switchArb = fc.array(
  fc.constantFrom(...QUANTITIES).chain((q) => fc.record({ q: fc.constant(q), u: fc.constantFrom(...UNIT_OPTIONS[q].map((o) => o.value)) })),
  { maxLength: 12 },
);

function applySwitches(s: BenchPanelState, switches: ReadonlyArray<{ q: PanelQuantity; u: string }>): BenchPanelState {
  return switches.reduce((acc, { q, u }) => setUnit(acc, q, u as never), s);
}

describe('unit switches', () => {
  it('100 mm reads 3.93701 in, and 100 again when switched back; 20 C reads 68 F', () => {
    let s = typeField(initialBenchState(), 'bore', '100');
    s = setUnit(s, 'length', 'inch');
    expect(s.fields.bore.text).toBe('3.93701');
    expect(s.fields.bore.valueSI).toBe(0.1);
    expect(setUnit(s, 'length', 'mm').fields.bore.text).toBe('100');
    expect(setUnit(s, 'temperature', 'F').fields.temperature.text).toBe('68');
  });

  it('area follows length: 1000 mm² reads 1.55 in² (1 in = 25.4 mm exactly, NIST SP 811)', () => {
    const s = setUnit(typeField(initialBenchState(), 'portArea', '1000'), 'length', 'inch');
    expect(s.fields.portArea.text).toBe('1.55');
  });

  it('the barometer keeps its own unit when the test pressure switches', () => {
    const s = setUnit(initialBenchState(), 'pressure', 'Pa');
    expect(s.fields.testPressure.text).toBe('6974.49');
    expect(s.fields.barometric.text).toBe('101325');
  });

  it('any sequence of switches keeps every SI value exactly and every result the same', () => {
    const base = filled();
    const before = benchOutputs(base).map((r) => r.valueSI);
    fc.assert(
      fc.property(switchArb, (switches) => {
        const s = applySwitches(base, switches);
        for (const k of FIELD_KEYS) expect(s.fields[k].valueSI).toBe(base.fields[k].valueSI);
        const after = benchOutputs(s).map((r) => r.valueSI);
        after.forEach((v, i) => expect(v).toBe(before[i]));
      }),
      { seed: 20261202 },
    );
  });

  it('the text shown after a switch reads back to the same quantity within six significant digits', () => {
    fc.assert(
      fc.property(switchArb, (switches) => {
        const s = applySwitches(filled(), switches);
        for (const k of FIELD_KEYS) {
          const si = s.fields[k].valueSI;
          if (si === null) continue;
          const retyped = typeField(s, k, s.fields[k].text).fields[k].valueSI ?? NaN;
          expect(Math.abs(retyped - si)).toBeLessThanOrEqual(5e-6 * Math.abs(si) + 1e-12);
        }
      }),
      { seed: 20261202 },
    );
  });
});

describe('text in and out', () => {
  it('parses what a porter types and refuses the rest', () => {
    expect(parseNumber(' 101 325 ')).toBe(101325);
    expect(parseNumber('.5')).toBe(0.5);
    expect(parseNumber('1e3')).toBe(1000);
    for (const bad of ['', 'abc', '1,5', '12mm', '--1', '.', 'Infinity', 'NaN']) expect(parseNumber(bad)).toBeNull();
  });

  it('prints six significant digits without trailing zeros', () => {
    expect(numberText(6974.4892)).toBe('6974.49');
    expect(numberText(28)).toBe('28');
    expect(numberText(1.2e-7)).toBe('1.2e-7');
    expect(numberText(NaN)).toBe('');
  });

  it('whatever is typed into any field, no result or message shows NaN or Infinity', () => {
    const text = fc.oneof(fc.string(), fc.double().map(String), fc.constantFrom('-0', '1e400', '0', '-1', '100.0001', '1e-320'));
    fc.assert(
      fc.property(fc.constantFrom(...FIELD_KEYS), text, fc.option(fc.double(), { nil: null }), (key, typed, port) => {
        const s = setPortArea(typeField(filled(), key, typed), port);
        for (const row of benchOutputs(s)) {
          const shown = `${row.text ?? ''} ${row.note ?? ''} ${row.missing ?? ''}`;
          expect(shown).not.toMatch(/NaN|Infinity/);
          expect(row.text !== null || row.missing !== undefined).toBe(true);
        }
      }),
      { seed: 20261202 },
    );
  });
});

/**
 * The bench panel's browser store: now the display units only; and the inputs a browser kept before the document held
 * them (version 1), which must come back exactly for their one adoption, a broken store changing nothing it should not.
 */

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FIELD_KEYS, type FieldKey } from '../../../src/app/bench-panel/fields.ts';
import {
  followApp, initialBenchState, setAreas, setChoice, setPortArea, setUnit, typeField, type BenchPanelState, type FollowingField,
} from '../../../src/app/bench-panel/model.ts';
import {
  LEGACY_BENCH_VERSION, MAX_SAVED_TEXT, restoreLegacyBench, restoreUnits, savedBench, SAVED_BENCH_VERSION,
} from '../../../src/app/bench-panel/saved.ts';
import { UNIT_OPTIONS, type PanelQuantity } from '../../../src/app/bench-panel/units.ts';

/** What a browser kept under version 1 (the writer the panel used before the document held the inputs). */
function legacySaved(state: BenchPanelState) {
  const fields: Partial<Record<FieldKey, { text: string; si?: number }>> = {};
  for (const key of FIELD_KEYS) {
    const { text, valueSI } = state.fields[key];
    const follows = (key === 'portArea' || key === 'valveDiameter') && state.follows[key];
    if (follows || text.length > MAX_SAVED_TEXT) continue;
    const retyped = typeField(state, key, text).fields[key].valueSI;
    const exact = valueSI !== null && Number.isFinite(valueSI) && valueSI !== retyped;
    fields[key] = exact ? { text, si: valueSI } : { text };
  }
  const { units, humidityModel, referenceArea, flowScale } = state;
  return { version: LEGACY_BENCH_VERSION, units: { ...units }, fields, humidityModel, referenceArea, flowScale };
}

/** Through storage: the same JSON text a browser kept. */
const throughJson = (s: BenchPanelState): unknown => JSON.parse(JSON.stringify(legacySaved(s)));
/** The version-1 inputs put back, or `base` when the store holds none. */
const restoreBench = (saved: unknown, base: BenchPanelState): BenchPanelState => restoreLegacyBench(saved, base) ?? base;

/** A porter's session: engine in inches, bench in L/s and Pa, room in °F, some fields typed before a switch, some after. */
function session(): BenchPanelState {
  let s = initialBenchState();
  s = typeField(s, 'bore', '101.6');
  s = typeField(s, 'stroke', '88.4');
  s = setUnit(s, 'length', 'inch'); // bore and stroke re-shown: 4, 3.48031
  s = typeField(s, 'valveDiameter', '2.02');
  s = setUnit(s, 'flow', 'L/s');
  s = typeField(s, 'flow', '100.3');
  s = setUnit(s, 'pressure', 'Pa');
  s = typeField(s, 'testPressure', '6227');
  s = setUnit(s, 'temperature', 'F');
  s = typeField(s, 'temperature', '72.5');
  s = typeField(s, 'rpm', '6800');
  s = typeField(s, 'humidity', 'about 40'); // kept as typed, with its message
  s = setChoice(s, 'humidityModel', 'ideal-mixture');
  s = setChoice(s, 'referenceArea', 'throat');
  return setChoice(s, 'flowScale', 'mean port speed');
}

describe('a porter\'s inputs survive a visit', () => {
  it('fields typed in several units, unit choices and the three choices come back as they were', () => {
    const s = session();
    const back = restoreBench(throughJson(s), initialBenchState());
    expect(back.units).toEqual({ length: 'inch', speed: 'm/s', flow: 'L/s', pressure: 'Pa', barometer: 'Pa', temperature: 'F' });
    expect(back.fields).toEqual(s.fields);
    expect(back.fields.bore).toEqual({ text: '4', valueSI: 0.1016 });
    expect(back.fields.stroke.text).toBe('3.48031');
    expect(back.fields.stroke.valueSI).toBe(s.fields.stroke.valueSI); // the exact 88.4 mm, not 3.48031 in
    expect(back.fields.humidity).toEqual({ text: 'about 40', valueSI: null });
    expect([back.humidityModel, back.referenceArea, back.flowScale]).toEqual(['ideal-mixture', 'throat', 'mean port speed']);
    expect(back.follows).toEqual({ portArea: true, valveDiameter: false });
  });

  it('the port area and valve diameter the document supplies are not kept; typed ones are', () => {
    let s = setPortArea(setAreas(initialBenchState(), { valveHead: 2e-3, curtain: 1.4e-3 }), 1.6e-3, 'measured');
    expect(legacySaved(s).fields).not.toHaveProperty('portArea');
    expect(legacySaved(s).fields).not.toHaveProperty('valveDiameter');
    expect(JSON.stringify(legacySaved(s))).not.toMatch(/areas|appPortArea|follows|measured/);
    s = typeField(s, 'portArea', '1500');
    expect(legacySaved(s).fields.portArea).toEqual({ text: '1500' });
    const back = restoreBench(throughJson(s), initialBenchState());
    expect(back.fields.portArea).toEqual(s.fields.portArea);
    expect(back.follows.portArea).toBe(false);
    expect(back.areasM2).toEqual({});
    expect(back.appPortArea).toBeNull();
  });

  it('a text typed in the unit shown needs no stored value; only a re-shown one does', () => {
    const s = session();
    const kept = legacySaved(s).fields;
    expect(kept.flow).toEqual({ text: '100.3' });
    expect(kept.stroke).toEqual({ text: '3.48031', si: s.fields.stroke.valueSI });
  });
});

describe('the store now keeps the display units only', () => {
  it('writes the units and nothing the porter typed (that is in the document)', () => {
    const s = session();
    expect(savedBench(s)).toEqual({ version: SAVED_BENCH_VERSION, units: s.units });
    expect(JSON.stringify(savedBench(s))).not.toMatch(/fields|101\.6|humidityModel/);
  });

  it('reads the units back from a store of either version, and no inputs from the new one', () => {
    const s = session();
    for (const stored of [JSON.parse(JSON.stringify(savedBench(s))), throughJson(s)]) {
      const back = restoreUnits(stored, initialBenchState());
      expect(back.units).toEqual(s.units);
      expect(back.fields.flow).toEqual(initialBenchState().fields.flow);
    }
    expect(restoreLegacyBench(JSON.parse(JSON.stringify(savedBench(s))), initialBenchState())).toBeNull();
  });
});

const QUANTITIES = Object.keys(UNIT_OPTIONS) as PanelQuantity[];

/** Text as a porter types it: numbers written several ways, empty fields, slips and words, all within the kept length. */
const typedText = fc.oneof(
  fc.double({ min: -1e6, max: 1e6, noNaN: true }).chain((v) => fc.constantFrom(String(v), v.toFixed(2), v.toPrecision(3), v.toExponential(1))),
  fc.integer({ min: -50, max: 30000 }).map(String),
  fc.constantFrom('', ' 101 325 ', '.5', '1e3', '-', 'abc', '1,5', '1e400'),
  fc.string({ maxLength: MAX_SAVED_TEXT }),
);

type Action = (s: BenchPanelState) => BenchPanelState;
const typing: fc.Arbitrary<Action> = fc.tuple(fc.constantFrom(...FIELD_KEYS), typedText).map(([k, t]) => (s) => typeField(s, k, t));
const unitSwitch: fc.Arbitrary<Action> = fc.constantFrom(...QUANTITIES)
  .chain((q) => fc.constantFrom(...UNIT_OPTIONS[q].map((o) => o.value)).map((u): Action => (s) => setUnit(s, q, u as never)));
const choice: fc.Arbitrary<Action> = fc.oneof(
  fc.constantFrom('cipm-2007', 'ideal-mixture' as const).map((v): Action => (s) => setChoice(s, 'humidityModel', v)),
  fc.constantFrom('curtain', 'throat', 'valve head' as const).map((v): Action => (s) => setChoice(s, 'referenceArea', v)),
  fc.constantFrom('ideal speed', 'bench flow / port area', 'mean port speed' as const).map((v): Action => (s) => setChoice(s, 'flowScale', v)),
);
const porter = fc.array(fc.oneof({ arbitrary: typing, weight: 3 }, unitSwitch, choice), { maxLength: 25 });

/** What the app sends: reference areas and a port area (m²), and the porter asking for the app's number back. */
const areas = fc.record({ curtain: fc.double({ min: 1e-4, max: 5e-3, noNaN: true }), valveHead: fc.double({ min: 1e-4, max: 5e-3, noNaN: true }) });
const fromApp: fc.Arbitrary<Action> = fc.oneof(
  areas.map((a): Action => (s) => setAreas(s, a)),
  fc.option(fc.double({ min: 1e-4, max: 5e-3, noNaN: true }), { nil: null }).map((m2): Action => (s) => setPortArea(s, m2, 'measured')),
  fc.constantFrom<FollowingField>('portArea', 'valveDiameter').map((k): Action => (s) => followApp(s, k)),
);

const run = (actions: readonly Action[]) => actions.reduce((s, act) => act(s), initialBenchState());

/** JSON keeps no sign on zero; a field reading −0 is the same reading as 0 (no limit or result tells them apart). */
function unsignedZeros(s: BenchPanelState): BenchPanelState {
  const fields = Object.fromEntries(FIELD_KEYS.map((k) => {
    const e = s.fields[k];
    return [k, e.valueSI === 0 ? { ...e, valueSI: 0 } : e];
  })) as Record<FieldKey, BenchPanelState['fields'][FieldKey]>;
  return { ...s, fields };
}

describe('restore(save(s)) is s', () => {
  it('for any sequence of typing, unit switches and choices', () => {
    fc.assert(fc.property(porter, (actions) => {
      const s = run(actions);
      expect(unsignedZeros(restoreBench(throughJson(s), initialBenchState()))).toEqual(unsignedZeros(s));
    }));
  });

  it('with the app\'s areas mixed in: the restored panel, sent the same areas, is the same panel', () => {
    const mixed = fc.array(fc.oneof({ arbitrary: typing, weight: 3 }, unitSwitch, choice, fromApp), { maxLength: 30 });
    fc.assert(fc.property(mixed, (actions) => {
      const s = run(actions);
      let back = restoreBench(throughJson(s), initialBenchState());
      back = setPortArea(setAreas(back, s.areasM2), s.appPortArea?.m2 ?? null, s.appPortArea?.source);
      expect(unsignedZeros(back)).toEqual(unsignedZeros(s));
    }));
  });
});

describe('a broken store breaks nothing', () => {
  const base = initialBenchState();
  const good = () => throughJson(session()) as Record<string, unknown> & { fields: Record<string, unknown>; units: Record<string, unknown> };

  it('JSON that is not a kept panel, or of another version, gives the base panel', () => {
    for (const stored of [null, [], [good()], 42, 'portwright', {}, { ...good(), version: 2 }, { ...good(), version: '1' }]) {
      expect(restoreBench(stored, base)).toBe(base);
    }
  });

  it('a unit that is not offered is ignored, and so are the fields typed in it; the rest comes back', () => {
    const stored = good();
    stored.units.length = 'furlong';
    const back = restoreBench(stored, base);
    expect(back.units).toEqual({ ...session().units, length: 'mm' });
    for (const key of ['bore', 'stroke', 'valveDiameter'] as const) expect(back.fields[key]).toEqual(base.fields[key]);
    expect(back.follows.valveDiameter).toBe(true);
    expect(back.fields.flow).toEqual(session().fields.flow);
    expect(back.fields.rpm.text).toBe('6800'); // a plain number needs no unit
  });

  it('fields of the wrong type, too long, or unknown are ignored one by one', () => {
    const stored = good();
    Object.assign(stored.fields, {
      flow: 100.3, rpm: { text: 6800 }, stroke: ['3.48'], humidity: null,
      cylinders: { text: '8'.repeat(MAX_SAVED_TEXT + 1) }, flowCoefficient: { text: ' '.repeat(MAX_SAVED_TEXT - 4) + '0.32' },
      wheelbase: { text: '2700' }, constructor: { text: '1' },
    });
    const back = restoreBench(stored, base);
    for (const key of ['flow', 'rpm', 'stroke', 'humidity', 'cylinders'] as const) expect(back.fields[key]).toEqual(base.fields[key]);
    expect(back.fields.flowCoefficient.valueSI).toBe(0.32); // exactly the cap: kept
    expect(back.fields.bore).toEqual(session().fields.bore);
    expect(Object.keys(back.fields).sort()).toEqual([...FIELD_KEYS].sort());
  });

  it('a stored exact value that does not print as the text, or is not a number, is dropped and the text typed again', () => {
    const stored = good();
    Object.assign(stored.fields, { bore: { text: '4', si: 0.2 }, stroke: { text: '3.48031', si: '0.0884' } });
    const back = restoreBench(stored, base);
    expect(back.fields.bore).toEqual(typeField(back, 'bore', '4').fields.bore);
    expect(back.fields.stroke.valueSI).toBeCloseTo(3.48031 * 0.0254, 12);
  });

  it('choices that are not offered are ignored; unknown top-level keys and a "__proto__" key change nothing', () => {
    const kept = good();
    delete kept.fields.cylinders;
    const text = JSON.stringify({ ...kept, humidityModel: 'magic', referenceArea: 3, extra: { a: 1 } })
      .replace('"fields":{', '"fields":{"__proto__":{"cylinders":{"text":"9"}},');
    const stored = JSON.parse(text);
    expect(Object.hasOwn(stored.fields, '__proto__')).toBe(true); // JSON.parse makes it an own key, as a hostile store would
    const back = restoreBench(stored, base);
    expect([back.humidityModel, back.referenceArea, back.flowScale]).toEqual(['cipm-2007', 'curtain', 'mean port speed']);
    expect(back.fields.cylinders).toEqual(base.fields.cylinders);
    expect(back.fields.bore).toEqual(session().fields.bore);
    expect(back).not.toHaveProperty('extra');
  });

  it('never throws, whatever JSON is stored or however a kept panel is damaged', () => {
    const damaged = fc.tuple(fc.constantFrom('units', 'fields', 'humidityModel', 'flowScale', 'version'), fc.jsonValue())
      .map(([key, junk]) => ({ ...good(), [key]: junk }));
    fc.assert(fc.property(fc.oneof(fc.jsonValue(), damaged, fc.anything()), (stored) => {
      const back = restoreBench(stored, base);
      for (const key of FIELD_KEYS) expect(back.fields[key].text.length).toBeLessThanOrEqual(MAX_SAVED_TEXT);
      expect(Object.keys(back).sort()).toEqual(Object.keys(base).sort());
    }));
  });
});

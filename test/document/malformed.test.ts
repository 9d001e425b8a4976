import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DocumentError } from '../../src/document/errors.ts';
import { loadDocument, saveDocument } from '../../src/document/load.ts';
import { documentArb } from './arbitraries.ts';
import * as m from './mutations.ts';

const SAMPLES = ['street-tight-short-side.json', 'short-side-compare.json', 'street-port-widths.json'].map((name) =>
  readFileSync(new URL(`../../samples/${name}`, import.meta.url), 'utf8'),
);

/** A fresh plain copy of a valid document, from a generated one or a sample. */
const baseArb: fc.Arbitrary<m.Json> = fc.oneof(
  documentArb.map((doc) => JSON.parse(saveDocument(doc)) as m.Json),
  fc.constantFrom(...SAMPLES).map((text) => JSON.parse(text) as m.Json),
);

/** Loading must fail with a DocumentError whose message names the expected place; nothing else may escape. */
function expectRefused(mutant: m.Mutant | undefined): void {
  fc.pre(mutant !== undefined);
  let caught: unknown;
  try {
    loadDocument(mutant!.text);
  } catch (error) {
    caught = error;
  }
  expect(caught, 'the broken file was accepted').toBeInstanceOf(DocumentError);
  const message = (caught as Error).message;
  if (typeof mutant!.expected === 'string') expect(message).toContain(mutant!.expected);
  else expect(message).toMatch(mutant!.expected);
  expect(({} as Record<string, unknown>).polluted).toBeUndefined();
}

const KINDS: [string, number, fc.Arbitrary<m.Mutant | undefined>][] = [
  ['a required field deleted', 40, fc.tuple(baseArb, m.pickArb).map(([d, p]) => m.deleteField(d, p))],
  ['a value of the wrong type', 60, fc.tuple(baseArb, m.pickArb, m.pickArb).map(([d, p, v]) => m.wrongType(d, p, v))],
  ['a value out of bounds', 50, fc.tuple(baseArb, m.pickArb, m.pickArb).map(([d, p, v]) => m.outOfBounds(d, p, v))],
  ['the text cut short', 50, fc.tuple(baseArb, m.pickArb).map(([d, p]) => m.truncate(JSON.stringify(d, null, 2), p))],
  ['a prototype key injected', 30, fc.tuple(baseArb, m.pickArb, m.pickArb).map(([d, p, k]) => m.hostileKey(d, p, k))],
  ['an unknown field added', 30, fc.tuple(baseArb, m.pickArb, m.pickArb).map(([d, p, k]) => m.unknownField(d, p, k))],
  ['nesting far too deep', 15, fc.tuple(baseArb, m.pickArb, fc.nat({ max: 100 })).map(([d, p, n]) => m.deepNest(d, p, n))],
  ['a number that overflows to Infinity', 20, fc.tuple(baseArb, m.pickArb).map(([d, p]) => m.overflowNumber(d, p))],
  ['a rule across fields broken', 30, fc.tuple(baseArb, m.pickArb).map(([d, p]) => m.crossField(d, p))],
  ['a list longer than allowed', 6, fc.tuple(baseArb, fc.nat()).map(([d, w]) => m.hugeArray(d, w))],
];

describe('malformed files are refused with the place named', () => {
  it('runs at least 200 broken files in all', () => {
    expect(KINDS.reduce((n, [, runs]) => n + runs, 0)).toBeGreaterThanOrEqual(200);
  });

  it.each(KINDS)('%s', (_, numRuns, mutants) => {
    fc.assert(fc.property(mutants, expectRefused), { numRuns });
  });
});

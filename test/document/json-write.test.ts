import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { writeJson } from '../../src/document/json-write.ts';
import { readJson } from '../../src/document/json-read.ts';

describe('writeJson', () => {
  it('writes text that reads back to the same value', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        fc.pre(!/"(__proto__|constructor|prototype)"/.test(JSON.stringify(value)));
        expect(readJson(writeJson(value))).toStrictEqual(value);
        expect(JSON.parse(writeJson(value))).toEqual(value);
      }),
      { numRuns: 500 },
    );
  });

  it('keeps points and small records on one line, indents the rest by two spaces', () => {
    const value = { a: [1, -0, 2.5], b: [{ at: [0, 1] }, { at: [2, 3], r: 4 }], c: [], d: {}, e: [[1, 2], [3, 4]] };
    expect(writeJson(value)).toBe(
      [
        '{',
        '  "a": [1, -0, 2.5],',
        '  "b": [',
        '    { "at": [0, 1] },',
        '    { "at": [2, 3], "r": 4 }',
        '  ],',
        '  "c": [],',
        '  "d": {},',
        '  "e": [[1, 2], [3, 4]]',
        '}',
        '',
      ].join('\n'),
    );
  });

  it('breaks a record that would run past 100 characters', () => {
    const text = writeJson({ note: 'x'.repeat(120), n: 1 });
    expect(text).toBe(`{\n  "note": "${'x'.repeat(120)}",\n  "n": 1\n}\n`);
  });

  it('leaves out undefined fields and refuses numbers JSON cannot hold', () => {
    expect(writeJson({ a: undefined, b: 1 })).toBe('{ "b": 1 }\n');
    expect(() => writeJson({ a: Number.NaN })).toThrow(TypeError);
    expect(() => writeJson([Infinity])).toThrow(TypeError);
  });
});

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DocumentError } from '../../src/document/errors.ts';
import { MAX_JSON_DEPTH, lineAndColumn, readJson } from '../../src/document/json-read.ts';
import { documentErrorOf } from './document-error.ts';

const HOSTILE = /"(__proto__|constructor|prototype)"/;

function messageOf(text: string): string {
  return documentErrorOf(() => readJson(text)).message;
}

describe('readJson agrees with JSON.parse', () => {
  it('on generated JSON text', () => {
    fc.assert(
      fc.property(fc.json({ depthSize: 'medium' }), (text) => {
        fc.pre(!HOSTILE.test(text));
        expect(readJson(text)).toStrictEqual(JSON.parse(text));
      }),
      { numRuns: 500 },
    );
  });

  it('on whether damaged JSON text is valid', () => {
    const damaged = fc
      .tuple(fc.json({ depthSize: 'small' }), fc.nat(), fc.nat({ max: 3 }), fc.constantFrom('', ',', '"', '}', ']', ':', '-', 'e', '\\', '\n', 'x', '0'))
      .map(([text, at, cut, insert]) => {
        const i = at % (text.length + 1);
        return text.slice(0, i) + insert + text.slice(i + cut);
      });
    fc.assert(
      fc.property(damaged, (text) => {
        let parsed: unknown, error: unknown;
        try {
          parsed = JSON.parse(text);
        } catch (e) {
          error = e;
        }
        if (error !== undefined) {
          expect(() => readJson(text)).toThrow(DocumentError);
          return;
        }
        try {
          expect(readJson(text)).toStrictEqual(parsed);
        } catch (refused) {
          // Valid JSON that a section file still may not hold: a repeated or prototype key (damage can make either).
          expect(refused).toBeInstanceOf(DocumentError);
          expect((refused as Error).message).toMatch(/appears twice|is not allowed/);
        }
      }),
      { numRuns: 1000 },
    );
  });

  it('keeps -0, escapes and surrogate pairs', () => {
    expect(Object.is(readJson('-0'), -0)).toBe(true);
    expect(readJson('"a\\u00e9\\n\\"\\/\\ud83d\\ude00"')).toBe('a\u00e9\n"/\u{1F600}');
  });

  it('skips a leading byte-order mark', () => {
    expect(readJson('\ufeff{"a": 1}')).toEqual({ a: 1 });
  });
});

describe('readJson refuses with a place', () => {
  it('gives line and column of a syntax error, and where in the document it is', () => {
    expect(messageOf('{\n  "a": [1, 2,\n  ]\n}')).toBe('not valid JSON at line 3, column 3 (inside a[2]): expected a value, found \']\'');
    expect(messageOf('{"a": tru}')).toBe('not valid JSON at line 1, column 7 (inside a): expected a value, found \'t\'');
  });

  it('says when the text is cut short', () => {
    expect(messageOf('{"variants": [{"name": "ba')).toBe(
      'not valid JSON at line 1, column 27 (inside variants[0].name): the text ends inside a string (is the file cut short?)',
    );
    expect(messageOf('{"a": ')).toContain('the text ends where a value should be');
  });

  it('says an empty file is empty', () => {
    expect(messageOf('')).toBe('the file is empty');
    expect(messageOf(' \n\t ')).toBe('the file is empty');
  });

  it('refuses keys that reach a prototype, naming where', () => {
    expect(messageOf('{"variants": [{"__proto__": {"x": 1}}]}')).toBe(
      'variants[0].__proto__: the field name "__proto__" is not allowed in a section file',
    );
    expect(messageOf('{"constructor": {"prototype": {}}}')).toContain('constructor: the field name "constructor"');
    expect(messageOf('{"a": {"prototype": 1}}')).toContain('a.prototype:');
    expect(messageOf('{"\\u005f_proto__": 1}')).toContain('"__proto__" is not allowed');
    expect(({} as Record<string, unknown>).x).toBeUndefined();
  });

  it('refuses a field given twice', () => {
    expect(messageOf('{"title": "a", "title": "b"}')).toBe('title: appears twice in the same object');
  });

  it('refuses nesting deeper than the limit without exhausting the stack', () => {
    const ok = `${'['.repeat(MAX_JSON_DEPTH)}${']'.repeat(MAX_JSON_DEPTH)}`;
    expect(() => readJson(ok)).not.toThrow();
    expect(messageOf(`{"note": ${'['.repeat(MAX_JSON_DEPTH + 1)}`)).toMatch(/^note(\[0\])+: nested more than 32 levels deep/);
    expect(messageOf('['.repeat(1_000_000))).toContain('nested more than');
  });

  it('refuses raw control characters in strings and bad escapes', () => {
    expect(messageOf('"a\nb"')).toContain('must be escaped');
    expect(messageOf('"\\x41"')).toContain('unknown escape \\x');
    expect(messageOf('"\\u12"')).toContain('four hexadecimal digits');
  });

  it('refuses numbers JSON does not allow', () => {
    for (const text of ['01', '1.', '.5', '+1', '1e', 'NaN', 'Infinity', '0x10', '1.5.2']) {
      expect(messageOf(text)).toMatch(/^not valid JSON at line 1/);
    }
  });
});

describe('lineAndColumn', () => {
  it('counts from 1 and restarts the column after each newline', () => {
    expect(lineAndColumn('ab\ncd', 0)).toEqual({ line: 1, column: 1 });
    expect(lineAndColumn('ab\ncd', 2)).toEqual({ line: 1, column: 3 });
    expect(lineAndColumn('ab\ncd', 4)).toEqual({ line: 2, column: 2 });
  });
});

import { describe, expect, it } from 'vitest';
import { jsonLines, roundForJson } from '../../src/cli/json-text.ts';

describe('JSON text for solve --json', () => {
  it('rounds to six significant figures and refuses NaN and infinities (JSON has no place for them)', () => {
    expect(roundForJson(0.123456789)).toBe(0.123457);
    expect(roundForJson(123456789)).toBe(123457000);
    expect(roundForJson(3.90629123e-9)).toBe(3.90629e-9);
    expect(roundForJson(-0)).toBe(0);
    expect(Object.is(roundForJson(-1e-300 * 1e-300), 0)).toBe(true);
    for (const bad of [NaN, Infinity, -Infinity]) expect(() => roundForJson(bad)).toThrow(TypeError);
    expect(() => jsonLines({ peak: { speedRatio: NaN } })).toThrow(/NaN/);
  });

  it('writes one parseable document equal to the rounded input, keys in order, undefined keys left out', () => {
    const value = {
      variant: 'tight short side',
      grid: { nx: 539, ny: 468, spacing: 0.28329512 },
      peak: { speedRatio: 3.5681663981, x: 117.709030681, y: 2 },
      probes: [],
      walls: [{ name: 'short side', sides: undefined, detachment: null, samples: [[0, 30, 0, 1.006691], [0.2830188, 30, 0.2830188, 1.00669]] }],
      converged: true,
    };
    const text = jsonLines(value).join('\n');
    expect(JSON.parse(text)).toEqual({
      variant: 'tight short side',
      grid: { nx: 539, ny: 468, spacing: 0.283295 },
      peak: { speedRatio: 3.56817, x: 117.709, y: 2 },
      probes: [],
      walls: [{ name: 'short side', detachment: null, samples: [[0, 30, 0, 1.00669], [0.283019, 30, 0.283019, 1.00669]] }],
      converged: true,
    });
    expect(Object.keys(JSON.parse(text))).toEqual(['variant', 'grid', 'peak', 'probes', 'walls', 'converged']);
  });

  it('keeps short flat lists on one line and breaks long ones and nested ones', () => {
    const lines = jsonLines({ peak: { speedRatio: 2, x: 1, y: 3 }, samples: [[1, 2], [3, 4]], findings: ['a'.repeat(100), 'b'.repeat(100)] });
    expect(lines).toEqual([
      '{',
      '  "peak": {"speedRatio": 2, "x": 1, "y": 3},',
      '  "samples": [',
      '    [1, 2],',
      '    [3, 4]',
      '  ],',
      '  "findings": [',
      `    "${'a'.repeat(100)}",`,
      `    "${'b'.repeat(100)}"`,
      '  ]',
      '}',
    ]);
  });

  it('escapes strings as JSON does', () => {
    const name = 'bowl "B"\\ \n 46\u00a0mm';
    expect(JSON.parse(jsonLines({ name }).join('\n'))).toEqual({ name });
  });
});

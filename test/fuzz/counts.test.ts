/** The fuzz runs at least the 10,000 cases issue 11 asks for, and README states the counts the tests run. */

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { EDIT_SEQUENCE_RUNS, GEOMETRY_RUNS, LOADER_RUNS, MIGRATION_RUNS, TOTAL_RUNS } from './counts.ts';

const README = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
const fuzzSection = README.slice(README.indexOf('## Fuzz'), README.indexOf('\n## ', README.indexOf('## Fuzz') + 1));
const written = (n: number): string => n.toLocaleString('en-GB');

describe('fuzz counts', () => {
  it(`add up to ${written(TOTAL_RUNS)}, at least 10,000`, () => {
    expect(TOTAL_RUNS).toBeGreaterThanOrEqual(10_000);
  });

  it('are the ones README states', () => {
    const geometry = Object.values(GEOMETRY_RUNS).reduce((a, b) => a + b, 0);
    for (const n of [TOTAL_RUNS, LOADER_RUNS, MIGRATION_RUNS, EDIT_SEQUENCE_RUNS, geometry, ...Object.values(GEOMETRY_RUNS)]) {
      expect(fuzzSection).toContain(written(n));
    }
  });
});

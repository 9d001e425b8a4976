/** solveCase: the solve and reading the worker and the command share. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import { SolveSupersededError } from '../../src/solver/solve.ts';
import { caseSetup, solveCase } from '../../src/study/index.ts';

const doc = loadDocument(readFileSync(new URL('../../samples/street-tight-short-side.json', import.meta.url), 'utf8'));
const setup = caseSetup(doc, { targetCells: 20_000 });

describe('solveCase', () => {
  it('reads the flow when asked, and samples the wall speeds for it even when told not to', () => {
    const { result, reading } = solveCase(setup.domain, { targetCells: 20_000, wallSpeeds: false }, setup.reading);
    expect(result.walls.length).toBeGreaterThan(0);
    expect(reading?.tightest).not.toBeNull();
    expect(solveCase(setup.domain, { targetCells: 20_000, wallSpeeds: false }, null)).toMatchObject({ reading: null, result: { walls: [] } });
  });

  it('does not read a solve that was superseded as it finished', () => {
    let calls = 0;
    solveCase(setup.domain, { targetCells: 20_000, shouldStop: () => (calls++, false) }, null);
    // The same questions again, and one more after the solve: that last one says stop.
    const solveCalls = calls;
    let asked = 0;
    const stopAfterSolve = () => ++asked > solveCalls;
    expect(() => solveCase(setup.domain, { targetCells: 20_000, shouldStop: stopAfterSolve }, setup.reading)).toThrow(SolveSupersededError);
    expect(asked).toBe(solveCalls + 1);
  });
});

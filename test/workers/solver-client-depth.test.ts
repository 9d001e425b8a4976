/** The passage depth crosses into the worker with the domain: a constant depth c gives c times the conductance. */
import { readFileSync } from 'node:fs';
import { afterEach, describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import { defaultTolerance, sectionToDomain } from '../../src/geometry/index.ts';
import type { FlowDomain } from '../../src/solver/types.ts';
import { SolverClient } from '../../src/workers/solver-client.ts';
import { portWorker } from './worker-handles.ts';

const open: Array<() => void> = [];
afterEach(() => open.splice(0).forEach((close) => close()));

describe('a domain with a depth sent to the worker', () => {
  it('is solved with its depth, and the caller keeps its own depth values', async () => {
    const client = new SolverClient(() => portWorker());
    open.push(() => client.dispose());
    const section = loadDocument(readFileSync('samples/street-tight-short-side.json', 'utf8')).variants[0].section;
    const plane = sectionToDomain(section, defaultTolerance(section));
    const values = new Float64Array(4).fill(32);
    const deep: FlowDomain = { ...plane, depth: { kind: 'sampled', x0: 0, y0: 0, dx: 1, dy: 1, nx: 2, ny: 2, values } };
    const flat = await client.solveLatest({ domain: plane, targetCells: 5_000 });
    const wide = await client.solveLatest({ domain: deep, targetCells: 5_000 });
    if (!flat?.ok || !wide?.ok) throw new Error('both solves should succeed');
    // A constant depth c multiplies every flux by c and changes nothing else (DEVELOPERS.md, "Passage depth") [derived].
    expect(wide.conductance / flat.conductance).toBeCloseTo(32, 6);
    expect(Array.from(values)).toEqual([32, 32, 32, 32]);
  });
});

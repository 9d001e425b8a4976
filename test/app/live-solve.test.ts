/** Live solving after a worker fault: the restart is said, the last shape is solved again, and then said solved. */
import { readFileSync } from 'node:fs';
import { afterEach, describe, expect, it } from 'vitest';
import { LiveSolve } from '../../src/app/live-solve.ts';
import { loadDocument } from '../../src/document/load.ts';
import { defaultTolerance, sectionToDomain } from '../../src/geometry/index.ts';
import { createSolverApi } from '../../src/workers/solver-api.ts';
import { SolverClient } from '../../src/workers/solver-client.ts';
import { portWorker, stallableApi } from '../workers/worker-handles.ts';

function sampleDomain() {
  const doc = loadDocument(readFileSync('samples/street-tight-short-side.json', 'utf8'));
  const section = doc.variants[0].section;
  return sectionToDomain(section, defaultTolerance(section));
}

const open: Array<() => void> = [];
afterEach(() => open.splice(0).forEach((close) => close()));

describe('LiveSolve after the worker stops', () => {
  it('says so, solves the last shape again on the new worker, and says the picture is solved again', async () => {
    const stuck = stallableApi();
    let made = 0;
    const client = new SolverClient(() => portWorker(made++ === 0 ? stuck.api : createSolverApi()), { minSilenceMs: 300, idleCheckMs: 100 });
    open.push(() => client.dispose());
    const events: string[] = [];
    const live = new LiveSolve(client, {
      onStart: (kind) => events.push(`start ${kind}`),
      onField: (reply, kind) => events.push(`field ${kind} ${reply.nx * reply.ny > 0}`),
      onFailure: (failure) => events.push(`failure ${failure.code}`),
      onWorkerNote: (message, level) => events.push(`${level}: ${message}`),
    });
    await live.request(sampleDomain(), 'full', 5_000, {});
    expect(events).toEqual(['start full', 'field full true']);
    stuck.hang();
    await expect.poll(() => events.length, { timeout: 5_000 }).toBe(6);
    expect(events.slice(2)).toEqual([
      'warn: The solver stopped answering and was restarted; solving again.',
      'start full',
      'info: The solver was restarted after it stopped, and the picture is solved again.',
      'field full true',
    ]);
    expect(made).toBe(2);
  });
});

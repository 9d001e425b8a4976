/** A solver worker that dies or hangs is replaced, its job run again once, and the caller told; stale replies dropped. */
import { readFileSync } from 'node:fs';
import { afterEach, describe, expect, it } from 'vitest';
import { loadDocument } from '../../src/document/load.ts';
import { defaultTolerance, sectionToDomain } from '../../src/geometry/index.ts';
import type { FlowDomain } from '../../src/solver/types.ts';
import type { SolverWorkerApi } from '../../src/workers/protocol.ts';
import { createSolverApi } from '../../src/workers/solver-api.ts';
import { SolverClient, type WorkerRestart } from '../../src/workers/solver-client.ts';
import { silenceLimitMs } from '../../src/workers/watchdog.ts';
import type { WorkerHandle } from '../../src/workers/worker-handle.ts';
import { portWorker, stallableApi, threadWorker } from './worker-handles.ts';

function sampleDomain(): FlowDomain {
  const doc = loadDocument(readFileSync('samples/street-tight-short-side.json', 'utf8'));
  const section = doc.variants[0].section;
  return sectionToDomain(section, defaultTolerance(section));
}

const FAULTY = new URL('./faulty-worker.mjs', import.meta.url);
/** Short limits, so a hang is found in a fraction of a second. */
const QUICK = { minSilenceMs: 300, idleCheckMs: 100 } as const;
/** A client over workers made in turn by `makers` (the last one for every later worker), and what it was told. */
function clientOver(makers: Array<() => WorkerHandle>, options = {}) {
  let made = 0;
  const restarts: WorkerRestart[] = [];
  const client = new SolverClient(() => makers[Math.min(made++, makers.length - 1)](), options);
  client.onRestart((restart) => restarts.push(restart));
  open.push(() => client.dispose());
  return { client, restarts, made: () => made };
}

const open: Array<() => void> = [];
afterEach(() => open.splice(0).forEach((close) => close()));

describe('a worker that dies', () => {
  it('ended mid-solve (its thread exits) is replaced and the job is solved on the new worker', async () => {
    let first: ReturnType<typeof threadWorker> | null = null;
    const { client, restarts, made } = clientOver([() => (first = threadWorker()), () => threadWorker()]);
    await client.ready;
    const reply = client.solveLatest({ domain: sampleDomain(), targetCells: 300_000 });
    await new Promise((r) => setTimeout(r, 100));
    await first!.thread.terminate();
    const solved = await reply;
    expect(solved?.ok && solved.nx * solved.ny).toBeGreaterThan(250_000);
    expect(made()).toBe(2);
    expect(restarts).toEqual([{
      cause: 'died', whileIdle: false, message: 'The solver stopped unexpectedly and was restarted; solving again.',
    }]);
  });

  it('of an uncaught error (error event) is replaced once, though its exit follows the error', async () => {
    const { client, restarts, made } = clientOver([() => threadWorker(FAULTY, 'throw'), () => portWorker()]);
    const solved = await client.solveLatest({ domain: sampleDomain(), targetCells: 5_000 });
    expect(solved?.ok).toBe(true);
    await new Promise((r) => setTimeout(r, 100));
    expect(made()).toBe(2);
    expect(restarts.map((r) => r.cause)).toEqual(['died']);
  });

  it('twice in a row on one job gives up with a plain message, and the next job solves', async () => {
    const { client, restarts, made } = clientOver([
      () => threadWorker(FAULTY, 'throw'), () => threadWorker(FAULTY, 'throw'), () => portWorker(),
    ]);
    const domain = sampleDomain();
    const failed = await client.solveLatest({ domain, targetCells: 5_000 });
    expect(failed?.ok).toBe(false);
    if (failed && !failed.ok) {
      expect(failed.code).toBe('solver-stopped');
      expect(failed.message).toBe('The solver stopped twice while solving this shape, so it was not tried again. '
        + 'A coarser grid detail may solve it; the next change is solved as usual.');
    }
    expect(restarts).toHaveLength(2);
    expect(made()).toBe(3);
    const next = await client.solveLatest({ domain, targetCells: 5_000 });
    expect(next?.ok).toBe(true);
  });

  it('while idle is found by the idle check, replaced, and said to be idle; the next job solves', async () => {
    const stuck = stallableApi();
    const { client, restarts } = clientOver([() => portWorker(stuck.api), () => portWorker()], QUICK);
    const domain = sampleDomain();
    expect((await client.solveLatest({ domain, targetCells: 5_000 }))?.ok).toBe(true);
    stuck.hang();
    await expect.poll(() => restarts.length, { timeout: 5_000 }).toBe(1);
    expect(restarts[0]).toEqual({ cause: 'silent', whileIdle: true, message: 'The solver stopped answering and was restarted.' });
    expect((await client.solveLatest({ domain, targetCells: 5_000 }))?.ok).toBe(true);
  });

  it('that can never start is not restarted for ever: the next job starts one, and gives up after two', async () => {
    const { client, restarts, made } = clientOver([() => threadWorker(FAULTY, 'broken')]);
    await expect.poll(made, { timeout: 5_000 }).toBe(3);
    await new Promise((r) => setTimeout(r, 500));
    // Two idle restarts were said; the third worker lost is not replaced until a job needs one.
    expect(made()).toBe(3);
    expect(restarts.map((r) => r.whileIdle)).toEqual([true, true]);
    const failed = await client.solveLatest({ domain: sampleDomain(), targetCells: 5_000 });
    expect(failed?.ok === false && failed.code).toBe('solver-stopped');
    await new Promise((r) => setTimeout(r, 500));
    expect(made()).toBe(5);
  });
});

describe('a worker that never answers', () => {
  it('is taken for hung after the silence limit, replaced, and the job is solved again', async () => {
    const { client, restarts } = clientOver([() => threadWorker(FAULTY, 'spin'), () => portWorker()], QUICK);
    const solved = await client.solveLatest({ domain: sampleDomain(), targetCells: 5_000 });
    expect(solved?.ok).toBe(true);
    expect(restarts).toEqual([{
      cause: 'silent', whileIdle: false, message: 'The solver stopped answering and was restarted; solving again.',
    }]);
  });

  it('is not one that keeps iterating: a heartbeat resets the silence, however long the solve', async () => {
    let shared: Int32Array | null = null;
    const slowButAlive: SolverWorkerApi = {
      init: (buffer) => void (shared = buffer ? new Int32Array(buffer) : null),
      ping: () => true,
      // Beats every 50 ms for 1.2 s (four silence limits), then answers as the real solver would.
      solve: (request) => new Promise((resolve) => {
        const beat = setInterval(() => shared && Atomics.add(shared, 1, 1), 50);
        setTimeout(() => { clearInterval(beat); resolve(createSolverApi().solve(request)); }, 1_200);
      }),
    };
    const { client, restarts, made } = clientOver([() => portWorker(slowButAlive)], QUICK);
    expect(client.canInterrupt).toBe(true);
    expect((await client.solveLatest({ domain: sampleDomain(), targetCells: 5_000 }))?.ok).toBe(true);
    expect(restarts).toEqual([]);
    expect(made()).toBe(1);
  });

  it('drops the late answer of the worker it replaced', async () => {
    const late: SolverWorkerApi = {
      init: () => undefined,
      ping: () => true,
      solve: (request) => new Promise((resolve) => setTimeout(
        () => resolve({ ok: false, id: request.id, code: 'late', message: 'from the replaced worker' }), 900)),
    };
    // The replaced worker ignores being ended, so its answer does come back.
    const deaf = (): WorkerHandle => ({ ...portWorker(late), terminate: () => undefined });
    const { client, restarts } = clientOver([deaf, () => portWorker()], QUICK);
    const first = await client.solveLatest({ domain: sampleDomain(), targetCells: 5_000 });
    expect(first?.ok).toBe(true);
    expect(restarts).toHaveLength(1);
    await new Promise((r) => setTimeout(r, 1_000));
    expect(client.busy).toBe(false);
    const second = await client.solveLatest({ domain: sampleDomain(), targetCells: 4_000 });
    expect(second?.ok && second.nx * second.ny).toBeLessThan(6_000);
  });

  it('still lets the newest request win: a newer job waiting when the worker hangs replaces the rerun', async () => {
    const { client, restarts } = clientOver([() => threadWorker(FAULTY, 'spin'), () => portWorker()], QUICK);
    const domain = sampleDomain();
    const older = client.solveLatest({ domain, targetCells: 8_000 });
    const newer = client.solveLatest({ domain, targetCells: 4_000 });
    expect(await older).toBeNull();
    const solved = await newer;
    expect(solved?.ok && solved.nx * solved.ny).toBeLessThan(6_000);
    expect(restarts).toHaveLength(1);
  });
});

describe('the silence limit', () => {
  it('is never under the minimum and grows with the grid: 20 s for a million cells', () => {
    expect(silenceLimitMs(30_000)).toBe(6_000);
    expect(silenceLimitMs(1_000_000)).toBe(20_000);
    expect(silenceLimitMs(4_000_000)).toBe(80_000);
  });
});

/** Solver workers for Node tests: the API on the far end of a MessageChannel, or in a real worker thread. */
import { Worker } from 'node:worker_threads';
import * as Comlink from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter.mjs';
import type { SolveReply, SolverWorkerApi } from '../../src/workers/protocol.ts';
import { createSolverApi } from '../../src/workers/solver-api.ts';
import type { WorkerHandle } from '../../src/workers/worker-handle.ts';

/** `api` (by default the real one) exposed on one end of a MessageChannel, in this thread; it never dies. */
export function portWorker(api: SolverWorkerApi = createSolverApi()): WorkerHandle {
  const { port1, port2 } = new MessageChannel();
  Comlink.expose(api, port1 as unknown as Comlink.Endpoint);
  return {
    endpoint: port2 as unknown as Comlink.Endpoint,
    onDeath: () => undefined,
    terminate: () => {
      port1.close();
      port2.close();
    },
  };
}

/** A worker thread running `script` (by default the real solver worker); an uncaught error or an exit is death. */
export function threadWorker(
  script = new URL('./node-solver-worker.mjs', import.meta.url),
  workerData?: unknown,
): WorkerHandle & { readonly thread: Worker } {
  const thread = new Worker(script, { workerData });
  return {
    thread,
    endpoint: nodeEndpoint(thread),
    onDeath(listener) {
      thread.on('error', (error) => listener(error.message));
      thread.on('messageerror', () => listener('a message from the worker could not be read'));
      thread.on('exit', (code) => listener(`the worker exited with code ${code}`));
    },
    terminate: () => void thread.terminate(),
  };
}

/** The real API until `hang()`, then silent for good (a worker stuck in a loop, or ended from outside). */
export function stallableApi(): { api: SolverWorkerApi; hang: () => void } {
  const real = createSolverApi();
  const never = <T>() => new Promise<T>(() => undefined);
  let hung = false;
  return {
    api: {
      init: (shared) => real.init(shared),
      solve: (request) => (hung ? never<SolveReply>() : real.solve(request)),
      ping: () => (hung ? (never<true>() as unknown as true) : true),
    },
    hang: () => void (hung = true),
  };
}

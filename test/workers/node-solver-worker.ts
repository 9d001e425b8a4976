/** The solver worker API in a Node worker thread, for tests that need a real second thread. */
import { parentPort } from 'node:worker_threads';
import * as Comlink from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter.mjs';
import { createSolverApi } from '../../src/workers/solver-api.ts';

if (!parentPort) throw new Error('node-solver-worker must run in a worker thread');
Comlink.expose(createSolverApi(), nodeEndpoint(parentPort));

// A solver worker thread that fails: on its first solve 'throw' dies of an uncaught error and 'spin' hangs for good;
// 'broken' fails as it loads, as a worker whose code cannot be read would.
import { parentPort, workerData } from 'node:worker_threads';
import * as Comlink from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter.mjs';

if (workerData === 'broken') throw new Error('the worker could not load');

Comlink.expose({
  init() {},
  ping: () => true,
  solve() {
    if (workerData === 'throw') setTimeout(() => { throw new Error('out of memory'); });
    else for (;;);
    return new Promise(() => {});
  },
}, nodeEndpoint(parentPort));

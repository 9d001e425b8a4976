// A solver worker thread that fails on its first solve: 'throw' dies of an uncaught error, 'spin' hangs for good.
import { parentPort, workerData } from 'node:worker_threads';
import * as Comlink from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter.mjs';

Comlink.expose({
  init() {},
  ping: () => true,
  solve() {
    if (workerData === 'throw') setTimeout(() => { throw new Error('out of memory'); });
    else for (;;);
    return new Promise(() => {});
  },
}, nodeEndpoint(parentPort));

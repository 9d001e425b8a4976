/** A pool of solver workers (one per spare core): one serves live edits, all share sweeps. */
import type * as Comlink from 'comlink';
import type { SolveReply } from './protocol.ts';
import { SolverClient, type SolveJob } from './solver-client.ts';

export class SolverPool {
  readonly clients: readonly SolverClient[];

  /** `createEndpoint` makes one worker (or a port in tests); `size` defaults to one per spare core. */
  constructor(createEndpoint: () => Comlink.Endpoint, size = defaultPoolSize()) {
    this.clients = Array.from({ length: Math.max(1, size) }, () => new SolverClient(createEndpoint()));
  }

  /** The worker that serves live editing. */
  get live(): SolverClient {
    return this.clients[0];
  }

  /** Solve independent jobs (lifts, variants) across the pool; results in job order. */
  async sweep(jobs: readonly SolveJob[], onProgress?: (done: number, total: number) => void): Promise<SolveReply[]> {
    const replies: SolveReply[] = new Array(jobs.length);
    let next = 0;
    let done = 0;
    const runOn = async (client: SolverClient) => {
      while (next < jobs.length) {
        const index = next++;
        const reply = await client.solveLatest(jobs[index]);
        replies[index] = reply ?? { ok: false, id: index, code: 'superseded', message: 'Replaced by a newer request.' };
        onProgress?.(++done, jobs.length);
      }
    };
    const sweepers = this.clients.length > 1 ? this.clients.slice(1) : this.clients;
    await Promise.all(sweepers.map(runOn));
    return replies;
  }

  dispose(): void {
    for (const client of this.clients) client.dispose();
  }
}

export function defaultPoolSize(): number {
  const cores = typeof navigator !== 'undefined' ? navigator.hardwareConcurrency || 2 : 2;
  return Math.max(1, cores - 1);
}

/** A pool of solver workers (one per spare core): one serves live edits, the others are started for sweeps. */
import type { SolveReply } from './protocol.ts';
import { SolverClient, type ClientOptions, type SolveJob } from './solver-client.ts';
import type { WorkerHandle } from './worker-handle.ts';

export class SolverPool {
  /** The worker that serves live editing, started with the pool. */
  readonly live: SolverClient;
  /** Workers for sweeps, started by the first sweep: live editing alone never pays for them. */
  private sweepers: readonly SolverClient[] | null = null;

  /** `createWorker` makes one worker (or a port in tests), again for each one replaced; `size` defaults to one per
   * spare core. */
  constructor(
    private readonly createWorker: () => WorkerHandle,
    private readonly size = defaultPoolSize(),
    private readonly options: ClientOptions = {},
  ) {
    this.live = new SolverClient(createWorker, options);
  }

  /** Solve independent jobs (lifts, variants) across the pool, on the live worker when it is the only one;
   * results in job order. */
  async sweep(jobs: readonly SolveJob[], onProgress?: (done: number, total: number) => void): Promise<SolveReply[]> {
    this.sweepers ??= this.size > 1
      ? Array.from({ length: this.size - 1 }, () => new SolverClient(this.createWorker, this.options))
      : [this.live];
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
    await Promise.all(this.sweepers.map(runOn));
    return replies;
  }

  dispose(): void {
    this.live.dispose();
    for (const client of this.sweepers ?? []) if (client !== this.live) client.dispose();
  }
}

function defaultPoolSize(): number {
  const cores = typeof navigator !== 'undefined' ? navigator.hardwareConcurrency || 2 : 2;
  return Math.max(1, cores - 1);
}

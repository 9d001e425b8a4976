/** The one worker a client talks to at a time: started, watched for death, and replaced by a fresh one. */
import * as Comlink from 'comlink';
import type { SolverWorkerApi } from './protocol.ts';
import type { WorkerHandle } from './worker-handle.ts';

export class WorkerSlot {
  /** Counts the workers started; a message or fault from an older one is ignored. */
  generation = 0;
  private handle: WorkerHandle | null = null;
  private remote!: Comlink.Remote<SolverWorkerApi>;
  private started!: Promise<void>;

  /**
   * `shared`: the Int32 cells [newest request id, heartbeat], handed to every worker this slot starts.
   * `onDeath` hears the current worker's death (never an older one's).
   */
  constructor(
    private readonly create: () => WorkerHandle,
    private readonly shared: SharedArrayBuffer | null,
    private readonly onDeath: (reason: string) => void,
  ) {
    this.start();
  }

  /** The current worker's API; a stopped slot starts a worker first. */
  get api(): Comlink.Remote<SolverWorkerApi> {
    if (!this.handle) this.start();
    return this.remote;
  }

  /** Resolves when the current worker has taken the shared cells; a stopped slot starts a worker first. */
  get ready(): Promise<void> {
    if (!this.handle) this.start();
    return this.started;
  }

  /** False after stop(), until a job asks for a worker again. */
  get running(): boolean {
    return this.handle !== null;
  }

  /** Ends the current worker (dead, hung or not) and starts a fresh one. */
  replace(): void {
    this.stop();
    this.start();
  }

  /** Ends the current worker and starts none: the next use of `api` or `ready` starts one. */
  stop(): void {
    this.generation++;
    this.handle?.terminate();
    this.handle = null;
  }

  dispose(): void {
    if (this.handle) this.remote[Comlink.releaseProxy]();
    this.stop();
  }

  private start(): void {
    const generation = ++this.generation;
    this.handle = this.create();
    this.handle.onDeath((reason) => {
      if (generation === this.generation) this.onDeath(reason);
    });
    this.remote = Comlink.wrap<SolverWorkerApi>(this.handle.endpoint);
    // A worker that fails to start is found by the watchdog (or its error event); no unhandled rejection here.
    this.started = this.remote.init(this.shared);
    this.started.catch(() => undefined);
  }
}

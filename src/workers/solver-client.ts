/**
 * Main-thread side of one solver worker: newest request wins, older results are dropped, at most one in flight;
 * a worker that dies or stops answering is replaced and the job it had is run again, once.
 */
import * as Comlink from 'comlink';
import type { FlowDomain } from '../solver/types.ts';
import type { FailureReply, SolveReply, SolveRequest } from './protocol.ts';
import { MIN_SILENCE_MS, silenceLimitMs, Watchdog } from './watchdog.ts';
import type { WorkerHandle } from './worker-handle.ts';
import { WorkerSlot } from './worker-slot.ts';

/** A request without its id: the client numbers them. */
export type SolveJob = Omit<SolveRequest, 'id'>;

export interface SolveOptions {
  /**
   * A preview (e.g. while a point is dragged) in flight is not stopped by a newer preview: it finishes and its
   * result is delivered, then the newest waiting preview runs. Requests that come faster than a solve then still
   * show a result every solve; stopping each one would show nothing until they pause. Any other request stops
   * whatever is in flight.
   */
  readonly preview?: boolean;
}

/** Said each time the worker is replaced. */
export interface WorkerRestart {
  /** 'died': the worker failed on its own; 'silent': it gave no answer within the limit for its grid. */
  readonly cause: 'died' | 'silent';
  /** True when no job was in flight: nothing is being solved again unless the caller asks. */
  readonly whileIdle: boolean;
  /** Plain words for the status line. */
  readonly message: string;
}

export interface ClientOptions {
  /** Shortest silence taken for a hang, ms (default MIN_SILENCE_MS; tests use less). */
  readonly minSilenceMs?: number;
  /** How often an idle worker is asked whether it is still there, ms (default 3000; 0 never asks). */
  readonly idleCheckMs?: number;
}

interface Call {
  readonly job: SolveJob;
  readonly preview: boolean;
  readonly resolve: (reply: SolveReply | null) => void;
  /** Times this job was run again after its worker failed. */
  readonly reruns: number;
}

export class SolverClient {
  private readonly slot: WorkerSlot;
  private readonly watchdog: Watchdog;
  /** Int32 [newest request id, heartbeat], shared with whichever worker is current; null without SharedArrayBuffer. */
  private readonly cells: Int32Array | null;
  private readonly minSilenceMs: number;
  private readonly idleTimer: ReturnType<typeof setInterval> | undefined;
  private nextId = 1;
  private inFlight: (Call & { readonly id: number }) | null = null;
  private pending: Call | null = null;
  /** Generation of the worker an idle check is waiting on, if any. */
  private pingOut: number | null = null;
  private restartListener: ((restart: WorkerRestart) => void) | null = null;
  /** Workers lost since one last answered. */
  private faultsInARow = 0;

  /** `createWorker` starts a Worker in the browser, or a port or thread in tests; called again for each replacement. */
  constructor(createWorker: () => WorkerHandle, options: ClientOptions = {}) {
    const shared = typeof SharedArrayBuffer === 'function' && canShareMemory() ? new SharedArrayBuffer(8) : null;
    this.cells = shared ? new Int32Array(shared) : null;
    this.minSilenceMs = options.minSilenceMs ?? MIN_SILENCE_MS;
    this.watchdog = new Watchdog(() => (this.cells ? Atomics.load(this.cells, 1) : 0), () => this.fault('silent'));
    this.slot = new WorkerSlot(createWorker, shared, () => this.fault('died'));
    const idleCheckMs = options.idleCheckMs ?? 3_000;
    this.idleTimer = idleCheckMs > 0 ? setInterval(() => this.checkIdle(), idleCheckMs) : undefined;
  }

  /** Resolves when the current worker is ready. */
  get ready(): Promise<void> {
    return this.slot.ready;
  }

  /** True when an in-flight solve can be stopped mid-way (needs SharedArrayBuffer). */
  get canInterrupt(): boolean {
    return this.cells !== null;
  }

  get busy(): boolean {
    return this.inFlight !== null;
  }

  /** Hears every replacement of the worker (one listener). */
  onRestart(listener: (restart: WorkerRestart) => void): void {
    this.restartListener = listener;
  }

  /**
   * Solve the newest job. Resolves with the reply, or null when a newer job replaced this one
   * before its result arrived (the stale result is dropped; see SolveOptions for previews).
   */
  solveLatest(job: SolveJob, { preview = false }: SolveOptions = {}): Promise<SolveReply | null> {
    return new Promise((resolve) => {
      this.pending?.resolve(null);
      this.pending = { job, preview, resolve, reruns: 0 };
      const keepRunning = preview && this.inFlight?.preview;
      if (this.cells && !keepRunning) Atomics.store(this.cells, 0, this.nextId);
      this.pump();
    });
  }

  private pump(): void {
    if (this.inFlight || !this.pending) return;
    const call = this.pending;
    this.pending = null;
    this.run(call);
  }

  private run(call: Call): void {
    const id = this.nextId++;
    if (this.cells) Atomics.store(this.cells, 0, id);
    this.inFlight = { ...call, id };
    this.watchdog.expect(silenceLimitMs(call.job.targetCells, this.minSilenceMs));
    void this.send(id, call.job).then((reply) => {
      // The worker was replaced meanwhile: a late reply from the old one is dropped.
      if (this.inFlight?.id !== id) return;
      this.watchdog.answered();
      this.faultsInARow = 0;
      this.inFlight = null;
      const next = this.pending;
      const replaced = next !== null && !(call.preview && next.preview);
      const stale = replaced || (!reply.ok && reply.code === 'superseded');
      call.resolve(stale ? null : reply);
      this.pump();
    });
  }

  private async send(id: number, job: SolveJob): Promise<SolveReply> {
    const { api, ready } = this.slot;
    const request: SolveRequest = { id, ...job, domain: copyDomain(job.domain) };
    try {
      await ready;
      return await api.solve(Comlink.transfer(request, domainBuffers(request.domain)));
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      return { ok: false, id, code: 'internal', message: `The solver worker failed: ${message}` };
    }
  }

  /**
   * The current worker died or went silent: replace it and run its job again, once, unless a newer one waits.
   * Workers that fail one after another answering nothing (one that cannot even load) are not started again until
   * a job needs one, so they never restart each other for ever.
   */
  private fault(cause: WorkerRestart['cause']): void {
    this.watchdog.answered();
    this.pingOut = null;
    const call = this.inFlight;
    this.inFlight = null;
    const failing = ++this.faultsInARow > 2;
    const rerun = call !== null && this.pending === null && call.reruns < 1;
    if (failing && !rerun && this.pending === null) this.slot.stop();
    else this.slot.replace();
    if (call === null && failing) return;
    this.restartListener?.({ cause, whileIdle: call === null, message: restartMessage(cause, call !== null) });
    if (call === null) return;
    if (rerun) this.run({ ...call, reruns: call.reruns + 1 });
    else call.resolve(this.pending ? null : givenUp(call.id));
    this.pump();
  }

  /** An idle worker is asked whether it is there; one that was ended from outside never answers. */
  private checkIdle(): void {
    if (this.inFlight || this.pingOut !== null || !this.slot.running) return;
    const generation = this.slot.generation;
    this.pingOut = generation;
    this.watchdog.expect(this.minSilenceMs);
    this.slot.ready.then(() => this.slot.api.ping()).then(() => {
      if (this.pingOut !== generation) return;
      this.pingOut = null;
      this.faultsInARow = 0;
      if (!this.inFlight) this.watchdog.answered();
    }, () => undefined);
  }

  dispose(): void {
    clearInterval(this.idleTimer);
    this.watchdog.answered();
    this.pending?.resolve(null);
    this.pending = null;
    this.inFlight?.resolve(null);
    this.inFlight = null;
    this.slot.dispose();
  }
}

/** "The solver stopped unexpectedly and was restarted; solving again." */
export function restartMessage(cause: WorkerRestart['cause'], solving: boolean): string {
  const what = cause === 'died' ? 'stopped unexpectedly' : 'stopped answering';
  return `The solver ${what} and was restarted${solving ? '; solving again' : ''}.`;
}

/** The job's worker failed twice in a row: say so rather than try for ever. */
function givenUp(id: number): FailureReply {
  return {
    ok: false,
    id,
    code: 'solver-stopped',
    message: 'The solver stopped twice while solving this shape, so it was not tried again. '
      + 'A coarser grid detail may solve it; the next change is solved as usual.',
  };
}

/** SharedArrayBuffer is only usable across threads on a cross-origin-isolated page (or in Node). */
function canShareMemory(): boolean {
  const scope = globalThis as { crossOriginIsolated?: boolean };
  return scope.crossOriginIsolated !== false;
}

/** A private copy whose buffers can be transferred without detaching the caller's arrays (the passage depth's too). */
function copyDomain(domain: FlowDomain): FlowDomain {
  const ring = (r: FlowDomain['outer']) => ({ xy: r.xy.slice(), marks: r.marks.slice(), wallIds: r.wallIds.slice() });
  const copy = { outer: ring(domain.outer), islands: domain.islands.map(ring), wallNames: [...domain.wallNames] };
  const { depth } = domain;
  if (depth === undefined) return copy;
  return { ...copy, depth: depth.kind === 'sampled' ? { ...depth, values: depth.values.slice() } : depth };
}

function domainBuffers(domain: FlowDomain): ArrayBuffer[] {
  const rings = [domain.outer, ...domain.islands].flatMap((r) => [r.xy.buffer, r.marks.buffer, r.wallIds.buffer] as ArrayBuffer[]);
  return domain.depth?.kind === 'sampled' ? [...rings, domain.depth.values.buffer as ArrayBuffer] : rings;
}

/** Main-thread side of one solver worker: newest request wins, older results are dropped, at most one in flight. */
import * as Comlink from 'comlink';
import type { FlowDomain } from '../solver/types.ts';
import type { SolveReply, SolveRequest, SolverWorkerApi } from './protocol.ts';

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

interface Pending {
  readonly job: SolveJob;
  readonly preview: boolean;
  readonly resolve: (reply: SolveReply | null) => void;
}

export class SolverClient {
  private readonly api: Comlink.Remote<SolverWorkerApi>;
  private readonly endpoint: Comlink.Endpoint;
  private readonly latest: Int32Array | null;
  private nextId = 1;
  private inFlight = false;
  private inFlightPreview = false;
  private pending: Pending | null = null;
  readonly ready: Promise<void>;

  /** `endpoint` is a Worker in the browser or a MessagePort in tests. */
  constructor(endpoint: Comlink.Endpoint) {
    this.endpoint = endpoint;
    this.api = Comlink.wrap<SolverWorkerApi>(endpoint);
    const shared = typeof SharedArrayBuffer === 'function' && canShareMemory() ? new SharedArrayBuffer(4) : null;
    this.latest = shared ? new Int32Array(shared) : null;
    this.ready = this.api.init(shared);
  }

  /** True when an in-flight solve can be stopped mid-way (needs SharedArrayBuffer). */
  get canInterrupt(): boolean {
    return this.latest !== null;
  }

  get busy(): boolean {
    return this.inFlight;
  }

  /**
   * Solve the newest job. Resolves with the reply, or null when a newer job replaced this one
   * before its result arrived (the stale result is dropped; see SolveOptions for previews).
   */
  solveLatest(job: SolveJob, { preview = false }: SolveOptions = {}): Promise<SolveReply | null> {
    return new Promise((resolve) => {
      this.pending?.resolve(null);
      this.pending = { job, preview, resolve };
      const keepRunning = preview && this.inFlight && this.inFlightPreview;
      if (this.latest && !keepRunning) Atomics.store(this.latest, 0, this.nextId);
      this.pump();
    });
  }

  private pump(): void {
    if (this.inFlight || !this.pending) return;
    const { job, preview, resolve } = this.pending;
    this.pending = null;
    const id = this.nextId++;
    if (this.latest) Atomics.store(this.latest, 0, id);
    this.inFlight = true;
    this.inFlightPreview = preview;
    void this.send(id, job).then((reply) => {
      this.inFlight = false;
      const next = this.pending;
      const replaced = next !== null && !(preview && next.preview);
      const stale = replaced || (!reply.ok && reply.code === 'superseded');
      resolve(stale ? null : reply);
      this.pump();
    });
  }

  private async send(id: number, job: SolveJob): Promise<SolveReply> {
    await this.ready;
    const request: SolveRequest = { id, ...job, domain: copyDomain(job.domain) };
    try {
      return await this.api.solve(Comlink.transfer(request, domainBuffers(request.domain)));
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      return { ok: false, id, code: 'internal', message: `The solver worker failed: ${message}` };
    }
  }

  dispose(): void {
    this.pending?.resolve(null);
    this.pending = null;
    this.api[Comlink.releaseProxy]();
    (this.endpoint as Partial<Worker>).terminate?.();
  }
}

/** SharedArrayBuffer is only usable across threads on a cross-origin-isolated page (or in Node). */
function canShareMemory(): boolean {
  const scope = globalThis as { crossOriginIsolated?: boolean };
  return scope.crossOriginIsolated !== false;
}

/** A private copy whose buffers can be transferred without detaching the caller's arrays. */
function copyDomain(domain: FlowDomain): FlowDomain {
  const ring = (r: FlowDomain['outer']) => ({ xy: r.xy.slice(), marks: r.marks.slice(), wallIds: r.wallIds.slice() });
  return { outer: ring(domain.outer), islands: domain.islands.map(ring), wallNames: [...domain.wallNames] };
}

function domainBuffers(domain: FlowDomain): ArrayBuffer[] {
  return [domain.outer, ...domain.islands].flatMap((r) => [r.xy.buffer, r.marks.buffer, r.wallIds.buffer] as ArrayBuffer[]);
}

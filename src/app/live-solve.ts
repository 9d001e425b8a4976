/** Live solving: a coarse grid while a point is dragged, the full grid (warm-started) when it is let go. */
import type { ReadingOptions } from '../solver/reading/index.ts';
import type { FlowDomain } from '../solver/types.ts';
import type { FieldReply, FailureReply } from '../workers/protocol.ts';
import { restartMessage, type SolverClient, type WorkerRestart } from '../workers/solver-client.ts';

export type SolveKind = 'drag' | 'full';

export interface LiveSolveHooks {
  readonly onStart: (kind: SolveKind, cells: number) => void;
  /** `domain` is the outline this field was solved for (mid-drag the view draws it with its field). */
  readonly onField: (reply: FieldReply, kind: SolveKind, roundTripMs: number, domain: FlowDomain) => void;
  readonly onFailure: (failure: FailureReply, kind: SolveKind, domain: FlowDomain) => void;
  /** The solver worker was replaced ('warn'), and later a full field came from its successor ('info'). */
  readonly onWorkerNote: (message: string, level: 'warn' | 'info') => void;
}

interface LastRequest {
  readonly domain: FlowDomain;
  readonly kind: SolveKind;
  readonly cells: number;
  readonly reading: ReadingOptions | null;
}

export class LiveSolve {
  private last: LastRequest | null = null;
  /** A worker was replaced and no full field has been drawn since. */
  private recovering = false;

  constructor(private readonly client: SolverClient, private readonly hooks: LiveSolveHooks) {
    client.onRestart((restart) => this.restarted(restart));
  }

  /** Ask for a solve; an older request still running is stopped and its result dropped, except that a drag
   * preview in flight finishes and is shown when the next drag step arrives (see SolveOptions). */
  async request(domain: FlowDomain, kind: SolveKind, cells: number, reading: ReadingOptions | null): Promise<void> {
    this.last = { domain, kind, cells, reading };
    this.hooks.onStart(kind, cells);
    const started = performance.now();
    const reply = await this.client.solveLatest({
      domain,
      targetCells: cells,
      // While dragging, a looser tolerance is plenty for the picture; the full solve goes to 1e-8.
      tolerance: kind === 'drag' ? 1e-5 : 1e-8,
      warmStart: true,
      // The drag preview draws the field alone; wall speeds come with the full solve.
      wallSpeeds: kind !== 'drag',
      reading,
    }, { preview: kind === 'drag' });
    if (reply === null) return;
    if (reply.ok && kind === 'full' && this.recovering) {
      this.recovering = false;
      // Said before the field is shown, so a warning that comes with the field (a thin wall) is not hidden.
      this.hooks.onWorkerNote('The solver was restarted after it stopped, and the picture is solved again.', 'info');
    }
    if (reply.ok) this.hooks.onField(reply, kind, performance.now() - started, domain);
    else this.hooks.onFailure(reply, kind, domain);
  }

  get busy(): boolean {
    return this.client.busy;
  }

  /** Say what happened; a worker lost while idle took the last shape's solve with it, so solve that again. */
  private restarted(restart: WorkerRestart): void {
    this.recovering = true;
    const again = restart.whileIdle && this.last !== null;
    this.hooks.onWorkerNote(again ? restartMessage(restart.cause, true) : restart.message, 'warn');
    if (again && this.last) {
      const { domain, kind, cells, reading } = this.last;
      void this.request(domain, kind, cells, reading);
    }
  }
}

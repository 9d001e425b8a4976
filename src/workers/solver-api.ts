/** The solver worker's API: a thin adapter from messages to the pure solver; it owns no physics. */
import * as Comlink from 'comlink';
import { solveCase } from '../study/solve-case.ts';
import type { FlowReading } from '../solver/reading/index.ts';
import type { PotentialField, SolveResult } from '../solver/types.ts';
import type { FailureReply, FieldReply, SolveReply, SolverWorkerApi } from './protocol.ts';

export function createSolverApi(): SolverWorkerApi {
  let latest: Int32Array | null = null;
  let lastPotential: PotentialField | null = null;
  return {
    init(shared) {
      latest = shared ? new Int32Array(shared) : null;
    },
    ping: () => true,
    async solve(request) {
      const superseded = () => latest !== null && Atomics.load(latest, 0) > request.id;
      // Asked at every solver iteration: each call is also a heartbeat the client's watchdog reads.
      const beatAndCheck = () => {
        if (latest) Atomics.add(latest, 1, 1);
        return superseded();
      };
      if (superseded()) return failure(request.id, 'superseded', 'A newer request replaced this one.');
      const started = performance.now();
      try {
        const { result, reading } = solveCase(request.domain, {
          targetCells: request.targetCells,
          tolerance: request.tolerance,
          warmStart: request.warmStart && lastPotential ? lastPotential : undefined,
          shouldStop: beatAndCheck,
          wallSpeeds: request.wallSpeeds,
        }, request.reading ?? null);
        if (superseded()) return failure(request.id, 'superseded', 'A newer request replaced this one.');
        lastPotential = potentialOf(result);
        return transferReply(toReply(request.id, result, reading, performance.now() - started));
      } catch (error) {
        return failureFrom(request.id, error);
      }
    },
  };
}

function potentialOf(result: SolveResult): PotentialField {
  const { nx, ny, h, x0, y0 } = result.grid;
  return { nx, ny, h, x0, y0, phi: result.phi };
}

function toReply(id: number, result: SolveResult, reading: FlowReading | null, workerMs: number): FieldReply {
  const { nx, ny, h, x0, y0 } = result.grid;
  return {
    ok: true, id, nx, ny, h, x0, y0,
    speedRatio: Float32Array.from(result.speedRatio),
    iterations: result.iterations,
    residual: result.residual,
    conductance: result.conductance,
    fluxImbalance: result.fluxImbalance,
    peak: result.peak,
    // The result is this reply's alone: its wall samples are sent as they are (transferred, not copied).
    walls: result.walls.map((w) => ({ name: w.name, samples: w.samples })),
    inletMeanSpeed: result.inletMeanSpeed,
    thinWalls: result.thinWalls,
    reading,
    workerMs,
  };
}

function transferReply(reply: FieldReply): SolveReply {
  const arrays: ArrayBufferView[] = [reply.speedRatio, ...reply.walls.map((w) => w.samples)];
  if (reply.reading) arrays.push(reply.reading.slow.mask, ...reply.reading.streamlines.map((s) => s.xy));
  const buffers = [...new Set(arrays.map((a) => a.buffer as ArrayBuffer))];
  return Comlink.transfer(reply, buffers);
}

function failure(id: number, code: string, message: string, where?: readonly [number, number]): FailureReply {
  return where ? { ok: false, id, code, message, where } : { ok: false, id, code, message };
}

/** Errors the user can cause carry a code and a plain message; anything else is reported as internal. */
function failureFrom(id: number, error: unknown): FailureReply {
  if (error instanceof Error && typeof (error as { code?: unknown }).code === 'string') {
    const typed = error as Error & { code: string; where?: readonly [number, number] };
    return failure(id, typed.code, typed.message, typed.where);
  }
  const message = error instanceof Error ? error.message : String(error);
  return failure(id, 'internal', `The solver failed unexpectedly: ${message}`);
}

/** Messages between the app and the solver workers: plain data, typed arrays transferred. */
import type { FlowReading, ReadingOptions } from '../solver/reading/index.ts';
import type { FlowDomain, ThinWall } from '../solver/types.ts';

export interface SolveRequest {
  /** Increasing per client; a newer id supersedes every older one. */
  readonly id: number;
  readonly domain: FlowDomain;
  /** Target number of grid cells over the section's bounds. */
  readonly targetCells: number;
  /** Relative residual to stop at. */
  readonly tolerance?: number;
  /** Start from the potential this worker computed last (any grid), if it has one. */
  readonly warmStart?: boolean;
  /** Sample speeds along the walls (default true); a drag preview that reads nothing can skip them. */
  readonly wallSpeeds?: boolean;
  /** Read the flow (stations, slow zones, detachment, streamlines, findings) with these options; null skips it. */
  readonly reading?: ReadingOptions | null;
}

/** Speed-ratio samples along a wall: x, y, s, speed ratio per sample (4 numbers each). */
export interface WallSpeedsReply {
  readonly name: string;
  readonly samples: Float64Array;
}

export interface FieldReply {
  readonly ok: true;
  readonly id: number;
  readonly nx: number;
  readonly ny: number;
  readonly x0: number;
  readonly y0: number;
  /** Cell size, document units. */
  readonly h: number;
  /** Speed ratio per cell for the GPU, row-major i + j * nx, NaN outside the fluid. */
  readonly speedRatio: Float32Array;
  readonly iterations: number;
  readonly residual: number;
  readonly conductance: number;
  readonly fluxImbalance: number;
  readonly peak: { readonly speedRatio: number; readonly x: number; readonly y: number };
  readonly walls: readonly WallSpeedsReply[];
  /** Mean inlet speed at a unit potential drop (potential per length). */
  readonly inletMeanSpeed: number;
  /** Walls thinner than a grid cell, solved as about one cell thick (thinWallNote gives the warning); often empty. */
  readonly thinWalls: readonly ThinWall[];
  /** The flow reading, when asked for. */
  readonly reading: FlowReading | null;
  /** Time the worker spent, ms (measured outside the solver). */
  readonly workerMs: number;
}

export interface FailureReply {
  readonly ok: false;
  readonly id: number;
  /** 'superseded' when a newer request stopped this one; 'solver-stopped' when the worker died twice on it. */
  readonly code: string;
  readonly message: string;
  readonly where?: readonly [number, number];
}

export type SolveReply = FieldReply | FailureReply;

/** The API one solver worker exposes over comlink. */
export interface SolverWorkerApi {
  /**
   * Give the worker the shared cells (null where SharedArrayBuffer is unavailable), Int32 [newest request id,
   * heartbeat]: the worker stops a solve whose id is older than the first, and adds one to the second at every
   * solver iteration, so the client can tell a long solve from a hung worker.
   */
  init(shared: SharedArrayBuffer | null): void;
  solve(request: SolveRequest): Promise<SolveReply>;
  /** Answers at once: an idle worker is asked now and then whether it is still there. */
  ping(): true;
}

/** Solve results built from exact potentials sampled on rasterised grids, for reading tests that need no solver. */
import { rasterise } from '../../../src/solver/rasterise/rasterise.ts';
import type { FlowDomain, SolveResult } from '../../../src/solver/types.ts';
import { wallSpeeds } from '../../../src/solver/wall-speeds.ts';

/** An exact flow: potential (1 at the inlet, 0 at the outlet) and speed (potential units per length) at a point. */
export interface ExactFlow {
  readonly phi: (x: number, y: number) => number;
  readonly speed: (x: number, y: number) => number;
  /** flux per unit potential drop, unit depth */
  readonly conductance: number;
  /** inlet length, document units */
  readonly inletLength: number;
}

/** Samples `flow` at the cell centres of the rasterised domain (NaN in solid cells), as the solver would report it. */
export function exactResult(domain: FlowDomain, targetCells: number, flow: ExactFlow): SolveResult {
  const grid = rasterise(domain, targetCells);
  const { nx, ny, h, x0, y0 } = grid;
  const inletMeanSpeed = flow.conductance / flow.inletLength;
  const phi = new Float64Array(nx * ny).fill(NaN);
  const speedRatio = new Float64Array(nx * ny).fill(NaN);
  let peak = { speedRatio: 0, x: 0, y: 0 };
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const c = i + j * nx;
      if (grid.cellFraction[c] === 0) continue;
      const x = x0 + (i + 0.5) * h;
      const y = y0 + (j + 0.5) * h;
      phi[c] = flow.phi(x, y);
      speedRatio[c] = flow.speed(x, y) / inletMeanSpeed;
      if (speedRatio[c] > peak.speedRatio) peak = { speedRatio: speedRatio[c], x, y };
    }
  }
  const walls = wallSpeeds(domain, grid, phi, inletMeanSpeed);
  return { grid, phi, speedRatio, iterations: 0, residual: 0, conductance: flow.conductance, fluxImbalance: 0, inletMeanSpeed, peak, walls, thinWalls: grid.thinWalls };
}

/** Exact flow in a straight channel [0, L] x [0, W] (see rasterise/shapes.ts channel): phi = 1 - x / L. */
export function channelFlow(lengthL: number, widthW: number): ExactFlow {
  return { phi: (x) => 1 - x / lengthL, speed: () => 1 / lengthL, conductance: widthW / lengthL, inletLength: widthW };
}

/**
 * Exact flow in the 90 degree concentric bend of rasterise/shapes.ts (inlet on theta = 0, outlet on theta = pi/2):
 * phi = 1 - theta / (pi / 2), speed = K / r with K = 2 / pi, flux Q = K ln(r2 / r1) (REFERENCES.md 1a, derived).
 */
export function bendFlow(r1: number, r2: number): ExactFlow {
  const k = 2 / Math.PI;
  return {
    phi: (x, y) => 1 - k * Math.atan2(y, x),
    speed: (x, y) => k / Math.hypot(x, y),
    conductance: k * Math.log(r2 / r1),
    inletLength: r2 - r1,
  };
}

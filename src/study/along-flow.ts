/** Distance along the port at every point of a section, from a plane solve: the coordinate a width profile is given in. */

import { FlowSetupError } from '../solver/errors.ts';
import { extendedPhi } from '../solver/reading/field.ts';
import { readingSettings } from '../solver/reading/options.ts';
import { RingIndex } from '../solver/reading/ring-index.ts';
import { buildStations, evenLevels } from '../solver/reading/stations.ts';
import { solveFlow } from '../solver/solve.ts';
import type { FlowDomain } from '../solver/types.ts';
import { StudyError } from './errors.ts';

/** Distance from the manifold face along the flow at the cell centres of a grid. */
export interface AlongFlowMap {
  /** Cell (i, j) has its centre at (x0 + (i + 0.5) h, y0 + (j + 0.5) h), document units. */
  readonly nx: number;
  readonly ny: number;
  readonly h: number;
  readonly x0: number;
  readonly y0: number;
  /** distance along the port, document units, row-major i + j * nx; defined in every cell, solid ones too */
  readonly along: Float64Array;
  /** The stations the distance was read through: potential (1 at the inlet) and distance, inlet first. */
  readonly stationPhi: readonly number[];
  readonly stationAlong: readonly number[];
}

/**
 * Solves the plane (unit-depth) flow of `domain` on about `targetCells` cells and maps its potential to distance
 * along the port through the reading's own stations: equipotentials at the reading's default levels, distance
 * measured as the reading measures Station.distanceFromInlet (inlet centre, then each station's centroid in turn),
 * linear in potential between stations, 0 at the inlet and carried on at the last two stations' rate past the last.
 * Cells outside the fluid take the potential of the fluid next to them (ring by ring), so a depth lattice built on
 * these cells has a value everywhere. Throws StudyError when the plane flow itself cannot be solved.
 */
export function alongFlowMap(domain: FlowDomain, targetCells: number): AlongFlowMap {
  const plane: FlowDomain = { outer: domain.outer, islands: domain.islands, wallNames: domain.wallNames };
  const result = solvePlane(plane, targetCells);
  const { grid } = result;
  const phi = extendedPhi(grid, result.phi);
  const input = { domain: plane, grid, phi, index: new RingIndex(grid, plane), conductance: result.conductance, inletMeanSpeed: result.inletMeanSpeed };
  const stations = buildStations(input, evenLevels(readingSettings().stationCount));
  const stationPhi = [1, ...stations.map((s) => s.phi)];
  const stationAlong = [0, ...stations.map((s) => s.distanceFromInlet)];
  const filled = extendedPhi(grid, result.phi, grid.nx + grid.ny);
  const along = new Float64Array(filled.length);
  for (let c = 0; c < filled.length; c++) along[c] = alongAt(filled[c], stationPhi, stationAlong);
  return { nx: grid.nx, ny: grid.ny, h: grid.h, x0: grid.x0, y0: grid.y0, along, stationPhi, stationAlong };
}

function solvePlane(plane: FlowDomain, targetCells: number) {
  try {
    return solveFlow(plane, { targetCells, wallSpeeds: false });
  } catch (error) {
    if (!(error instanceof FlowSetupError)) throw error;
    throw new StudyError('width-along', `The width profile cannot be laid along the port, because the section does not solve. ${error.message}`);
  }
}

/**
 * Distance at potential `p`: linear between stations (potential falling, distance rising), the first distance at and
 * above the first potential, and past the last station on the line through the last two.
 */
export function alongAt(p: number, phis: readonly number[], alongs: readonly number[]): number {
  const n = phis.length;
  if (!(p < phis[0])) return alongs[0];
  if (p <= phis[n - 1]) {
    if (n < 2) return alongs[n - 1];
    return alongs[n - 1] + ((phis[n - 1] - p) * (alongs[n - 1] - alongs[n - 2])) / (phis[n - 2] - phis[n - 1]);
  }
  let lo = 0, hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (phis[mid] > p) lo = mid;
    else hi = mid;
  }
  const t = (phis[lo] - p) / (phis[lo] - phis[hi]);
  return alongs[lo] + t * (alongs[hi] - alongs[lo]);
}

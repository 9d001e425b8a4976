/** What `portwright solve` reports about one solved variant: plain data shared by the readable and the JSON output. */

import type { Units } from '../document/types.ts';
import { pointInRegion } from '../geometry/index.ts';
import type { BreathingSummary } from '../parts/index.ts';
import { probeFlow } from '../solver/probe.ts';
import { thinWallNote } from '../solver/thin-wall-note.ts';
import { onSymmetryLine, type PassageModel, type ReadingSummary } from '../solver/reading/index.ts';
import type { FlowDomain, SolveResult, ThinWall, WallSpeeds } from '../solver/types.ts';

type Detachment = ReadingSummary['walls'][number]['detachment'];

/** One side of a closed wall (an island), read from where the flow divides on it to where it leaves. */
export interface WallSideReport {
  /** "left of the flow" or "right of the flow", looking downstream. */
  readonly side: string;
  /** undefined when the side has no sample with a speed */
  readonly peakSpeedRatio: number | undefined;
  readonly detachment: Detachment;
}

export interface WallReport {
  readonly name: string;
  /** Highest speed ratio over the wall's samples; undefined when no flow reaches the wall (no samples). */
  readonly peakSpeedRatio: number | undefined;
  /** Cp recovered after the peak, for an open wall (undefined for a closed island wall, see sides). */
  readonly pressureRecovered: number | undefined;
  /** Where the boundary layer likely leaves the wall (s from the wall's upstream end); for an island, the earlier side. */
  readonly detachment: Detachment;
  /** Both sides of a closed island wall; undefined for an open wall. */
  readonly sides: readonly WallSideReport[] | undefined;
  /** True for the axis of a round model: a line of symmetry, not metal (no layer marched, never ranked). */
  readonly symmetryLine?: true;
  /** [x, y, s, speed ratio] in ring order, s from the wall's first point; lengths in document units. */
  readonly samples: readonly (readonly number[])[];
}

export interface ProbeReport {
  readonly x: number;
  readonly y: number;
  /** False when the point lies in solid metal or outside the section. */
  readonly inFluid: boolean;
  /** Undefined (left out of JSON) outside the fluid and in a pocket the flow does not reach. */
  readonly potential: number | undefined;
  readonly speedRatio: number | undefined;
}

/** A wall thinner than a grid cell (solved as about one cell thick), with the warning the command prints. */
export interface ThinWallReport extends ThinWall {
  readonly note: string;
}

/** Everything solve prints; lengths in the document's units, speeds as ratios to the mean inlet speed. */
export interface SolveReport {
  readonly title: string;
  readonly variant: string;
  readonly units: Units;
  /** "plane" (per unit depth) or "width" (the variant's width profile as the passage depth). */
  readonly model: PassageModel;
  readonly grid: { readonly nx: number; readonly ny: number; readonly cells: number; readonly solvedCells: number; readonly spacing: number };
  /** False when the iteration cap came before the tolerance. */
  readonly converged: boolean;
  readonly iterations: number;
  readonly residual: number;
  /** Flux per unit potential drop: per unit depth (dimensionless) in the plane model, document units with a width profile. */
  readonly conductance: number;
  readonly fluxImbalance: number;
  /** Walls thinner than a grid cell, one per wall name; empty when there are none. */
  readonly thinWalls: readonly ThinWallReport[];
  /** Potential drop per length unit at the inlet (flux / inlet length) at a unit potential drop. */
  readonly inletMeanSpeed: number;
  readonly peak: SolveResult['peak'];
  readonly probes: readonly ProbeReport[];
  readonly tightest: ReadingSummary['tightest'];
  /** The station of least area ahead of the valve: document units squared (per unit depth in the plane model). */
  readonly leastArea: ReadingSummary['leastArea'];
  /** Depth integrated over the port and bowl above the deck: document units cubed (per unit depth in the plane model). */
  readonly portVolume: number;
  readonly slowShare: number;
  readonly portSlowShare: number;
  readonly findings: readonly string[];
  readonly stations: ReadingSummary['stations'];
  readonly walls: readonly WallReport[];
  /** Valve and seat numbers at the variant's lift (null without valve and seat parts); document units. */
  readonly breathing: BreathingSummary | null;
  /** Notes on the parts against usual practice (throat band, L/D, shrouding). */
  readonly notes: readonly string[];
}

export interface SolvedVariant {
  readonly title: string;
  readonly variant: string;
  readonly units: Units;
  readonly model: PassageModel;
  readonly domain: FlowDomain;
  readonly result: SolveResult;
  readonly summary: ReadingSummary;
  readonly converged: boolean;
  readonly breathing: BreathingSummary | null;
  readonly notes: readonly string[];
}

/** The report of a solved variant, with `probes` (document units) read from the field. */
export function buildSolveReport(solved: SolvedVariant, probes: readonly (readonly [number, number])[]): SolveReport {
  const { result, summary } = solved;
  const { grid } = result;
  return {
    title: solved.title,
    variant: solved.variant,
    units: solved.units,
    model: solved.model,
    grid: { nx: grid.nx, ny: grid.ny, cells: grid.nx * grid.ny, solvedCells: countFinite(result.phi), spacing: grid.h },
    converged: solved.converged,
    iterations: result.iterations,
    residual: result.residual,
    conductance: result.conductance,
    fluxImbalance: result.fluxImbalance,
    thinWalls: result.thinWalls.map((wall) => ({ ...wall, note: thinWallNote(wall, { units: solved.units, spacing: grid.h }) })),
    inletMeanSpeed: result.inletMeanSpeed,
    peak: result.peak,
    probes: probes.map(([x, y]) => probeReport(solved.domain, result, x, y)),
    tightest: summary.tightest,
    leastArea: summary.leastArea,
    portVolume: summary.portVolume,
    slowShare: summary.slowShare,
    portSlowShare: summary.portSlowShare,
    findings: summary.findings,
    stations: summary.stations,
    breathing: solved.breathing,
    notes: solved.notes,
    walls: result.walls.map((wall) => wallReport(wall, summary, onSymmetryLine(wall, solved.domain.depth, grid.h))),
  };
}

function probeReport(domain: FlowDomain, result: SolveResult, x: number, y: number): ProbeReport {
  if (!pointInRegion(domain, x, y)) return { x, y, inFluid: false, potential: undefined, speedRatio: undefined };
  const read = probeFlow(result, x, y);
  const solved = Number.isFinite(read.potential) && Number.isFinite(read.speedRatio);
  return { x, y, inFluid: true, potential: solved ? read.potential : undefined, speedRatio: solved ? read.speedRatio : undefined };
}

/**
 * The wall's samples with the reading's verdict. The reading names an open wall as the solver does; a closed island
 * wall it reads as two paths, "<name>, left of the flow" and "<name>, right of the flow", both measured from the
 * point where the flow divides, so the side with the smaller s leaves the wall first.
 */
function wallReport(wall: WallSpeeds, summary: ReadingSummary, symmetryLine: boolean): WallReport {
  const samples: number[][] = [];
  let peak: number | undefined;
  for (let k = 0; k < wall.samples.length; k += 4) {
    samples.push([wall.samples[k], wall.samples[k + 1], wall.samples[k + 2], wall.samples[k + 3]]);
    if (peak === undefined || wall.samples[k + 3] > peak) peak = wall.samples[k + 3];
  }
  if (symmetryLine) return { name: wall.name, peakSpeedRatio: peak, pressureRecovered: undefined, detachment: null, sides: undefined, symmetryLine, samples };
  const open = summary.walls.find((w) => w.name === wall.name);
  if (open !== undefined) {
    return { name: wall.name, peakSpeedRatio: peak, pressureRecovered: open.pressureRecovered, detachment: open.detachment, sides: undefined, samples };
  }
  const prefix = `${wall.name}, `;
  const sides = summary.walls
    .filter((w) => w.name.startsWith(prefix))
    .map((w) => ({ side: w.name.slice(prefix.length), peakSpeedRatio: w.peakSpeedRatio, detachment: w.detachment }));
  const first = sides
    .map((s) => s.detachment)
    .reduce<Detachment>((best, d) => (d !== null && (best === null || d.s < best.s) ? d : best), null);
  return { name: wall.name, peakSpeedRatio: peak, pressureRecovered: undefined, detachment: first, sides: sides.length > 0 ? sides : undefined, samples };
}

function countFinite(values: Float64Array): number {
  let n = 0;
  for (const v of values) if (Number.isFinite(v)) n++;
  return n;
}

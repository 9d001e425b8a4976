/** The readable summary `portwright solve` prints: the solve, the flow reading, each wall, findings and probes. */

import { MODEL_WORDS, type DetachmentMethod } from '../solver/reading/index.ts';
import type { ProbeReport, SolveReport, WallReport } from './solve-report.ts';

/** Printed last, every time: what the numbers are and are not. */
export const IDEAL_FLOW_CAUTION =
  'Caution: ideal 2D flow (no viscosity, per unit depth); confirm on a flow bench before removing metal.';

/** The caution for a variant solved through its width profile. */
export const WIDTH_FLOW_CAUTION =
  'Caution: ideal flow (no viscosity) through the section weighted by its width profile; confirm on a flow bench before removing metal.';

/** The caution for a variant solved round about its valve axis. */
export const ROUND_FLOW_CAUTION =
  'Caution: ideal flow (no viscosity) solved as round about the valve axis, which the port is not; confirm on a flow bench before removing metal.';

const CAUTIONS = { plane: IDEAL_FLOW_CAUTION, width: WIDTH_FLOW_CAUTION, axisymmetric: ROUND_FLOW_CAUTION } as const;

const METHOD_WORDS: Readonly<Record<DetachmentMethod, string>> = {
  thwaites: 'laminar layer, Thwaites',
  head: 'turbulent layer, Head',
  stratford: 'turbulent layer, Stratford',
};

/** The summary as lines. */
export function solveReportLines(report: SolveReport): string[] {
  const f = placeFormat(report.units);
  const g = report.grid;
  const lines = [
    report.title,
    `  variant: "${report.variant}", units: ${report.units}`,
    `  model: ${MODEL_WORDS[report.model]}`,
    `  grid: ${g.nx} x ${g.ny} (${g.cells.toLocaleString('en-US')} cells, ${g.solvedCells.toLocaleString('en-US')} in the flow), ` +
      `spacing ${sig(g.spacing, 3)} ${report.units}`,
    `  solve: ${report.iterations} iterations, relative residual ${report.residual.toExponential(1)}` +
      (report.converged ? '' : ' (stopped at the iteration cap before reaching the tolerance)'),
    `  conductance: ${conductanceText(report)} (flux per unit potential drop)`,
    `  flux imbalance: ${report.fluxImbalance.toExponential(1)} (worst station against the total)`,
    `  peak speed ratio: ${peakText(report.peak, f)}`,
    `  tightest section ahead of the valve: ${tightestText(report, f)}`,
    `  least area ahead of the valve: ${leastAreaText(report, f)}`,
    `  port volume: ${volumeText(report)} (the port and bowl above the deck)`,
    `  slow share${report.model === 'plane' ? '' : ' by volume'}: ${percent(report.slowShare)} of the port and bowl, ` +
      `${percent(report.portSlowShare)} ahead of the valve (the test bore is not judged)`,
    ...report.thinWalls.map((wall) => `  warning: ${wall.note}`),
    '',
    'walls (fastest wall flow, as a speed ratio; where the flow likely leaves the wall, measured from its upstream end):',
  ];
  const nameWidth = Math.max(...report.walls.map((w) => w.name.length));
  for (const wall of report.walls) lines.push(...wallLines(wall, nameWidth, f));
  if (report.breathing) lines.push('', ...breathingLines(report.breathing, report.units));
  for (const note of report.notes) lines.push(`  note: ${note}`);
  lines.push('', report.findings.length > 0 ? 'findings:' : 'findings: none');
  for (const finding of report.findings) lines.push(`  - ${finding}`);
  if (report.probes.length > 0) {
    lines.push('', 'probes (potential 1 at the inlet, 0 at the outlet):');
    for (const probe of report.probes) lines.push(`  ${f.at(probe.x, probe.y)}: ${probeText(probe)}`);
  }
  lines.push('', CAUTIONS[report.model]);
  return lines;
}

/** Lengths and points in the document's units. */
interface PlaceFormat {
  /** A bare number: mm to 0.1, inch to 0.001, as fine as a tracing is accurate. */
  readonly len: (value: number) => string;
  /** A length with its unit. */
  readonly dist: (value: number) => string;
  /** A point with its unit. */
  readonly at: (x: number, y: number) => string;
}

function placeFormat(units: SolveReport['units']): PlaceFormat {
  const digits = units === 'mm' ? 1 : 3;
  const len = (value: number): string => (Number.isFinite(value) ? value.toFixed(digits) : '-');
  return { len, dist: (value) => `${len(value)} ${units}`, at: (x, y) => `(${len(x)}, ${len(y)}) ${units}` };
}

function wallLines(wall: WallReport, nameWidth: number, f: PlaceFormat): string[] {
  if (wall.peakSpeedRatio === undefined) return [`  ${wall.name.padEnd(nameWidth)}  no flow reaches this wall`];
  const head = `  ${wall.name.padEnd(nameWidth)}  ${ratio(wall.peakSpeedRatio).padStart(5)}`;
  if (wall.symmetryLine) return [`${head}  line of symmetry (the axis), not a wall`];
  if (wall.sides === undefined) return [`${head}  ${detachmentText(wall.detachment, f)}`];
  return [head, ...wall.sides.map((side) => `    ${side.side}: fastest ${side.peakSpeedRatio === undefined ? 'none' : ratio(side.peakSpeedRatio)}, ${detachmentText(side.detachment, f)}`)];
}

function detachmentText(d: WallReport['detachment'], f: PlaceFormat): string {
  if (d === null) return 'stays on';
  return `leaves at ${f.at(d.x, d.y)}, ${f.dist(d.s)} along (${METHOD_WORDS[d.method]})`;
}

/** The solver's peak, clear of sharp corners (a sharp corner's own spike is not a port's peak). */
function peakText(peak: SolveReport['peak'], f: PlaceFormat): string {
  if (!Number.isFinite(peak.speedRatio)) return 'none clear of sharp corners (every whole cell lies beside one)';
  return `${ratio(peak.speedRatio)} at ${f.at(peak.x, peak.y)} (clear of sharp corners)`;
}

function tightestText(report: SolveReport, f: PlaceFormat): string {
  const t = report.tightest;
  if (t === null) return 'none found';
  return `${f.dist(t.width)} wide, ${f.dist(t.distanceFromInlet)} from the inlet, from ${f.at(t.x1, t.y1)} to ${f.at(t.x2, t.y2)}`;
}

/** Plane: per unit depth (a number); with a depth the flux per unit potential drop is a length. */
function conductanceText(report: SolveReport): string {
  return report.model === 'plane' ? `${sig(report.conductance, 4)} per unit depth` : `${sig(report.conductance, 4)} ${report.units}`;
}

/** Areas in mm² or in², read per unit depth in the plane model. */
function leastAreaText(report: SolveReport, f: PlaceFormat): string {
  const a = report.leastArea;
  if (a === null) return 'none found';
  return `${sig(a.area, 4)} ${report.units === 'mm' ? 'mm²' : 'in²'}${perDepth(report)}, from ${f.at(a.x1, a.y1)} to ${f.at(a.x2, a.y2)}`;
}

/** mm³ or in³, read per unit depth in the plane model. */
function volumeText(report: SolveReport): string {
  return `${sig(report.portVolume, 4)} ${report.units === 'mm' ? 'mm³' : 'in³'}${perDepth(report)}`;
}

/** " per mm of depth" (or in) in the plane model, where an area is a width and a volume an area; else nothing. */
function perDepth(report: SolveReport): string {
  return report.model === 'plane' ? ` per ${report.units === 'mm' ? 'mm' : 'in'} of depth` : '';
}

function probeText(probe: ProbeReport): string {
  if (!probe.inFluid) return 'outside the fluid';
  if (probe.potential === undefined || probe.speedRatio === undefined) return 'no solved flow here (a pocket the flow does not reach)';
  return `potential ${probe.potential.toFixed(4)}, speed ratio ${ratio(probe.speedRatio)}`;
}

function ratio(value: number): string {
  return Number.isFinite(value) ? value.toFixed(2) : '-';
}

function sig(value: number, digits: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(digits))) : '-';
}

function percent(share: number): string {
  if (!Number.isFinite(share)) return '-';
  const p = share * 100;
  return `${p >= 1 ? p.toFixed(1) : p.toPrecision(2)}%`;
}

/** The valve and seat numbers at the variant's lift. */
function breathingLines(b: NonNullable<SolveReport['breathing']>, units: string): string[] {
  const len = (v: number) => `${sig(v, 4)} ${units}`;
  const area = (v: number) => `${sig(v, 5)} ${units}^2`;
  return [
    `breathing at ${len(b.lift)} lift (valve ${len(b.valveDiameter)}, L/D ${sig(b.ld, 3)}):`,
    `  curtain area ${area(b.curtainArea)}, least valve flow area ${area(b.minValveArea)} (stage ${b.stage}), ` +
      `throat ${area(b.throatArea)} (${sig(b.throatPct, 3)}% of the valve)`,
    ...(b.port === null ? [] : [`  port area ranked: ${area(b.port.area)} (${b.port.source})`]),
    `  greatest restriction at this lift: ${b.greatest}` +
      (b.crossoverLift === null ? '' : `; it passes from the valve to the port side at ${len(b.crossoverLift)} lift`),
  ];
}

/** Flow reading: turns a solved potential into advice a porter can act on (stations, slow zones, walls, findings). */
import type { FlowDomain, SolveResult } from '../types.ts';
import { wallDetachments } from './detachment.ts';
import { extendedPhi } from './field.ts';
import { findings } from './findings.ts';
import { readingSettings } from './options.ts';
import { overWideStations } from './over-wide.ts';
import { cellDepths, passageModel, portVolume } from './port-volume.ts';
import { RingIndex } from './ring-index.ts';
import { slowZones } from './slow-zones.ts';
import { buildStations, evenLevels, tightestStation } from './stations.ts';
import { traceStreamlines } from './streamlines.ts';
import { valvePotential } from './valve-level.ts';
import { downstreamWalls } from './wall-paths.ts';
import { readWall } from './walls.ts';
import { onSymmetryLine } from './symmetry-line.ts';
import type { FlowReading, ReadingOptions, WallReading } from './types.ts';

export type * from './types.ts';
export { ReadingSettingError } from './errors.ts';
export { readingSummary, type ReadingSummary } from './summary.ts';
export { passageModel } from './port-volume.ts';
export { onSymmetryLine } from './symmetry-line.ts';
export { MODEL_WORDS } from './wording.ts';

/**
 * Reads a solved flow: equipotential stations (with their areas under the domain's depth) and the one of least area
 * ahead of the valve, the port volume, slow zones, over-wide
 * stations, the speed peak and fall on every wall, where the boundary layer likely leaves each wall, equal-flux
 * streamlines and a ranked list of findings. Pure computation, same input same output.
 * Throws ReadingSettingError for an option out of range (see ReadingOptions for every default).
 */
export function readFlow(domain: FlowDomain, result: SolveResult, options: ReadingOptions = {}): FlowReading {
  const settings = readingSettings(options);
  const { grid } = result;
  const phi = extendedPhi(grid, result.phi);
  const index = new RingIndex(grid, domain);
  const input = { domain, grid, phi, index, conductance: result.conductance, inletMeanSpeed: result.inletMeanSpeed };
  const stations = buildStations(input, evenLevels(settings.stationCount), settings.deck);
  const valvePhi = valvePotential(domain, grid, phi, settings.valveIslandName);
  // A symmetry line (the axis of a round model) is not metal: no layer is marched along it, it is never ranked.
  const paths = downstreamWalls(result.walls, grid, phi).filter((path) => !onSymmetryLine(path, domain.depth, grid.h));
  const valve = valvePhi === null ? null : { phi: valvePhi, name: settings.valveIslandName };
  const depth = cellDepths(grid, domain.depth);
  const partial = {
    model: passageModel(domain.depth),
    stations,
    valvePhi,
    tightest: tightestStation(stations, valvePhi),
    portVolume: portVolume(grid, depth, settings.deck),
    slow: slowZones(grid, result.phi, result.speedRatio, stations, settings.slowFraction, valvePhi, settings.deck, depth),
    overWide: overWideStations(stations, valvePhi, settings.overWideThreshold, settings.overWideWindow),
    walls: paths.map((path) => readWall(path, valve)).filter((w): w is WallReading => w !== null),
    detachments: wallDetachments(paths, settings),
    streamlines: traceStreamlines(domain, grid, result.phi, index, settings.streamlineCount),
  };
  return { ...partial, findings: findings(partial, settings, grid.h) };
}

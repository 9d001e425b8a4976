/** Public API of the field solver (pure TypeScript, no DOM): the worker, the command line and tests import from here. */
export * from './types.ts';
export { FlowSetupError } from './errors.ts';
export { rasterise } from './rasterise.ts';
export { connectedCells } from './connectivity.ts';
export { wallSpeeds } from './wall-speeds.ts';
export { solveFlow, solveOnGrid, SolveSupersededError, DEFAULT_TOLERANCE, DEFAULT_MAX_ITERATIONS } from './solve.ts';
export type { GridSolveOptions, GridSolution } from './solve.ts';
export { assemble, type Stencil } from './assemble.ts';
export { buildMultigrid, applyMultigrid, type Multigrid, type MultigridOptions } from './multigrid.ts';
export { pcg, type PcgOptions, type PcgReport } from './pcg.ts';
export { warmStartGuess } from './warm-start.ts';
export { stationFluxes, worstImbalance, STATION_COUNT } from './stations-flux.ts';
export { sharpConvexCorners, peakSpeed, SHARP_TURN, CORNER_CLEARANCE_CELLS, CORNER_CLEARANCE_SHARE, type SpeedPeak } from './velocity-peak.ts';

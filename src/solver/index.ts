/** Public face of the field solver (pure TypeScript, no DOM) for callers outside src/solver: the domain and result types, the solve and its errors, the passage depth. */
export * from './types.ts';
export { FlowSetupError } from './errors.ts';
export { solveFlow, SolveSupersededError, DEFAULT_TOLERANCE, DEFAULT_MAX_ITERATIONS } from './solve.ts';
export { thinWallNote, type GridChoice, type ThinWallNoteOptions } from './thin-wall-note.ts';
export { depthFunction, type DepthAt } from './depth/depth-model.ts';
export { linesDepthIntegral, segmentDepthIntegral } from './depth/depth-integral.ts';

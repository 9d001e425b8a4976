/** The solve and the flow reading of one case, as the worker and the command both run them. */

import { readFlow, type FlowReading, type ReadingOptions } from '../solver/reading/index.ts';
import { SolveSupersededError, solveFlow } from '../solver/solve.ts';
import type { FlowDomain, SolveOptions, SolveResult } from '../solver/types.ts';

export interface SolvedCase {
  readonly result: SolveResult;
  /** Null when no reading was asked for (a drag preview). */
  readonly reading: FlowReading | null;
}

/**
 * Solves `domain` and reads the flow when `reading` is given. The reading marches along the walls, so wall speeds
 * are sampled whenever a reading is asked for, whatever options.wallSpeeds says.
 * Throws FlowSetupError, ReadingSettingError or SolveSupersededError (see solveFlow, readFlow).
 */
export function solveCase(domain: FlowDomain, options: SolveOptions, reading: ReadingOptions | null): SolvedCase {
  const result = solveFlow(domain, { ...options, wallSpeeds: options.wallSpeeds !== false || reading !== null });
  // A solve superseded while it finished is not read: the reading costs tens of milliseconds nobody will see.
  if (reading !== null && options.shouldStop?.()) throw new SolveSupersededError(result.iterations);
  return { result, reading: reading ? readFlow(domain, result, reading) : null };
}

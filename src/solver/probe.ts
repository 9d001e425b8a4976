/** Potential and speed ratio at any point of a solved flow, read from the cell-centre values (a probe). */
import { sampleCells } from './reading/field.ts';
import type { SolveResult } from './types.ts';

/** What a probe reads; NaN where no solved cell is near enough to read from. */
export interface ProbeReading {
  /** 1 at the inlet, 0 at the outlet. */
  readonly potential: number;
  /** Speed over the mean inlet speed. */
  readonly speedRatio: number;
}

/**
 * The potential and speed ratio at (x, y), document units, by bilinear interpolation between the four cell centres
 * around the point. Cells that are not solved (solid metal or a dead pocket, NaN in the result) drop out and the
 * weights of the others are rescaled, so a point in a partly filled cell beside a wall reads only fluid values.
 * Whether (x, y) lies in the fluid at all is the caller's question (the domain's rings answer it); a point in
 * solid metal with fluid cells around it would still read their values.
 * Example: on a channel solved with phi = 1 - x / L, a probe at x = L / 4 reads potential 0.75.
 */
export function probeFlow(result: Pick<SolveResult, 'grid' | 'phi' | 'speedRatio'>, x: number, y: number): ProbeReading {
  return {
    potential: sampleCells(result.grid, result.phi, x, y),
    speedRatio: sampleCells(result.grid, result.speedRatio, x, y),
  };
}

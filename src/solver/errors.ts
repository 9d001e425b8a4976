/** Typed errors for flow set-ups a porter can get wrong, with messages in shop words. */

/** What is wrong with the set-up. */
export type FlowSetupCode = 'no-inlet' | 'no-outlet' | 'blocked' | 'too-many-cells' | 'degenerate' | 'depth';

/** Most grid cells one solve may use; above this the grid would not fit a browser tab's memory. */
export const MAX_CELLS = 16_000_000;

/**
 * A set-up the solver cannot run: the message says what to change.
 * `where` is a point in document units the view can mark, when there is one.
 */
export class FlowSetupError extends Error {
  readonly code: FlowSetupCode;
  readonly where?: readonly [number, number];

  constructor(code: FlowSetupCode, message: string, where?: readonly [number, number]) {
    super(message);
    this.name = 'FlowSetupError';
    this.code = code;
    if (where) this.where = where;
  }
}

/** A length or coordinate for a message, to one decimal or finer when `step` (the grid cell, length units) is smaller. */
export function formatLength(value: number, step = 1): string {
  const digits = Math.min(4, Math.max(1, Math.ceil(-Math.log10(step))));
  return value.toFixed(digits);
}

/** Typed input errors for the breathing calculator: a porter-readable message instead of a silent NaN. */

/** A number the user typed (or a file carried) that the calculator cannot use. `field` names the input. */
export class BreathingInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.name = 'BreathingInputError';
    this.field = field;
  }
}

/** Throws unless `value` is a finite number greater than zero. `what` is the trade name shown to the user. */
export function requirePositive(value: number, field: string, what: string): number {
  if (!Number.isFinite(value) || value <= 0) {
    throw new BreathingInputError(field, `${what} must be a number above zero (got ${String(value)}).`);
  }
  return value;
}

/** Throws unless `value` is a finite number of zero or more. */
export function requireNonNegative(value: number, field: string, what: string): number {
  if (!Number.isFinite(value) || value < 0) {
    throw new BreathingInputError(field, `${what} cannot be negative (got ${String(value)}).`);
  }
  return value;
}

/** Throws unless lo <= value <= hi. */
export function requireWithin(value: number, lo: number, hi: number, field: string, what: string): number {
  if (!Number.isFinite(value) || value < lo || value > hi) {
    throw new BreathingInputError(field, `${what} must lie between ${lo} and ${hi} (got ${String(value)}).`);
  }
  return value;
}

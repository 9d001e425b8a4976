/** The command line of `portwright solve`: flags read into settings, each mistake a plain UserError. */

import { MAX_CELLS } from '../solver/errors.ts';
import { UserError } from './errors.ts';

/** The app's "standard" grid detail, named in the message for a bad --cells. */
const STANDARD_CELLS = 250_000;
/** Fewest cells worth solving: below this a port's throat is only a few cells across. */
const MIN_CELLS = 1_000;
/** Relative residual limits for --tolerance: tighter than 1e-13 is below rounding, looser than 1e-2 is not a solve. */
const MIN_TOLERANCE = 1e-13;
const MAX_TOLERANCE = 1e-2;

export const SOLVE_ARGS = 'FILE [--variant NAME] [--cells N] [--probe X,Y]... [--json] [--tolerance T]';
const SOLVE_USAGE = `portwright solve ${SOLVE_ARGS}`;

export interface SolveArgs {
  readonly file: string;
  /** Variant to solve; undefined means the document's active variant. */
  readonly variant: string | undefined;
  /** Target grid cells over the section's bounding box; undefined means the file's own grid detail. */
  readonly cells: number | undefined;
  /** Points to read, document units. */
  readonly probes: readonly (readonly [number, number])[];
  readonly json: boolean;
  /** Relative residual to stop at; undefined means the solver's default. */
  readonly tolerance: number | undefined;
}

const VALUE_FLAGS = new Set(['--variant', '--cells', '--probe', '--tolerance']);

/** Reads `args` (everything after "solve"). Accepts "--flag value" and "--flag=value". */
export function parseSolveArgs(args: readonly string[]): SolveArgs {
  const files: string[] = [];
  const values = new Map<string, string[]>();
  let json = false;
  for (let k = 0; k < args.length; k++) {
    const arg = args[k];
    if (arg === '--json') {
      json = true;
      continue;
    }
    if (!arg.startsWith('--') || arg === '--') {
      files.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const flag = eq >= 0 ? arg.slice(0, eq) : arg;
    if (!VALUE_FLAGS.has(flag)) throw new UserError(`unknown option ${flag}; usage: ${SOLVE_USAGE}`);
    const value: string | undefined = eq >= 0 ? arg.slice(eq + 1) : args[++k];
    if (value === undefined || value === '') throw new UserError(`${flag} needs a value; usage: ${SOLVE_USAGE}`);
    const list = values.get(flag) ?? [];
    if (list.length > 0 && flag !== '--probe') throw new UserError(`${flag} is given twice; give it once`);
    list.push(value);
    values.set(flag, list);
  }
  if (files.length !== 1) throw new UserError(`solve takes one file (got ${files.length}); usage: ${SOLVE_USAGE}`);
  const one = (flag: string): string | undefined => values.get(flag)?.[0];
  const cellsText = one('--cells');
  const toleranceText = one('--tolerance');
  return {
    file: files[0],
    variant: one('--variant'),
    cells: cellsText === undefined ? undefined : parseCells(cellsText),
    probes: (values.get('--probe') ?? []).map(parseProbe),
    json,
    tolerance: toleranceText === undefined ? undefined : parseTolerance(toleranceText),
  };
}

function parseCells(text: string): number {
  const cells = Number(text.replaceAll('_', ''));
  if (!Number.isInteger(cells) || cells < MIN_CELLS || cells > MAX_CELLS) {
    throw new UserError(
      `--cells must be a whole number from ${MIN_CELLS.toLocaleString('en-US')} to ${MAX_CELLS.toLocaleString('en-US')} (got "${text}"); ` +
        `the standard grid is ${STANDARD_CELLS.toLocaleString('en-US')}`,
    );
  }
  return cells;
}

function parseTolerance(text: string): number {
  const tolerance = Number(text);
  if (!Number.isFinite(tolerance) || tolerance < MIN_TOLERANCE || tolerance > MAX_TOLERANCE) {
    throw new UserError(`--tolerance must be a number from ${MIN_TOLERANCE} to ${MAX_TOLERANCE} (a relative residual, e.g. 1e-8; got "${text}")`);
  }
  return tolerance;
}

function parseProbe(text: string): [number, number] {
  const parts = text.split(',');
  const [x, y] = parts.map((part) => (part.trim() === '' ? NaN : Number(part)));
  if (parts.length !== 2 || !Number.isFinite(x) || !Number.isFinite(y)) {
    throw new UserError(`--probe takes a point as X,Y in the file's units, e.g. --probe 80,40 (got "${text}")`);
  }
  return [x, y];
}

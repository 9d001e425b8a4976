/** `portwright solve FILE`: solves one variant's ideal flow headless and prints the flow reading, readable or as JSON. */

import type { PortDocument, Variant } from '../document/index.ts';
import { GeometryError } from '../geometry/index.ts';
import { DEFAULT_MAX_ITERATIONS, DEFAULT_TOLERANCE, FlowSetupError, solveFlow, type FlowDomain } from '../solver/index.ts';
import { PartsError, breathingSummary, deckLine, partsNotes } from '../parts/index.ts';
import { readFlow, readingSummary } from '../solver/reading/index.ts';
import { EXIT_OK, type CliIO, type Command } from './command.ts';
import { UserError } from './errors.ts';
import { jsonLines } from './json-text.ts';
import { readSectionFile } from './read-file.ts';
import { SOLVE_ARGS, parseSolveArgs, type SolveArgs } from './solve-args.ts';
import { buildSolveReport, type SolvedVariant } from './solve-report.ts';
import { solveReportLines } from './solve-text.ts';
import { variantDomain } from './variant-domain.ts';

/** From this many grid cells a solve takes seconds, so solve says on stderr that it has started. */
const PROGRESS_CELLS = 1_000_000;

export const solveCommand: Command = {
  name: 'solve',
  args: SOLVE_ARGS,
  summary: 'solve the ideal flow through a variant (default: the active one) and print speeds, walls, findings; --json for programs',
  run: (args, io) => {
    const options = parseSolveArgs(args);
    const report = buildSolveReport(solveVariant(options, io), options.probes);
    const lines = options.json ? jsonLines(report) : solveReportLines(report);
    for (const line of lines) io.out(line);
    return EXIT_OK;
  },
};

/** Loads, checks, solves and reads the chosen variant; every problem the user can fix becomes a UserError. */
function solveVariant(options: SolveArgs, io: CliIO): SolvedVariant {
  const { document } = readSectionFile(options.file);
  const variant = chooseVariant(document, options);
  const where = `${options.file}, variant "${variant.name}"`;
  const domain = toDomain(variant, document, where);
  if (options.cells >= PROGRESS_CELLS) {
    io.err(`portwright solve: solving ${where} on about ${options.cells.toLocaleString('en-US')} cells...`);
  }
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const result = solve(domain, options.cells, tolerance, where, document.units);
  const summary = readingSummary(readFlow(domain, result, { units: document.units, deck: deckLine(variant) ?? undefined }));
  // Converged unless the cap came first with the residual still above the tolerance.
  const converged = result.iterations < DEFAULT_MAX_ITERATIONS || result.residual <= tolerance;
  const breathing = breathingSummary(variant, document.units);
  const notes = variant.parts ? partsNotes(variant.parts, document.units).map((n) => n.message) : [];
  return { title: document.title, variant: variant.name, units: document.units, domain, result, summary, converged, breathing, notes };
}

function chooseVariant(document: PortDocument, options: SolveArgs): Variant {
  const name = options.variant ?? document.activeVariant;
  const variant = document.variants.find((v) => v.name === name);
  if (variant !== undefined) return variant;
  const names = document.variants.map((v) => `"${v.name}"`).join(', ');
  throw new UserError(`${options.file} has no variant "${name}"; its variants are: ${names}`);
}

function toDomain(variant: Variant, document: PortDocument, where: string): FlowDomain {
  try {
    return variantDomain(variant, document.units);
  } catch (error) {
    if (!(error instanceof GeometryError) && !(error instanceof PartsError)) throw error;
    throw new UserError(`${where}: ${error.message}`);
  }
}

function solve(domain: FlowDomain, cells: number, tolerance: number, where: string, units: string): ReturnType<typeof solveFlow> {
  try {
    return solveFlow(domain, { targetCells: cells, tolerance });
  } catch (error) {
    if (!(error instanceof FlowSetupError)) throw error;
    // The solver's message gives the place as bare numbers; say which units they are in.
    const place = error.where === undefined ? '' : ` (x and y in ${units})`;
    throw new UserError(`${where} cannot be solved: ${error.message}${place}`);
  }
}

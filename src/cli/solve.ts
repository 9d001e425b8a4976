/** `portwright solve FILE`: solves one variant's ideal flow headless and prints the flow reading, readable or as JSON. */

import { GeometryError } from '../geometry/index.ts';
import { DEFAULT_MAX_ITERATIONS, DEFAULT_TOLERANCE, FlowSetupError } from '../solver/index.ts';
import { PartsError, breathingSummary, partsNotes } from '../parts/index.ts';
import { readingSummary, type FlowReading, type PassageModel } from '../solver/reading/index.ts';
import { caseSetup, solveCase, StudyError, type CaseSetup, type SolvedCase } from '../study/index.ts';
import { EXIT_OK, type CliIO, type Command } from './command.ts';
import { UserError } from './errors.ts';
import { jsonLines } from './json-text.ts';
import { readSectionFile } from './read-file.ts';
import { SOLVE_ARGS, parseSolveArgs, type SolveArgs } from './solve-args.ts';
import { buildSolveReport, type SolvedVariant } from './solve-report.ts';
import { solveReportLines } from './solve-text.ts';
import { fileCells } from './variant-domain.ts';

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
  const cells = options.cells ?? fileCells(document);
  const named = `${options.file}, variant "${options.variant ?? document.activeVariant}"`;
  const setup = setUp(() => caseSetup(document, { variant: options.variant, targetCells: cells }), options.file, named);
  const { variant, domain } = setup;
  const where = `${options.file}, variant "${variant.name}"`;
  if (cells >= PROGRESS_CELLS) {
    io.err(`portwright solve: solving ${where} on about ${cells.toLocaleString('en-US')} cells...`);
  }
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const { result, reading } = solve(setup, tolerance, where, document.units);
  const summary = readingSummary(reading);
  // Converged unless the cap came first with the residual still above the tolerance.
  const converged = result.iterations < DEFAULT_MAX_ITERATIONS || result.residual <= tolerance;
  const model = solvedModel(setup, reading);
  // Under a width profile the port area ranked is the least area the solve found (the breathing block names it).
  const solvedLeastArea = model === 'width' && reading.tightest ? reading.tightest.area : undefined;
  const breathing = breathingSummary(variant, document.units, { solvedLeastArea });
  const notes = variant.parts ? partsNotes(variant.parts, document.units).map((n) => n.message) : [];
  return { title: document.title, variant: variant.name, units: document.units, model, domain, result, summary, converged, breathing, notes };
}

/** The model the case was set up in, as the study names it; the reading's own (from the domain's depth) until it does. */
function solvedModel(setup: CaseSetup & { readonly model?: PassageModel }, reading: FlowReading): PassageModel {
  return setup.model ?? reading.model;
}

/** The case set up, or the porter's problem with it as a UserError naming the file (and the variant, for its geometry). */
function setUp(build: () => CaseSetup, file: string, named: string): CaseSetup {
  try {
    return build();
  } catch (error) {
    if (error instanceof StudyError) throw new UserError(`${file}: ${error.message}`);
    if (!(error instanceof GeometryError) && !(error instanceof PartsError)) throw error;
    throw new UserError(`${named}: ${error.message}`);
  }
}

function solve(setup: CaseSetup, tolerance: number, where: string, units: string): SolvedCase & { reading: NonNullable<SolvedCase['reading']> } {
  try {
    const solved = solveCase(setup.domain, { targetCells: setup.targetCells, tolerance }, setup.reading);
    return { result: solved.result, reading: solved.reading! };
  } catch (error) {
    if (!(error instanceof FlowSetupError)) throw error;
    // The solver's message gives the place as bare numbers; say which units they are in.
    const place = error.where === undefined ? '' : ` (x and y in ${units})`;
    throw new UserError(`${where} cannot be solved: ${error.message}${place}`);
  }
}

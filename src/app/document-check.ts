/** Whether a document may be committed: every variant builds as `portwright check` and `solve` build it. */
import { checkDocumentShape } from '../document/load.ts';
import { DocumentError } from '../document/errors.ts';
import type { PortDocument, Variant } from '../document/types.ts';
import { GeometryError } from '../geometry/index.ts';
import { PartsError } from '../parts/index.ts';
import { EditError } from '../editor/errors.ts';
import { caseSetup, CELLS_BY_DETAIL, missingEnds, StudyError } from '../study/index.ts';
import { sentences } from './status.ts';

/** A variant that cannot be solved; `problem` is the plain sentence(s) saying why. */
export class DocumentCheckError extends Error {
  constructor(readonly variantName: string, readonly problem: string, readonly fault?: Error) {
    super(`the variant "${variantName}" cannot be solved. ${problem}`);
    this.name = 'DocumentCheckError';
  }
}

/** A change whose result Save would refuse (the file's own rules, e.g. an outline with one anchor corner). */
export class DocumentShapeError extends Error {
  constructor(readonly fault: DocumentError) {
    super(`The result would not save as a valid section file (${fault.problems.map((p) => (p.path === '' ? p.problem : `${p.path} ${p.problem}`)).join('; ')}).`);
    this.name = 'DocumentShapeError';
  }
}

/**
 * Throws DocumentShapeError when Save would refuse `doc`, and DocumentCheckError for the first variant of `doc`
 * that `check` would refuse: no inlet or no outlet edge, or a case that does not set up on the file's own grid
 * detail (a fillet too big, a crossing, a part that does not fit). Variants whose section and parts are the very
 * objects a variant of `before` held, under the same units and grid detail, were checked when they were committed
 * and are not built again, so a drag step builds only the variant it changes and a change of bench inputs builds none.
 */
export function checkDocument(doc: PortDocument, before?: PortDocument): void {
  try {
    checkDocumentShape(doc);
  } catch (error) {
    throw error instanceof DocumentError ? new DocumentShapeError(error) : error;
  }
  if (!doc.variants.some((v) => v.name === doc.activeVariant)) {
    throw new DocumentCheckError(doc.activeVariant, 'The file names it as the active variant, but holds no variant of that name.');
  }
  const same = before !== undefined && before.units === doc.units && before.settings.gridDetail === doc.settings.gridDetail;
  // A variant is built from its section and parts alone (not its name, note or bench inputs): a pair already checked
  // need not be built again, so a change of bench inputs costs no build.
  // A round model cuts the section along its axis, so it is part of what is built.
  const known = new Map<Variant['section'], Variant>(same ? before.variants.map((v) => [v.section, v]) : []);
  for (const variant of doc.variants) {
    const kept = known.get(variant.section);
    if (kept !== undefined && kept.parts === variant.parts && kept.axisymmetric === variant.axisymmetric) continue;
    const problem = variantProblem(doc, variant);
    if (problem !== null) throw new DocumentCheckError(variant.name, problem.message, problem.fault);
  }
}

/** What keeps one variant from being solved (the wording `check` uses), or null when it builds. */
function variantProblem(doc: PortDocument, variant: Variant): { message: string; fault?: Error } | null {
  const ends = missingEnds(variant);
  if (ends.length > 0) return { message: ends[0] };
  try {
    caseSetup(doc, { variant: variant.name, targetCells: CELLS_BY_DETAIL[doc.settings.gridDetail] });
    return null;
  } catch (error) {
    if (error instanceof GeometryError || error instanceof PartsError || error instanceof StudyError) return { message: error.message, fault: error };
    throw error;
  }
}

/** An error's message for the status line: for a refused edit the problem alone (the variant is the one in view). */
export function plainMessage(error: unknown): string {
  if (error instanceof DocumentCheckError) return sentences(error.problem, 'The change was not made.');
  if (error instanceof DocumentShapeError) return sentences(error.message, 'The change was not made.');
  if (error instanceof EditError) return editMessage(error);
  return error instanceof Error ? error.message : String(error);
}

/**
 * A refused edit argument without the edit's internal name: "setFilletRadius: radius: A fillet radius cannot be
 * negative…" is shown from "A fillet radius…"; a message that is not a sentence of its own names the value refused.
 */
function editMessage(error: EditError): string {
  const prefix = `${error.edit}: `;
  if (error.edit === '' || !error.message.startsWith(prefix)) return error.message;
  const rest = error.message.slice(prefix.length);
  const field = /^([\w.[\]]+): ([\s\S]*)$/.exec(rest);
  const problem = field ? field[2] : rest;
  if (/^[A-Z]/.test(problem)) return problem;
  return `The value${field ? ` of ${field[1]}` : ''} was refused: ${problem}`;
}

/** Why `doc` cannot be committed (a sentence naming the variant), or null when every variant builds. */
export function documentProblem(doc: PortDocument): string | null {
  try {
    checkDocument(doc);
    return null;
  } catch (error) {
    // Any other failure (a fault of ours on a document from an older Portwright) also keeps it out.
    const message = error instanceof Error ? error.message : String(error);
    return `${message.charAt(0).toUpperCase()}${message.slice(1)}`;
  }
}

/** Typed error for a section file that cannot be read, with each problem's place in the file in plain words. */

/** One thing wrong with a file. */
export interface DocumentProblem {
  /** Where, e.g. `variants[0].section.outline.vertices[3].filletRadius`; "" for the file as a whole. */
  readonly path: string;
  /** What is wrong, in plain words, without the path. */
  readonly problem: string;
}

/** How many problems the message lists before "and N more". */
const LISTED_PROBLEMS = 5;

/**
 * A section file was malformed, of the wrong kind, from a newer version, too big or hostile.
 * The message lists the problems one per line, each as `path: problem`.
 */
export class DocumentError extends Error {
  readonly problems: readonly DocumentProblem[];

  constructor(problems: readonly DocumentProblem[]) {
    super(describeProblems(problems));
    this.name = 'DocumentError';
    this.problems = problems;
  }
}

/** A DocumentError with a single problem. */
export function documentError(path: string, problem: string): DocumentError {
  return new DocumentError([{ path, problem }]);
}

function describeProblems(problems: readonly DocumentProblem[]): string {
  if (problems.length === 0) return 'the file could not be read';
  const lines = problems.slice(0, LISTED_PROBLEMS).map((p) => (p.path === '' ? p.problem : `${p.path}: ${p.problem}`));
  const more = problems.length - LISTED_PROBLEMS;
  if (more > 0) lines.push(`... and ${more} more problem${more === 1 ? '' : 's'}`);
  return lines.join('\n');
}

/** `['variants', 0, 'name']` -> `variants[0].name`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out;
}

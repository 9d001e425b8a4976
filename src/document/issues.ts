/** Turns zod issues into plain problems: the place in the file, the requirement, and what was found there. */

import type { z } from 'zod';
import { formatPath, type DocumentProblem } from './errors.ts';

type Issue = z.core.$ZodIssue;

/** Longest piece of a found string quoted back in a message. */
const QUOTE_LENGTH = 40;

/** One problem per issue; an unknown-fields issue becomes one problem per field. */
export function problemsFromIssues(issues: readonly Issue[]): DocumentProblem[] {
  return issues.flatMap((issue) => problemsFromIssue(issue));
}

function problemsFromIssue(issue: Issue): DocumentProblem[] {
  if (issue.code === 'unrecognized_keys') {
    return issue.keys.map((key) => ({
      path: formatPath([...issue.path, key]),
      problem: 'is not a field of a Portwright section file here (check the spelling)',
    }));
  }
  const path = formatPath(issue.path);
  if (issue.code === 'custom') return [{ path, problem: issue.message }];
  const found = foundValue(issue);
  if (found === undefined) return [{ path, problem: `is missing; it ${issue.message}` }];
  return [{ path, problem: `${issue.message} (got ${describeValue(found)})` }];
}

/** The value the issue is about; for a bad edge kind, the kind rather than the whole edge. */
function foundValue(issue: Issue): unknown {
  const input = issue.input;
  if (issue.code === 'invalid_union' && issue.discriminator !== undefined && isRecord(input)) {
    return input[issue.discriminator];
  }
  return input;
}

/** A short plain description of a value from a file: quoted strings, numbers as written, sizes of lists. */
export function describeValue(value: unknown): string {
  if (typeof value === 'string') {
    const shown = value.length > QUOTE_LENGTH ? `${value.slice(0, QUOTE_LENGTH)}...` : value;
    return `${JSON.stringify(shown)}${value.length > QUOTE_LENGTH ? ` (${value.length} characters)` : ''}`;
  }
  if (typeof value === 'number' || typeof value === 'boolean' || value === null) return String(value);
  if (Array.isArray(value)) return value.length === 1 ? 'a list of 1 item' : `a list of ${value.length} items`;
  if (typeof value === 'object') return 'an object';
  return typeof value;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

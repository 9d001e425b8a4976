/** The rule for a name the porter types (a variant, a wall): trimmed, on one line, short enough to save. */

import { CONTROL_CHARACTER, MAX_NAME_LENGTH } from '../document/limits.ts';
import { EditError } from './errors.ts';

/**
 * Longest name the editor takes, characters. Under the file's MAX_NAME_LENGTH (80), so a typed name always saves
 * and " copy 2" can still be added to it.
 */
const TYPED_NAME_MAX = 60;

/**
 * `name` without surrounding spaces, or an EditError when the file could not hold it: longer than TYPED_NAME_MAX,
 * or with a line break, tab or other control character (names are one-line labels). May be empty: callers decide.
 */
export function typedName(name: string, what: 'variant' | 'wall', edit: string): string {
  const trimmed = name.trim();
  if (trimmed.length > TYPED_NAME_MAX) throw new EditError(edit, `A ${what} name can be at most ${TYPED_NAME_MAX} characters long.`);
  if (CONTROL_CHARACTER.test(trimmed)) {
    throw new EditError(edit, `A ${what} name must fit on one line: no line breaks, tabs or other control characters.`);
  }
  return trimmed;
}

/** `base` + `suffix`, with `base` cut so the whole stays within the file's MAX_NAME_LENGTH. */
export function nameWithSuffix(base: string, suffix: string): string {
  return `${base.slice(0, MAX_NAME_LENGTH - suffix.length).trimEnd()}${suffix}`;
}

/** JSON for people and programs: numbers to six significant figures, short lists kept on one line; never NaN. */

/**
 * Six significant figures: finer than any tracing, yet the same from run to run. JSON has no NaN or infinity, and a
 * quantity with no value is left out of the report rather than written as a number, so meeting one here is a fault
 * in Portwright: it throws (exit code 2) instead of writing null into a number's place.
 */
export function roundForJson(value: number): number {
  if (!Number.isFinite(value)) throw new TypeError(`solve --json: ${value} has no place in a report's numbers`);
  const rounded = Number(value.toPrecision(6));
  return rounded === 0 ? 0 : rounded; // no "-0"
}

/**
 * `value` as indented JSON lines. An array or object whose members are all plain values (a point, a wall sample,
 * a station) stays on one line, so a wall of 500 samples takes 500 lines, not 3000. Object keys whose value is
 * undefined are left out, as JSON.stringify does.
 */
export function jsonLines(value: unknown): string[] {
  return render(value, '').split('\n');
}

/** Longest list kept on one line, characters: a station or a point fits, a list of findings does not. */
const INLINE_MAX = 160;

function render(value: unknown, indent: string): string {
  if (isPlain(value)) return plain(value);
  if (isFlat(value)) {
    const line = inline(value);
    if (line.length <= INLINE_MAX) return line;
  }
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.length === 0) return '[]';
    return `[\n${value.map((item) => inner + render(item, inner)).join(',\n')}\n${indent}]`;
  }
  const entries = definedEntries(value as Record<string, unknown>);
  if (entries.length === 0) return '{}';
  return `{\n${entries.map(([key, item]) => `${inner}${JSON.stringify(key)}: ${render(item, inner)}`).join(',\n')}\n${indent}}`;
}

type Plain = string | number | boolean | null;

function isPlain(value: unknown): value is Plain {
  return value === null || typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean';
}

function plain(value: Plain): string {
  if (typeof value === 'number') return JSON.stringify(roundForJson(value));
  return JSON.stringify(value);
}

function isFlat(value: unknown): value is readonly Plain[] | Record<string, Plain> {
  if (typeof value !== 'object' || value === null) return false;
  const members = Array.isArray(value) ? value : Object.values(value).filter((v) => v !== undefined);
  return members.every(isPlain);
}

function inline(value: readonly Plain[] | Record<string, Plain>): string {
  if (Array.isArray(value)) return `[${value.map(plain).join(', ')}]`;
  const entries = definedEntries(value as Record<string, Plain>) as [string, Plain][];
  return `{${entries.map(([key, item]) => `${JSON.stringify(key)}: ${plain(item)}`).join(', ')}}`;
}

function definedEntries(record: Record<string, unknown>): [string, unknown][] {
  return Object.entries(record).filter(([, item]) => item !== undefined);
}

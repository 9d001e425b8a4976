/** Stable pretty JSON for section files: 2-space indent, points kept on one line, keys in the order given. */

const INDENT = '  ';
/** Widest line a small record (a vertex, an edge) is kept on. */
const LINE_WIDTH = 100;

/** Writes `value` (plain JSON data) with a trailing newline. Fields whose value is undefined are left out. */
export function writeJson(value: unknown): string {
  return `${write(value, '')}\n`;
}

function write(value: unknown, indent: string): string {
  if (typeof value === 'number') return writeNumber(value);
  if (typeof value === 'string' || typeof value === 'boolean' || value === null) return JSON.stringify(value);
  if (Array.isArray(value)) return writeArray(value, indent);
  if (typeof value === 'object') return writeObject(value as Record<string, unknown>, indent);
  throw new TypeError(`cannot write a ${typeof value} as JSON`);
}

/** -0 is written as -0 so that a save and load gives back exactly the same numbers. */
function writeNumber(n: number): string {
  if (!Number.isFinite(n)) throw new TypeError(`cannot write ${n} as JSON`);
  return Object.is(n, -0) ? '-0' : String(n); // String and JSON.stringify agree on every other finite number
}

function writeArray(items: readonly unknown[], indent: string): string {
  if (items.length === 0) return '[]';
  // A list of plain numbers is a point: [x, y] on one line reads as a coordinate.
  if (items.every((item) => typeof item === 'number')) return `[${items.map((n) => writeNumber(n as number)).join(', ')}]`;
  // A short list of points stays on one line too: "via": [[72.9, 11.4]].
  if (items.every(isPoint)) {
    const line = `[${items.map((item) => write(item, indent)).join(', ')}]`;
    if (indent.length + line.length <= LINE_WIDTH) return line;
  }
  const inner = indent + INDENT;
  return `[\n${items.map((item) => inner + write(item, inner)).join(',\n')}\n${indent}]`;
}

function writeObject(record: Record<string, unknown>, indent: string): string {
  const keys = Object.keys(record).filter((key) => record[key] !== undefined);
  if (keys.length === 0) return '{}';
  // A small flat record (a vertex, an edge) reads best on one line: { "at": [12.5, 40] }.
  if (keys.every((key) => isFlat(record[key]))) {
    const line = `{ ${keys.map((key) => `${quoteKey(key)}: ${write(record[key], indent)}`).join(', ')} }`;
    if (indent.length + line.length <= LINE_WIDTH) return line;
  }
  const inner = indent + INDENT;
  const fields = keys.map((key) => `${inner}${quoteKey(key)}: ${write(record[key], inner)}`);
  return `{\n${fields.join(',\n')}\n${indent}}`;
}

/** A value that may share a line: a number, text, true/false/null, a point or a list of points. */
function isFlat(value: unknown): boolean {
  if (Array.isArray(value)) return isPoint(value) || value.every(isPoint);
  return typeof value !== 'object' || value === null;
}

function isPoint(value: unknown): boolean {
  return Array.isArray(value) && value.every((item) => typeof item === 'number');
}

/** Field names repeat thousands of times in a big section; quote each once. */
const quotedKeys = new Map<string, string>();
function quoteKey(key: string): string {
  let quoted = quotedKeys.get(key);
  if (quoted === undefined) {
    quoted = JSON.stringify(key);
    if (quotedKeys.size < 256) quotedKeys.set(key, quoted);
  }
  return quoted;
}

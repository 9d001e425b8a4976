/**
 * Strict JSON reader for section files. Unlike JSON.parse it reports where a syntax error is (line and column),
 * refuses keys that could reach an object prototype, duplicate keys and runaway nesting, and names the place
 * in the document for each.
 */

import { documentError, formatPath } from './errors.ts';

/** Deepest nesting accepted. A valid file is 7 levels deep (variants[].section.islands[].outline.edges[].via[][]). */
export const MAX_JSON_DEPTH = 32;

/** Keys that name or reach an object's prototype; a section file never needs them. */
const HOSTILE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

const LITERALS = [['true', true], ['false', false], ['null', null]] as const;
/** A JSON number, matched where it starts (sticky). */
const NUMBER = /-?(?:0|[1-9][0-9]*)(?:\.[0-9]+)?(?:[eE][+-]?[0-9]+)?/y;
/** Characters that cannot follow a complete number. */
const NUMBER_TAIL = new Set([...'0123456789.eE+-']);

const ESCAPES: Record<string, string> = { '"': '"', '\\': '\\', '/': '/', b: '\b', f: '\f', n: '\n', r: '\r', t: '\t' };

/** Parse `text` as one JSON value; throws DocumentError. A leading byte-order mark is skipped. */
export function readJson(text: string): unknown {
  const reader = new JsonReader(text);
  return reader.document();
}

class JsonReader {
  private pos: number;
  private readonly path: (string | number)[] = [];

  constructor(private readonly text: string) {
    this.pos = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  }

  document(): unknown {
    this.skipSpace();
    if (this.pos >= this.text.length) throw documentError('', 'the file is empty');
    const value = this.value(0);
    this.skipSpace();
    if (this.pos < this.text.length) this.fail('unexpected text after the end of the document');
    return value;
  }

  private value(depth: number): unknown {
    if (depth > MAX_JSON_DEPTH) {
      throw documentError(formatPath(this.path), `nested more than ${MAX_JSON_DEPTH} levels deep; a section file is never that deep`);
    }
    const c = this.text[this.pos];
    if (c === '{') return this.object(depth);
    if (c === '[') return this.array(depth);
    if (c === '"') return this.string();
    if (c === '-' || (c >= '0' && c <= '9')) return this.number();
    for (const [word, v] of LITERALS) {
      if (this.text.startsWith(word, this.pos)) {
        this.pos += word.length;
        return v;
      }
    }
    return this.fail(c === undefined ? 'the text ends where a value should be (is the file cut short?)' : `expected a value, found ${quoteChar(c)}`);
  }

  private object(depth: number): Record<string, unknown> {
    const out: Record<string, unknown> = {};
    this.pos++; // '{'
    this.skipSpace();
    if (this.eat('}')) return out;
    for (;;) {
      if (this.text[this.pos] !== '"') this.fail('expected a field name in double quotes');
      const key = this.string();
      if (HOSTILE_KEYS.has(key)) {
        throw documentError(formatPath([...this.path, key]), `the field name "${key}" is not allowed in a section file`);
      }
      if (Object.prototype.hasOwnProperty.call(out, key)) throw documentError(formatPath([...this.path, key]), 'appears twice in the same object');
      this.skipSpace();
      if (!this.eat(':')) this.fail(`expected ':' after the field name "${key}"`);
      this.skipSpace();
      this.path.push(key);
      out[key] = this.value(depth + 1);
      this.path.pop();
      this.skipSpace();
      if (this.eat('}')) return out;
      if (!this.eat(',')) this.fail("expected ',' or '}' after a field");
      this.skipSpace();
    }
  }

  private array(depth: number): unknown[] {
    const out: unknown[] = [];
    this.pos++; // '['
    this.skipSpace();
    if (this.eat(']')) return out;
    for (;;) {
      this.path.push(out.length);
      out.push(this.value(depth + 1));
      this.path.pop();
      this.skipSpace();
      if (this.eat(']')) return out;
      if (!this.eat(',')) this.fail("expected ',' or ']' after a list item");
      this.skipSpace();
    }
  }

  private string(): string {
    const text = this.text;
    let pos = this.pos + 1;
    let out = '';
    let runStart = pos;
    for (;;) {
      const code = text.charCodeAt(pos);
      if (Number.isNaN(code)) {
        this.pos = pos;
        this.fail('the text ends inside a string (is the file cut short?)');
      }
      if (code === 0x22) break; // closing quote
      if (code < 0x20) {
        this.pos = pos;
        this.fail('a line break or control character inside a string must be escaped');
      }
      if (code === 0x5c) {
        out += text.slice(runStart, pos);
        pos = this.escape(pos, (s) => (out += s));
        runStart = pos;
      } else pos++;
    }
    out += text.slice(runStart, pos);
    this.pos = pos + 1;
    return out;
  }

  /** Decodes the escape at `pos` (a backslash), hands it to `emit`, returns the position after it. */
  private escape(pos: number, emit: (s: string) => void): number {
    const c = this.text[pos + 1];
    if (c === 'u') {
      const hex = this.text.slice(pos + 2, pos + 6);
      if (!/^[0-9a-fA-F]{4}$/.test(hex)) {
        this.pos = pos;
        this.fail('a \\u escape needs four hexadecimal digits');
      }
      emit(String.fromCharCode(parseInt(hex, 16)));
      return pos + 6;
    }
    const plain = c === undefined ? undefined : ESCAPES[c];
    if (plain === undefined) {
      this.pos = pos;
      this.fail(`unknown escape \\${c ?? ''} in a string`);
    }
    emit(plain);
    return pos + 2;
  }

  private number(): number {
    NUMBER.lastIndex = this.pos;
    const found = NUMBER.exec(this.text);
    if (found === null) this.fail('a number is malformed');
    this.pos += found[0].length;
    // "1.5.2", "01" or "1e" would otherwise read as a number followed by junk; name the number instead.
    if (NUMBER_TAIL.has(this.text[this.pos])) this.fail('a number is malformed');
    return Number(found[0]);
  }

  private skipSpace(): void {
    const text = this.text;
    let pos = this.pos;
    for (;;) {
      const code = text.charCodeAt(pos);
      if (code === 0x20 || code === 0x0a || code === 0x0d || code === 0x09) pos++;
      else break;
    }
    this.pos = pos;
  }

  private eat(c: string): boolean {
    if (this.text[this.pos] !== c) return false;
    this.pos++;
    return true;
  }

  private fail(what: string): never {
    const { line, column } = lineAndColumn(this.text, this.pos);
    const inside = this.path.length > 0 ? ` (inside ${formatPath(this.path)})` : '';
    throw documentError('', `not valid JSON at line ${line}, column ${column}${inside}: ${what}`);
  }
}

/** 1-based line and column (in characters) of `pos`. */
export function lineAndColumn(text: string, pos: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = text.indexOf('\n'); i !== -1 && i < pos; i = text.indexOf('\n', i + 1)) {
    line++;
    lineStart = i + 1;
  }
  return { line, column: pos - lineStart + 1 };
}

function quoteChar(c: string): string {
  return c === "'" ? '"\'"' : `'${c}'`;
}

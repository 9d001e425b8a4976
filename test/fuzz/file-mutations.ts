/** Ways to damage a section file for the loader fuzz: byte-level damage to its text and JSON-level changes to its tree. */

import fc from 'fast-check';

export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** One mutation step: which operator, and three free choices it reads as it likes (shrinkable naturals). */
export interface Step {
  readonly op: number;
  readonly a: number;
  readonly b: number;
  readonly c: number;
}

export const stepArb: fc.Arbitrary<Step> = fc.record({
  op: fc.nat({ max: 1000 }), a: fc.nat({ max: 1_000_000 }), b: fc.nat({ max: 1_000_000 }), c: fc.nat({ max: 1_000_000 }),
});

const pick = <T>(options: readonly T[], n: number): T => options[n % options.length];

/** Text placed verbatim in the written file where its marker string stands (tokens JSON.stringify cannot write). */
class RawText {
  private readonly pieces: string[] = [];
  /** A string to put in the tree; `write` swaps it, quotes included, for `text`. */
  marker(text: string): string {
    this.pieces.push(text);
    return `@@RAW${this.pieces.length - 1}@@`;
  }
  write(tree: Json, indent: number): string {
    let out = JSON.stringify(tree, null, indent);
    this.pieces.forEach((text, k) => {
      out = out.split(`"@@RAW${k}@@"`).join(text);
    });
    return out;
  }
}

export interface Place {
  readonly parent: Json[] | { [key: string]: Json };
  readonly key: string | number;
  readonly value: Json;
}

/** Every place below the root, depth first. */
export function places(value: Json, out: Place[] = []): Place[] {
  if (value === null || typeof value !== 'object') return out;
  const entries: [string | number, Json][] = Array.isArray(value) ? value.map((v, i) => [i, v]) : Object.entries(value);
  for (const [key, child] of entries) {
    out.push({ parent: value, key, value: child });
    places(child, out);
  }
  return out;
}

function objectsIn(root: Json): { [key: string]: Json }[] {
  const all = [root, ...places(root).map((p) => p.value)];
  return all.filter((v): v is { [key: string]: Json } => v !== null && typeof v === 'object' && !Array.isArray(v));
}

const set = (p: Place, value: Json): void => {
  (p.parent as Record<string | number, Json>)[p.key] = value;
};

const OTHER_TYPES: Json[] = ['abc', '', '12', 0, -1, 7.5, true, false, null, {}, [], [1, 2], { a: 1 }, [[0, 0]]];
const HUGE_NUMBERS = ['1e308', '-1e308', '5e-324', '-0', '1e21', '9007199254740993', '123456789012345678901234567890', '1e999', '-1e999', '0.1e-400'];
const NAN_STRINGS: Json[] = ['NaN', 'Infinity', '-Infinity', '1e999', '0x1F', ' 7', '7mm', '', 'null', '4,5', '١٢'];
const BAD_TOKENS = ['NaN', 'Infinity', '-Infinity', 'undefined', '0x1F', '+1', '.5', '1.', '01', '1e', "'a'", 'True', 'nul'];
const UNICODE = [
  '😀🚀', 'e\u0301\u0301', '\ud800', '\udfff lone', '\u202eevil', 'a\u200db', '\u0000nul', '\ufeffbom', 'line\u2028sep',
  'x'.repeat(10_000), '<script>alert(1)</script>', 'ﬃ', '𝔘𝔫𝔦𝔠𝔬𝔡𝔢', '\u0007bell', 'tab\tin', '   ',
];
const PROTO_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'valueOf', '__defineGetter__', 'isPrototypeOf'];

/** JSON-level operators: each changes the tree in place (and may register raw text). */
const TREE_OPS: ((root: Json, raw: RawText, s: Step) => void)[] = [
  // A value of another type anywhere.
  (root, _raw, s) => withPlace(root, s.a, (p) => set(p, pick(OTHER_TYPES, s.b))),
  // A number far out of range, too precise, or overflowing to Infinity as written.
  (root, raw, s) => withPlace(root, s.a, (p) => set(p, raw.marker(pick(HUGE_NUMBERS, s.b))), (v) => typeof v === 'number'),
  // A number spelt as a NaN-like string, or a token JSON does not have.
  (root, raw, s) => withPlace(root, s.a, (p) => set(p, s.c % 2 === 0 ? pick(NAN_STRINGS, s.b) : raw.marker(pick(BAD_TOKENS, s.b)))),
  // Nesting from a few levels to far beyond any stack.
  (root, raw, s) => withPlace(root, s.a, (p) => {
    const depth = pick([2, 8, 31, 33, 40, 200, 5000, 100_000], s.b);
    const [open, close] = s.c % 2 === 0 ? ['[', ']'] : ['{"a":', '}'];
    set(p, raw.marker(`${open.repeat(depth)}1${close.repeat(depth)}`));
  }),
  // Unicode of every awkward kind in a string, or in place of one.
  (root, _raw, s) => withPlace(root, s.a, (p) => set(p, s.c % 2 === 0 ? pick(UNICODE, s.b) : `${p.value as string}${pick(UNICODE, s.b)}`), (v) => typeof v === 'string'),
  // A key given twice in one object, the second with another value or the same one.
  (root, raw, s) => {
    const objects = objectsIn(root).filter((o) => Object.keys(o).length > 0);
    const o = pick(objects, s.a), key = pick(Object.keys(o), s.b);
    o[raw.marker(JSON.stringify(key))] = s.c % 2 === 0 ? o[key] : pick(OTHER_TYPES, s.c);
  },
  // A key that names or reaches a prototype.
  (root, _raw, s) => {
    const o = pick(objectsIn(root), s.a);
    Object.defineProperty(o, pick(PROTO_KEYS, s.b), { value: pick(OTHER_TYPES, s.c), enumerable: true, configurable: true, writable: true });
  },
  // A field taken away.
  (root, _raw, s) => {
    const objects = objectsIn(root).filter((o) => Object.keys(o).length > 0);
    const o = pick(objects, s.a);
    delete o[pick(Object.keys(o), s.b)];
  },
  // A list item removed, copied, or the list emptied or reversed.
  (root, _raw, s) => withPlace(root, s.a, (p) => {
    const list = [...(p.value as Json[])];
    const at = list.length === 0 ? 0 : s.b % list.length;
    if (s.c % 4 === 0) list.splice(at, 1);
    else if (s.c % 4 === 1) list.splice(at, 0, ...list.slice(at, at + 1));
    else if (s.c % 4 === 2) list.length = 0;
    else list.reverse();
    set(p, list);
  }, (v) => Array.isArray(v)),
  // A plausible change that often keeps the file valid: a number nudged or scaled, a name changed.
  (root, _raw, s) => withPlace(root, s.a, (p) => {
    if (typeof p.value === 'number') set(p, pick([p.value + 0.5, p.value * 1.01, -p.value, 0, p.value + s.c / 1000], s.b));
    else set(p, `${p.value as string} ${s.c % 100}`);
  }, (v) => typeof v === 'number' || typeof v === 'string'),
  // The version or units or grid detail set to a neighbouring or nonsense value.
  (root, _raw, s) => {
    const o = root as { [key: string]: Json };
    const field = pick(['version', 'units', 'format', 'activeVariant'], s.a);
    o[field] = pick([0, 1, 2, 3, 4, 5, -1, 2.5, 'mm', 'inch', 'portwright-section', 'base', 'tight short side'], s.b);
  },
];

/** Runs `change` on one place (among those whose value passes `filter`); does nothing when there is none. */
function withPlace(root: Json, n: number, change: (p: Place) => void, filter: (v: Json) => boolean = () => true): void {
  const all = places(root).filter((p) => filter(p.value));
  if (all.length > 0) change(pick(all, n));
}

/** Byte-level operators on the UTF-8 text. */
const BYTE_OPS: ((bytes: Uint8Array, s: Step) => Uint8Array)[] = [
  (bytes, s) => bytes.slice(0, s.a % (bytes.length + 1)),
  (bytes, s) => {
    const out = bytes.slice();
    for (let k = 0; k <= s.c % 4; k++) out[(s.a + k * 7919) % out.length] ^= 1 << ((s.b + k) % 8);
    return out;
  },
  (bytes, s) => splice(bytes, s.a % (bytes.length + 1), 0, Uint8Array.from({ length: 1 + (s.c % 8) }, (_, k) => (s.b * (k + 1) * 2654435761) >>> 24)),
  (bytes, s) => splice(bytes, s.a % (bytes.length + 1), 1 + (s.b % 64), new Uint8Array(0)),
  (bytes, s) => {
    const at = s.a % (bytes.length + 1);
    return splice(bytes, at, 0, bytes.slice(at, at + 1 + (s.b % 200)));
  },
  (bytes, s) => splice(bytes, s.a % (bytes.length + 1), 0, pick(INSERTS, s.b)),
];

const encoder = new TextEncoder();
const INSERTS = ['\ufeff', '\u0000', '\r\n', '}', ']', '"', ',', '\\', '\\u12', '// note\n', '\ud800', '\x89PNG\r\n\x1a\n'].map((s) => encoder.encode(s));

function splice(bytes: Uint8Array, at: number, remove: number, insert: Uint8Array): Uint8Array {
  const out = new Uint8Array(bytes.length - Math.min(remove, bytes.length - at) + insert.length);
  out.set(bytes.subarray(0, at));
  out.set(insert, at);
  out.set(bytes.subarray(Math.min(bytes.length, at + remove)), at + insert.length);
  return out;
}

/** How many operators there are of each level, for counting what the fuzz covered. */
export const OPERATOR_COUNT = { tree: TREE_OPS.length, byte: BYTE_OPS.length } as const;

/** A damaged copy of `text`: the JSON steps applied to its tree, then the file written, then the byte steps. */
export function damage(text: string, treeSteps: readonly Step[], byteSteps: readonly Step[], indent: number): string {
  const root = JSON.parse(text) as Json;
  const raw = new RawText();
  for (const s of treeSteps) TREE_OPS[s.op % TREE_OPS.length](root, raw, s);
  let bytes: Uint8Array = encoder.encode(raw.write(root, indent));
  for (const s of byteSteps) if (bytes.length > 0) bytes = BYTE_OPS[s.op % BYTE_OPS.length](bytes, s);
  return new TextDecoder('utf-8', { fatal: false, ignoreBOM: true }).decode(bytes);
}

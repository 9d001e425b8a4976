/** Ways to break a valid section file for the fuzz tests; each says which place in the file the error must name. */

import fc from 'fast-check';
import { formatPath } from '../../src/document/errors.ts';
import { BENCH_BOUNDS, type BenchBound } from '../../src/document/limits.ts';

export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
export type Path = (string | number)[];

/** A broken file and a substring (or pattern) its error message must contain. */
export interface Mutant {
  readonly text: string;
  readonly expected: string | RegExp;
}

/** Every place below the root: its path and value. */
export function places(value: Json, path: Path = []): { path: Path; value: Json }[] {
  const out: { path: Path; value: Json }[] = [];
  const children: [string | number, Json][] = Array.isArray(value)
    ? value.map((v, i) => [i, v])
    : value !== null && typeof value === 'object' ? Object.entries(value) : [];
  for (const [key, child] of children) {
    const childPath = [...path, key];
    out.push({ path: childPath, value: child }, ...places(child, childPath));
  }
  return out;
}

export function getAt(root: Json, path: Path): Json {
  return path.reduce<Json>((v, key) => (v as Record<string | number, Json>)[key], root);
}

export function setAt(root: Json, path: Path, value: Json): void {
  const parent = getAt(root, path.slice(0, -1)) as Record<string | number, Json>;
  parent[path[path.length - 1]] = value;
}

/** Fields the schema lets a file leave out. */
const OPTIONAL = new Set([
  'filletRadius', 'wallName', 'note', 'anchor', 'parts', 'valve', 'seat', 'bore', 'port', 'bench', ...Object.keys(BENCH_BOUNDS),
  'humidityModel', 'referenceArea', 'flowScale', 'obstructions',
]);

/** Whether a file may leave out the field at `path`: "width" is optional on a variant, required in a width station. */
function isOptional(path: Path): boolean {
  const key = path[path.length - 1];
  if (key === 'width') return path.length === 3 && path[0] === 'variants';
  return typeof key === 'string' && OPTIONAL.has(key);
}

/** `path:` as the message writes it, so "variants[1]" does not match "variants[1].name". */
export const named = (path: Path): string => `${formatPath(path)}:`;

const typeOf = (v: Json): string => (v === null ? 'null' : Array.isArray(v) ? 'array' : typeof v);
const WRONG_VALUES: Json[] = ['abc', 7, true, null, {}, [], 'NaN', 'Infinity', '-Infinity', '1e999'];

/** The out-of-range value for a field, by its key; undefined when the key has no range. */
function outOfRange(path: Path, pick: number): Json | undefined {
  const key = path[path.length - 1];
  const parentKey = path[path.length - 2];
  const choose = <T>(options: T[]): T => options[pick % options.length];
  if (parentKey === 'at' || parentKey === 'through' || typeof parentKey === 'number') {
    if (typeof key === 'number' && path.length >= 2) return choose([100000.5, -100001, 1e300, -1e300]);
  }
  if (typeof key === 'string' && parentKey === 'bench' && Object.hasOwn(BENCH_BOUNDS, key)) {
    const bound: BenchBound = BENCH_BOUNDS[key as keyof typeof BENCH_BOUNDS];
    return choose([bound.aboveMin ? bound.min : bound.min - 1e-6, bound.max * 1.001 + 1e-9, -1e300]);
  }
  if (path.length >= 3 && path[path.length - 3] === 'stations' && (key === 'along' || key === 'width')) {
    return key === 'along' ? choose([-1, 1e6 + 1, -1e300]) : choose([0, -3, 100001]);
  }
  if (path.length >= 3 && path[path.length - 3] === 'obstructions') {
    if (key === 'diameter') return choose([0, -8, 100001]);
    if (key === 'from' || key === 'to') return choose([100000.5, -100001]);
  }
  switch (key) {
    case 'filletRadius': return choose([-1e-9, -4, 100001]);
    case 'name': case 'wallName': case 'activeVariant': return choose(['', '   ', 'x'.repeat(81), 'two\nlines', 'tab\there']);
    case 'title': return choose(['', 'y'.repeat(121), 'bell\u0007']);
    case 'note': return 'z'.repeat(4001);
    case 'units': return choose(['cm', 'MM', 'inches', '']);
    case 'role': return choose(['pipe', 'Wall', 'exit']);
    case 'kind': return choose(['spline', 'bezier', 'Line', '']);
    case 'gridDetail': return choose(['ultra', 'coarse']);
    case 'humidityModel': return choose(['dry', 'CIPM-2007', '']);
    case 'referenceArea': return choose(['valve', 'Curtain', 'head']);
    case 'flowScale': return choose(['port speed', 'ideal', '']);
    case 'version': return choose([0, -2, 1.5, 99]);
    case 'format': return choose(['portwright-drawing', 'Portwright-section', '']);
    default: return undefined;
  }
}

/** Deletes a required field. */
export function deleteField(doc: Json, pick: number): Mutant | undefined {
  const fields = places(doc).filter((p) => typeof p.path[p.path.length - 1] === 'string' && !isOptional(p.path));
  const { path } = fields[pick % fields.length];
  const parent = getAt(doc, path.slice(0, -1)) as Record<string, Json>;
  delete parent[path[path.length - 1] as string];
  return { text: JSON.stringify(doc), expected: `${named(path)} is missing` };
}

/** Puts a value of another JSON type (or a number spelt as a string) in any place. */
export function wrongType(doc: Json, pick: number, valuePick: number): Mutant | undefined {
  const all = places(doc);
  const { path, value } = all[pick % all.length];
  const candidates = WRONG_VALUES.filter((v) => typeOf(v) !== typeOf(value));
  setAt(doc, path, candidates[valuePick % candidates.length]);
  return { text: JSON.stringify(doc), expected: named(path) };
}

/** Puts a value of the right type but out of its range in a field that has one. */
export function outOfBounds(doc: Json, pick: number, valuePick: number): Mutant | undefined {
  const ranged = places(doc).filter((p) => outOfRange(p.path, 0) !== undefined);
  const { path } = ranged[pick % ranged.length];
  setAt(doc, path, outOfRange(path, valuePick) as Json);
  return { text: JSON.stringify(doc), expected: named(path) };
}

/** Cuts the text short anywhere. */
export function truncate(text: string, at: number): Mutant {
  const body = text.trimEnd();
  const cut = 1 + (at % (body.length - 1));
  return { text: body.slice(0, cut), expected: /^not valid JSON at line \d+, column \d+/ };
}

/** Adds a key that reaches a prototype to some object. */
export function hostileKey(doc: Json, pick: number, keyPick: number): Mutant {
  const objects = [{ path: [] as Path, value: doc }, ...places(doc)].filter((p) => typeOf(p.value) === 'object');
  const { path, value } = objects[pick % objects.length];
  const key = ['__proto__', 'constructor', 'prototype'][keyPick % 3];
  Object.defineProperty(value, key, { value: { polluted: true }, enumerable: true, configurable: true, writable: true });
  return { text: JSON.stringify(doc), expected: `${named([...path, key])} the field name "${key}" is not allowed` };
}

/** Adds a field the format does not have (e.g. a misspelling) to some object. */
export function unknownField(doc: Json, pick: number, keyPick: number): Mutant {
  const objects = [{ path: [] as Path, value: doc }, ...places(doc)].filter((p) => typeOf(p.value) === 'object');
  const { path, value } = objects[pick % objects.length];
  const key = ['filetRadius', 'colour', 'Units', 'x', 'wallname'][keyPick % 5];
  (value as Record<string, Json>)[key] = 1;
  return { text: JSON.stringify(doc), expected: `${named([...path, key])} is not a field` };
}

/** Nests arrays far deeper than any section file under some field. */
export function deepNest(doc: Json, pick: number, depth: number): Mutant {
  const all = places(doc);
  const { path } = all[pick % all.length];
  let nested: Json = 1;
  for (let i = 0; i < 40 + depth; i++) nested = [nested];
  setAt(doc, path, nested);
  return { text: JSON.stringify(doc), expected: formatPath(path) };
}

/** Replaces a number with a literal JSON reads as Infinity. */
export function overflowNumber(doc: Json, pick: number): Mutant | undefined {
  const numbers = places(doc).filter((p) => typeof p.value === 'number' && p.path[0] !== 'version');
  if (numbers.length === 0) return undefined;
  const { path } = numbers[pick % numbers.length];
  setAt(doc, path, 'OVERFLOW');
  return { text: JSON.stringify(doc).replace('"OVERFLOW"', '-1e999'), expected: `${named(path)} must be a number` };
}

/** Rules across fields: duplicate variant names, an active variant that does not exist, edge count, island roles. */
export function crossField(doc: Json, pick: number): Mutant {
  const d = doc as { variants: { name: string; section: { outline: { edges: Json[] }; islands: { outline: { edges: { role: string }[] } }[] } }[]; activeVariant: string };
  const v = pick % d.variants.length;
  switch (pick % 4) {
    case 0:
      d.variants.push(JSON.parse(JSON.stringify(d.variants[v])));
      return { text: JSON.stringify(doc), expected: `${named(['variants', d.variants.length - 1, 'name'])} "` };
    case 1:
      d.activeVariant = `${d.activeVariant} (old)`;
      return { text: JSON.stringify(doc), expected: 'activeVariant: must name one of the variants' };
    case 2:
      d.variants[v].section.outline.edges.push(d.variants[v].section.outline.edges[0]);
      return { text: JSON.stringify(doc), expected: `${named(['variants', v, 'section', 'outline', 'edges'])} must hold one edge per vertex` };
    default: {
      const islands = d.variants[v].section.islands;
      if (islands.length === 0) return crossField(doc, pick + 1);
      islands[0].outline.edges[0].role = 'inlet';
      return { text: JSON.stringify(doc), expected: `${named(['variants', v, 'section', 'islands', 0, 'outline', 'edges', 0, 'role'])} must be "wall"` };
    }
  }
}

/** Lists one longer than allowed. */
export function hugeArray(doc: Json, which: number): Mutant {
  const d = doc as { variants: { name: string; section: { outline: { vertices: Json[]; edges: Json[] } } }[] };
  const outline = d.variants[0].section.outline;
  switch (which % 3) {
    case 0:
      outline.vertices = Array.from({ length: 20001 }, (_, i) => ({ at: [i, i % 7] }));
      outline.edges = Array.from({ length: 20001 }, () => ({ kind: 'line', role: 'wall' }));
      return { text: JSON.stringify(doc), expected: 'variants[0].section.outline.vertices: must be a list of 3 to 20000 vertices (got a list of 20001 items)' };
    case 1:
      outline.edges[0] = { kind: 'curve', role: 'wall', via: Array.from({ length: 201 }, (_, i) => [i, 0]) };
      return { text: JSON.stringify(doc), expected: 'variants[0].section.outline.edges[0].via: must be a list of 0 to 200 points' };
    default:
      d.variants = Array.from({ length: 101 }, (_, i) => ({ ...d.variants[0], name: `copy ${i}` }));
      return { text: JSON.stringify(doc), expected: 'variants: must be a list of 1 to 100 variants (got a list of 101 items)' };
  }
}

export const pickArb = fc.nat({ max: 1_000_000 });

/**
 * Documents of every format version for the migration fuzz: the samples and fixtures grouped by the version they are
 * written in, and plausible changes to them that know nothing of any one version's fields (so a version added later
 * is covered as soon as a file of the version before it is among the fixtures).
 */

import { readdirSync, readFileSync } from 'node:fs';
import fc from 'fast-check';
import { places as allPlaces, type Json, type Place } from './file-mutations.ts';

/** Every sample and fixture, parsed, by the format version it says it is in. */
export function filesByVersion(): Map<number, Json[]> {
  const byVersion = new Map<number, Json[]>();
  for (const dir of ['../../samples/', '../fixtures/']) {
    const url = new URL(dir, import.meta.url);
    for (const name of readdirSync(url).filter((n) => n.endsWith('.json'))) {
      const doc = JSON.parse(readFileSync(new URL(name, url), 'utf8')) as { version?: unknown };
      if (typeof doc.version !== 'number') continue;
      byVersion.set(doc.version, [...(byVersion.get(doc.version) ?? []), doc as Json]);
    }
  }
  return byVersion;
}

type JsonObject = { [key: string]: Json };

/** Every place below the root but the format and version, which say which schema applies (changing them is the loader fuzz's business). */
function places(value: Json): Place[] {
  return allPlaces(value).filter((place) => place.key !== 'format' && place.key !== 'version');
}

/** Names and labels a porter might type, beside those already in the files. */
const LABELS: readonly string[] = ['ported', 'stock', 'base', 'bowl', 'short side', 'Ünïcødé bowl 🚀', 'a'.repeat(60), '  spaced  ', 'variant 2'];

/** One plausible change: which kind, and free choices (uniform, so no one place is favoured). */
export interface Change {
  readonly kind: number;
  readonly at: number;
  readonly pick: number;
  /** -1..1 */
  readonly amount: number;
}

const uniform = (max: number): fc.Arbitrary<number> => fc.noBias(fc.integer({ min: 0, max }));

export const changeArb: fc.Arbitrary<Change> = fc.record({
  kind: uniform(99), at: uniform(1 << 20), pick: uniform(1 << 20), amount: uniform(2000).map((k) => k / 1000 - 1),
});

const pick = <T>(options: readonly T[], n: number): T => options[n % options.length];

/** Strings seen in the files under each key (names, titles, roles, kinds, units), to swap in for one another. */
export type StringsByKey = ReadonlyMap<string, readonly string[]>;

/** Applies `change` in place: a number nudged, a string swapped for one seen under the same key, a list item or field. */
export function applyChange(root: Json, change: Change, strings: StringsByKey): void {
  const all = places(root);
  // Mostly changes that keep the file valid (numbers and names); a list item or a field now and then.
  const kind = [0, 0, 0, 0, 1, 1, 2, 2, 3, 3, 4, 5][change.kind % 12];
  const of = (filter: (p: Place) => boolean): Place | undefined => {
    const found = all.filter(filter);
    return found.length === 0 ? undefined : pick(found, change.at);
  };
  const set = (p: Place, value: Json): void => {
    (p.parent as Record<string | number, Json>)[p.key] = value;
  };
  if (kind <= 1) {
    const p = of((q) => typeof q.value === 'number');
    if (p) set(p, kind === 0 ? (p.value as number) * (1 + 0.2 * change.amount) : (p.value as number) + change.amount);
  } else if (kind <= 3) {
    const p = of((q) => typeof q.value === 'string');
    if (p) set(p, pick(strings.get(String(p.key)) ?? LABELS, change.pick));
  } else if (kind === 4) {
    // A list item copied or dropped (two variants of one name, or an outline one corner short, must then be refused).
    const p = of((q) => Array.isArray(q.value) && q.value.length > 0);
    if (!p) return;
    const list = [...(p.value as Json[])];
    const k = change.pick % list.length;
    if (change.amount >= 0) list.splice(k, 0, structuredClone(list[k])); else list.splice(k, 1);
    set(p, list);
  } else {
    const p = of((q) => !Array.isArray(q.parent));
    if (p) delete (p.parent as JsonObject)[p.key as string];
  }
}

/** Keys whose strings are names a porter types: any label may stand there. */
const TYPED = new Set(['name', 'wallName', 'title', 'note', 'activeVariant']);

/** Every string value in the files, by the key it is under; typed names also get the labels above. */
export function stringsByKey(files: readonly Json[]): StringsByKey {
  const seen = new Map<string, Set<string>>();
  for (const f of files) {
    for (const p of places(f)) {
      if (typeof p.value !== 'string') continue;
      const key = String(p.key);
      if (!seen.has(key)) seen.set(key, new Set(TYPED.has(key) ? LABELS : []));
      seen.get(key)!.add(p.value);
    }
  }
  return new Map([...seen].map(([key, values]) => [key, [...values]]));
}

/**
 * Migration fuzz: generated documents of every older format version load to the current version, equal to loading
 * their form after each migration step, and saving and loading again changes nothing.
 */

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DocumentError } from '../../src/document/errors.ts';
import { loadDocument, readDocument, saveDocument } from '../../src/document/load.ts';
import { MIGRATIONS } from '../../src/document/migrations.ts';
import { FORMAT_VERSION } from '../../src/document/types.ts';
import { MIGRATION_RUNS, SEEDS } from './counts.ts';
import { applyChange, changeArb, filesByVersion, stringsByKey } from './older-documents.ts';
import type { Json } from './file-mutations.ts';

const BY_VERSION = filesByVersion();
const STRINGS = stringsByKey([...BY_VERSION.values()].flat());
/** Every version a migration starts from, with the files written in it. */
const OLDER = MIGRATIONS.map((m) => ({ version: m.from, files: BY_VERSION.get(m.from) ?? [] }));

/** The document after each migration step from its own version up, as the JSON text each step's output writes to. */
function stepwise(doc: Json, fromVersion: number): string[] {
  const texts: string[] = [];
  let current: unknown = doc;
  for (const migration of MIGRATIONS.filter((m) => m.from >= fromVersion)) {
    current = migration.up(migration.schema.parse(current) as never);
    texts.push(JSON.stringify(current));
  }
  return texts;
}

describe(`migration fuzz: ${MIGRATION_RUNS} generated documents of the older format versions`, () => {
  it('has a file of every older version to start from (add a fixture of the old version with each new one)', () => {
    expect(MIGRATIONS.map((m) => m.from)).toEqual(Array.from({ length: FORMAT_VERSION - 1 }, (_, i) => i + 1));
    for (const { version, files } of OLDER) expect(files.length, `files in format version ${version}`).toBeGreaterThan(0);
  });

  it('loads each to the current version, equal to loading it after any number of migration steps, and saves to a fixed point', () => {
    const seen = { migrated: 0, refused: 0 };
    const perVersion = new Map<number, number>();
    const cases = fc.record({
      older: fc.nat({ max: OLDER.length - 1 }), file: fc.nat(), changes: fc.array(changeArb, { minLength: 1, maxLength: 3 }),
    });
    fc.assert(fc.property(cases, ({ older, file, changes }) => {
      const { version, files } = OLDER[older];
      const doc = structuredClone(files[file % files.length]);
      for (const change of changes) applyChange(doc, change, STRINGS);
      const text = JSON.stringify(doc);
      // A change its own version's schema refuses must be refused by the loader too, plainly.
      if (!MIGRATIONS[version - 1].schema.safeParse(doc).success) {
        expect(() => loadDocument(text)).toThrow(DocumentError);
        seen.refused++;
        return;
      }
      const { document, fileVersion } = readDocument(text);
      expect(fileVersion).toBe(version);
      expect(document.version).toBe(FORMAT_VERSION);
      for (const stepped of stepwise(doc, version)) expect(loadDocument(stepped)).toStrictEqual(document);
      const saved = saveDocument(document);
      expect(loadDocument(saved)).toStrictEqual(document);
      expect(saveDocument(loadDocument(saved))).toBe(saved);
      seen.migrated++;
      perVersion.set(version, (perVersion.get(version) ?? 0) + 1);
    }), { seed: SEEDS.migrations, numRuns: MIGRATION_RUNS });
    expect(seen.migrated + seen.refused).toBe(MIGRATION_RUNS);
    for (const { version } of OLDER) expect(perVersion.get(version) ?? 0, `version ${version} migrated`).toBeGreaterThan(MIGRATION_RUNS / (4 * OLDER.length));
    console.info(`migration fuzz: ${MIGRATION_RUNS} cases, ${seen.migrated} migrated (${[...perVersion].map(([v, n]) => `${n} from v${v}`).join(', ')}), ${seen.refused} refused by their own version's schema`);
  });
});

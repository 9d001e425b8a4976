/** Reading and writing section files: text in, a whole valid current-version document out, or a DocumentError. */

import type { z } from 'zod';
import { FORMAT_NAME, FORMAT_VERSION, type PortDocument } from './types.ts';
import { DocumentError, documentError } from './errors.ts';
import { MAX_FILE_BYTES, formatMegabytes, utf8Length } from './limits.ts';
import { readJson } from './json-read.ts';
import { writeJson } from './json-write.ts';
import { documentSchema } from './schema.ts';
import { MIGRATIONS } from './migrations.ts';
import { describeValue, problemsFromIssues } from './issues.ts';

/** A loaded document and the format version its file was written in. */
export interface ReadResult {
  readonly document: PortDocument;
  /** Version found in the file; below FORMAT_VERSION means it was migrated and saving will upgrade it. */
  readonly fileVersion: number;
}

/** Parses a section file of any known version into a current document. Throws DocumentError, nothing else. */
export function loadDocument(text: string): PortDocument {
  return readDocument(text).document;
}

/** As loadDocument, and also says which format version the file was in. */
export function readDocument(text: string): ReadResult {
  if (typeof text !== 'string') throw documentError('', 'the file is not text');
  checkSize(text);
  const raw = readJson(text);
  const record = expectSectionFile(raw);
  const fileVersion = expectKnownVersion(record.version);
  let doc: unknown = record;
  for (const migration of MIGRATIONS) {
    if (migration.from < fileVersion) continue;
    // Check at the file's own version, so a problem is named by the paths in the file as written.
    const checked = validate(migration.schema, doc, '');
    doc = migration.up(checked as never);
  }
  const note = fileVersion < FORMAT_VERSION ? ` (after upgrading the file from format version ${fileVersion})` : '';
  return { document: validate(documentSchema, doc, note) as PortDocument, fileVersion };
}

/** The document as stable pretty JSON (2-space indent, fixed key order). Throws DocumentError if it is not valid. */
export function saveDocument(doc: PortDocument): string {
  return writeJson(validate(documentSchema, doc, ''));
}

/** Throws DocumentError when `doc` is not a valid current-version document (the check Save makes), without writing it. */
export function checkDocumentShape(doc: PortDocument): void {
  validate(documentSchema, doc, '');
}

function checkSize(text: string): void {
  // Characters never outnumber UTF-8 bytes, so the cheap length test settles most huge inputs at once.
  const bytes = text.length > MAX_FILE_BYTES ? text.length : utf8Length(text);
  if (bytes > MAX_FILE_BYTES) {
    throw documentError('', `the file is too big (${formatMegabytes(bytes)}); a section file is at most ${formatMegabytes(MAX_FILE_BYTES)}`);
  }
}

function expectSectionFile(raw: unknown): Record<string, unknown> {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw documentError('', `this is not a Portwright section file: it holds ${describeValue(raw)}, not a section document`);
  }
  const record = raw as Record<string, unknown>;
  if (!('format' in record)) throw documentError('format', 'is missing: this is not a Portwright section file');
  if (record.format !== FORMAT_NAME) {
    throw documentError('format', `this is not a Portwright section file (format is ${describeValue(record.format)}, a section file says "${FORMAT_NAME}")`);
  }
  return record;
}

function expectKnownVersion(version: unknown): number {
  if (version === undefined) throw documentError('version', 'is missing; it must be a whole number from 1 up');
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    throw documentError('version', `must be a whole number from 1 up (got ${describeValue(version)})`);
  }
  if (version > FORMAT_VERSION) {
    throw documentError(
      'version',
      `the file is in format version ${version}, written by a newer Portwright; this one reads versions 1 to ${FORMAT_VERSION}. Open it with a newer Portwright.`,
    );
  }
  return version;
}

function validate(schema: z.ZodType, value: unknown, note: string): unknown {
  const result = schema.safeParse(value, { reportInput: true });
  if (result.success) return result.data;
  const problems = problemsFromIssues(result.error.issues);
  throw new DocumentError(problems.map((p) => ({ path: p.path, problem: p.problem + note })));
}

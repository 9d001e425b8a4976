/** Reads a section file from disk for a command, turning every file-system or file-format failure into a plain UserError. */

import { closeSync, openSync, readSync, statSync } from 'node:fs';
import { DocumentError } from '../document/errors.ts';
import { readDocument, type ReadResult } from '../document/load.ts';
import { MAX_FILE_BYTES, formatMegabytes } from '../document/limits.ts';
import { UserError } from './errors.ts';

/** The document in `path` and its file's format version; a file that cannot be read is a UserError naming `path`. */
export function readSectionFile(path: string): ReadResult {
  const text = readSectionText(path);
  try {
    return readDocument(text);
  } catch (error) {
    if (!(error instanceof DocumentError)) throw error;
    throw new UserError(`${path}: the file cannot be used:\n${error.message.split('\n').map((line) => `  ${line}`).join('\n')}`);
  }
}

/**
 * The text of `path` (UTF-8). Refuses folders and files too big to be a section: by their size before reading, and
 * by what arrives while reading (a device, a pipe or a file still growing says nothing true in its size).
 */
function readSectionText(path: string): string {
  try {
    const stat = statSync(path);
    if (stat.isDirectory()) throw new UserError(`${path} is a folder, not a section file`);
    if (stat.size > MAX_FILE_BYTES) throw tooBig(path, formatMegabytes(stat.size));
    return readCapped(path);
  } catch (error) {
    if (error instanceof UserError) throw error;
    throw new UserError(`cannot read ${path}: ${fileProblem(error)}`);
  }
}

/** Reads at most MAX_FILE_BYTES; one byte more and the file is refused. */
function readCapped(path: string): string {
  const buffer = Buffer.alloc(MAX_FILE_BYTES + 1);
  const fd = openSync(path, 'r');
  try {
    let length = 0;
    for (let got = 1; got > 0 && length < buffer.length; length += got) got = readSync(fd, buffer, length, buffer.length - length, null);
    if (length > MAX_FILE_BYTES) throw tooBig(path, `more than ${formatMegabytes(MAX_FILE_BYTES)}`);
    return buffer.toString('utf8', 0, length);
  } finally {
    closeSync(fd);
  }
}

function tooBig(path: string, size: string): UserError {
  return new UserError(`${path} is too big (${size}); a section file is at most ${formatMegabytes(MAX_FILE_BYTES)}`);
}

function fileProblem(error: unknown): string {
  const code = (error as { code?: unknown }).code;
  if (code === 'ENOENT') return 'no such file';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  if (code === 'ENOTDIR') return 'a folder on the path is a file';
  return error instanceof Error ? error.message : String(error);
}

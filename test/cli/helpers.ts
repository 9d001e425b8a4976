/** Helpers for CLI tests: run the real bin in a child node process, or the command in-process with captured output. */

import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { CliIO } from '../../src/cli/command.ts';

export const REPO = fileURLToPath(new URL('../../', import.meta.url));
export const BIN = join(REPO, 'bin', 'portwright.js');

export interface Ran {
  readonly code: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs `node bin/portwright.js ...args` from the repository root. */
export function runBin(args: readonly string[], options: { cwd?: string; command?: string; prefix?: string[] } = {}): Ran {
  const result = spawnSync(options.command ?? process.execPath, [...(options.prefix ?? [BIN]), ...args], {
    cwd: options.cwd ?? REPO,
    encoding: 'utf8',
    timeout: 60_000,
  });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** An IO that collects lines. */
export function captureIO(): CliIO & { readonly stdout: string[]; readonly stderr: string[] } {
  const stdout: string[] = [], stderr: string[] = [];
  return { stdout, stderr, out: (line) => stdout.push(line), err: (line) => stderr.push(line) };
}

/** A temporary folder for the test's files; call the returned cleanup when done. */
export function tempDir(): { dir: string; write: (name: string, text: string) => string; cleanup: () => void } {
  const dir = mkdtempSync(join(tmpdir(), 'portwright-cli-'));
  return {
    dir,
    write: (name, text) => {
      const path = join(dir, name);
      writeFileSync(path, text);
      return path;
    },
    cleanup: () => rmSync(dir, { recursive: true, force: true }),
  };
}

/** A line of a JavaScript stack trace. */
export const STACK_LINE = /^\s+at .+[:(]/m;

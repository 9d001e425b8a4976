import { describe, expect, it } from 'vitest';
import { runWith } from '../../src/cli/main.ts';
import { UserError } from '../../src/cli/errors.ts';
import type { Command } from '../../src/cli/command.ts';
import { captureIO } from './helpers.ts';

const failing = (error: unknown): Command => ({ name: 'explode', args: '', summary: 'always fails', run: () => { throw error; } });

describe('command dispatch and exit codes', () => {
  it('maps a fault to exit 2 with a short line and the stack', async () => {
    const io = captureIO();
    expect(await runWith([failing(new RangeError('index out of range'))], ['explode'], io)).toBe(2);
    expect(io.stderr[0]).toBe('portwright explode: internal error (a fault in Portwright, not in your file): RangeError: index out of range');
    expect(io.stderr[1]).toMatch(/^RangeError: index out of range\n\s+at /);
  });

  it('maps a UserError to exit 1 with its message only', async () => {
    const io = captureIO();
    expect(await runWith([failing(new UserError('no lift given'))], ['explode'], io)).toBe(1);
    expect(io.stderr).toEqual(['portwright explode: no lift given']);
  });

  it('passes the exit code a command returns and its arguments', async () => {
    const seen: string[][] = [];
    const echo: Command = { name: 'echo', args: 'WORDS', summary: 'echo', run: (args) => (seen.push([...args]), 0) };
    expect(await runWith([echo], ['echo', 'a', 'b'], captureIO())).toBe(0);
    expect(seen).toEqual([['a', 'b']]);
  });

  it('shows the usage on stderr with exit 1 when no command is given', async () => {
    const io = captureIO();
    expect(await runWith([failing(0)], [], io)).toBe(1);
    expect(io.stderr.join('\n')).toContain('usage: portwright COMMAND [ARGUMENTS]');
    expect(io.stderr.join('\n')).toContain('explode   always fails');
  });
});

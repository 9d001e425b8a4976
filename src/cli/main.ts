/** Entry of the headless portwright command: picks the subcommand, runs it, and maps failures to exit codes. */

import { GeometryError } from '../geometry/index.ts';
import { EXIT_INTERNAL_ERROR, EXIT_OK, EXIT_USER_ERROR, type CliIO, type Command } from './command.ts';
import { UserError } from './errors.ts';
import { checkCommand } from './check.ts';
import { solveCommand } from './solve.ts';

/** Every subcommand; a new one (e.g. solve) is one file and one entry here. */
const COMMANDS: readonly Command[] = [checkCommand, solveCommand];

const HELP_FLAGS = new Set(['-h', '--help', 'help']);

const consoleIO: CliIO = {
  out: (line) => process.stdout.write(`${line}\n`),
  err: (line) => process.stderr.write(`${line}\n`),
};

/** Runs the command line `argv` (without node and the script) and returns the exit code. Never throws. */
export function run(argv: readonly string[], io: CliIO = consoleIO): Promise<number> {
  return runWith(COMMANDS, argv, io);
}

/** As run, choosing from `commands`. */
export async function runWith(commands: readonly Command[], argv: readonly string[], io: CliIO): Promise<number> {
  const [name, ...args] = argv;
  if (name === undefined) {
    usage(commands, io.err);
    return EXIT_USER_ERROR;
  }
  if (HELP_FLAGS.has(name)) {
    usage(commands, io.out);
    return EXIT_OK;
  }
  const command = commands.find((c) => c.name === name);
  if (command === undefined) {
    io.err(`portwright: unknown command "${name}"`);
    usage(commands, io.err);
    return EXIT_USER_ERROR;
  }
  if (args.some((arg) => HELP_FLAGS.has(arg))) {
    io.out(`usage: portwright ${command.name} ${command.args}`);
    io.out(`  ${command.summary}`);
    return EXIT_OK;
  }
  return runCommand(command, args, io);
}

async function runCommand(command: Command, args: readonly string[], io: CliIO): Promise<number> {
  try {
    return await command.run(args, io);
  } catch (error) {
    if (error instanceof UserError || error instanceof GeometryError) {
      // One line a call, as CliIO asks: a file's problems come one per line after the first.
      const [first, ...more] = error.message.split('\n');
      io.err(`portwright ${command.name}: ${first}`);
      for (const line of more) io.err(line);
      return EXIT_USER_ERROR;
    }
    io.err(`portwright ${command.name}: internal error (a fault in Portwright, not in your file): ${String(error)}`);
    if (error instanceof Error && error.stack !== undefined) io.err(error.stack);
    return EXIT_INTERNAL_ERROR;
  }
}

function usage(commands: readonly Command[], write: (line: string) => void): void {
  write('Portwright: ideal-flow checks for cylinder-head port sections.');
  write('');
  write('usage: portwright COMMAND [ARGUMENTS]');
  write('       portwright COMMAND --help    how to use one command');
  write('');
  write('commands:');
  const width = Math.max(...commands.map((c) => `${c.name} ${c.args}`.length));
  for (const c of commands) write(`  ${`${c.name} ${c.args}`.padEnd(width)}  ${c.summary}`);
  write('');
  write('exit codes: 0 all good, 1 a problem you can fix (file, arguments), 2 a fault in Portwright');
}

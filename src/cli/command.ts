/** What a subcommand of the portwright command is: a name, a one-line summary and a run function. */

/** Where a command writes: `out` for results (stdout), `err` for problems (stderr). Each call writes one line. */
export interface CliIO {
  readonly out: (line: string) => void;
  readonly err: (line: string) => void;
}

/** Exit codes of the portwright command. */
export const EXIT_OK = 0;
/** The user can fix it: a missing file, bad JSON, a schema or geometry problem, a wrong argument. */
export const EXIT_USER_ERROR = 1;
/** A fault in Portwright itself. */
export const EXIT_INTERNAL_ERROR = 2;

export interface Command {
  readonly name: string;
  /** Arguments as shown in usage, e.g. "FILE". */
  readonly args: string;
  readonly summary: string;
  /** Runs with the arguments after the command name; returns the exit code or throws (UserError for exit 1). */
  readonly run: (args: readonly string[], io: CliIO) => Promise<number> | number;
}

#!/usr/bin/env node
// Launches the portwright command: loads the TypeScript entry (src/cli/main.ts) through tsx, runs it, sets the exit code.
import { tsImport } from 'tsx/esm/api';

try {
  const cli = await tsImport('../src/cli/main.ts', import.meta.url);
  process.exitCode = await cli.run(process.argv.slice(2));
} catch (error) {
  // Only a fault in Portwright itself gets here (the command maps user errors to exit 1).
  process.stderr.write(`portwright: internal error: ${error instanceof Error ? error.message : String(error)}\n`);
  if (error instanceof Error && error.stack) process.stderr.write(`${error.stack}\n`);
  process.exitCode = 2;
}

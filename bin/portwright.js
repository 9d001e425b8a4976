#!/usr/bin/env node
// Launches the portwright command: runs the compiled bundle (dist-cli/), rebuilding it first if a source changed.
import { pathToFileURL } from 'node:url';
import { bundlePath, ensureBundle } from './cli-build.js';

// A reader that stops early (`portwright solve FILE | head`) closes the pipe: end quietly, as other commands do.
process.stdout.on('error', (error) => {
  if (error.code === 'EPIPE') process.exit(0);
  throw error;
});

try {
  await rebuildIfNeeded();
  const cli = await import(pathToFileURL(bundlePath()).href);
  process.exitCode = await cli.run(process.argv.slice(2));
} catch (error) {
  // Only a fault in Portwright itself gets here (the command maps user errors to exit 1).
  process.stderr.write(`portwright: internal error: ${error instanceof Error ? error.message : String(error)}\n`);
  if (error instanceof Error && error.stack) process.stderr.write(`${error.stack}\n`);
  process.exitCode = 2;
}

/** A missing or stale bundle is rebuilt (esbuild, about half a second) and said so on stderr: stale code never runs. */
async function rebuildIfNeeded() {
  let built;
  try {
    built = await ensureBundle();
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    throw new Error(`the command is not built and could not be built (run npm install in the project folder): ${why}`);
  }
  if (built !== null) {
    const what = built.state === 'missing' ? 'was not built yet' : 'was older than its sources';
    process.stderr.write(`portwright: the command ${what}; rebuilt it in ${built.ms} ms\n`);
  }
}

/** Builds the headless command's bundle once, before any test file runs it, so parallel test files never race to build it. */
import { ensureBundle } from '../bin/cli-build.js';

export default async function setup(): Promise<void> {
  const built = await ensureBundle();
  if (built !== null) process.stdout.write(`portwright bundle ${built.state}: rebuilt in ${built.ms} ms for the tests\n`);
}

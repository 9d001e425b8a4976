/** Before any test file runs: builds the headless command's bundle once, and finds (or installs) the browser tests' chromium. */
import type { TestProject } from 'vitest/node';
import { ensureBundle } from '../bin/cli-build.js';
import { browserNeeded, cliFilters, prepareBrowser } from './chromium.ts';

export default async function setup(project: TestProject): Promise<void> {
  const built = await ensureBundle();
  if (built !== null) process.stdout.write(`portwright bundle ${built.state}: rebuilt in ${built.ms} ms for the tests\n`);
  // Only a run that includes browser tests needs chromium; `npx vitest run test/solver` runs without one.
  const { testFiles } = await project.globTestFiles(cliFilters(process.argv));
  if (!browserNeeded(testFiles)) return;
  try {
    prepareBrowser();
  } catch (error) {
    // One line naming the fix, not a stack trace, and before any test has started.
    process.stderr.write(`\n${(error as Error).message}\n\n`);
    process.exit(1);
  }
}

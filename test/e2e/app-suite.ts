/** One app session shared by a test file's checks: started before them, closed after them. */
import { afterAll, beforeAll } from 'vitest';
import { CHECK_MS, startApp, withApp, type AppPage, type AppSession } from './app-session.ts';

/** Call at the top of a test file; the function it returns runs a check on the app opened fresh in that session. */
export function appSuite(): (check: (app: AppPage) => Promise<void>) => Promise<void> {
  let session: AppSession | undefined;
  beforeAll(async () => {
    session = await startApp();
  }, CHECK_MS);
  afterAll(async () => {
    await session?.close();
  });
  return (check) => {
    if (!session) throw new Error('The app session did not start.');
    return withApp(session, check);
  };
}

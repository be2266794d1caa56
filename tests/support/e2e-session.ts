/**
 * One built app on a fresh database and one Chromium per end-to-end test file: started before the file's
 * tests, stopped after them. Use as `const e2e = useAppInBrowser();` then `e2e.app.baseUrl`,
 * `e2e.browser.context`.
 */
import { afterAll, beforeAll } from 'vitest';
import { startApp, type AppServer } from './app-server';
import { openBrowser } from './browser';

export interface E2eSession {
  app: AppServer;
  browser: Awaited<ReturnType<typeof openBrowser>>;
}

export function useAppInBrowser(): E2eSession {
  const session = {} as E2eSession;
  beforeAll(async () => {
    session.app = await startApp();
    session.browser = await openBrowser();
  });
  afterAll(async () => {
    await session.browser?.close();
    await session.app?.stop();
  });
  return session;
}

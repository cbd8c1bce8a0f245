import type { Browser } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { launchBrowser } from './browser';
import { startServer, type RunningServer } from './server';

export interface AppUnderTest {
  readonly server: RunningServer;
  readonly browser: Browser;
}

/**
 * Starts the built server on a fresh data folder and a chromium for the enclosing `describe`,
 * and stops both after it. Read the fields inside tests and hooks, once `beforeAll` has run.
 */
export function useAppUnderTest(options: Parameters<typeof startServer>[0] = {}): AppUnderTest {
  let server: RunningServer | undefined;
  let browser: Browser | undefined;
  beforeAll(async () => {
    server = await startServer(options);
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });
  return {
    get server() {
      if (!server) throw new Error('The server is not started yet: use it inside a test or hook');
      return server;
    },
    get browser() {
      if (!browser) throw new Error('The browser is not launched yet: use it inside a test or hook');
      return browser;
    },
  };
}

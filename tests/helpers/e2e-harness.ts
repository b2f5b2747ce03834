import { afterAll, beforeAll } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './browser';
import { startLiveServer } from './live-server';

/** Registers hooks that start the real server and Debian's Chromium for one browser test file. */
export function useLiveBrowser() {
  const live = {} as { server: Awaited<ReturnType<typeof startLiveServer>>; browser: Browser };
  beforeAll(async () => {
    live.server = await startLiveServer();
    live.browser = await launchBrowser();
  });
  afterAll(async () => {
    await live.browser?.close();
    await live.server?.close();
  });
  return live;
}

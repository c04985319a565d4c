/** The real server and Chromium for one browser test file: started before its tests, stopped after them. */
import { Browser } from 'playwright-core';
import { launchBrowser } from './browser';
import { RunningServer, startServer } from './server-process';

export interface LiveApp {
  server: RunningServer;
  browser: Browser;
}

/** Registers the file's beforeAll and afterAll; the fields are set once beforeAll has run. */
export function startLiveAppForFile(): LiveApp {
  const live = {} as LiveApp;
  beforeAll(async () => {
    live.server = await startServer();
    live.browser = await launchBrowser();
  });
  afterAll(async () => {
    await live.browser?.close();
    await live.server?.stop();
  });
  return live;
}

// A browser test starts a server and Chromium; a slow CI machine needs more than Jest's 5 s.
jest.setTimeout(120_000);

/**
 * The JavaScript a page fetches, and the JavaScript the web export holds, in raw and gzipped
 * bytes. The server sends files uncompressed, so each body is gzipped here with zlib's default
 * level, the one a compressing proxy or CDN in front of it would most likely use.
 */
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import type { Page } from 'playwright-core';

export interface ScriptSize {
  name: string;
  rawBytes: number;
  gzipBytes: number;
}

export interface ScriptTotal {
  files: number;
  rawBytes: number;
  gzipBytes: number;
}

export function sizeOf(name: string, body: Buffer): ScriptSize {
  return { name, rawBytes: body.length, gzipBytes: zlib.gzipSync(body).length };
}

export function totalOf(scripts: readonly ScriptSize[]): ScriptTotal {
  return {
    files: scripts.length,
    rawBytes: scripts.reduce((sum, s) => sum + s.rawBytes, 0),
    gzipBytes: scripts.reduce((sum, s) => sum + s.gzipBytes, 0),
  };
}

/** Keeps every script response the page receives, by file name; `taken()` sizes those seen so far. */
export function recordScripts(page: Page): { taken: () => Promise<ScriptSize[]> } {
  const seen = new Map<string, Promise<ScriptSize>>();
  page.on('response', (response) => {
    if (response.request().resourceType() !== 'script' || !response.ok()) return;
    const name = path.basename(new URL(response.url()).pathname);
    if (!seen.has(name)) seen.set(name, response.body().then((body) => sizeOf(name, body)));
  });
  return { taken: () => Promise.all(seen.values()) };
}

/** Every .js file of the export in dist/, the whole app as shipped. */
export function exportedScripts(distDir: string): ScriptSize[] {
  const dir = path.join(distDir, '_expo', 'static', 'js', 'web');
  return fs
    .readdirSync(dir)
    .filter((name) => name.endsWith('.js'))
    .map((name) => sizeOf(name, fs.readFileSync(path.join(dir, name))));
}

export function kilobytes(bytes: number): string {
  return `${(bytes / 1000).toFixed(1)} KB`;
}

/**
 * Before the browser tests: Debian's Chromium must be there (installed with apt-get when this
 * runs as root), and the web build must be current.
 */
import { execSync } from 'node:child_process';
import fs from 'node:fs';
import { buildWeb, webBuildIsCurrent } from '../../server/tools/ensure-web-build';
import { CHROMIUM } from './browser';

function ensureChromium() {
  if (fs.existsSync(CHROMIUM)) return;
  if (process.getuid?.() !== 0) {
    console.error(`Browser tests need Chromium at ${CHROMIUM}: run "sudo apt-get install -y chromium".`);
    process.exit(1);
  }
  console.log('Installing Debian\'s chromium for the browser tests...');
  execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', { stdio: 'inherit' });
}

ensureChromium();
if (!webBuildIsCurrent()) buildWeb();

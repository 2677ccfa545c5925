// Browser tests drive Debian's Chromium. Install it when missing and we can (root with apt-get);
// otherwise stop with the one command that installs it. Browser tests are never skipped silently.
import { existsSync } from 'node:fs';
import { execSync } from 'node:child_process';

const CHROMIUM = process.env.CHROMIUM_PATH || '/usr/bin/chromium';
const INSTALL = 'apt-get update && apt-get install -y chromium';

if (!existsSync(CHROMIUM)) {
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  let hasApt = false;
  try {
    execSync('command -v apt-get', { stdio: 'ignore', shell: '/bin/sh' });
    hasApt = true;
  } catch {}
  if (isRoot && hasApt) {
    console.log(`[chordline] ${CHROMIUM} is missing: installing Debian's chromium for the browser tests…`);
    execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', { stdio: 'inherit', shell: '/bin/sh' });
  }
  if (!existsSync(CHROMIUM)) {
    console.error(`[chordline] The browser tests need Chromium at ${CHROMIUM}. Install it with:\n  sudo ${INSTALL}`);
    process.exit(1);
  }
}

// Finds a Chromium for the browser tests: $CHROMIUM_PATH, then chromium / chromium-browser on PATH,
// then a browser Playwright already has; on Debian/Ubuntu as root, installs the distribution's package.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

function onPath(name) {
  const r = spawnSync('sh', ['-c', `command -v ${name}`], { encoding: 'utf8' });
  const p = r.stdout.trim();
  return r.status === 0 && p ? p : null;
}

async function playwrightOwn() {
  try {
    const { chromium } = await import('@playwright/test');
    const p = chromium.executablePath();
    return p && existsSync(p) ? p : null;
  } catch {
    return null;
  }
}

function installDebianChromium() {
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot || !existsSync('/usr/bin/apt-get')) return null;
  console.log('No Chromium found: installing the distribution package (apt-get install chromium) ...');
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
  execFileSync('apt-get', ['install', '-y', '-qq', 'chromium'], { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  return onPath('chromium');
}

/** Returns the path of a Chromium executable, or throws with instructions. */
export async function findChromium() {
  const fromEnv = process.env.CHROMIUM_PATH;
  if (fromEnv && existsSync(fromEnv)) return fromEnv;
  const found = onPath('chromium') ?? onPath('chromium-browser') ?? (await playwrightOwn()) ?? installDebianChromium();
  if (found) return found;
  throw new Error(
    'No Chromium found for the browser tests. Install one (Debian/Ubuntu: sudo apt-get install chromium; ' +
      'other systems: your package manager, or `npx playwright install chromium`) or set CHROMIUM_PATH.',
  );
}

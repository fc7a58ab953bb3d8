// `npm test`: type check, lint, unit and property tests (Vitest), build, browser tests (Playwright).
// Ends with one line "N passed, N failed" summing the Vitest and Playwright tests; a failed type check,
// lint or build counts as one failure each. Exits non-zero when anything failed.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { findChromium } from './findChromium.mjs';
import { checkNode } from './nodeRange.mjs';

checkNode();

const reports = 'reports';
rmSync(reports, { recursive: true, force: true });
mkdirSync(reports, { recursive: true });

let passed = 0;
let failed = 0;
const failures = [];

function run(label, cmd, args, env = {}) {
  console.log(`\n=== ${label} ===`);
  const r = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  return r.status === 0;
}

function step(label, cmd, args) {
  if (!run(label, cmd, args)) {
    failed += 1;
    failures.push(label);
    return false;
  }
  return true;
}

function readJson(path) {
  if (!existsSync(path)) return null;
  try {
    return JSON.parse(readFileSync(path, 'utf8'));
  } catch {
    return null;
  }
}

step('type check', 'npm', ['run', '--silent', 'typecheck']);
step('lint', 'npx', ['eslint', '.', '--max-warnings=0']);

run('unit and property tests (Vitest)', 'npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${reports}/vitest.json`]);
const vitest = readJson(`${reports}/vitest.json`);
if (vitest) {
  passed += vitest.numPassedTests;
  failed += vitest.numFailedTests + (vitest.numPendingTests ?? 0) + (vitest.numTodoTests ?? 0);
  // A test file that fails to load has no tests counted: count it as a failure.
  for (const f of vitest.testResults ?? []) {
    if (f.status === 'failed' && (f.assertionResults ?? []).length === 0) failed += 1;
  }
} else {
  failed += 1;
  failures.push('vitest report missing');
}

if (step('build', 'npx', ['vite', 'build', '--logLevel', 'warn'])) {
  let chromiumPath = null;
  try {
    chromiumPath = await findChromium();
  } catch (e) {
    console.error(String(e.message ?? e));
  }
  if (chromiumPath) {
    console.log(`Chromium: ${chromiumPath}`);
    run('browser tests (Playwright)', 'npx', ['playwright', 'test'], {
      CHROMIUM_PATH: chromiumPath,
      PLAYWRIGHT_JSON_OUTPUT_NAME: `${reports}/playwright.json`,
    });
    const pw = readJson(`${reports}/playwright.json`);
    if (pw?.stats) {
      passed += pw.stats.expected;
      failed += pw.stats.unexpected + pw.stats.flaky + pw.stats.skipped;
      if ((pw.errors ?? []).length > 0) failed += pw.errors.length;
    } else {
      failed += 1;
      failures.push('playwright report missing');
    }
  } else {
    failed += 1;
    failures.push('no Chromium');
  }
}

if (failures.length) console.log(`\nSteps that failed: ${failures.join(', ')}`);
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 ? 1 : 0);

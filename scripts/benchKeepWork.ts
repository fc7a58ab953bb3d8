// How long an edit stays at risk (a script, not a test): the built app in headless Chromium, an edit made in the
// page, then after d ms either a reload or a killed browser (SIGKILL of the whole Chromium), then the page opened
// again to see whether the edit came back. Prints, for each d, how many of the runs kept the edit, and the window
// that remains: the longest d at which an edit was lost.
//
//   npx tsx scripts/benchKeepWork.ts [-- --runs 3]      BENCH_DIST=folder serves that build (else it builds one)
import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Page } from '@playwright/test';
import { freePort, startPreview } from './previewServer';

const DIST = process.env.BENCH_DIST || '/tmp/foldroot-bench-keep/dist';
const CHROMIUM = process.env.CHROMIUM_PATH || '/usr/bin/chromium';
const ARGS = ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const runsAt = process.argv.indexOf('--runs');
const RUNS = runsAt >= 0 ? Math.max(1, Number(process.argv[runsAt + 1])) : 3;
const RELOAD_DELAYS = [0, 5, 10, 25, 50, 100, 200, 450];
const KILL_DELAYS = [0, 5, 10, 25, 50, 100, 200, 300, 500];

async function until(what: string, ok: () => Promise<boolean>): Promise<void> {
  for (let i = 0; i < 300; i++) {
    if (await ok().catch(() => false)) return;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`benchKeepWork: ${what} did not happen`);
}

// In the page: rename the first horizon as a user does (type, Enter), then run `after` d ms later (0: in the same task).
const EDIT = `(([name, d, reload]) => {
  const field = document.querySelector('[aria-label="Horizon name"]');
  field.focus();
  const set = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value').set;
  set.call(field, name);
  field.dispatchEvent(new Event('input', { bubbles: true }));
  field.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));
  if (reload) { if (d === 0) location.reload(); else setTimeout(() => location.reload(), d); }
})`;

const started = (page: Page) => page.locator('[data-startup="done"]').count().then((n) => n === 1);
const firstName = (page: Page) => page.locator('[aria-label="Horizon name"]').first().inputValue();

async function reloadTrial(page: Page, origin: string, name: string, d: number): Promise<boolean> {
  await page.goto(origin);
  await until('start-up', () => started(page));
  await until('the horizon list', async () => (await page.locator('[aria-label="Horizon name"]').count()) > 0);
  const navigated = page.waitForEvent('framenavigated');
  await page.evaluate(`${EDIT}(${JSON.stringify([name, d, true])})`);
  await navigated;
  await until('start-up after the reload', () => started(page));
  return (await firstName(page)) === name;
}

async function launchKillable(profile: string): Promise<{ proc: ChildProcess; page: Page; close: () => Promise<void> }> {
  const port = await freePort();
  const proc = spawn(CHROMIUM, [...ARGS, '--headless=new', `--user-data-dir=${profile}`, `--remote-debugging-port=${port}`, 'about:blank'], { stdio: 'ignore' });
  let browser: Awaited<ReturnType<typeof chromium.connectOverCDP>> | null = null;
  await until('Chromium', async () => {
    browser = await chromium.connectOverCDP(`http://127.0.0.1:${port}`);
    return true;
  });
  const b = browser!;
  const context = b.contexts()[0];
  const page = context.pages()[0] ?? (await context.newPage());
  page.on('dialog', (dl) => void dl.accept());
  return { proc, page, close: () => b.close() };
}

async function killTrial(origin: string, profile: string, name: string, d: number): Promise<boolean> {
  const first = await launchKillable(profile);
  await first.page.goto(origin);
  await until('start-up', () => started(first.page));
  await until('the horizon list', async () => (await first.page.locator('[aria-label="Horizon name"]').count()) > 0);
  await first.page.evaluate(`${EDIT}(${JSON.stringify([name, d, false])})`);
  if (d > 0) await new Promise((r) => setTimeout(r, d));
  first.proc.kill('SIGKILL');
  await new Promise<void>((r) => first.proc.once('exit', () => r()));
  const second = await launchKillable(profile);
  await second.page.goto(origin);
  await until('start-up after the kill', () => started(second.page));
  const kept = (await firstName(second.page)) === name;
  await second.close();
  second.proc.kill('SIGKILL');
  return kept;
}

function summarise(what: string, results: Map<number, boolean[]>): void {
  console.log(`\n${what}: edit kept / runs, by the time from the edit to the event`);
  let window = 0;
  for (const [d, kept] of results) {
    const n = kept.filter(Boolean).length;
    console.log(`  ${String(d).padStart(4)} ms   ${n} / ${kept.length}`);
    if (n < kept.length) window = Math.max(window, d);
  }
  const lost = [...results.values()].some((k) => k.some((x) => !x));
  console.log(lost ? `  remaining window: an edit ${window} ms or less before it was lost at least once` : `  remaining window: 0 ms (no edit lost at any delay measured, ${[...results.keys()][0]} ms included)`);
}

async function main(): Promise<void> {
  if (!process.env.BENCH_DIST) execFileSync('npx', ['vite', 'build', '--outDir', DIST], { stdio: 'ignore' });
  const preview = await startPreview(DIST);
  const origin = `${preview.url}/`;
  try {
    const browser = await chromium.launch({ executablePath: CHROMIUM, args: ARGS });
    const page = await (await browser.newContext()).newPage();
    page.on('dialog', (dl) => void dl.accept());
    const reloads = new Map<number, boolean[]>();
    for (const d of RELOAD_DELAYS) for (let r = 0; r < RUNS; r++) (reloads.get(d) ?? reloads.set(d, []).get(d)!).push(await reloadTrial(page, origin, `Reload ${d} ms run ${r}`, d));
    await browser.close();
    summarise('Reload', reloads);
    const kills = new Map<number, boolean[]>();
    for (const d of KILL_DELAYS) {
      for (let r = 0; r < RUNS; r++) {
        const profile = mkdtempSync(join(tmpdir(), 'foldroot-keep-'));
        (kills.get(d) ?? kills.set(d, []).get(d)!).push(await killTrial(origin, profile, `Kill ${d} ms run ${r}`, d));
        // Chromium's helper processes may still be closing files in the profile: a leftover folder in tmp is harmless.
        try {
          rmSync(profile, { recursive: true, force: true, maxRetries: 5 });
        } catch {
          // left for the system's tmp cleaning
        }
      }
    }
    summarise('Killed browser (SIGKILL)', kills);
  } finally {
    preview.stop();
  }
}

void main().catch((e: unknown) => {
  console.error(e instanceof Error ? e.message : e);
  process.exit(1);
});

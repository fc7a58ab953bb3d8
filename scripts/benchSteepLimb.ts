// Self-crossing check benchmark in the app (a script, not a test): serves the built app, opens a section file with
// one densely traced steep limb of 20,000 vertices (z falls at every vertex while x wavers, so it cannot cross
// itself) and prints the longest main-thread task (PerformanceObserver 'longtask') on opening it and on each of a few
// edits (renaming the horizon, which makes the analysis run again), beside the same edit on the demo section (the
// floor: what an edit costs where the check is cheap), in the same page.
//
//   npx tsx scripts/benchSteepLimb.ts [--vertices 20000] [--edits 3]      BENCH_DIST=folder (default dist), BENCH_PORT (default: a free port)
import { chromium, type Page } from '@playwright/test';
import type { LineSection } from '../src/core/model/section';
import { LONG_TASKS, longestSince, pageNow as now } from './pageTasks';
import { startPreview } from './previewServer';

const DIST = process.env.BENCH_DIST || 'dist';
const PORT = process.env.BENCH_PORT ? Number(process.env.BENCH_PORT) : undefined;
const flag = (name: string, fallback: number) => {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? Number(process.argv[i + 1]) : fallback;
};
const VERTICES = flag('vertices', 20_000);
const EDITS = flag('edits', 3);

/** A flat bed, a steep limb of `n` vertices falling 2,000 m with hand-like wavering in x, and a flat bed below. */
function steepLimbSection(n: number): LineSection {
  const line: [number, number][] = [[-100, 0], [1000, 0]];
  for (let i = 1; i <= n; i++) line.push([1000 + (500 * i) / n + 0.3 * Math.sin(i * 0.7) + 0.2 * Math.sin(i * 1.9), -(2000 * i) / (n + 1)]);
  line.push([3100, -2000]);
  return { units: 'm', pins: [0, 3000], horizons: [{ name: 'Steep limb', line, regional: [[-100, -1000], [3100, -1000]] }] };
}

/** Waits until no task is running for a few frames (the page settled), by the page's own clock. */
const settle = (page: Page) => page.evaluate('new Promise((r) => { let k = 0; const f = () => (++k > 10 ? r() : requestAnimationFrame(f)); requestAnimationFrame(f); })');

async function renameEdits(page: Page, base: string): Promise<number[]> {
  const out: number[] = [];
  const field = page.getByTestId('horizon-list').getByLabel('Horizon name').first();
  for (let k = 0; k < EDITS; k++) {
    await settle(page);
    const t = await now(page);
    await field.fill(`${base} ${k + 1}`);
    await field.press('Enter');
    await page.getByTestId('results-strip').getByText(`${base} ${k + 1}`).first().waitFor({ timeout: 120_000 });
    await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 120_000 });
    await settle(page);
    out.push(await longestSince(page, t));
  }
  return out;
}

async function main(): Promise<void> {
  const preview = await startPreview(DIST, { port: PORT });
  try {
    const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu'] });
    const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    page.on('dialog', (d) => void d.accept());
    await page.addInitScript(LONG_TASKS);
    await page.goto(`${preview.url}/`);
    await page.locator('[data-startup="done"]').waitFor({ timeout: 60_000 });
    const floor = await renameEdits(page, 'Demo horizon');
    const section = steepLimbSection(VERTICES);
    await settle(page);
    const t0 = await now(page);
    await page.getByTestId('open-project').setInputFiles({ name: 'steep-limb.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(section)) });
    await page.getByLabel('Show Steep limb', { exact: true }).waitFor({ timeout: 120_000 });
    await page.getByTestId('strip-detachment-depth').waitFor({ timeout: 120_000 });
    await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 120_000 });
    await settle(page);
    const open = await longestSince(page, t0);
    const edits = await renameEdits(page, 'Steep limb renamed');
    console.log(`steep limb of ${VERTICES} vertices (machine shared and loaded; long tasks are those over 50 ms, 0 = none)`);
    console.log(`  longest task on open:      ${open.toFixed(0)} ms`);
    console.log(`  longest task on each edit: ${edits.map((x) => x.toFixed(0)).join(', ')} ms`);
    console.log(`  floor (same edit, demo):   ${floor.map((x) => x.toFixed(0)).join(', ')} ms`);
    await browser.close();
  } finally {
    preview.stop();
  }
}

void main().catch((e: unknown) => {
  console.error(e instanceof Error ? e.message : String(e));
  process.exit(1);
});

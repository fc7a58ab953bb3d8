// Self-crossing check benchmark in the app (a script, not a test): serves the built app, opens a section file with
// one densely traced steep limb of 20,000 vertices (z falls at every vertex while x wavers, so it cannot cross
// itself) and prints the longest main-thread task (PerformanceObserver 'longtask') on opening it (over the demo the page
// opens on, unedited, so no dialog waits inside the task) and on each of a few edits (renaming the horizon, which makes
// the analysis run again), beside the same edit on the demo section afterwards (the floor: what an edit costs where
// the check is cheap), in the same page.
//
// With --profile <file> it writes a CPU profile of the open (for Chrome's DevTools) and prints where the longest
// stretch of main-thread work went (build with `--minify false` for readable names).
//
//   npx tsx scripts/benchSteepLimb.ts [--vertices 20000] [--edits 3] [--profile open.cpuprofile]      BENCH_DIST=folder (default dist), BENCH_PORT (default: a free port)
import { writeFileSync } from 'node:fs';
import { chromium, type CDPSession, type Page } from '@playwright/test';
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
const PROFILE = (() => {
  const i = process.argv.indexOf('--profile');
  return i >= 0 ? process.argv[i + 1] : null;
})();

interface ProfileNode { id: number; callFrame: { functionName: string; url: string; lineNumber: number }; children?: number[] }
interface CpuProfile { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[] }

/** Prints the functions with most time of their own and with their callees over the longest run of samples without an idle one. */
function printLongestStretch(profile: CpuProfile): void {
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const parent = new Map<number, number>();
  for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const idle = (i: number) => byId.get(profile.samples[i])?.callFrame.functionName === '(idle)';
  // The longest stretch of consecutive busy samples, by time.
  let best = [0, 0, 0];
  for (let i = 0; i < profile.samples.length;) {
    if (idle(i)) { i++; continue; }
    let j = i, ms = 0;
    while (j < profile.samples.length && !idle(j)) ms += (profile.timeDeltas[++j] ?? 0) / 1000;
    if (ms > best[2]) best = [i, j, ms];
    i = j;
  }
  const label = (n: ProfileNode) => `${n.callFrame.functionName || '(anonymous)'} ${n.callFrame.url.split('/').pop() || ''}:${n.callFrame.lineNumber + 1}`;
  const self = new Map<string, number>(), total = new Map<string, number>();
  for (let i = best[0]; i < best[1]; i++) {
    const dt = (profile.timeDeltas[i + 1] ?? 0) / 1000;
    const leaf = byId.get(profile.samples[i])!;
    self.set(label(leaf), (self.get(label(leaf)) ?? 0) + dt);
    const seen = new Set<string>();
    for (let id: number | undefined = leaf.id; id !== undefined; id = parent.get(id)) {
      const l = label(byId.get(id)!);
      if (!seen.has(l)) total.set(l, (total.get(l) ?? 0) + dt);
      seen.add(l);
    }
  }
  const top = (m: Map<string, number>, k: number) => [...m].sort((a, b) => b[1] - a[1]).slice(0, k);
  console.log(`  profile: longest busy stretch ${best[2].toFixed(0)} ms; ms of its own (self) and with callees (total):`);
  for (const [l, ms] of top(self, 15)) console.log(`    self  ${ms.toFixed(1).padStart(6)}  ${l}`);
  for (const [l, ms] of top(total, 40)) console.log(`    total ${ms.toFixed(1).padStart(6)}  ${l}`);
}
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
    const section = steepLimbSection(VERTICES);
    // The file is made in the page first, in a task of its own: Playwright's setInputFiles builds it inside the task
    // that delivers the change, and that (~130 ms for 20k vertices, base64 decoding in injected script) would count as the open's.
    await page.evaluate(`window.__limbFile = new File([${JSON.stringify(JSON.stringify(section))}], 'steep-limb.json', { type: 'application/json' })`);
    await settle(page);
    const t0 = await now(page);
    let cdp: CDPSession | null = null;
    if (PROFILE) {
      cdp = await page.context().newCDPSession(page);
      await cdp.send('Profiler.enable');
      await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
      await cdp.send('Profiler.start');
    }
    await page.evaluate(`(() => {
      const input = document.querySelector('[data-testid="open-project"]');
      const files = new DataTransfer();
      files.items.add(window.__limbFile);
      input.files = files.files;
      input.dispatchEvent(new Event('change', { bubbles: true }));
    })()`);
    await page.getByLabel('Show Steep limb', { exact: true }).waitFor({ timeout: 120_000 });
    await page.getByTestId('strip-detachment-depth').waitFor({ timeout: 120_000 });
    await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 120_000 });
    await settle(page);
    const open = await longestSince(page, t0);
    const openTasks = (await page.evaluate(`window.__tasks.filter((t) => t[0] + t[1] >= ${t0}).map((t) => Math.round(t[1]))`)) as number[];
    if (cdp && PROFILE) {
      const { profile } = (await cdp.send('Profiler.stop')) as unknown as { profile: CpuProfile };
      await cdp.detach();
      writeFileSync(PROFILE, JSON.stringify(profile));
      printLongestStretch(profile);
    }
    const edits = await renameEdits(page, 'Steep limb renamed');
    // The floor after: the page opens on the demo unedited, so the limb opens with no "discard the changes?" dialog,
    // whose wait would count in the open's task.
    await page.getByTestId('menu-project').click();
    await page.getByTestId('open-example-fold').click();
    await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 120_000 });
    await page.getByTestId('results-strip').getByText('Steep limb renamed').first().waitFor({ state: 'detached', timeout: 120_000 });
    const floor = await renameEdits(page, 'Demo horizon');
    console.log(`steep limb of ${VERTICES} vertices (machine shared and loaded; long tasks are those over 50 ms, 0 = none)`);
    console.log(`  longest task on open:      ${open.toFixed(0)} ms (tasks over 50 ms: ${openTasks.join(', ') || 'none'})`);
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

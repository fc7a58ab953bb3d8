// Horizon import benchmark in the app (a script, not a test): serves the built app and feeds large generated CSV,
// GeoJSON and SVG files through the real file inputs, printing the longest main-thread task (PerformanceObserver
// 'longtask') from choosing the file to the preview (or the refusal) being shown, and from Import to the horizons
// being in the project, beside the longest task of choosing a small file the same way (the floor) in the same page.
// Each case runs in a fresh browser context (no kept work carried over).
//
//   npx tsx scripts/benchImport.ts [--only csv150k,svg20k]      BENCH_DIST=folder (default dist), BENCH_PORT (default: a free port)
import { chromium, type Browser, type Page } from '@playwright/test';
import { LONG_TASKS, longestSince, pageNow as now } from './pageTasks';
import { startPreview } from './previewServer';

const DIST = process.env.BENCH_DIST || 'dist';
const PORT = process.env.BENCH_PORT ? Number(process.env.BENCH_PORT) : undefined;
const ONLY = (() => {
  const i = process.argv.indexOf('--only');
  return i >= 0 ? process.argv[i + 1].split(',') : null;
})();

/**
 * The cases: which input, the file's name, and the page-side expression that makes its text (strings, not functions,
 * go to the page: tsx would wrap inner functions in a helper that does not exist there).
 */
const CSV_ROWS = (horizons: number, rows: number) => `(() => {
  const out = ['horizon,x_m,z_m'];
  for (let h = 0; h < ${horizons}; h++) for (let i = 0; i < ${rows}; i++) out.push('Dense ' + (h + 1) + ',' + (i / 100) + ',' + (Math.sin(i / 1000) * 50 - 200 * h));
  return out.join('\\n');
})()`;
const GEOJSON_LINE = (n: number) => `(() => {
  const coordinates = [];
  for (let i = 0; i < ${n}; i++) coordinates.push([i / 100, Math.sin(i / 1000) * 50]);
  return JSON.stringify({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: { name: 'Dense' }, geometry: { type: 'LineString', coordinates } }] });
})()`;
const SVG_ARCS = (n: number) => `(() => {
  const p = ['M0 0'];
  for (let i = 0; i < ${n}; i++) p.push('a5 5 0 0 1 10 0');
  return '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 100 100"><path id="Arcs" d="' + p.join(' ') + '"/></svg>';
})()`;

interface Case { id: string; input: 'csv' | 'geojson' | 'svg'; name: string; text: string }
const CASES: Case[] = [
  { id: 'csv150k', input: 'csv', name: 'dense-150k.csv', text: CSV_ROWS(1, 150_000) },
  { id: 'csv1M', input: 'csv', name: 'dense-1M.csv', text: CSV_ROWS(1, 1_000_000) },
  { id: 'csv5x200k', input: 'csv', name: 'dense-5x200k.csv', text: CSV_ROWS(5, 200_000) },
  { id: 'geojson150k', input: 'geojson', name: 'dense-150k.geojson', text: GEOJSON_LINE(150_000) },
  { id: 'svg20k', input: 'svg', name: 'arcs-20k.svg', text: SVG_ARCS(20_000) },
  { id: 'svg300k', input: 'svg', name: 'arcs-300k.svg', text: SVG_ARCS(300_000) },
];
const SMALL: Record<Case['input'], string> = { csv: CSV_ROWS(1, 20), geojson: GEOJSON_LINE(20), svg: SVG_ARCS(5) };

/** Waits until no task is running for a few frames (the page settled), by the page's own clock. */
const settle = (page: Page) => page.evaluate('new Promise((r) => { let k = 0; const f = () => (++k > 10 ? r() : requestAnimationFrame(f)); requestAnimationFrame(f); })');

/** Chooses the file made by `text` in the import input of `input`; returns the longest task until the dialog shows a preview or a refusal, and which. */
async function choose(page: Page, input: Case['input'], name: string, text: string): Promise<{ longest: number; wallMs: number; shown: string }> {
  // The file is made in the page first, in a task of its own, so its making does not count as the import's.
  await page.evaluate(`window.__importFile = new File([${text}], ${JSON.stringify(name)}, { type: 'text/plain' })`);
  await settle(page);
  const t0 = await now(page);
  await page.evaluate(`(() => {
    const input = document.querySelector('[data-testid="import-${input}"]');
    const files = new DataTransfer();
    files.items.add(window.__importFile);
    input.files = files.files;
    input.dispatchEvent(new Event('change', { bubbles: true }));
  })()`);
  const dialog = page.getByTestId('import-dialog');
  await dialog.locator('[data-testid="import-preview"], [data-testid="import-error"], [data-testid="svg-ref1-sx"]').first().waitFor({ timeout: 300_000 });
  const wallMs = (await now(page)) - t0;
  await settle(page);
  const shown = (await dialog.getByTestId('import-error').count()) > 0 ? `refused: ${(await dialog.getByTestId('import-error').first().innerText()).slice(0, 90)}` : 'preview';
  return { longest: await longestSince(page, t0), wallMs, shown };
}

/** Clicks Import (when it can) and returns the longest task until the dialog has gone and the page settled. */
async function confirm(page: Page): Promise<number | null> {
  const button = page.getByTestId('import-confirm');
  if (await button.isDisabled()) {
    await page.getByTestId('import-cancel').click();
    return null;
  }
  await settle(page);
  const t0 = await now(page);
  await button.click();
  await page.getByTestId('import-dialog').waitFor({ state: 'detached', timeout: 300_000 });
  await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 300_000 });
  await settle(page);
  return longestSince(page, t0);
}

async function runCase(browser: Browser, url: string, c: Case): Promise<void> {
  const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
  try {
    const page = await context.newPage();
    page.on('dialog', (d) => void d.accept());
    await page.addInitScript(LONG_TASKS);
    await page.goto(`${url}/`);
    await page.locator('[data-startup="done"]').waitFor({ timeout: 60_000 });
    await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 60_000 });
    const floor = await choose(page, c.input, `small.${c.input}`, SMALL[c.input]);
    await page.getByTestId('import-cancel').click();
    const big = await choose(page, c.input, c.name, c.text);
    const imported = await confirm(page);
    console.log(`${c.id.padEnd(12)} choose → shown: longest task ${big.longest.toFixed(0).padStart(6)} ms, wall ${big.wallMs.toFixed(0).padStart(6)} ms (${big.shown})`);
    console.log(`${''.padEnd(12)} Import → in project: ${imported === null ? 'not offered' : `longest task ${imported.toFixed(0)} ms`}; floor (a small ${c.input} file chosen): ${floor.longest.toFixed(0)} ms`);
  } finally {
    await context.close();
  }
}

async function main(): Promise<void> {
  const preview = await startPreview(DIST, { port: PORT });
  try {
    const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu'] });
    console.log('horizon imports (long tasks are those over 50 ms, 0 = none; the machine is shared)');
    for (const c of CASES) if (!ONLY || ONLY.includes(c.id)) await runCase(browser, preview.url, c);
    await browser.close();
  } finally {
    preview.stop();
  }
}

void main().catch((e: unknown) => {
  console.error(e instanceof Error ? e.message : String(e));
  process.exit(1);
});

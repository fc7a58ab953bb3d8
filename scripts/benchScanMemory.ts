// Memory benchmark (a script, not a test): serves a build, opens three generated 100 MP scans one after
// another in headless Chromium, and prints after each (its reduced views made) the page's JS heap (CDP
// Performance.getMetrics, after a forced garbage collection), the renderer's resident and private memory and that
// of all the browser's processes (Linux /proc, which is where decoded bitmaps and tiles live: they are not JS heap),
// and what the scan panel says it holds (decoded scans, reduced-view tiles). The renderer is the page's own process
// (scripts/rendererMemory.ts pageRendererPid); "browser processes" sums every process of the browser.
// Each step also prints the renderer's peak since the step before (VmHWM), and with --breakdown the renderer by
// allocator from Chromium's own memory-infra dump (the decoded bitmap is one direct-mapped block in malloc).
//   BENCH_DIST=/path/to/dist [BENCH_PORT=4244] flock /tmp/foldroot-bigmem.lock npx tsx scripts/benchScanMemory.ts
//     [--mp 100] [--count 3] [--replace-mp 1] [--reload] [--png] [--grain] [--breakdown [--depth 2]] [--shots prefix]
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { chromium, type Page } from '@playwright/test';
import { startPreview } from './previewServer';
import { allocatorLine, pageRendererPid, rendererAllocators } from './rendererMemory';

const DIST = process.env.BENCH_DIST || 'dist';
const flag = (name: string, fallback: number) => {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? Number(process.argv[i + 1]) : fallback;
};
const MP = flag('mp', 100);
const COUNT = flag('count', 3);
/** After the last, open a scan of this size in their place (0: none): what the replaced scan leaves behind. */
const REPLACE_MP = flag('replace-mp', 1);
/** Also print the renderer's memory by allocator (a memory-infra dump) at each step. */
const BREAKDOWN = process.argv.includes('--breakdown');
const DEPTH = flag('depth', 2);
/** Reload the page after the last scan is kept in the browser, and measure the restored scan. */
const RELOAD = process.argv.includes('--reload');
/** The generated scans' file type: jpeg (small files) or png (large files, as lossless scans are). */
const TYPE = process.argv.includes('--png') ? 'png' : 'jpeg';
/** Paper grain over the whole scan, so its file is about as large as a scanned sheet's (a plain drawing compresses to little). */
const NOISE = process.argv.includes('--grain');
/** Screenshot path prefix: `<prefix>-<mp>mp-<i>.png` after each opening and `<prefix>-replaced.png`. */
const SHOTS = process.argv.includes('--shots') ? process.argv[process.argv.indexOf('--shots') + 1] : undefined;

/** Resident memory (MB) of the process and all its descendants, from /proc. */
function treeRssMb(rootPid: number): number {
  const parent = new Map<number, number>();
  const rss = new Map<number, number>();
  for (const name of readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const stat = readFileSync(`/proc/${name}/stat`, 'utf8');
      const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      parent.set(Number(name), Number(fields[1]));
      const status = readFileSync(`/proc/${name}/status`, 'utf8');
      const m = /VmRSS:\s+(\d+) kB/.exec(status);
      rss.set(Number(name), m ? Number(m[1]) : 0);
    } catch {
      // the process ended meanwhile
    }
  }
  let total = 0;
  for (const [pid, kb] of rss) {
    for (let p: number | undefined = pid; p !== undefined && p > 1; p = parent.get(p)) {
      if (p === rootPid) {
        total += kb;
        break;
      }
    }
  }
  return total / 1024;
}

async function makeScan(page: Page, side: number, name: string): Promise<void> {
  await page.evaluate(`(async () => {
    const s = ${side};
    const c = new OffscreenCanvas(s, s);
    const ctx = c.getContext('2d');
    ctx.fillStyle = '#efe6cf';
    ctx.fillRect(0, 0, s, s);
    if (${NOISE}) {
      // Paper grain (a 509 px tile of small random steps, repeated), so the file is as large as a scanned sheet's.
      const n = 509;
      const grain = new ImageData(n, n);
      for (let i = 0; i < n * n; i++) {
        const d = Math.floor(Math.random() * 16) - 8;
        grain.data[4 * i] = 239 + d; grain.data[4 * i + 1] = 230 + d; grain.data[4 * i + 2] = 207 + d; grain.data[4 * i + 3] = 255;
      }
      const tile = new OffscreenCanvas(n, n);
      tile.getContext('2d').putImageData(grain, 0, 0);
      ctx.fillStyle = ctx.createPattern(tile, 'repeat');
      ctx.fillRect(0, 0, s, s);
    }
    ctx.strokeStyle = '#4a3b2a';
    ctx.lineWidth = Math.max(1, s / 2000);
    for (let k = 0; k <= s; k += s / 40) {
      ctx.beginPath(); ctx.moveTo(k, 0); ctx.lineTo(k, s); ctx.moveTo(0, k); ctx.lineTo(s, k); ctx.stroke();
    }
    const blob = await c.convertToBlob({ type: 'image/${TYPE}', quality: 0.8 });
    window.__scanFile = new File([blob], ${JSON.stringify(name)}, { type: 'image/${TYPE}' });
  })()`);
}

async function main(): Promise<void> {
  const preview = await startPreview(DIST, { port: Number(process.env.BENCH_PORT) || undefined });
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--enable-precise-memory-info'] });
  const browserPid = (browser as unknown as { process?: () => { pid: number } }).process?.().pid;
  try {
    const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    page.on('dialog', (d) => void d.accept());
    const cdp = await page.context().newCDPSession(page);
    await cdp.send('Performance.enable');
    await page.goto(preview.url);
    await page.locator('[data-startup="done"]').waitFor({ timeout: 60_000 });
    const rootPid = browserPid ?? Number(/(\d+)/.exec(readFileSync('/proc/self/stat', 'utf8'))![1]);
    let base: { rss: number; anon: number } | null = null;
    // Linux: writing 5 to clear_refs starts a process's peak resident size (VmHWM) again from now.
    const resetPeaks = async () => {
      const browserCdp = await browser.newBrowserCDPSession();
      const info = (await browserCdp.send('SystemInfo.getProcessInfo')) as { processInfo: { type: string; id: number }[] };
      await browserCdp.detach();
      for (const p of info.processInfo) {
        if (p.type !== 'renderer') continue;
        try {
          writeFileSync(`/proc/${p.id}/clear_refs`, '5');
        } catch {
          // Not allowed here: the peak then counts from the process's start.
        }
      }
    };
    const measure = async (what: string, rgbaMb: number) => {
      await cdp.send('HeapProfiler.collectGarbage');
      const { metrics } = (await cdp.send('Performance.getMetrics')) as { metrics: { name: string; value: number }[] };
      const heap = metrics.find((m) => m.name === 'JSHeapUsedSize')!.value / 1048576;
      const browserCdp = await browser.newBrowserCDPSession();
      const info = (await browserCdp.send('SystemInfo.getProcessInfo')) as { processInfo: { type: string; id: number }[] };
      await browserCdp.detach();
      // The page's own renderer process: the browser's others (a spare one, its interface's) hold nothing of the app.
      const pagePid = await pageRendererPid(page);
      let [rss, anon, peak] = [0, 0, 0];
      for (const p of info.processInfo) {
        if (p.type !== 'renderer' || (pagePid !== null && p.id !== pagePid)) continue;
        const status = readFileSync(`/proc/${p.id}/status`, 'utf8');
        rss += Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0) / 1024;
        anon += Number(/RssAnon:\s+(\d+)/.exec(status)?.[1] ?? 0) / 1024;
        peak += Number(/VmHWM:\s+(\d+)/.exec(status)?.[1] ?? 0) / 1024;
      }
      await resetPeaks();
      base ??= { rss, anon };
      const held = await page.getByTestId('scan-memory').evaluate((el) => `${el.getAttribute('data-decoded-scans')} decoded, ${el.getAttribute('data-reduced-tiles')} tiles`).catch(() => 'no scan decoded');
      const ratio = rgbaMb > 0 ? `   = ${(rss / rgbaMb).toFixed(2)}× its RGBA ${rgbaMb.toFixed(0)} MB (over the app before any scan ${((rss - base.rss) / rgbaMb).toFixed(2)}×, private ${((anon - base.anon) / rgbaMb).toFixed(2)}×)` : '';
      console.log(`${what.padEnd(34)} JS heap ${heap.toFixed(1).padStart(7)} MB   renderer RSS ${rss.toFixed(0).padStart(6)} MB (private ${anon.toFixed(0).padStart(6)} MB, peak since the step began ${peak.toFixed(0)} MB)${ratio}   browser processes RSS ${treeRssMb(rootPid).toFixed(0).padStart(6)} MB   panel: ${held}`);
      if (BREAKDOWN) console.log(`${''.padEnd(34)} renderer by allocator (MB): ${allocatorLine(await rendererAllocators(browser, DEPTH, pagePid ?? undefined))}`);
    };
    await measure('after start-up (demo)', 0);
    const open = async (mp: number, name: string) => {
      const side = Math.round(Math.sqrt(mp * 1e6));
      await makeScan(page, side, name);
      // The peak from the drop on: not the canvas the scan was drawn and encoded on here.
      await cdp.send('HeapProfiler.collectGarbage');
      await resetPeaks();
      await page.evaluate(`(() => {
        const d = new DataTransfer();
        d.items.add(window.__scanFile);
        document.querySelector('.view-box').dispatchEvent(new DragEvent('drop', { dataTransfer: d, bubbles: true, cancelable: true }));
      })()`);
      const bytesMb = ((await page.evaluate('window.__scanFile.size')) as number) / 1048576;
      const keptTitle = await page.getByTestId('autosave-status').getAttribute('title');
      await page.getByTestId('scan-name').filter({ hasText: name }).waitFor({ timeout: 300_000 });
      await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 300_000 });
      await page.locator('[data-testid="scan-memory"][data-building="no"]').waitFor({ timeout: 300_000 });
      await page.locator('[data-scan-drawn="tiles"]').waitFor({ timeout: 300_000 });
      await page.evaluate('window.__scanFile = null');
      // Kept in the browser (its bytes written to IndexedDB): the status's time changes.
      for (let t = 0; t < 600 && (await page.getByTestId('autosave-status').getAttribute('title')) === keptTitle; t++) await page.waitForTimeout(100);
      // Deferred releases run a task after the change (state/scanLifetime): a timer, then a frame.
      await page.evaluate('new Promise((r) => setTimeout(() => requestAnimationFrame(() => r(null)), 50))');
      console.log(`${''.padEnd(34)} ${name}: ${side} × ${side} px ${TYPE.toUpperCase()}, ${bytesMb.toFixed(1)} MB file`);
      return (side * side * 4) / 1048576;
    };
    for (let i = 1; i <= COUNT; i++) {
      const rgba = await open(MP, `memory-${i}.${TYPE === 'png' ? 'png' : 'jpg'}`);
      await measure(`after opening scan ${i} (${MP} MP)`, rgba);
      if (SHOTS) await page.screenshot({ path: `${SHOTS}-${MP}mp-${i}.png` });
    }
    if (RELOAD) {
      // The page again, as after closing the tab: the last scan comes back from IndexedDB (its bytes read as a Blob).
      const rgba = (Math.round(Math.sqrt(MP * 1e6)) ** 2 * 4) / 1048576;
      await page.reload();
      await page.locator('[data-startup="done"]').waitFor({ timeout: 300_000 });
      await page.getByTestId('scan-name').filter({ hasText: `memory-${COUNT}.${TYPE === 'png' ? 'png' : 'jpg'}` }).waitFor({ timeout: 300_000 });
      await page.locator('[data-testid="scan-memory"][data-building="no"]').waitFor({ timeout: 300_000 });
      await page.locator('[data-scan-drawn="tiles"]').waitFor({ timeout: 300_000 });
      await measure(`reloaded: scan ${COUNT} kept, restored`, rgba);
      if (SHOTS) await page.screenshot({ path: `${SHOTS}-reloaded.png` });
    }
    if (REPLACE_MP > 0) {
      await open(REPLACE_MP, `memory-replacement.${TYPE === 'png' ? 'png' : 'jpg'}`);
      await measure(`replaced by a ${REPLACE_MP} MP scan`, 0);
      if (SHOTS) await page.screenshot({ path: `${SHOTS}-replaced.png` });
    }
  } finally {
    await browser.close();
    preview.stop();
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});

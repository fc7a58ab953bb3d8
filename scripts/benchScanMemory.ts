// Memory benchmark (a script, not a test): serves a build, opens three generated 100 MP scans one after
// another in headless Chromium, and prints after each (its reduced views made) the page's JS heap (CDP
// Performance.getMetrics, after a forced garbage collection), the renderer's resident and private memory and that
// of all the browser's processes (Linux /proc, which is where decoded bitmaps and tiles live: they are not JS heap),
// and what the scan panel says it holds (decoded scans, reduced-view tiles).
//   BENCH_DIST=/path/to/dist BENCH_PORT=4202 npx tsx scripts/benchScanMemory.ts [--mp 100] [--count 3]
import { spawn, type ChildProcess } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { chromium, type Page } from '@playwright/test';

const DIST = process.env.BENCH_DIST || 'dist';
const PORT = Number(process.env.BENCH_PORT) || 4202;
const VITE = 'node_modules/vite/bin/vite.js';
const flag = (name: string, fallback: number) => {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? Number(process.argv[i + 1]) : fallback;
};
const MP = flag('mp', 100);
const COUNT = flag('count', 3);

async function serve(): Promise<ChildProcess> {
  const server = spawn(process.execPath, [VITE, 'preview', '--host', '127.0.0.1', '--port', String(PORT), '--strictPort', '--outDir', DIST], { stdio: 'ignore' });
  for (let i = 0; i < 100; i++) {
    try {
      if ((await fetch(`http://127.0.0.1:${PORT}`)).ok) return server;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  server.kill();
  throw new Error(`The preview server did not start on port ${PORT}`);
}

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
    ctx.strokeStyle = '#4a3b2a';
    ctx.lineWidth = Math.max(1, s / 2000);
    for (let k = 0; k <= s; k += s / 40) {
      ctx.beginPath(); ctx.moveTo(k, 0); ctx.lineTo(k, s); ctx.moveTo(0, k); ctx.lineTo(s, k); ctx.stroke();
    }
    const blob = await c.convertToBlob({ type: 'image/jpeg', quality: 0.8 });
    window.__scanFile = new File([blob], ${JSON.stringify(name)}, { type: 'image/jpeg' });
  })()`);
}

async function main(): Promise<void> {
  const server = await serve();
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--enable-precise-memory-info'] });
  const browserPid = (browser as unknown as { process?: () => { pid: number } }).process?.().pid;
  try {
    const page = await browser.newPage({ viewport: { width: 1400, height: 900 } });
    page.on('dialog', (d) => void d.accept());
    const cdp = await page.context().newCDPSession(page);
    await cdp.send('Performance.enable');
    await page.goto(`http://127.0.0.1:${PORT}`);
    await page.locator('[data-startup="done"]').waitFor({ timeout: 60_000 });
    const rootPid = browserPid ?? Number(/(\d+)/.exec(readFileSync('/proc/self/stat', 'utf8'))![1]);
    const measure = async (what: string) => {
      await cdp.send('HeapProfiler.collectGarbage');
      const { metrics } = (await cdp.send('Performance.getMetrics')) as { metrics: { name: string; value: number }[] };
      const heap = metrics.find((m) => m.name === 'JSHeapUsedSize')!.value / 1048576;
      const browserCdp = await browser.newBrowserCDPSession();
      const info = (await browserCdp.send('SystemInfo.getProcessInfo')) as { processInfo: { type: string; id: number }[] };
      await browserCdp.detach();
      let [rss, anon] = [0, 0];
      for (const p of info.processInfo) {
        if (p.type !== 'renderer') continue;
        const status = readFileSync(`/proc/${p.id}/status`, 'utf8');
        rss += Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0) / 1024;
        anon += Number(/RssAnon:\s+(\d+)/.exec(status)?.[1] ?? 0) / 1024;
      }
      const held = await page.getByTestId('scan-memory').evaluate((el) => `${el.getAttribute('data-decoded-scans')} decoded, ${el.getAttribute('data-reduced-tiles')} tiles`).catch(() => 'no scan decoded');
      console.log(`${what.padEnd(34)} JS heap ${heap.toFixed(1).padStart(7)} MB   renderer RSS ${rss.toFixed(0).padStart(6)} MB (private ${anon.toFixed(0).padStart(6)} MB)   browser processes RSS ${treeRssMb(rootPid).toFixed(0).padStart(6)} MB   panel: ${held}`);
    };
    await measure('after start-up (demo)');
    const side = Math.round(Math.sqrt(MP * 1e6));
    for (let i = 1; i <= COUNT; i++) {
      const name = `memory-${i}.jpg`;
      await makeScan(page, side, name);
      await page.evaluate(`(() => {
        const d = new DataTransfer();
        d.items.add(window.__scanFile);
        document.querySelector('.view-box').dispatchEvent(new DragEvent('drop', { dataTransfer: d, bubbles: true, cancelable: true }));
      })()`);
      await page.getByTestId('scan-name').filter({ hasText: name }).waitFor({ timeout: 300_000 });
      await page.getByTestId('busy').waitFor({ state: 'detached', timeout: 300_000 });
      await page.locator('[data-testid="scan-memory"][data-building="no"]').waitFor({ timeout: 300_000 });
      await page.evaluate('window.__scanFile = null');
      // Give deferred releases a moment to run (a timer, then a frame).
      await page.evaluate('new Promise((r) => setTimeout(() => requestAnimationFrame(() => r(null)), 50))');
      await measure(`after opening scan ${i} (${MP} MP)`);
    }
    console.log(`(${MP} MP as RGBA: ${((side * side * 4) / 1048576).toFixed(0)} MB)`);
  } finally {
    await browser.close();
    server.kill();
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});

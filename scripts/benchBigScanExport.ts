// Export benchmark with a scan file too large for one string (a script, not a test): writes a noisy 200 MP PNG
// (about 290 MB: paper tones, a line grid and two bits of noise a channel, which do not compress), opens a
// calibrated project of three horizons and then that file over it in the built app in headless Chromium, exports
// the figure as SVG and as PNG at each offered size, and prints the time, the longest main-thread task and what
// came out: the SVG's <image> elements and whether its embedded bytes equal the file, the PNG's size.
//
//   flock /tmp/foldroot-bigmem.lock npx tsx scripts/benchBigScanExport.ts [--side 14142] [--png-sizes screen,a3-300]
//     [--shots folder]        (a 200 MP scan in a browser: hold the lock, so that two such runs never overlap)
//   BENCH_DIST=folder serves that built app (else it is built into /tmp/foldroot-bench-big/dist).
// Fails (exit 1) when an export fails or its file is not what was asked.
import { execFileSync } from 'node:child_process';
import { createReadStream, createWriteStream, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { createHash, randomFillSync } from 'node:crypto';
import { once } from 'node:events';
import { createDeflate, crc32 } from 'node:zlib';
import { chromium, type Page } from '@playwright/test';
import { sectionToProjectDoc } from '../src/core/model/migrations/sectionToProjectDoc';
import type { ImagePx, ProjectDoc } from '../src/core/model/projectDoc';
import type { Section, XZ } from '../src/core/model/section';
import { serializeProject } from '../src/io/projectFile';
import { LONG_TASKS, longestSince, pageNow as now } from './pageTasks';
import { startPreview } from './previewServer';

function flag(name: string): string | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? process.argv[i + 1] : undefined;
}
const SIDE = Number(flag('side') ?? 14142);
const SIZES = (flag('png-sizes') ?? 'screen,a4-150,a4-300,a3-300').split(',');
const SHOTS = flag('shots');
const DIST = process.env.BENCH_DIST || '/tmp/foldroot-bench-big/dist';
const SCAN = `/tmp/foldroot-bench-big/noise-${SIDE}.png`;

function check(ok: unknown, what: string): asserts ok {
  if (!ok) throw new Error(`benchBigScanExport: ${what}`);
}

function pngChunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body) >>> 0);
  return Buffer.concat([len, body, crc]);
}

/** Writes the noisy RGB PNG side × side to `path`, a row at a time (fast deflate: the file stays large). */
async function writeNoisyPng(path: string, side: number): Promise<void> {
  const file = createWriteStream(path);
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(side, 0);
  ihdr.writeUInt32BE(side, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // RGB
  file.write(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
  file.write(pngChunk('IHDR', ihdr));
  const deflate = createDeflate({ level: 1, chunkSize: 4 << 20 });
  deflate.on('data', (d: Buffer) => file.write(pngChunk('IDAT', d)));
  const row = Buffer.alloc(1 + side * 3);
  const noise = Buffer.alloc(side * 3);
  const grid = Math.max(1, Math.round(side / 40));
  const lineWidth = Math.max(1, Math.round(side / 3000));
  for (let y = 0; y < side; y++) {
    randomFillSync(noise);
    for (let x = 0; x < side; x++) {
      const dark = y % grid < lineWidth || x % grid < lineWidth;
      const t = (x + y) / (2 * side);
      const i = 1 + 3 * x;
      row[i] = (dark ? 70 : 240 - 50 * t) - (noise[3 * x] & 3);
      row[i + 1] = (dark ? 55 : 232 - 60 * t) - (noise[3 * x + 1] & 3);
      row[i + 2] = (dark ? 40 : 210 - 80 * t) - (noise[3 * x + 2] & 3);
    }
    if (!deflate.write(Buffer.from(row))) await once(deflate, 'drain');
  }
  deflate.end();
  await once(deflate, 'end');
  file.end(pngChunk('IEND', Buffer.alloc(0)));
  await once(file, 'finish');
}

/** Three horizons over one anticline, drawn on the scan at SIDE / 1500 px a metre, calibrated by three corners. */
const SECTION: Section = {
  units: 'm', pins: [0, 1000],
  horizons: [
    { name: 'Upper marker', line: [[-100, 500], [0, 500], [500, 900], [1000, 500], [1100, 500]], regional: [[-100, 500], [1100, 500]] },
    { name: 'Middle marker', line: [[-100, 250], [0, 250], [500, 600], [1000, 250], [1100, 250]], regional: [[-100, 250], [1100, 250]] },
    { name: 'Lower marker', line: [[-100, 0], [0, 0], [500, 300], [1000, 0], [1100, 0]], regional: [[-100, 0], [1100, 0]] },
  ],
};
const k = SIDE / 1500;
const toPx = ([x, z]: XZ): ImagePx => [(x + 200) * k, (1000 - z) * k];
const name = SCAN.split('/').pop()!;
const base = sectionToProjectDoc(SECTION, 'Big scan export');
const corners: XZ[] = [[-200, 1000], [1300, 1000], [-200, -100]];
const doc: ProjectDoc = {
  ...base,
  scan: { id: 'big', name, widthPx: SIDE, heightPx: SIDE, type: 'image/png' },
  calibration: { kind: 'affine', points: corners.map((q) => { const [u, v] = toPx(q); return { u, v, x: q[0], z: q[1] }; }) },
  horizons: base.horizons.map((h, i) => ({ ...h, pointsPx: SECTION.horizons[i].line!.map(toPx) })),
  scenarios: [{ ...base.scenarios[0], pinsPx: [toPx([0, 300]), toPx([1000, 450])], regionals: Object.fromEntries(base.horizons.map((h, i) => [h.id, SECTION.horizons[i].regional.map(toPx)])) }],
};

async function sha(path: string): Promise<string> {
  const h = createHash('sha256');
  for await (const c of createReadStream(path)) h.update(c as Buffer);
  return h.digest('hex');
}

/** Exports the figure as SVG: time, longest task, and the file checked (one <image>, its bytes the scan file's). */
async function exportSvg(page: Page, scanSha: string): Promise<void> {
  const t0 = await now(page);
  await page.getByTestId('menu-export').click();
  const [download] = await Promise.all([page.waitForEvent('download', { timeout: 600_000 }), page.getByTestId('export-svg').click()]);
  const ms = (await now(page)) - t0;
  const path = await download.path();
  check(path, 'the SVG export produced no file');
  const text = readFileSync(path, 'latin1');
  const images = text.split('<image').length - 1;
  const at = text.indexOf('base64,') + 'base64,'.length;
  const bytes = Buffer.from(text.slice(at, text.indexOf('"', at)), 'base64');
  const same = createHash('sha256').update(bytes).digest('hex') === scanSha;
  console.log(`export SVG: ${ms.toFixed(0)} ms, longest task ${(await longestSince(page, t0)).toFixed(0)} ms; ${(statSync(path).size / 1e6).toFixed(0)} MB, ${images} <image>, embedded scan ${(bytes.length / 1e6).toFixed(0)} MB ${same ? 'equal to the file' : 'NOT equal to the file'}`);
  check(images === 1 && same, 'the SVG does not embed the scan file once, byte for byte');
  await page.getByTestId('busy').waitFor({ state: 'detached' });
}

/** Exports the figure as PNG at one offered size: time, longest task, and the file's pixel size checked. */
async function exportPng(page: Page, size: string): Promise<void> {
  await page.getByTestId('menu-export').click();
  await page.getByTestId('png-size').selectOption(size);
  const t0 = await now(page);
  const [download] = await Promise.all([page.waitForEvent('download', { timeout: 600_000 }), page.getByTestId('export-png').click()]);
  const ms = (await now(page)) - t0;
  const path = await download.path();
  check(path, 'the PNG export produced no file');
  const head = readFileSync(path).subarray(0, 24);
  check(head.subarray(1, 4).toString('latin1') === 'PNG', 'the PNG export produced no PNG');
  console.log(`export PNG ${size}: ${ms.toFixed(0)} ms, longest task ${(await longestSince(page, t0)).toFixed(0)} ms; ${head.readUInt32BE(16)} × ${head.readUInt32BE(20)} px, ${(statSync(path).size / 1e6).toFixed(1)} MB`);
  if (SHOTS) writeFileSync(`${SHOTS}/bench-big-export-${size}.png`, readFileSync(path));
  await page.getByTestId('busy').waitFor({ state: 'detached' });
}

async function main(): Promise<void> {
  mkdirSync('/tmp/foldroot-bench-big', { recursive: true });
  if (!process.env.BENCH_DIST) execFileSync(process.execPath, ['node_modules/vite/bin/vite.js', 'build', '--outDir', DIST, '--emptyOutDir', '--logLevel', 'warn'], { stdio: 'inherit' });
  await writeNoisyPng(SCAN, SIDE);
  const scanSha = await sha(SCAN);
  console.log(`scan: ${SCAN}, ${SIDE} × ${SIDE} px (${((SIDE * SIDE) / 1e6).toFixed(0)} MP), ${(statSync(SCAN).size / 1e6).toFixed(0)} MB`);
  const preview = await startPreview(DIST, { port: Number(process.env.BENCH_PORT) || undefined });
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu'] });
  try {
    const page = await browser.newPage({ viewport: { width: 1400, height: 900 }, acceptDownloads: true });
    page.setDefaultTimeout(300_000);
    page.on('dialog', (d) => void d.accept());
    page.on('pageerror', (e) => console.log(`page error: ${e.message}`));
    await page.addInitScript(LONG_TASKS);
    await page.goto(preview.url);
    await page.locator('[data-startup="done"]').waitFor({ timeout: 60_000 });
    await page.getByTestId('open-project').setInputFiles({ name: 'big.foldroot.json', mimeType: 'application/json', buffer: Buffer.from(serializeProject(doc, null)) });
    await page.getByTestId('busy').waitFor({ state: 'detached' });
    const t0 = await now(page);
    await page.getByTestId('open-image').setInputFiles(SCAN);
    await page.getByTestId('scan-name').filter({ hasText: name }).waitFor();
    await page.getByTestId('busy').waitFor({ state: 'detached' });
    console.log(`open the scan: ${((await now(page)) - t0).toFixed(0)} ms, longest task ${(await longestSince(page, t0)).toFixed(0)} ms`);
    await page.locator('[data-testid="scan-memory"][data-building="no"]').waitFor();
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/bench-big-app.png` });
    await exportSvg(page, scanSha);
    for (const size of SIZES) await exportPng(page, size);
  } finally {
    await browser.close();
    preview.stop();
  }
}

main().catch((e) => {
  console.error(e instanceof Error ? e.message : e);
  process.exit(1);
});

// The PNG export is drawn in a worker from the figure's own SVG markup: it must be the same picture as the
// browser's rendering of the exported SVG (the reference: Chromium's own SVG renderer, drawn on the page's
// canvas); while it runs it shows its progress and a Cancel button that stops it without a download and
// without touching the project; run again, it downloads a PNG of the asked size.
import { writeFileSync } from 'node:fs';
import type { Page } from '@playwright/test';
import { PNG } from 'pngjs';
import { calibratedProject } from './calibratedProject';
import { download } from './download';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { serializeProject } from '../../src/io/projectFile';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import type { ImagePx, ProjectDoc } from '../../src/core/model/projectDoc';
import type { Section, XZ } from '../../src/core/model/section';
import { expectLastMessage } from './messages';

const SECTION: Section = {
  units: 'm',
  pins: [0, 1000],
  horizons: [
    { name: 'Upper marker', line: [[-100, 500], [0, 500], [500, 900], [1000, 500], [1100, 500]], regional: [[-100, 500], [1100, 500]] },
    { name: 'Middle marker', line: [[-100, 250], [0, 250], [500, 600], [1000, 250], [1100, 250]], regional: [[-100, 250], [1100, 250]] },
    { name: 'Lower marker', line: [[-100, 0], [0, 0], [500, 300], [1000, 0], [1100, 0]], regional: [[-100, 0], [1100, 0]] },
  ],
};
const [W, H] = [1500, 1100];
/** Section (x, z) → scan pixel: `k` px per metre, x from −200 m, z down from 1000 m. */
const toPxAt = (k: number) => ([x, z]: XZ): ImagePx => [(x + 200) * k, (1000 - z) * k];

/**
 * A synthetic scan of (W × H)·k px: a smooth two-way colour ramp with broad dark bands (nothing finer than the
 * figure can show), the same picture at every k.
 */
function syntheticScan(k: number): Buffer {
  const [w, h] = [W * k, H * k];
  const png = new PNG({ width: w, height: h });
  for (let v = 0; v < h; v++) {
    for (let u = 0; u < w; u++) {
      const i = (v * w + u) * 4;
      const band = Math.floor(v / (120 * k)) % 2 === 0 ? 0 : 40;
      png.data[i] = 230 - Math.round((u / w) * 90) - band;
      png.data[i + 1] = 215 - Math.round((v / h) * 70) - band;
      png.data[i + 2] = 170 - band;
      png.data[i + 3] = 255;
    }
  }
  return PNG.sync.write(png);
}

function project(k: number): string {
  const scan = { id: 'synthetic-scan', name: 'synthetic.png', widthPx: W * k, heightPx: H * k, bytes: new Uint8Array(syntheticScan(k)) };
  return calibratedProject(SECTION, 'Worker figure', scan, toPxAt(k), [[-200, 1000], [1300, 1000], [-200, -100]], [[0, 300], [1000, 450]]);
}


/** Opens the project on a scan of (W × H)·k px; with k > 1, waits until its reduced views are made (the export then draws from their tiles). */
async function openProject(page: Page, k = 1): Promise<void> {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('open-project').setInputFiles({ name: 'worker.foldroot.json', mimeType: 'application/json', buffer: Buffer.from(project(k)) });
  await expect(page.getByTestId('scan-name')).toContainText(`synthetic.png — ${W * k} × ${H * k} px`);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  if (k > 1) await expect(page.locator('[data-testid="scan-memory"][data-building="no"]:not([data-reduced-tiles="0"])')).toHaveCount(1);
}

/** The browser's own rendering of an SVG document at width × height, as RGBA bytes. */
async function renderSvgInPage(page: Page, svg: string, width: number, height: number): Promise<Buffer> {
  const rgba = await page.evaluate(async ([text, w, h]) => {
    const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml' }));
    const img = new Image();
    await new Promise((resolve, reject) => { img.onload = resolve; img.onerror = reject; img.src = url; });
    const c = document.createElement('canvas');
    c.width = w;
    c.height = h;
    const ctx = c.getContext('2d')!;
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, w, h);
    ctx.drawImage(img, 0, 0, w, h);
    URL.revokeObjectURL(url);
    return c.toDataURL('image/png');
  }, [svg, width, height] as const);
  return PNG.sync.read(Buffer.from(rgba.slice(rgba.indexOf(',') + 1), 'base64')).data;
}

/** Mean absolute difference per colour channel (0..255) over the whole image and over its worst 16 × 16 block. */
function difference(a: Buffer, b: Buffer, width: number, height: number): { mean: number; worstBlock: number; diff: PNG } {
  const diff = new PNG({ width, height });
  let total = 0, worstBlock = 0;
  const B = 16;
  for (let by = 0; by < height; by += B) {
    for (let bx = 0; bx < width; bx += B) {
      let sum = 0, n = 0;
      for (let y = by; y < Math.min(height, by + B); y++) {
        for (let x = bx; x < Math.min(width, bx + B); x++) {
          const i = (y * width + x) * 4;
          const d = (Math.abs(a[i] - b[i]) + Math.abs(a[i + 1] - b[i + 1]) + Math.abs(a[i + 2] - b[i + 2])) / 3;
          sum += d;
          n++;
          diff.data[i] = diff.data[i + 1] = diff.data[i + 2] = 255 - Math.min(255, Math.round(d * 4));
          diff.data[i + 3] = 255;
        }
      }
      total += sum;
      worstBlock = Math.max(worstBlock, sum / n);
    }
  }
  return { mean: total / (width * height), worstBlock, diff };
}

/** Exports the SVG and then the PNG at each size, and compares each PNG with the browser's own drawing of the SVG. */
async function comparePngWithSvg(page: Page, tag: string): Promise<void> {
  await page.getByTestId('menu-export').click();
  const svg = (await download(page, () => page.getByTestId('export-svg').click())).toString('utf8');
  for (const [id, w, h] of [['screen', 1400, 990], ['a4-150', 1754, 1240]] as const) {
    await page.getByTestId('menu-export').click();
    await page.getByTestId('png-size').selectOption(id);
    const bytes = await download(page, () => page.getByTestId('export-png').click());
    const png = PNG.sync.read(bytes);
    expect([png.width, png.height]).toEqual([w, h]);
    const reference = await renderSvgInPage(page, svg, w, h);
    const { mean, worstBlock, diff } = difference(png.data, reference, w, h);
    writeFileSync(test.info().outputPath(`worker-${tag}${id}.png`), bytes);
    writeFileSync(test.info().outputPath(`svg-${tag}${id}.png`), PNG.sync.write(Object.assign(new PNG({ width: w, height: h }), { data: reference })));
    writeFileSync(test.info().outputPath(`diff-${tag}${id}.png`), PNG.sync.write(diff));
    // Anti-aliasing and glyph placement differ by a level or two; a missing line, fill or label moves a block by far more.
    expect(mean, `mean difference at ${tag}${id}`).toBeLessThan(1);
    expect(worstBlock, `worst 16 × 16 block at ${tag}${id}`).toBeLessThan(16);
  }
}

test('the PNG drawn in the worker is the picture the browser draws from the exported SVG', async ({ page }) => {
  await openProject(page);
  await comparePngWithSvg(page, '');
});

test('from a scan large enough for reduced views, the PNG (drawn from their tiles) is the picture the browser draws from the SVG', async ({ page }) => {
  // 4500 × 3300 px: the figure shows it at about a quarter, from the level of 1125 × 825 px, two tiles put together in the worker.
  await openProject(page, 3);
  await comparePngWithSvg(page, 'reduced-');
});

test('a PNG export shows its progress, stops on Cancel without a download or a change, and runs again', async ({ page }) => {
  await openProject(page);
  const pngs: string[] = [];
  page.on('download', (d) => { if (d.suggestedFilename().endsWith('.png')) pngs.push(d.suggestedFilename()); });
  const projectText = async () => {
    await page.getByTestId('menu-project').click();
    const text = (await download(page, () => page.getByTestId('save-project').click())).toString('utf8');
    return text.replace(/"savedAt":\s*"[^"]*"/, '');
  };
  const before = await projectText();
  await expect(page.getByTestId('autosave-status')).toContainText('Saved');
  // The worker's script is held back, so the export is surely still running when Cancel is pressed.
  let release: () => void = () => undefined;
  const held = new Promise<void>((resolve) => { release = resolve; });
  await page.route(/figurePng\.worker-[^/]*\.js$/, async (route) => { await held; await route.continue(); });
  await page.getByTestId('menu-export').click();
  await page.getByTestId('png-size').selectOption('a4-300');
  await page.getByTestId('export-png').click();
  await expect(page.getByTestId('busy-text')).toContainText('PNG 3508 × 2480 px');
  await expect(page.getByTestId('busy-progress')).toBeVisible();
  await page.screenshot({ path: test.info().outputPath('export-progress.png') });
  await page.getByTestId('busy-cancel').click();
  await expectLastMessage(page, 'info', 'PNG export cancelled');
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.screenshot({ path: test.info().outputPath('export-cancelled.png') });
  release();
  await page.unroute(/figurePng\.worker-[^/]*\.js$/);
  await expect(page.getByTestId('autosave-status')).toContainText('Saved');
  expect(await projectText()).toBe(before);
  // Run again: one PNG, of the asked size (read from its header: IHDR width and height).
  await page.getByTestId('menu-export').click();
  await page.getByTestId('png-size').selectOption('a4-300');
  const bytes = await download(page, () => page.getByTestId('export-png').click());
  expect(bytes.subarray(1, 4).toString('latin1')).toBe('PNG');
  expect([bytes.readUInt32BE(16), bytes.readUInt32BE(20)]).toEqual([3508, 2480]);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  expect(pngs, 'PNG downloads: only the second export').toHaveLength(1);
});

test('the SVG embeds the scan file once, its bytes exactly, when the file is read in several pieces', async ({ page }) => {
  // Noise does not compress: a PNG of about 4.6 MB, several 1.5 MiB pieces of the SVG writer.
  const [w, h] = [1400, 1100];
  const png = new PNG({ width: w, height: h });
  let seed = 7;
  for (let i = 0; i < png.data.length; i++) {
    seed = (seed * 1103515245 + 12345) >>> 0;
    png.data[i] = i % 4 === 3 ? 255 : seed >>> 24;
  }
  const scan = PNG.sync.write(png);
  expect(scan.length).toBeGreaterThan(2 * 3 * 1024 * 1024 * 0.7);
  const base = sectionToProjectDoc(SECTION, 'Noise scan');
  const doc: ProjectDoc = { ...base, scan: { id: 'noise-scan', name: 'noise.png', widthPx: w, heightPx: h, type: 'image/png' } };
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('open-project').setInputFiles({ name: 'noise.foldroot.json', mimeType: 'application/json', buffer: Buffer.from(serializeProject(doc, { type: 'image/png', name: 'noise.png', bytes: new Uint8Array(scan) })) });
  await expect(page.getByTestId('scan-name')).toContainText(`noise.png — ${w} × ${h} px`);
  await page.getByTestId('menu-export').click();
  const svg = (await download(page, () => page.getByTestId('export-svg').click())).toString('utf8');
  const hrefs = [...svg.matchAll(/href="data:image\/png;base64,([^"]*)"/g)];
  expect(hrefs).toHaveLength(1);
  expect(Buffer.from(hrefs[0][1], 'base64').equals(scan)).toBe(true);
});

// Opening scans of every supported kind, big scans staying smooth, and the view's readout, grid and
// 1:1 zoom. Fixtures are generated: TIFFs by our own baseline writer, a PDF written by hand, the 100 MP
// scan drawn in the page. Pixel colours encode position (red rises left to right, green top to bottom).
import { readFileSync } from 'node:fs';
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { viewPixel } from './canvasPixels';
import { gradientPng } from './pngFixture';
import { samples16, writeTiff, type TiffPageSpec } from '../fixtures/scans/writeTiff';
import { rectanglePdf } from '../fixtures/scans/onePagePdf';
import { checkStandardFontText } from './standardFontText';

const near = (a: number, b: number, tol = 6) => Math.abs(a - b) <= tol;

/** Opens the app and waits for the demo section, which opens at start (calibrated, in metres). */
async function openApp(page: Page) {
  await gotoStarted(page);
  await expect(page.getByTestId('scan-name')).toContainText('demo/section.png');
  await expect(page.getByTestId('busy')).toHaveCount(0);
}

/** Returns the composited view's pixels along a row, as [r, g, b] per screen column. */
async function viewRow(page: Page, y: number, x0: number, x1: number): Promise<number[][]> {
  return page.evaluate(
    ([py, a, b]) => {
      const box = document.querySelector('[data-testid="section-view"]') as HTMLElement;
      const ratio = window.devicePixelRatio || 1;
      const out: number[][] = [];
      for (let x = a; x < b; x++) out.push([0, 0, 0]);
      for (const c of Array.from(box.querySelectorAll('canvas'))) {
        const d = c.getContext('2d')!.getImageData(Math.round(a * ratio), Math.round(py * ratio), Math.round((b - a) * ratio), 1).data;
        for (let x = 0; x < b - a; x++) {
          const i = Math.round(x * ratio) * 4;
          const alpha = d[i + 3] / 255;
          for (let k = 0; k < 3; k++) out[x][k] = out[x][k] * (1 - alpha) + d[i + k] * alpha;
        }
      }
      return out;
    },
    [y, x0, x1] as const,
  );
}

async function viewCentre(page: Page) {
  const box = (await page.getByTestId('section-view').boundingBox())!;
  return { box, cx: Math.round(box.width / 2), cy: Math.round(box.height / 2) };
}

async function openFile(page: Page, name: string, mimeType: string, bytes: Uint8Array | Buffer) {
  await page.getByTestId('open-image').setInputFiles({ name, mimeType, buffer: Buffer.from(bytes) });
}

/** An 8-bit RGB page whose colours encode position, like gradientPng. */
function gradientRgbPage(width: number, height: number): TiffPageSpec {
  const data = new Uint8Array(width * height * 3);
  for (let v = 0; v < height; v++) {
    for (let u = 0; u < width; u++) {
      const i = (v * width + u) * 3;
      data[i] = Math.round((u / (width - 1)) * 255);
      data[i + 1] = Math.round((v / (height - 1)) * 255);
      data[i + 2] = 90;
    }
  }
  return { width, height, bitsPerSample: 8, samplesPerPixel: 3, photometric: 2, data };
}

test('a generated 100-megapixel scan opens with progress shown, and pans and zooms to 1:1 smoothly', async ({ page }) => {
  test.setTimeout(120_000);
  await openApp(page);
  // Drawn and encoded in the page (faster than in Node), then dropped on the view as a user would.
  const dropped = await page.evaluateHandle(async () => {
    const w = 10000;
    const h = 10000;
    const c = new OffscreenCanvas(w, h);
    const ctx = c.getContext('2d')!;
    const red = ctx.createLinearGradient(0, 0, w, 0);
    red.addColorStop(0, 'rgb(0,0,90)');
    red.addColorStop(1, 'rgb(255,0,90)');
    ctx.fillStyle = red;
    ctx.fillRect(0, 0, w, h);
    ctx.globalCompositeOperation = 'lighter';
    const green = ctx.createLinearGradient(0, 0, 0, h);
    green.addColorStop(0, 'rgb(0,0,0)');
    green.addColorStop(1, 'rgb(0,255,0)');
    ctx.fillStyle = green;
    ctx.fillRect(0, 0, w, h);
    const blob = await c.convertToBlob({ type: 'image/jpeg', quality: 0.9 });
    const dt = new DataTransfer();
    dt.items.add(new File([blob], 'big-section.jpg', { type: 'image/jpeg' }));
    return dt;
  });
  await page.dispatchEvent('.view-box', 'drop', { dataTransfer: dropped });
  await expect(page.getByTestId('busy')).toBeVisible();
  await expect(page.getByTestId('busy')).toContainText('big-section.jpg');
  await expect(page.getByTestId('scan-name')).toContainText('big-section.jpg — 10000 × 10000 px', { timeout: 60_000 });
  await expect(page.getByTestId('busy')).toHaveCount(0);
  const { box, cx, cy } = await viewCentre(page);
  // Zoomed out to fit, it is drawn from its reduced views once they are made: one decoded scan, their tiles held.
  const memory = page.getByTestId('scan-memory');
  await expect(memory).toHaveAttribute('data-building', 'no', { timeout: 60_000 });
  await expect(memory).toHaveAttribute('data-decoded-scans', '1');
  // 10000 px a side: levels 2 to 4 (3 × 3, 2 × 2 and 1 tile of 1024 px); level 1 is not kept.
  await expect(memory).toHaveAttribute('data-reduced-tiles', '14');
  const [r, g, b] = await viewPixel(page, cx, cy);
  expect(near(r, 128, 8) && near(g, 128, 8) && near(b, 90, 8)).toBe(true);
  await page.screenshot({ path: test.info().outputPath('big-fitted.png') });

  // Pan with the middle button: what was at the centre moves with the pointer.
  await page.mouse.move(box.x + cx, box.y + cy);
  await page.mouse.down({ button: 'middle' });
  await page.mouse.move(box.x + cx - 200, box.y + cy + 100, { steps: 20 });
  await page.mouse.up({ button: 'middle' });
  const moved = await viewPixel(page, cx - 200, cy + 100);
  expect(near(moved[0], r, 4) && near(moved[1], g, 4)).toBe(true);

  // 1:1 keeps the view's centre and shows full-resolution tiles there.
  const centreBefore = await viewPixel(page, cx, cy);
  await page.getByTestId('zoom-actual').click();
  await expect(page.getByTestId('zoom-readout')).toHaveText('100 %');
  const centreAfter = await viewPixel(page, cx, cy);
  expect(near(centreAfter[0], centreBefore[0], 4) && near(centreAfter[1], centreBefore[1], 4)).toBe(true);
  // At 1:1, 200 screen pixels to the right are 200 image pixels on: red rises by 200/9999 × 255 ≈ 5.
  const right = await viewPixel(page, cx + 200, cy);
  expect(right[0] - centreAfter[0]).toBeGreaterThanOrEqual(2);
  expect(right[0] - centreAfter[0]).toBeLessThanOrEqual(9);
  // Arrow keys pan across tile boundaries without gaps (no transparent or white pixels at the centre).
  for (let i = 0; i < 15; i++) await page.keyboard.press('ArrowRight');
  const after = await viewPixel(page, cx, cy);
  expect(after[2]).toBeGreaterThan(60);
  expect(after[0]).toBeGreaterThan(centreAfter[0]);
  await page.screenshot({ path: test.info().outputPath('big-actual-size.png') });
});

/** What the page has closed and which object URLs it has made and revoked (window.__scanMemory), from its start. */
async function watchBitmapsAndUrls(page: Page) {
  await page.addInitScript(() => {
    const watch = { closed: [] as string[], made: [] as string[], revoked: [] as string[] };
    (window as unknown as { __scanMemory: typeof watch }).__scanMemory = watch;
    const close = ImageBitmap.prototype.close;
    ImageBitmap.prototype.close = function (this: ImageBitmap) {
      // Its size before it goes (a closed bitmap reads 0 × 0).
      watch.closed.push(`${this.width}x${this.height}`);
      close.call(this);
    };
    const make = URL.createObjectURL.bind(URL);
    const revoke = URL.revokeObjectURL.bind(URL);
    URL.createObjectURL = (o: Blob | MediaSource) => {
      const url = make(o);
      watch.made.push(url);
      return url;
    };
    URL.revokeObjectURL = (url: string) => {
      watch.revoked.push(url);
      revoke(url);
    };
  });
  return () => page.evaluate(() => (window as unknown as { __scanMemory: { closed: string[]; made: string[]; revoked: string[] } }).__scanMemory);
}

test('a scan that replaces another is drawn from its own tiles, and the one it replaced is closed', async ({ page }) => {
  test.setTimeout(120_000);
  const watched = await watchBitmapsAndUrls(page);
  await openApp(page);
  const memory = page.getByTestId('scan-memory');
  // 3000 px a side: levels 0 (the bitmap itself) and 2 (one tile of 750 px); 4200 px: levels 2 (2 × 2) and 3 (1).
  await openFile(page, 'first.png', 'image/png', gradientPng(3000, 3000));
  await expect(page.getByTestId('scan-name')).toContainText('first.png — 3000 × 3000 px', { timeout: 60_000 });
  await expect(memory).toHaveAttribute('data-building', 'no', { timeout: 60_000 });
  await expect(memory).toHaveAttribute('data-decoded-scans', '1');
  await expect(memory).toHaveAttribute('data-reduced-tiles', '1');
  await openFile(page, 'second.png', 'image/png', gradientPng(4200, 4200));
  await expect(page.getByTestId('scan-name')).toContainText('second.png — 4200 × 4200 px', { timeout: 60_000 });
  await expect(memory).toHaveAttribute('data-building', 'no', { timeout: 60_000 });
  // The first scan's bitmap and tile are closed (its bytes stay while undo can bring it back).
  await expect(memory).toHaveAttribute('data-decoded-scans', '1');
  await expect(memory).toHaveAttribute('data-reduced-tiles', '5');
  await expect(memory).toContainText('67 MB at full resolution');
  // The page itself closed the first scan's bitmap and its one tile, and none of the second's.
  await expect.poll(async () => (await watched()).closed.filter((c) => c === '3000x3000' || c === '750x750').sort()).toEqual(['3000x3000', '750x750']);
  expect((await watched()).closed.filter((c) => c === '4200x4200')).toEqual([]);
  // The scratch canvases the reduced views were made through are given back.
  await expect(memory).toHaveAttribute('data-scratch-bytes', '0');
  // Every object URL made while opening and replacing is revoked (a scan is drawn from its bitmap, not a URL).
  const urls = await watched();
  expect(urls.made.filter((u) => !urls.revoked.includes(u))).toEqual([]);
  // Fitted, the view draws the second scan's level 3 tile: its centre has the gradient's middle colour.
  await expect(page.getByTestId('section-view')).toHaveAttribute('data-scan-drawn', 'tiles');
  const { cx, cy } = await viewCentre(page);
  const [r, g] = await viewPixel(page, cx, cy);
  expect(near(r, 128, 8) && near(g, 128, 8)).toBe(true);
  await page.screenshot({ path: test.info().outputPath('replaced-scan.png') });
  // Undo brings the first scan back, decoded again from its bytes, with its own tile; the second is closed.
  await page.keyboard.press('Control+z');
  await expect(page.getByTestId('scan-name')).toContainText('first.png — 3000 × 3000 px');
  await expect(memory).toHaveAttribute('data-building', 'no', { timeout: 60_000 });
  await expect(memory).toHaveAttribute('data-decoded-scans', '1');
  await expect(memory).toHaveAttribute('data-reduced-tiles', '1');
  await expect.poll(async () => (await watched()).closed.filter((c) => c === '4200x4200')).toEqual(['4200x4200']);
  // Fitted to the first scan again, its own tile is drawn: the centre has the gradient's middle colour.
  await page.getByTestId('zoom-fit').click();
  await expect(page.getByTestId('section-view')).toHaveAttribute('data-scan-drawn', 'tiles');
  const [r1, g1] = await viewPixel(page, cx, cy);
  expect(near(r1, 128, 8) && near(g1, 128, 8)).toBe(true);
});

test('an 8-bit RGB TIFF opens with its colours', async ({ page }) => {
  await openApp(page);
  await openFile(page, 'section-rgb.tif', 'image/tiff', writeTiff([gradientRgbPage(400, 200)]));
  await expect(page.getByTestId('scan-name')).toContainText('section-rgb.tif — 400 × 200 px');
  const { cx, cy } = await viewCentre(page);
  const [r, g, b] = await viewPixel(page, cx, cy);
  expect(near(r, 128) && near(g, 128) && b === 90).toBe(true);
});

test('a 16-bit greyscale TIFF (big-endian) opens, scaled to 8 bits', async ({ page }) => {
  await openApp(page);
  const w = 300;
  const h = 150;
  // Left half 16-bit 12850 (= 50 × 257 → 50), right half 51400 (= 200 × 257 → 200).
  const values = Array.from({ length: w * h }, (_, i) => (i % w < w / 2 ? 12850 : 51400));
  await openFile(page, 'depth-16bit.tif', 'image/tiff', writeTiff([{ width: w, height: h, bitsPerSample: 16, samplesPerPixel: 1, photometric: 1, data: samples16(values, true) }], true));
  await expect(page.getByTestId('scan-name')).toContainText('depth-16bit.tif — 300 × 150 px');
  const { cx, cy } = await viewCentre(page);
  const left = await viewPixel(page, cx - 100, cy);
  const right = await viewPixel(page, cx + 100, cy);
  expect(near(left[0], 50, 2) && near(left[1], 50, 2)).toBe(true);
  expect(near(right[0], 200, 2)).toBe(true);
});

test('a palette TIFF opens with the colours of its colour map', async ({ page }) => {
  await openApp(page);
  const map = new Array(3 * 256).fill(0);
  map[1] = 0xffff; // index 1 red
  map[2 * 256 + 2] = 0xffff; // index 2 blue
  const w = 200;
  const data = new Uint8Array(w * 100).map((_, i) => (i % w < w / 2 ? 1 : 2));
  await openFile(page, 'units-palette.tif', 'image/tiff', writeTiff([{ width: w, height: 100, bitsPerSample: 8, samplesPerPixel: 1, photometric: 3, data, colorMap: map }]));
  await expect(page.getByTestId('scan-name')).toContainText('units-palette.tif');
  const { cx, cy } = await viewCentre(page);
  expect((await viewPixel(page, cx - 80, cy)).slice(0, 3)).toEqual([255, 0, 0]);
  expect((await viewPixel(page, cx + 80, cy)).slice(0, 3)).toEqual([0, 0, 255]);
});

test('a multi-page TIFF asks for the page and opens the one chosen', async ({ page }) => {
  await openApp(page);
  const grey = (w: number, h: number, level: number, reduced = false): TiffPageSpec => ({ width: w, height: h, bitsPerSample: 8, samplesPerPixel: 1, photometric: 1, data: new Uint8Array(w * h).fill(level), reduced });
  await openFile(page, 'three-pages.tif', 'image/tiff', writeTiff([grey(320, 160, 40), grey(500, 250, 160), grey(80, 40, 220, true)]));
  const dialog = page.getByTestId('scan-page-dialog');
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText('Page 2: 500 × 250 px, 8-bit grey');
  await expect(dialog).toContainText('(preview)');
  await page.screenshot({ path: test.info().outputPath('tiff-page-dialog.png') });
  await page.getByTestId('scan-page-2').check();
  await page.getByTestId('scan-page-open').click();
  await expect(page.getByTestId('scan-name')).toContainText('three-pages.tif (page 2) — 500 × 250 px');
  const { cx, cy } = await viewCentre(page);
  expect(near((await viewPixel(page, cx, cy))[0], 160, 1)).toBe(true);
});

test('a PDF page opens at the chosen page and resolution', async ({ page }) => {
  await openApp(page);
  const pdf = rectanglePdf([
    { widthPt: 288, heightPt: 144, rgb: [1, 0, 0] },
    { widthPt: 360, heightPt: 180, rgb: [0, 0.5, 1] },
  ]);
  await openFile(page, 'report-figure.pdf', 'application/pdf', pdf);
  const dialog = page.getByTestId('scan-page-dialog');
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText('of 2');
  await page.getByTestId('pdf-page').fill('2');
  await page.getByTestId('pdf-dpi').selectOption('150');
  // 360 pt × 150/72 = 750 px, 180 pt → 375 px.
  await expect(page.getByTestId('pdf-size')).toContainText('750 × 375 px');
  await page.screenshot({ path: test.info().outputPath('pdf-dialog.png') });
  await page.getByTestId('scan-page-open').click();
  await expect(page.getByTestId('scan-name')).toContainText('report-figure.pdf (page 2) — 750 × 375 px');
  const { cx, cy } = await viewCentre(page);
  const [r, g, b] = await viewPixel(page, cx, cy);
  expect(r < 10 && near(g, 128, 4) && b > 245).toBe(true);
  // Near the page's corner is the white background around the rectangle (fitted: 750 px span the view minus margins).
  const { box } = await viewCentre(page);
  const scale = Math.min((box.width - 48) / 750, (box.height - 48) / 375);
  const corner = await viewPixel(page, cx - 340 * scale, cy - 170 * scale);
  expect(corner.slice(0, 3)).toEqual([255, 255, 255]);
  await page.screenshot({ path: test.info().outputPath('pdf-opened.png') });
});

test('text in a standard font the PDF does not embed is drawn from the app\'s own copy of the font data', async ({ page }) => {
  await checkStandardFontText(page, 'pdf-standard-font.png');
});

test('bad files give their message and leave the open scan unchanged', async ({ page }) => {
  await openApp(page);
  await openFile(page, 'good.png', 'image/png', gradientPng(300, 150));
  await expect(page.getByTestId('scan-name')).toContainText('good.png');
  const error = page.getByTestId('message-error');

  const tiff = writeTiff([gradientRgbPage(64, 32)]);
  await openFile(page, 'cut-short.tif', 'image/tiff', tiff.subarray(0, tiff.length - 30));
  await expect(error).toContainText('cut-short.tif has a damaged or truncated TIFF directory');
  await expect(page.getByTestId('scan-name')).toContainText('good.png');

  // A PNG header announcing 20000 × 20000 px (400 MP) is refused before decoding.
  const huge = Buffer.from(gradientPng(4, 4));
  huge.writeUInt32BE(20000, 16);
  huge.writeUInt32BE(20000, 20);
  await openFile(page, 'huge.png', 'image/png', huge);
  await expect(error).toContainText('huge.png is too large to open (400 megapixels, 20000 × 20000 px');
  await expect(error).toContainText('the largest scan Foldroot opens is 200 megapixels');
  await expect(page.getByTestId('scan-name')).toContainText('good.png');

  // A JPEG whose frame header says 64000 × 64000 px is too large, not damaged (ITU T.81: SOF0 carries the size).
  const sof = [0xff, 0xc0, 0, 17, 8, 0xfa, 0x00, 0xfa, 0x00, 3, 1, 0x22, 0, 2, 0x11, 1, 3, 0x11, 1];
  const app0 = [0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0, 1, 1, 0, 0, 1, 0, 1, 0, 0];
  await openFile(page, 'vast.jpg', 'image/jpeg', Buffer.from([0xff, 0xd8, ...app0, ...sof, 0xff, 0xd9]));
  await expect(error).toContainText('vast.jpg is too large to open (4096 megapixels, 64000 × 64000 px; the largest scan Foldroot opens is 200 megapixels)');
  await expect(error).not.toContainText('damaged');
  await expect(page.getByTestId('scan-name')).toContainText('good.png');

  // A TIFF whose strip runs past the end of the file (its pixel data cut short) is called truncated.
  const whole = Buffer.from(writeTiff([gradientRgbPage(64, 32)]));
  const dir = whole.readUInt32LE(4);
  for (let k = 0; k < whole.readUInt16LE(dir); k++) {
    if (whole.readUInt16LE(dir + 2 + 12 * k) === 273) whole.writeUInt32LE(whole.length - 64 * 32 * 3 + 3000, dir + 2 + 12 * k + 8);
  }
  await openFile(page, 'pixels-cut.tif', 'image/tiff', whole);
  await expect(error).toContainText('pixels-cut.tif (page 1) is truncated');
  await expect(page.getByTestId('scan-name')).toContainText('good.png');

  await openFile(page, 'broken.pdf', 'application/pdf', Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> garbage'));
  await expect(error).toContainText('broken.pdf');
  await expect(error).toContainText('could not be read');
  await expect(page.getByTestId('scan-name')).toContainText('good.png');

  await openFile(page, 'notes.docx', 'application/octet-stream', Buffer.from('PK\u0003\u0004 not a scan'));
  await expect(error).toContainText('notes.docx is not a PNG, JPEG, WebP, TIFF or PDF image');
  await expect(page.getByTestId('scan-name')).toContainText('good.png — 300 × 150 px');
  await page.screenshot({ path: test.info().outputPath('bad-file-message.png') });
});

test('the cursor readout shows section x and z of the pixel under the pointer once calibrated', async ({ page }) => {
  await openApp(page);
  // The demo's published mapping (public/demo/calibration.json): control point 0 is at x = 0, z = 2800 m.
  const cal = JSON.parse(readFileSync(new URL('../../public/demo/calibration.json', import.meta.url), 'utf8'));
  const { box } = await viewCentre(page);
  // Zoom to fit, as the app does on opening: 24 px margins, centred.
  const scale = Math.min((box.width - 48) / cal.imageWidthPx, (box.height - 48) / cal.imageHeightPx);
  const ox = (box.width - cal.imageWidthPx * scale) / 2;
  const oy = (box.height - cal.imageHeightPx * scale) / 2;
  for (const p of cal.controlPoints) {
    await page.mouse.move(box.x + ox + p.u * scale, box.y + oy + p.v * scale);
    const text = (await page.getByTestId('cursor-readout').textContent()) ?? '';
    // Negative values carry the minus sign U+2212, as every number the app shows.
    const m = /^x (\u2212?[\d.]+) {2}z (\u2212?[\d.]+) m$/.exec(text.replace(/-/g, 'hyphen'));
    expect(m, text).not.toBeNull();
    // Within one screen pixel of the point (12.5 m of x and 6.25 m of z per scan pixel, from the same file).
    const num = (t: string) => Number(t.replace('\u2212', '-'));
    expect(Math.abs(num(m![1]) - p.x)).toBeLessThanOrEqual(12.5 / scale);
    expect(Math.abs(num(m![2]) - p.z)).toBeLessThanOrEqual(6.25 / scale);
  }
});

test('the grid draws lines in section units over the scan, and follows the view', async ({ page }) => {
  await openApp(page);
  const { cx, cy: centre } = await viewCentre(page);
  // A row a little below the centre: the demo's fit puts the grid line z = 0 m, which runs along the row and
  // changes every column, near the centre itself.
  const cy = centre + 40;
  // The scan is drawn (not the empty view's background) before the row is read.
  await expect.poll(async () => (await viewPixel(page, cx, cy))[3]).toBe(255);
  // The demo is drawn whole until its tiles are cut, then from tiles (resampled a little differently): the
  // row is taken as the picture without a grid once the view says its tiles are drawn.
  await expect(page.getByTestId('section-view')).toHaveAttribute('data-scan-drawn', 'tiles', { timeout: 20_000 });
  const before = await viewRow(page, cy, 60, 660);
  await page.getByTestId('toggle-grid').check();
  await expect(page.getByTestId('toggle-grid')).toBeChecked();
  const differs = (a: number[][], b: number[][]) => a.map((p, i) => Math.abs(p[0] - b[i][0]) + Math.abs(p[1] - b[i][1]) + Math.abs(p[2] - b[i][2]) > 30);
  const changed = (a: number[][], b: number[][]) => differs(a, b).filter(Boolean).length;
  // Runs of changed columns at most 3 px wide: where a vertical grid line crosses the row.
  const narrowRuns = (d: boolean[]) => {
    let runs = 0;
    let len = 0;
    for (const x of [...d, false]) {
      if (x) len += 1;
      else {
        if (len > 0 && len <= 3) runs += 1;
        len = 0;
      }
    }
    return runs;
  };
  // Lines of constant x (every 5000 m at this zoom, ~100 px apart) cross the row as narrow runs once the grid
  // layer has drawn (its next frame); most columns do not change.
  let after = before;
  await expect
    .poll(async () => {
      after = await viewRow(page, cy, 60, 660);
      return narrowRuns(differs(before, after));
    })
    .toBeGreaterThanOrEqual(3);
  await page.screenshot({ path: test.info().outputPath('grid-on-demo.png') });
  expect(changed(before, after)).toBeLessThan(before.length / 2);
  // Off again: the row is as it was.
  await page.getByTestId('toggle-grid').uncheck();
  await expect.poll(async () => changed(before, await viewRow(page, cy, 60, 660))).toBe(0);
});

test('pasting an image opens it, and a trackpad pinch zooms', async ({ page }) => {
  await openApp(page);
  const png = gradientPng(600, 300).toString('base64');
  await page.evaluate(async (b64) => {
    const bytes = Uint8Array.from(atob(b64), (c) => c.charCodeAt(0));
    const dt = new DataTransfer();
    dt.items.add(new File([bytes], 'image.png', { type: 'image/png' }));
    window.dispatchEvent(new ClipboardEvent('paste', { clipboardData: dt, bubbles: true }));
  }, png);
  await expect(page.getByTestId('scan-name')).toContainText('pasted image.png — 600 × 300 px');
  const { box, cx, cy } = await viewCentre(page);
  const [r, g] = await viewPixel(page, cx, cy);
  expect(near(r, 128, 8) && near(g, 128, 8)).toBe(true);
  // A trackpad pinch arrives as a wheel with ctrlKey: 50 units zoom by 1.01^50 ≈ 1.64.
  await page.getByTestId('zoom-actual').click();
  await expect(page.getByTestId('zoom-readout')).toHaveText('100 %');
  await page.mouse.move(box.x + cx, box.y + cy);
  await page.keyboard.down('Control');
  await page.mouse.wheel(0, -50);
  await page.keyboard.up('Control');
  await expect(page.getByTestId('zoom-readout')).toHaveText('164 %');
});

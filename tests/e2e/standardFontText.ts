// A PDF whose text uses a standard font it does not embed, opened as a scan: the check shared by the browser
// tests with and without the computer's own fonts (scans.spec.ts, pdfWithoutHelveticaFonts.spec.ts).
import { statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { helveticaTextPdf } from '../fixtures/scans/onePagePdf';
import { fitCamera } from '../../src/state/camera';

/**
 * Opens a one-line Helvetica PDF (not embedded) at 150 dpi in a new project and checks that pdf.js drew it with the
 * standard font data the app serves: the font file came from the page's own origin, and the drawn text has the ink
 * box of the browser's own drawing of that font file at the same size and place.
 */
export async function checkStandardFontText(page: Page, shot: string): Promise<void> {
  await gotoStarted(page);
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  const fontResponses: { url: string; status: number; bytes: number }[] = [];
  page.on('response', (r) => {
    if (r.url().includes('standard_fonts/')) void r.body().then((b) => fontResponses.push({ url: r.url(), status: r.status(), bytes: b.length }));
  });
  // 432 × 144 pt; "HORIZON" in 72 pt Helvetica with its baseline 48 pt above the bottom, starting 36 pt from the left.
  const pdf = helveticaTextPdf({ widthPt: 432, heightPt: 144, text: 'HORIZON', sizePt: 72, xPt: 36, baselinePt: 48 });
  await page.getByTestId('open-image').setInputFiles({ name: 'legend.pdf', mimeType: 'application/pdf', buffer: Buffer.from(pdf) });
  await page.getByTestId('pdf-dpi').selectOption('150');
  await page.getByTestId('scan-page-open').click();
  // 150 dpi: 432 pt → 900 px, 144 pt → 300 px (scale 150/72).
  await expect(page.getByTestId('scan-name')).toContainText('legend.pdf (page 1) — 900 × 300 px');
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.screenshot({ path: test.info().outputPath(shot) });

  // pdf.js maps Helvetica to LiberationSans-Regular.ttf: it came from the page's own origin, whole (the file in pdfjs-dist).
  const fontFile = join(dirname(createRequire(import.meta.url).resolve('pdfjs-dist/package.json')), 'standard_fonts', 'LiberationSans-Regular.ttf');
  const origin = new URL(page.url()).origin;
  const fontUrl = `${origin}/pdfjs/standard_fonts/LiberationSans-Regular.ttf`;
  await expect.poll(() => fontResponses.length).toBeGreaterThan(0);
  expect(fontResponses).toEqual([{ url: fontUrl, status: 200, bytes: statSync(fontFile).size }]);

  const boxes = await page.evaluate(async (url) => {
    /** Bounding box [x0, y0, x1, y1] (x1, y1 exclusive) of the dark pixels (luminance < 128, opaque) of RGBA data, or null. */
    const inkBox = (d: Uint8ClampedArray, width: number): number[] | null => {
      let box: number[] | null = null;
      for (let i = 0; i < d.length; i += 4) {
        if (d[i + 3] < 128 || 0.299 * d[i] + 0.587 * d[i + 1] + 0.114 * d[i + 2] >= 128) continue;
        const x = (i / 4) % width;
        const y = Math.floor(i / 4 / width);
        box = box ? [Math.min(box[0], x), Math.min(box[1], y), Math.max(box[2], x + 1), Math.max(box[3], y + 1)] : [x, y, x + 1, y + 1];
      }
      return box;
    };
    // The scan layer: the first canvas of the section view.
    const el = document.querySelector('[data-testid="section-view"]') as HTMLElement;
    const c = el.querySelector('canvas')!;
    const drawn = inkBox(c.getContext('2d')!.getImageData(0, 0, c.width, c.height).data, c.width);
    // The reference: the browser's own text drawing of the same font file, 72 pt = 150 px at x = 36 pt = 75 px,
    // baseline 144 − 48 = 96 pt = 200 px from the top of the page.
    const face = new FontFace('reference-face', await (await fetch(url)).arrayBuffer());
    await face.load();
    document.fonts.add(face);
    const ref = new OffscreenCanvas(900, 300);
    const ctx = ref.getContext('2d')!;
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, 900, 300);
    ctx.fillStyle = '#000000';
    ctx.font = '150px reference-face';
    ctx.fillText('HORIZON', 75, 200);
    return { drawn, reference: inkBox(ctx.getImageData(0, 0, 900, 300).data, 900), w: el.clientWidth, h: el.clientHeight, ratio: c.width / el.clientWidth };
  }, fontUrl);
  expect(boxes.drawn, 'dark text pixels on the scan').not.toBeNull();
  expect(boxes.reference).not.toBeNull();
  // The view fits the page (state/camera fitCamera); map the drawn box back to page pixels.
  const cam = fitCamera(900, 300, boxes.w, boxes.h);
  const drawnPx = boxes.drawn!.map((v, k) => (v / boxes.ratio - (k % 2 === 0 ? cam.x : cam.y)) / cam.scale);
  // Same ink box to within 2 page pixels plus one view pixel (the view shows the page at cam.scale).
  const tol = 2 + 1 / cam.scale;
  drawnPx.forEach((v, k) => expect(Math.abs(v - boxes.reference![k]), `edge ${k}: drawn ${drawnPx.map(Math.round)}, reference ${boxes.reference}`).toBeLessThanOrEqual(tol));
}

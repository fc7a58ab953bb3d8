// Reopening a saved scan: a project file opened again, and the work kept in the browser restored after a
// reload, bring a PDF page back at the page and pixel size its lines were digitised on, without asking; a
// scan that no longer decodes to that size is not shown under the lines, and the user is told why.
import type { Page } from '@playwright/test';
import { PNG } from 'pngjs';
import { download } from './download';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { viewPixel } from './canvasPixels';
import { gradientPng } from './pngFixture';
import { rectanglePdf } from '../fixtures/scans/onePagePdf';
import { writeTiff, type TiffPageSpec } from '../fixtures/scans/writeTiff';
import type { ProjectDoc } from '../../src/core/model/projectDoc';
import { serializeProject } from '../../src/io/projectFile';

interface SavedFile { doc: ProjectDoc; scan: { type: string; name: string; dataBase64: string } | null }

// Page 2 is 100 × 150 mm (283.46 × 425.2 pt; 1 in = 25.4 mm = 72 pt), rendered at 150 dpi (not the default 300):
// round(283.46 × 150 / 72) = 591 by round(425.2 × 150 / 72) = 886 px. Scaling by the width alone would give
// round(425.2 × 591 / 283.46) = 887 px high, so this page also checks that both sides come back.
const PAGE2 = { widthPt: 283.46, heightPt: 425.2, rgb: [0, 0.5, 1] as [number, number, number] };
const W = 591;
const H = 886;
// rectanglePdf fills the middle half of the page: u from W/4 to 3W/4, v from H/4 to 3H/4 (the page is symmetric, so
// PDF's upward y does not matter), in the colour (0, 0.5, 1) → (0, 128, 255), on white.
const RECT = { u0: W / 4, u1: (3 * W) / 4, v0: H / 4, v1: (3 * H) / 4 };
const BLUE = [0, 128, 255];
const WHITE = [255, 255, 255];

function twoPagePdf(): Uint8Array {
  return rectanglePdf([{ widthPt: 288, heightPt: 144, rgb: [1, 0, 0] }, PAGE2]);
}

/** The camera the app fits a w × h scan with (state/camera.ts, margin 24). */
async function fitted(page: Page, w = W, h = H) {
  const box = (await page.getByTestId('section-view').boundingBox())!;
  const scale = Math.min((box.width - 48) / w, (box.height - 48) / h);
  return { box, scale, x: (box.width - w * scale) / 2, y: (box.height - h * scale) / 2 };
}
type Cam = Awaited<ReturnType<typeof fitted>>;
/** Screen position of an image pixel position, relative to the section view's box. */
const inView = (cam: Cam, u: number, v: number) => ({ x: cam.x + u * cam.scale, y: cam.y + v * cam.scale });

const near = (a: number[], b: number[], tol = 12) => a.slice(0, 3).every((c, i) => Math.abs(c - b[i]) <= tol);

/** Checks what the view shows: the rectangle's edges where the page puts them in image pixels (4 px either side). */
async function expectRectangleInView(page: Page): Promise<void> {
  const cam = await fitted(page);
  const at = async (u: number, v: number) => {
    const p = inView(cam, u, v);
    return viewPixel(page, p.x, p.y);
  };
  // Wait until the scan is drawn (its tiles may still be cut), then read both sides of each edge away from the line.
  await expect.poll(async () => near(await at((RECT.u0 + RECT.u1) / 2, 300), BLUE)).toBe(true);
  for (const [u, v, colour] of [
    [RECT.u0 - 4, 300, WHITE], [RECT.u0 + 4, 300, BLUE], [RECT.u1 - 4, 300, BLUE], [RECT.u1 + 4, 300, WHITE],
    [200, RECT.v0 - 4, WHITE], [200, RECT.v0 + 4, BLUE], [200, RECT.v1 - 4, BLUE], [200, RECT.v1 + 4, WHITE],
  ] as const) {
    expect(near(await at(u, v), colour), `image (${u}, ${v})`).toBe(true);
  }
}


async function saveProject(page: Page): Promise<SavedFile> {
  const bytes = await download(page, async () => {
    await page.getByTestId('menu-project').click();
    await page.getByTestId('save-project').click();
  });
  return JSON.parse(bytes.toString('utf8'));
}

/** The scan as the app holds it, read from the exported figure (a PDF page is embedded as a PNG of the decoded bitmap); null when the figure has none. */
async function exportedScan(page: Page): Promise<PNG | null> {
  await page.getByTestId('menu-export').click();
  const svg = (await download(page, () => page.getByTestId('export-svg').click())).toString('utf8');
  const m = /<image [^>]*href="data:image\/png;base64,([^"]+)"/.exec(svg);
  return m ? PNG.sync.read(Buffer.from(m[1], 'base64')) : null;
}

function rgbAt(png: PNG, u: number, v: number): number[] {
  const i = 4 * (Math.round(v) * png.width + Math.round(u));
  return [png.data[i], png.data[i + 1], png.data[i + 2]];
}

/** Starts from an empty project (the demo opens first), answering yes to any "discard changes?" question. */
async function freshProject(page: Page): Promise<void> {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
}

async function waitStarted(page: Page): Promise<void> {
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 30_000 });
  await expect(page.getByTestId('busy')).toHaveCount(0);
}

test('a PDF page reopens at its page and size, without asking, from the project file and after a reload', async ({ page }) => {
  test.setTimeout(120_000);
  await freshProject(page);
  await page.getByTestId('open-image').setInputFiles({ name: 'report-figure.pdf', mimeType: 'application/pdf', buffer: Buffer.from(twoPagePdf()) });
  await expect(page.getByTestId('scan-page-dialog')).toBeVisible();
  await page.getByTestId('pdf-page').fill('2');
  await page.getByTestId('pdf-dpi').selectOption('150');
  await expect(page.getByTestId('pdf-size')).toContainText(`${W} × ${H} px`);
  await page.getByTestId('scan-page-open').click();
  await expect(page.getByTestId('scan-name')).toContainText(`report-figure.pdf (page 2) — ${W} × ${H} px`);
  await expectRectangleInView(page);

  // A horizon across the rectangle: its middle vertex on the blue, the ends on the white around it.
  const cam = await fitted(page);
  await page.getByTestId('tool-draw').click();
  for (const u of [60, 295, 530]) {
    const p = inView(cam, u, 443);
    await page.mouse.click(cam.box.x + p.x, cam.box.y + p.y);
  }
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(1);
  const saved = await saveProject(page);
  expect(saved.doc.scan).toMatchObject({ page: 1, widthPx: W, heightPx: H });
  const vertices = saved.doc.horizons[0].pointsPx;
  expect(vertices).toHaveLength(3);
  const before = (await exportedScan(page))!;
  expect([before.width, before.height]).toEqual([W, H]);
  const under = vertices.map(([u, v]) => rgbAt(before, u, v));
  expect([near(under[0], WHITE), near(under[1], BLUE), near(under[2], WHITE)]).toEqual([true, true, true]);

  /** After reopening: no page question, the same pixel size, the same scan under every vertex, the same document. */
  const expectSameAsSaved = async () => {
    await expect(page.getByTestId('scan-page-dialog')).toHaveCount(0);
    await expect(page.getByTestId('scan-name')).toContainText(`report-figure.pdf (page 2) — ${W} × ${H} px`);
    await expect(page.getByTestId('scan-not-shown')).toHaveCount(0);
    await expectRectangleInView(page);
    const after = (await exportedScan(page))!;
    expect([after.width, after.height]).toEqual([W, H]);
    expect(vertices.map(([u, v]) => rgbAt(after, u, v))).toEqual(under);
    const again = await saveProject(page);
    expect(again.doc).toEqual(saved.doc);
    expect(again.scan!.dataBase64).toBe(saved.scan!.dataBase64);
  };

  // Opened from the project file, over a new project: the page dialog would come before the "Opened" message.
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await expect(page.getByTestId('scan-name')).toHaveCount(0);
  await page.getByTestId('open-project').setInputFiles({ name: 'figure.foldroot.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(saved)) });
  // The message area keeps the last message after it fades (data-last-message): the open's end, however late it is read.
  const opened = page.locator('[data-testid="message-area"][data-last-message^="info: Opened figure.foldroot.json."]');
  await expect(opened.or(page.getByTestId('scan-page-dialog')).or(page.getByTestId('message-error'))).toHaveCount(1);
  await expect(page.getByTestId('scan-page-dialog'), 'the page question').toHaveCount(0);
  await expect(opened).toHaveCount(1);
  await expectSameAsSaved();

  // Restored after a reload from the work kept in the browser: start-up would wait on the page dialog.
  await expect(page.getByTestId('autosave-status')).toHaveText('Saved · kept in browser');
  await page.reload();
  await expect(page.locator('[data-startup="done"]').or(page.getByTestId('scan-page-dialog'))).toHaveCount(1, { timeout: 30_000 });
  await expect(page.getByTestId('scan-page-dialog'), 'the page question').toHaveCount(0);
  await waitStarted(page);
  await expect(page.getByTestId('restore-banner')).toBeVisible();
  await expectSameAsSaved();
  await page.screenshot({ path: test.info().outputPath('pdf-page-restored.png') });
});

test('a page of a multi-page TIFF reopens at that page, without asking, from the project file and after a reload', async ({ page }) => {
  test.setTimeout(90_000);
  await freshProject(page);
  // Three grey pages of different sizes and levels (TIFF 6.0 baseline, written by our own writer); the second is wanted.
  const grey = (w: number, h: number, level: number): TiffPageSpec => ({ width: w, height: h, bitsPerSample: 8, samplesPerPixel: 1, photometric: 1, data: new Uint8Array(w * h).fill(level) });
  await page.getByTestId('open-image').setInputFiles({ name: 'three-pages.tif', mimeType: 'image/tiff', buffer: Buffer.from(writeTiff([grey(320, 160, 40), grey(500, 250, 160), grey(400, 200, 220)])) });
  await expect(page.getByTestId('scan-page-dialog')).toBeVisible();
  await page.getByTestId('scan-page-2').check();
  await page.getByTestId('scan-page-open').click();
  await expect(page.getByTestId('scan-name')).toContainText('three-pages.tif (page 2) — 500 × 250 px');
  const saved = await saveProject(page);
  expect(saved.doc.scan).toMatchObject({ page: 1, widthPx: 500, heightPx: 250 });

  const expectPage2 = async () => {
    await expect(page.getByTestId('scan-page-dialog')).toHaveCount(0);
    await expect(page.getByTestId('scan-name')).toContainText('three-pages.tif (page 2) — 500 × 250 px');
    const cam = await fitted(page, 500, 250);
    const centre = inView(cam, 250, 125);
    await expect.poll(async () => (await viewPixel(page, centre.x, centre.y)).slice(0, 3)).toEqual([160, 160, 160]);
    const scan = (await exportedScan(page))!;
    expect([scan.width, scan.height, ...rgbAt(scan, 250, 125)]).toEqual([500, 250, 160, 160, 160]);
  };

  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await page.getByTestId('open-project').setInputFiles({ name: 'tiff.foldroot.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(saved)) });
  // The message area keeps the last message after it fades (data-last-message): the open's end, however late it is read.
  const opened = page.locator('[data-testid="message-area"][data-last-message^="info: Opened tiff.foldroot.json."]');
  await expect(opened.or(page.getByTestId('scan-page-dialog')).or(page.getByTestId('message-error'))).toHaveCount(1);
  await expect(page.getByTestId('scan-page-dialog'), 'the page question').toHaveCount(0);
  await expectPage2();

  await expect(page.getByTestId('autosave-status')).toHaveText('Saved · kept in browser');
  await page.reload();
  await expect(page.locator('[data-startup="done"]').or(page.getByTestId('scan-page-dialog'))).toHaveCount(1, { timeout: 30_000 });
  await expect(page.getByTestId('scan-page-dialog'), 'the page question').toHaveCount(0);
  await waitStarted(page);
  await expectPage2();
});

test('a saved scan that decodes to another size than its lines were digitised on is not shown, and the user is told why', async ({ page }) => {
  test.setTimeout(90_000);
  await freshProject(page);
  await page.getByTestId('open-image').setInputFiles({ name: 'field-sheet.png', mimeType: 'image/png', buffer: gradientPng(300, 200) });
  await expect(page.getByTestId('scan-name')).toContainText('field-sheet.png — 300 × 200 px');
  await page.getByTestId('import-csv').setInputFiles({ name: 'h.csv', mimeType: 'text/csv', buffer: Buffer.from('horizon,x_m,z_m\nTop,0,10\nTop,50,30\nTop,100,10\n') });
  await page.getByTestId('import-confirm').click();
  const good = await saveProject(page);
  // The same file with the scan's recorded size changed (as a file edited by hand, or a scan replaced by another
  // of the same name), its check rewritten so that it opens: the 300 × 200 px image no longer matches 600 × 400 px.
  const doc = { ...good.doc, scan: { ...good.doc.scan!, widthPx: 600, heightPx: 400 } };
  const text = serializeProject(doc, { type: good.scan!.type, name: good.scan!.name, bytes: Buffer.from(good.scan!.dataBase64, 'base64') });

  const expectNotShown = async (said: string | null) => {
    const error = page.getByTestId('message-error');
    if (said) await expect(error).toContainText(said);
    await expect(error).toContainText('The scan "field-sheet.png" now opens at 300 × 200 px, but the lines were digitised on it at 600 × 400 px, so they would not line up with it.');
    await expect(error).toContainText('The scan is not shown; the horizons, calibration, pins and regionals are unchanged');
    await expect(page.getByTestId('scan-not-shown')).toContainText('Not shown: The scan "field-sheet.png" now opens at 300 × 200 px');
    // The work is open; where the scan would be is the blank sheet, not the image.
    await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(1);
    await expect(page.getByTestId('scan-name')).toContainText('field-sheet.png — 600 × 400 px');
    await page.screenshot({ path: test.info().outputPath(said ? 'scan-not-shown-opened.png' : 'scan-not-shown-restored.png') });
    const cam = await fitted(page, 600, 400);
    const centre = inView(cam, 300, 100);
    expect((await viewPixel(page, centre.x, centre.y)).slice(0, 3)).toEqual(WHITE);
    expect(await exportedScan(page)).toBeNull();
    // Nothing is lost: saving again writes the same document and the scan's bytes.
    const again = await saveProject(page);
    expect(again.doc).toEqual(doc);
    expect(again.scan!.dataBase64).toBe(good.scan!.dataBase64);
  };

  await page.getByTestId('open-project').setInputFiles({ name: 'edited.foldroot.json', mimeType: 'application/json', buffer: Buffer.from(text) });
  await expectNotShown('Opened edited.foldroot.json.');
  await page.getByTestId('message-error').getByRole('button', { name: 'Dismiss' }).click();

  // Restored after a reload: told again, and the bytes are still kept in the browser.
  await expect(page.getByTestId('autosave-status')).toHaveText('Saved · kept in browser');
  await page.reload();
  await waitStarted(page);
  await expect(page.getByTestId('restore-banner')).toBeVisible();
  await expectNotShown(null);
});

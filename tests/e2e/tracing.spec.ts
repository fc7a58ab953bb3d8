// Traced drawing with real mouse events on a generated scan whose lines are known exactly: a few clicks per
// horizon, the stretches between them following the ink (and a boundary between two colour fills drawn
// without ink), zooming in the middle of a line; the saved vertices are checked against the true curves.
import type { Page } from '@playwright/test';
import { PNG } from 'pngjs';
import { distanceToCurve, fromFrame, renderScan, sineCurve, straightCurve, type Curve, type ScanSpec } from '../core/trace/syntheticScan';
import { test, expect } from './guard';
import { gotoStarted } from './startup';

const W = 1600;
const H = 600;
const inkA = sineCurve(170, 40, 900, 0.4);
const inkB = sineCurve(330, 30, 1300, 2.0);
const boundary = sineCurve(470, 25, 1100, 1.0);
const SPEC: ScanSpec = {
  w: W, h: H, paper: [240, 233, 216], angleRad: 0.012, noise: 5, seed: 21,
  layers: [
    { kind: 'fill', below: straightCurve(400, 0), colour: [222, 200, 140] },
    { kind: 'fill', below: boundary, colour: [160, 186, 210] },
    { kind: 'ink', curve: inkA, widthPx: 2.5, colour: [30, 28, 26] },
    { kind: 'ink', curve: inkB, widthPx: 2.5, colour: [30, 28, 26] },
  ],
};

function scanPng(): Buffer {
  const scan = renderScan(SPEC);
  const png = new PNG({ width: W, height: H });
  png.data.set(scan.rgba);
  return PNG.sync.write(png);
}

async function camera(page: Page) {
  const box = (await page.getByTestId('section-view').boundingBox())!;
  const scale = Math.min((box.width - 48) / W, (box.height - 48) / H);
  return { box, scale, x: (box.width - W * scale) / 2, y: (box.height - H * scale) / 2 };
}
type Cam = Awaited<ReturnType<typeof camera>>;
const toScreen = (cam: Cam, p: [number, number]) => ({ x: cam.box.x + cam.x + p[0] * cam.scale, y: cam.box.y + cam.y + p[1] * cam.scale });

/** The image point on a curve at frame u, nudged `off` px below it (a click beside the line). */
const onCurve = (curve: Curve, u: number, off = 0) => fromFrame(SPEC, u, curve.f(u) + off);

async function savedHorizons(page: Page): Promise<{ name: string; pointsPx: [number, number][] }[]> {
  const [dl] = await Promise.all([page.waitForEvent('download'), (async () => {
    await page.getByTestId('menu-project').click();
    await page.getByTestId('save-project').click();
  })()]);
  const chunks: Buffer[] = [];
  for await (const c of await dl.createReadStream()) chunks.push(c as Buffer);
  return JSON.parse(Buffer.concat(chunks).toString('utf8')).doc.horizons;
}

function rms(curve: Curve, pts: [number, number][]): number {
  let s = 0;
  for (const p of pts) s += distanceToCurve(SPEC, curve, p[0], p[1]) ** 2;
  return Math.sqrt(s / pts.length);
}

/** Moves to each anchor in steps (the preview follows), clicking it; double-clicks the last. */
async function trace(page: Page, cam: Cam, anchors: [number, number][], between?: (i: number) => Promise<Cam>) {
  let c = cam;
  for (const [i, a] of anchors.entries()) {
    const p = toScreen(c, a);
    await page.mouse.move(p.x, p.y, { steps: 8 });
    if (i === anchors.length - 1) await page.mouse.dblclick(p.x, p.y);
    else await page.mouse.click(p.x, p.y);
    if (between) c = await between(i);
  }
}

test('traces three horizons with four clicks each; the vertices sit on the drawn lines', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await page.getByTestId('open-image').setInputFiles({ name: 'traced.png', mimeType: 'image/png', buffer: scanPng() });
  await expect(page.getByTestId('scan-name')).toContainText('traced.png');
  const cam = await camera(page);
  await page.getByTestId('tool-draw').click();
  await expect(page.getByTestId('follow-line')).toBeChecked();

  const us = [40, 560, 1080, 1560];
  // Clicks up to 3 px beside the line: snapping puts each anchor on it.
  await trace(page, cam, us.map((u, i) => onCurve(inkA, u, i % 2 ? 3 : -2)));
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(1);

  // The second horizon: mid-line, half-way, look at the live preview, then zoom in and out with the wheel.
  await trace(page, cam, us.map((u) => onCurve(inkB, u, 2)), async (i) => {
    if (i !== 1) return cam;
    const next = toScreen(cam, onCurve(inkB, 820));
    await page.mouse.move(next.x, next.y, { steps: 6 });
    await expect(page.getByTestId('tool-hint')).toHaveAttribute('data-state', 'placing');
    await page.screenshot({ path: test.info().outputPath('tracing-preview.png') });
    await page.mouse.wheel(0, -300);
    await page.mouse.wheel(0, 300);
    await page.getByTestId('zoom-fit').click();
    return camera(page);
  });
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(2);

  // The third follows the boundary between two colour fills (no ink line).
  await trace(page, cam, us.map((u) => onCurve(boundary, u, 1)));
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(3);
  await page.screenshot({ path: test.info().outputPath('tracing-done.png') });

  const horizons = await savedHorizons(page);
  expect(horizons).toHaveLength(3);
  const [a, b, c] = horizons.map((h) => h.pointsPx);
  // Followed, not straight: many vertices from four clicks; on the ink to the targets (0.5 px, 1 px on a boundary).
  for (const pts of [a, b, c]) expect(pts.length).toBeGreaterThan(20);
  expect(rms(inkA, a)).toBeLessThan(0.5);
  expect(rms(inkB, b)).toBeLessThan(0.5);
  expect(rms(boundary, c)).toBeLessThan(1);
});

test('Alt-click places a straight stretch; Backspace and Ctrl+Z take back the last stretch, while drawing and after', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await page.getByTestId('open-image').setInputFiles({ name: 'traced.png', mimeType: 'image/png', buffer: scanPng() });
  await expect(page.getByTestId('scan-name')).toContainText('traced.png');
  const cam = await camera(page);
  await page.getByTestId('tool-draw').click();
  const first = toScreen(cam, onCurve(inkA, 100));
  const second = toScreen(cam, onCurve(inkA, 700));
  const off = toScreen(cam, [900, 60]);
  await page.mouse.click(first.x, first.y);
  await page.mouse.move(second.x, second.y, { steps: 6 });
  await page.mouse.click(second.x, second.y);
  // A straight stretch to a point on bare paper, then taken back.
  await page.keyboard.down('Alt');
  await page.mouse.click(off.x, off.y);
  await page.keyboard.up('Alt');
  await page.keyboard.press('Backspace');
  // Ctrl+Z then Ctrl+Y while drawing: the traced stretch is taken back and put back.
  await page.keyboard.press('Control+z');
  await page.keyboard.press('Control+y');
  // One more straight stretch, kept this time, then finish.
  const end = toScreen(cam, [1000, 160]);
  await page.keyboard.down('Alt');
  await page.mouse.click(end.x, end.y);
  await page.keyboard.up('Alt');
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(1);
  const [whole] = await savedHorizons(page);
  expect(whole.pointsPx.at(-1)![0]).toBeCloseTo(1000, 6);
  // After finishing, Ctrl+Z takes back the last stretch (the straight one) and keeps the traced one.
  await page.keyboard.press('Control+z');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(1);
  const [h] = await savedHorizons(page);
  expect(h.pointsPx).toEqual(whole.pointsPx.slice(0, -1));
  // The traced stretch is kept (many vertices, all on the line); the straight ones are gone.
  expect(h.pointsPx.length).toBeGreaterThan(8);
  expect(rms(inkA, h.pointsPx)).toBeLessThan(0.5);
  expect(h.pointsPx.reduce((m, p) => Math.max(m, p[0]), -Infinity)).toBeLessThan(710);
  // One more undo removes the line; redo brings back its first stretch.
  await page.keyboard.press('Control+z');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(0);
  await page.keyboard.press('Control+y');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(1);
});

// The app shell: load, open a scan, zoom about the cursor, refuse a corrupt file, stay offline.
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { gradientPng } from './pngFixture';
import { viewPixel } from './canvasPixels';
import type { Page } from '@playwright/test';

/** Opens the app and waits for the demo section, which opens at start. */
async function openApp(page: Page) {
  await gotoStarted(page);
  await expect(page.getByTestId('scan-name')).toContainText('demo/section.png');
}

test('the page loads with the section view and the demo, and no console errors', async ({ page }) => {
  await openApp(page);
  await expect(page.getByText('Foldroot', { exact: true })).toBeVisible();
  await expect(page.getByTestId('section-view').locator('canvas').first()).toBeVisible();
});

test('opening a generated PNG shows it fitted in the view', async ({ page }) => {
  await openApp(page);
  await page.getByTestId('open-image').setInputFiles({ name: 'gradient.png', mimeType: 'image/png', buffer: gradientPng(400, 200) });
  await expect(page.getByTestId('scan-name')).toContainText('gradient.png — 400 × 200 px');
  const box = (await page.getByTestId('section-view').boundingBox())!;
  // Fitted: the image centre is at the view centre; its colour is mid-red, mid-green (the generator's encoding).
  // The scan may be drawn a frame or more after its name shows: wait for the picture, then check it.
  await expect.poll(async () => (await viewPixel(page, box.width / 2, box.height / 2))[2]).toBe(90);
  const [r, g, b] = await viewPixel(page, box.width / 2, box.height / 2);
  expect(Math.abs(r - 128)).toBeLessThan(8);
  expect(Math.abs(g - 128)).toBeLessThan(8);
  expect(b).toBe(90);
  await page.screenshot({ path: test.info().outputPath('shell-with-scan.png') });
});

test('the wheel zooms about the cursor', async ({ page }) => {
  await openApp(page);
  await page.getByTestId('open-image').setInputFiles({ name: 'gradient.png', mimeType: 'image/png', buffer: gradientPng(600, 300) });
  await expect(page.getByTestId('scan-name')).toBeVisible();
  const box = (await page.getByTestId('section-view').boundingBox())!;
  const cx = box.width * 0.3;
  const cy = box.height * 0.45;
  const under = await viewPixel(page, cx, cy);
  const elsewhere = await viewPixel(page, box.width * 0.7, box.height * 0.55);
  const before = await page.getByTestId('zoom-readout').textContent();
  await page.mouse.move(box.x + cx, box.y + cy);
  for (let i = 0; i < 4; i++) await page.mouse.wheel(0, -200);
  await expect(page.getByTestId('zoom-readout')).not.toHaveText(before ?? '');
  const underAfter = await viewPixel(page, cx, cy);
  const elsewhereAfter = await viewPixel(page, box.width * 0.7, box.height * 0.55);
  // The image pixel under the cursor stays put (same encoded colour, to rounding) ...
  expect(Math.abs(underAfter[0] - under[0])).toBeLessThanOrEqual(3);
  expect(Math.abs(underAfter[1] - under[1])).toBeLessThanOrEqual(3);
  // ... while the rest of the image moves away from it.
  expect(Math.abs(elsewhereAfter[0] - elsewhere[0]) + Math.abs(elsewhereAfter[1] - elsewhere[1])).toBeGreaterThan(10);
});

test('space-drag pans the view', async ({ page }) => {
  await openApp(page);
  await page.getByTestId('open-image').setInputFiles({ name: 'gradient.png', mimeType: 'image/png', buffer: gradientPng(600, 300) });
  await expect(page.getByTestId('scan-name')).toBeVisible();
  const box = (await page.getByTestId('section-view').boundingBox())!;
  const at = await viewPixel(page, box.width / 2, box.height / 2);
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.keyboard.down('Space');
  await page.mouse.down();
  await page.mouse.move(box.x + box.width / 2 - 150, box.y + box.height / 2, { steps: 5 });
  await page.mouse.up();
  await page.keyboard.up('Space');
  // What was at the centre is now 150 px to the left.
  const moved = await viewPixel(page, box.width / 2 - 150, box.height / 2);
  expect(Math.abs(moved[0] - at[0])).toBeLessThanOrEqual(3);
  expect(Math.abs(moved[1] - at[1])).toBeLessThanOrEqual(3);
});

test('a corrupt image gives a clear message and changes nothing', async ({ page }) => {
  await openApp(page);
  await page.getByTestId('open-image').setInputFiles({ name: 'good.png', mimeType: 'image/png', buffer: gradientPng(300, 150) });
  await expect(page.getByTestId('scan-name')).toContainText('good.png');
  const truncated = gradientPng(300, 150).subarray(0, 80);
  await page.getByTestId('open-image').setInputFiles({ name: 'broken.png', mimeType: 'image/png', buffer: truncated });
  await expect(page.getByTestId('message-error')).toContainText('broken.png');
  await expect(page.getByTestId('message-error')).toContainText('could not be decoded');
  await expect(page.getByTestId('scan-name')).toContainText('good.png');
  await page.getByTestId('open-image').setInputFiles({ name: 'notes.txt', mimeType: 'text/plain', buffer: Buffer.from('not a picture') });
  await expect(page.getByTestId('message-error')).toContainText('is not a PNG, JPEG, WebP');
  await expect(page.getByTestId('scan-name')).toContainText('good.png');
});

test('the view stays fitted when the window changes size, and once zoomed keeps its centre instead', async ({ page }) => {
  await openApp(page);
  await page.getByTestId('open-image').setInputFiles({ name: 'gradient.png', mimeType: 'image/png', buffer: gradientPng(1000, 500) });
  await expect(page.getByTestId('scan-name')).toContainText('gradient.png — 1000 × 500 px');
  // Fitted as on opening: 24 px margins, centred. The generated image's colour says which pixel is shown
  // (red = u / 999 · 255, green = v / 499 · 255), so each sampled point must show the image pixel the fit puts there.
  const expectFitted = async () => {
    const box = (await page.getByTestId('section-view').boundingBox())!;
    const scale = Math.min((box.width - 48) / 1000, (box.height - 48) / 500);
    const ox = (box.width - 1000 * scale) / 2;
    const oy = (box.height - 500 * scale) / 2;
    for (const [u, v] of [[40, 30], [960, 470], [500, 250], [150, 420]]) {
      const [r, g] = await viewPixel(page, ox + u * scale, oy + v * scale);
      expect(Math.abs(r - (u / 999) * 255), `red at image (${u}, ${v})`).toBeLessThanOrEqual(4);
      expect(Math.abs(g - (v / 499) * 255), `green at image (${u}, ${v})`).toBeLessThanOrEqual(4);
    }
  };
  await expectFitted();
  for (const [width, height] of [[1150, 760], [1600, 980]]) {
    await page.setViewportSize({ width, height });
    await expect.poll(async () => (await page.getByTestId('section-view').boundingBox())!.width).not.toBe(0);
    await expect(async () => expectFitted()).toPass({ timeout: 5_000 });
  }
  await page.screenshot({ path: test.info().outputPath('fitted-after-resize.png') });

  // Zoomed in by the user, a size change keeps what is at the view's centre there, at the same zoom.
  const box = (await page.getByTestId('section-view').boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.45, box.y + box.height * 0.55);
  for (let i = 0; i < 3; i++) await page.mouse.wheel(0, -200);
  const zoom = await page.getByTestId('zoom-readout').textContent();
  const atCentre = await viewPixel(page, box.width / 2, box.height / 2);
  await page.setViewportSize({ width: 1250, height: 820 });
  await expect(async () => {
    const now = (await page.getByTestId('section-view').boundingBox())!;
    expect(now.width).toBeLessThan(box.width);
    const c = await viewPixel(page, now.width / 2, now.height / 2);
    expect(Math.abs(c[0] - atCentre[0]) + Math.abs(c[1] - atCentre[1])).toBeLessThanOrEqual(4);
  }).toPass({ timeout: 5_000 });
  await expect(page.getByTestId('zoom-readout')).toHaveText(zoom ?? '');
  await page.screenshot({ path: test.info().outputPath('zoomed-after-resize.png') });
});

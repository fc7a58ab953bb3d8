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

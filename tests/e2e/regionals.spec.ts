// Regionals a geologist knows from wells or thicknesses: typed as elevations at the pins, as one flat
// elevation, or through a point at a dip; the typed fields and a drag on the section stay in step, and
// each typed value is one undo step. Proposed regionals sit on the bed near the pins. Elevations follow
// from the generated scan's calibration (10 m per pixel, z = 1000 m at the top: z = 1000 − 10 v) and
// plane trigonometry (a dip θ drops tan θ per unit across).
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { clickAt, fittedScan, screen, type Cam } from './fittedScan';
import { gradientPng } from './pngFixture';

const W = 1000;
const H = 500;

const fitted = (page: Page) => fittedScan(page, W, H);

async function setUp(page: Page): Promise<Cam> {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await page.getByTestId('open-image').setInputFiles({ name: 'section.png', mimeType: 'image/png', buffer: gradientPng(W, H) });
  await expect(page.getByTestId('scan-name')).toContainText('section.png');
  const cam = await fitted(page);
  await page.getByTestId('tool-calibrate').click();
  await page.getByTestId('cal-mode-affine').click();
  for (const [k, [u, v]] of ([[50, 50], [950, 60], [940, 450], [60, 440]] as [number, number][]).entries()) {
    await clickAt(page, cam, u, v);
    await expect(page.getByTestId(`cal-x-${k}`)).toBeFocused();
    await page.getByTestId(`cal-x-${k}`).fill(String(10 * u));
    await page.getByTestId(`cal-z-${k}`).fill(String(1000 - 10 * v));
    await page.getByTestId(`cal-z-${k}`).press('Enter');
  }
  // One anticline at v = 300 (z = −2000 m), 100 px high, between u = 150 and 850, with a vertex every 25 px.
  await page.getByTestId('tool-draw').click();
  for (let u = 50; u <= 950; u += 25) {
    const t = u > 150 && u < 850 ? Math.sin((Math.PI * (u - 150)) / 700) ** 2 : 0;
    await clickAt(page, cam, u, 300 - 100 * t);
  }
  await page.keyboard.press('Enter');
  await page.getByTestId('tool-pins').click();
  await clickAt(page, cam, 100, 470);
  await clickAt(page, cam, 900, 470);
  await page.getByTestId('pin-left-x').fill('1000');
  await page.getByTestId('pin-left-x').press('Enter');
  await page.getByTestId('pin-right-x').fill('9000');
  await page.getByTestId('pin-right-x').press('Enter');
  await expect(page.getByTestId('pin-width')).toContainText('8000 m');
  await page.getByTestId('horizon-row-h1').click({ position: { x: 8, y: 10 } });
  await expect(page.getByTestId('regional-fields')).toBeVisible();
  return cam;
}

test('a regional is typed at the pins, flat, or through a point at a dip; drag and fields stay in step; one undo per value', async ({ page }) => {
  const cam = await setUp(page);
  const summary = page.getByTestId('regional-summary');
  await expect(summary).toContainText('No regional yet');

  // Elevations at both pins: the left one first gives a flat regional, the right one tilts it.
  await page.getByTestId('regional-z-left').fill('-2000');
  await page.getByTestId('regional-z-left').press('Enter');
  await expect(summary).toContainText('mean elevation −2000 m, dip 0°');
  await page.getByTestId('regional-z-right').fill('-2080');
  await page.getByTestId('regional-z-right').press('Enter');
  // Mean (−2000 − 2080) / 2 = −2040; dip atan(80 / 8000) = 0.573° down to the right.
  await expect(summary).toContainText('mean elevation −2040 m, dip 0.573° down to the right');
  await expect(page.getByTestId('strip-area-h1')).toHaveText(/\d (km²|m²)$/);
  await page.screenshot({ path: test.info().outputPath('regional-typed.png') });

  // One undo step per typed value: Ctrl+Z takes back the right pin's value only.
  await page.getByTestId('section-view').focus();
  await page.keyboard.press('Control+z');
  await expect(summary).toContainText('mean elevation −2000 m, dip 0°');
  await expect(page.getByTestId('regional-z-right')).toHaveValue('-2000');

  // Flat at one elevation.
  await page.getByTestId('regional-z-flat').fill('-1990');
  await page.getByTestId('regional-z-flat').press('Enter');
  await expect(page.getByTestId('regional-z-left')).toHaveValue('-1990');
  await expect(page.getByTestId('regional-z-right')).toHaveValue('-1990');

  // Through x = 1000 (the left pin), z = −1990 at a dip of 2°: at the right pin −1990 − 8000 tan 2° = −2269.37.
  await page.getByTestId('regional-through-x').fill('1000');
  await page.getByTestId('regional-through-x').press('Enter');
  await expect(page.getByTestId('regional-through-z')).toHaveValue('-1990');
  await page.getByTestId('regional-dip').fill('2');
  await page.getByTestId('regional-dip').press('Enter');
  await expect(page.getByTestId('regional-z-right')).toHaveValue(String(Math.round((-1990 - 8000 * Math.tan((2 * Math.PI) / 180)) * 100) / 100));
  await expect(page.getByTestId('regional-z-left')).toHaveValue('-1990');
  await expect(summary).toContainText('dip 2° down to the right');
  // A dip of 90° is refused with a message, and the regional stays.
  await page.getByTestId('regional-dip').fill('90');
  await page.getByTestId('regional-dip').press('Enter');
  await expect(page.getByTestId('message-error')).toContainText('a dip must lie between −90° and 90°');
  await expect(summary).toContainText('dip 2° down to the right');

  // Back to flat at −2000 m (v = 300), then drag the regional up 10 px (100 m) with the Regional tool:
  // the fields follow the drag.
  await page.getByTestId('regional-z-flat').fill('-2000');
  await page.getByTestId('regional-z-flat').press('Enter');
  await expect(summary).toContainText('mean elevation −2000 m, dip 0°');
  await page.getByTestId('tool-regional').click();
  const grab = screen(cam, 500, 300);
  await page.mouse.move(grab.x, grab.y);
  await page.mouse.down();
  await page.mouse.move(grab.x, grab.y - 10 * cam.scale, { steps: 4 });
  await page.mouse.up();
  // The drag moves the regional by whole screen pixels: about 100 m up, the same at both pins.
  const left = Number(await page.getByTestId('regional-z-left').inputValue());
  const right = Number(await page.getByTestId('regional-z-right').inputValue());
  expect(left).toBeGreaterThan(-2000 + 100 - 10 / cam.scale * 10);
  expect(left).toBeLessThan(-2000 + 100 + 10 / cam.scale * 10);
  expect(right).toBeCloseTo(left, 6);
  await expect(page.getByTestId('regional-z-flat')).toHaveValue(String(left));
  // The drag was one undo step: Ctrl+Z puts it back at −2000 m.
  await page.keyboard.press('Control+z');
  await expect(page.getByTestId('regional-z-left')).toHaveValue('-2000');
});

test('Propose regional puts the regional on the bed near the pins, not below it', async ({ page }) => {
  await setUp(page);
  await page.getByTestId('propose-regional').click();
  // The bed is flat at v = 300 near both pins (z = −2000 m): the clicks land within a screen pixel of it.
  const left = Number(await page.getByTestId('regional-z-left').inputValue());
  const right = Number(await page.getByTestId('regional-z-right').inputValue());
  for (const z of [left, right]) expect(Math.abs(z + 2000)).toBeLessThan(10);
  await page.screenshot({ path: test.info().outputPath('regional-proposed.png') });
});

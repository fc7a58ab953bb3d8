// Gestures and layout on a geologist's working day: a click just after an arrow-key pan is a new vertex,
// not the end of the line; messages hide nothing; the results strip lies below the section view, not over
// it; the pins fields stay within reach with four horizons at 1600 × 1000.
import { readFileSync } from 'node:fs';
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { freshProject, gotoStarted } from './startup';
import { gradientPng } from './pngFixture';
import type { ProjectDoc } from '../../src/core/model/projectDoc';

async function savedDoc(page: Page): Promise<ProjectDoc> {
  const [dl] = await Promise.all([page.waitForEvent('download'), (async () => {
    await page.getByTestId('menu-project').click();
    await page.getByTestId('save-project').click();
  })()]);
  return JSON.parse(readFileSync((await dl.path())!, 'utf8')).doc;
}

test('a click at the same screen spot just after an arrow-key pan adds a vertex and does not end the line', async ({ page }) => {
  await freshProject(page);
  await page.getByTestId('open-image').setInputFiles({ name: 'scan.png', mimeType: 'image/png', buffer: gradientPng(1600, 1200) });
  await expect(page.getByTestId('scan-name')).toContainText('scan.png');
  await page.getByTestId('zoom-actual').click();
  await page.getByTestId('tool-draw').click();
  const hint = page.getByTestId('tool-hint');
  for (const x of [500, 600, 700]) await page.mouse.click(x, 500);
  await expect(hint).toHaveAttribute('data-state', 'placing');
  // Pan with → (the view moves), then click the same screen spot at once: a different point of the scan.
  await page.keyboard.press('ArrowRight');
  await page.mouse.click(700, 500);
  await expect(hint).toHaveAttribute('data-state', 'placing');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(0);
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(1);
  const doc = await savedDoc(page);
  const pts = doc.horizons[0].pointsPx;
  expect(pts).toHaveLength(4);
  // The fourth vertex lies to the right of the third by the pan step, in scan pixels at 1:1.
  expect(pts[3][0]).toBeGreaterThan(pts[2][0] + 5);
  // A real double-click without a pan still ends a line.
  for (const x of [500, 600]) await page.mouse.click(x, 650);
  await page.mouse.dblclick(700, 650);
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(2);
  await expect(hint).toHaveAttribute('data-state', 'idle');
});

/** Returns true when two boxes overlap by more than a pixel. */
const overlaps = (a: { x: number; y: number; width: number; height: number }, b: { x: number; y: number; width: number; height: number }) =>
  a.x + 1 < b.x + b.width && b.x + 1 < a.x + a.width && a.y + 1 < b.y + b.height && b.y + 1 < a.y + a.height;

test('messages hide neither the pane\'s scenario selector and hide button nor the section; the strip lies below the view', async ({ page }) => {
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  // An error (stays until dismissed): a refused pin value.
  await page.getByTestId('pin-left-x').fill('abc');
  await page.getByTestId('pin-left-x').press('Enter');
  const message = page.getByTestId('message-error');
  await expect(message).toContainText('is not a number');
  const m = (await message.boundingBox())!;
  for (const id of ['scenario-select', 'pane-collapse', 'section-view', 'interpretation-pane']) {
    const b = (await page.getByTestId(id).boundingBox())!;
    expect(overlaps(m, b), `the message covers ${id}`).toBe(false);
  }
  // The pane's controls still take clicks with the message shown.
  await page.getByTestId('pane-collapse').click();
  await expect(page.getByTestId('pane-expand')).toBeVisible();
  await page.getByTestId('pane-expand').click();
  await page.screenshot({ path: test.info().outputPath('message-in-top-bar.png') });
  // The results strip is laid out below the section view, not over it.
  const view = (await page.getByTestId('section-view').boundingBox())!;
  const strip = (await page.getByTestId('results-strip').boundingBox())!;
  expect(strip.y).toBeGreaterThanOrEqual(view.y + view.height - 0.5);
  expect(overlaps(view, strip)).toBe(false);
});

test('at 1600 × 1000 with the demo\'s six horizons the pins fields are in view without scrolling the side panel', async ({ page }) => {
  await page.setViewportSize({ width: 1600, height: 1000 });
  await gotoStarted(page);
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(6);
  // Before any scrolling, the pins fields are in view.
  const side = page.locator('aside.side-panel');
  expect(await side.evaluate((el) => el.scrollTop)).toBe(0);
  for (const id of ['pin-left-x', 'pin-right-x']) await expect(page.getByTestId(id)).toBeInViewport();
  // Select a horizon: its colour, regional buttons and regional fields open below the list, within reach.
  await page.getByTestId('horizon-list').locator('li').nth(3).click({ position: { x: 8, y: 10 } });
  await expect(page.getByTestId('regional-fields')).toBeVisible();
  await page.getByTestId('regional-z-left').scrollIntoViewIfNeeded();
  await expect(page.getByTestId('regional-z-left')).toBeInViewport();
  // No long scroll: the whole column is at most about one extra screen.
  const extra = await side.evaluate((el) => el.scrollHeight - el.clientHeight);
  expect(extra).toBeLessThan(1000);
  await page.screenshot({ path: test.info().outputPath('side-panel-1600x1000.png') });
});

test('beside the Chamberlin column and in the report: bed length was not conserved, and the strain sign', async ({ page }) => {
  await gotoStarted(page);
  const note = page.getByTestId('chamberlin-note');
  await expect(note).toContainText('Chamberlin’s depth assumes bed length is conserved');
  await expect(page.getByTestId('note-lpsStrain')).toHaveText('− = shortened');
  await expect(note).toContainText('negative = shortened along the layer');
  await page.getByTestId('open-report').click();
  await expect(page.getByTestId('report-chamberlin-note')).toContainText('assumes bed length is conserved');
  await expect(page.getByTestId('report-table')).toContainText('negative = shortened along the layer');
});

/** Returns the page y of the first and last rows, down the view's column at page x, where the scan is drawn (any opaque canvas pixel). */
async function scanRowsAt(page: Page, x: number): Promise<{ top: number; bottom: number }> {
  return page.evaluate((px) => {
    const box = document.querySelector('[data-testid="section-view"]') as HTMLElement;
    const r = box.getBoundingClientRect();
    const ratio = window.devicePixelRatio || 1;
    let top = Infinity;
    let bottom = -Infinity;
    for (const c of Array.from(box.querySelectorAll('canvas'))) {
      const cr = c.getBoundingClientRect();
      const col = c.getContext('2d')!.getImageData(Math.round((px - cr.left) * ratio), 0, 1, c.height).data;
      for (let j = 0; j < c.height; j++) {
        if (col[4 * j + 3] === 0) continue;
        const y = cr.top + j / ratio;
        top = Math.min(top, y);
        bottom = Math.max(bottom, y);
      }
    }
    // Rows the view's own box clips are not seen, whatever the canvas holds.
    return { top: Math.max(top, r.top), bottom: Math.min(bottom, r.bottom) };
  }, x);
}

test('a fitted scan ends above the results strip: its bottom edge is in view and a click there places a vertex', async ({ page }) => {
  await freshProject(page);
  // A tall scan, so that the fit is set by the view's height and the scan's lower edge sits at the view's bottom margin.
  const [w, h] = [600, 2400];
  await page.getByTestId('open-image').setInputFiles({ name: 'tall.png', mimeType: 'image/png', buffer: gradientPng(w, h) });
  await expect(page.getByTestId('scan-name')).toContainText('tall.png');
  // A first line brings the results strip (it shows once there is a horizon or a calibration); then fit the scan.
  await page.getByTestId('tool-draw').click();
  const first = (await page.getByTestId('section-view').boundingBox())!;
  for (const dx of [-60, 60]) await page.mouse.click(first.x + first.width / 2 + dx, first.y + first.height / 3);
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(1);
  await expect(page.getByTestId('results-strip')).toBeVisible();
  await page.getByTestId('zoom-fit').click();
  const view = (await page.getByTestId('section-view').boundingBox())!;
  const cx = view.x + view.width / 2;
  // Where the scan is drawn, read from the canvas itself (not from the app's camera).
  await expect.poll(async () => (await scanRowsAt(page, cx)).bottom).toBeGreaterThan(view.y);
  const rows = await scanRowsAt(page, cx);
  const scale = (rows.bottom + 1 - rows.top) / h;
  // Two screen pixels above the scan's lowest drawn row: what the user sees there is the section view, not the strip.
  const yLow = rows.bottom - 2;
  const onTop = await page.evaluate(([x, y]) => {
    const el = document.elementFromPoint(x, y);
    return { inView: !!el?.closest('[data-testid="section-view"]'), inStrip: !!el?.closest('[data-testid="results-strip"]') };
  }, [cx, yLow] as const);
  expect(onTop).toEqual({ inView: true, inStrip: false });
  // Draw a line along the scan's bottom rows with real clicks: each click lands on the scan and places a vertex there.
  for (const x of [cx - 0.3 * w * scale, cx, cx + 0.3 * w * scale]) await page.mouse.click(x, yLow);
  await expect(page.getByTestId('tool-hint')).toHaveAttribute('data-state', 'placing');
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(2);
  const doc = await savedDoc(page);
  const pts = doc.horizons[1].pointsPx;
  expect(pts).toHaveLength(3);
  // Each vertex lies within the scan's lowest few screen pixels (a screen pixel is 1/scale scan rows).
  for (const [, v] of pts) {
    expect(v).toBeLessThan(h);
    expect(v).toBeGreaterThan(h - 4 / scale);
  }
  // The whole fitted scan lies in the visible view, inside its margin, and the view ends where the strip begins.
  const strip = (await page.getByTestId('results-strip').boundingBox())!;
  expect(view.y + view.height).toBeLessThanOrEqual(strip.y + 0.5);
  expect(rows.bottom).toBeLessThan(strip.y);
  expect(rows.bottom).toBeLessThan(view.y + view.height - 8);
  await page.screenshot({ path: test.info().outputPath('fitted-bottom-above-strip.png') });
});

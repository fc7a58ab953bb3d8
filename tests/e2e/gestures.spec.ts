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
  await expect(page.getByTestId('strain-sign')).toHaveText('− = shortened');
  await expect(note).toContainText('negative = shortened along the layer');
  await page.getByTestId('open-report').click();
  await expect(page.getByTestId('report-chamberlin-note')).toContainText('assumes bed length is conserved');
  await expect(page.getByTestId('report-table')).toContainText('negative = shortened along the layer');
});

// Gestures and layout on a geologist's working day: a click just after an arrow-key pan is a new vertex,
// not the end of the line; messages hide nothing; the results strip lies below the section view, not over
// it; the pins fields stay within reach with four horizons at 1600 × 1000.
import { readFileSync } from 'node:fs';
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { gradientPng } from './pngFixture';
import type { ProjectDoc } from '../../src/core/model/projectDoc';

async function freshProject(page: Page) {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(0);
}

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

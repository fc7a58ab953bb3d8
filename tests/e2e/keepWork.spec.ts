// Work kept in the browser survives a reload straight after an edit, and two tabs never overwrite each
// other's work silently: the second tab shows the work read-only until the user takes over editing there.
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { gotoStarted } from './startup';

const firstName = (page: Page) => page.getByTestId('horizon-list').getByLabel('Horizon name').first();

async function rename(page: Page, name: string): Promise<void> {
  const field = firstName(page);
  await field.fill(name);
  await field.press('Enter');
}

test('an edit made just before a reload comes back after it', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(firstName(page)).toBeVisible();
  await rename(page, 'Renamed just before reload');
  // No wait: the reload starts as soon as the edit has been made.
  await page.reload();
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 30_000 });
  await expect(firstName(page)).toHaveValue('Renamed just before reload');
});

test('a second tab opens read-only, cannot overwrite the first, and takes over only when asked', async ({ page, context }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await rename(page, 'Tab A first');
  await expect(page.getByTestId('read-only-banner')).toHaveCount(0);

  const second = await context.newPage();
  second.on('dialog', (d) => void d.accept());
  await gotoStarted(second);
  await expect(second.getByTestId('read-only-banner')).toContainText('open for editing in another tab');
  await expect(firstName(second)).toHaveValue('Tab A first');
  // An edit in the read-only tab does not happen, so it cannot be kept over the first tab's work.
  await rename(second, 'Tab B while read-only');
  await expect(firstName(second)).toHaveValue('Tab A first');

  await rename(page, 'Tab A second');
  await expect(page.getByTestId('autosave-status')).toBeVisible();
  // Taking over: the first tab writes its last change and becomes read-only; the second reads that change.
  await second.getByTestId('take-over').click();
  await expect(second.getByTestId('read-only-banner')).toHaveCount(0);
  await expect(firstName(second)).toHaveValue('Tab A second');
  await expect(page.getByTestId('read-only-banner')).toContainText('Another tab took over editing');
  await rename(second, 'Tab B edit');
  await rename(page, 'Tab A after losing editing');
  await expect(firstName(page)).toHaveValue('Tab A second');

  await second.reload();
  await expect(second.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 30_000 });
  await expect(firstName(second)).toHaveValue('Tab B edit');
});

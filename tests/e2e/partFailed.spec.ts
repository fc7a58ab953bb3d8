// A part of the page that throws while drawing does not take the page or the work with it: the part shows
// what went wrong, the document stays on screen and kept in the browser, and the part can be drawn again.
// The failure is made from outside the app: the file menu calls Date.prototype.toLocaleTimeString while it
// draws its "kept in this browser at …" note, and this test makes that call throw while a flag is set.
import type { Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { test, expect } from './guard';
import { gotoStarted } from './startup';

const FAILURE = 'drawing failure made by the test';
const firstName = (page: Page) => page.getByTestId('horizon-list').getByLabel('Horizon name').first();

test('a part that fails to draw shows why, keeps the work, and can be drawn again', async ({ page, guard }) => {
  page.on('dialog', (d) => void d.accept());
  await page.addInitScript((message) => {
    const plain = Date.prototype.toLocaleTimeString;
    Date.prototype.toLocaleTimeString = function (this: Date, ...args: Parameters<Date['toLocaleTimeString']>) {
      if ((window as unknown as { breakDrawing?: boolean }).breakDrawing) throw new Error(message);
      return plain.apply(this, args);
    };
  }, FAILURE);
  await gotoStarted(page);
  await expect(page.getByTestId('autosave-status')).toBeVisible();

  await page.evaluate(() => ((window as unknown as { breakDrawing?: boolean }).breakDrawing = true));
  // An edit in the side panel makes the file menu draw its autosave note again, which now throws.
  const field = firstName(page);
  await field.fill('Kept through a failed part');
  await field.press('Enter');
  const failed = page.getByTestId('part-failed');
  await expect(failed).toHaveCount(1);
  await expect(failed).toContainText('The file menu could not be drawn');
  await expect(failed).toContainText(FAILURE);
  await expect(failed).toContainText('Your project is unchanged and kept in this browser');
  // The rest of the page still works and still holds the edit.
  await expect(firstName(page)).toHaveValue('Kept through a failed part');
  await expect(page.getByTestId('horizon-list')).toBeVisible();
  await expect(page.locator('canvas').first()).toBeVisible();
  await page.screenshot({ path: test.info().outputPath('part-failed.png') });

  // Recovery 1: the project can be saved from the message itself, with the edit in it.
  const [dl] = await Promise.all([page.waitForEvent('download'), failed.getByRole('button', { name: 'Save project…' }).click()]);
  const saved = JSON.parse(readFileSync((await dl.path())!, 'utf8')) as { doc: { horizons: { name: string }[] } };
  expect(saved.doc.horizons.map((h) => h.name)).toContain('Kept through a failed part');

  // Editing goes on while the part is down.
  await field.fill('Edited while the menu was down');
  await field.press('Enter');
  await expect(firstName(page)).toHaveValue('Edited while the menu was down');

  // Recovery 2: once the cause is gone, "Try again" draws the part again.
  await page.evaluate(() => ((window as unknown as { breakDrawing?: boolean }).breakDrawing = false));
  await failed.getByTestId('part-failed-retry').click();
  await expect(page.getByTestId('part-failed')).toHaveCount(0);
  await expect(page.getByTestId('autosave-status')).toContainText('Unsaved changes');
  await expect(page.getByTestId('menu-project')).toBeVisible();

  // The work was kept in the browser all along: it comes back after a reload.
  await page.reload();
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 30_000 });
  await expect(firstName(page)).toHaveValue('Edited while the menu was down');

  // React reports the error the boundary caught on the console; that one (and only that one) was expected.
  const unexpected = guard.consoleErrors.filter((m) => !m.includes(FAILURE));
  expect(guard.consoleErrors.length).toBeGreaterThan(0);
  guard.consoleErrors.splice(0, guard.consoleErrors.length, ...unexpected);
});

import type { Page } from '@playwright/test';
import { expect } from './guard';

/** Opens the app and waits until start-up (restoring kept work, or opening the demo) has finished. */
export async function gotoStarted(page: Page): Promise<void> {
  await page.goto('/');
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 30_000 });
}

/** Starts from an empty project: the page may open the demo section first, so wait for it, then choose New. */
export async function freshProject(page: Page): Promise<void> {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(0);
}

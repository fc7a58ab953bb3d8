import type { Page } from '@playwright/test';
import { expect } from './guard';

/** Opens the app and waits until start-up (restoring kept work, or opening the demo) has finished. */
export async function gotoStarted(page: Page): Promise<void> {
  await page.goto('/');
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 30_000 });
}

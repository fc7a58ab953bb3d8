// A download the page starts: what `click` sets off, read back from the file Playwright saved.
import { readFileSync } from 'node:fs';
import type { Page } from '@playwright/test';

/** Runs `click`, waits for the download it starts and returns the file's bytes. */
export async function download(page: Page, click: () => Promise<void>): Promise<Buffer> {
  const [dl] = await Promise.all([page.waitForEvent('download'), click()]);
  return readFileSync((await dl.path())!);
}

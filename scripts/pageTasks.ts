// Long main-thread tasks in a page driven by Playwright, for the benchmark scripts. Strings, not functions, go to
// the page: tsx would wrap inner functions in a helper that does not exist there.
import type { Page } from '@playwright/test';

/** Add with page.addInitScript before the app loads: keeps every long task (over 50 ms) as [start, duration]. */
export const LONG_TASKS = `(() => {
  window.__tasks = [];
  new PerformanceObserver((l) => { for (const e of l.getEntries()) window.__tasks.push([e.startTime, e.duration]); }).observe({ type: 'longtask', buffered: true });
})()`;

/** The page's clock (performance.now(), ms). */
export const pageNow = (page: Page) => page.evaluate('performance.now()') as Promise<number>;

/** The longest main-thread task that ended at or after `since` (page ms); 0 when none passed 50 ms. */
export async function longestSince(page: Page, since: number): Promise<number> {
  // A long task is reported once it ends; give the observer a frame to deliver it.
  await page.evaluate('new Promise((r) => requestAnimationFrame(() => setTimeout(r, 0)))');
  return (await page.evaluate(`window.__tasks.filter((t) => t[0] + t[1] >= ${since}).reduce((m, t) => Math.max(m, t[1]), 0)`)) as number;
}

// Every browser test runs through this fixture: it fails the test on any console error or uncaught
// page error, and on any request to a host other than the local preview server.
import { test as base, expect } from '@playwright/test';

export const test = base.extend<{ guard: { consoleErrors: string[]; foreignRequests: string[] } }>({
  guard: [
    async ({ page }, use) => {
      const consoleErrors: string[] = [];
      const foreignRequests: string[] = [];
      page.on('console', (m) => {
        if (m.type() === 'error') consoleErrors.push(m.text());
      });
      page.on('pageerror', (e) => consoleErrors.push(String(e)));
      await page.route('**/*', (route) => {
        const url = new URL(route.request().url());
        const local = url.protocol === 'blob:' || url.protocol === 'data:' || url.hostname === '127.0.0.1' || url.hostname === 'localhost';
        if (local) return route.continue();
        foreignRequests.push(route.request().url());
        return route.abort();
      });
      await use({ consoleErrors, foreignRequests });
      expect(foreignRequests, 'requests that left localhost').toEqual([]);
      expect(consoleErrors, 'console errors').toEqual([]);
    },
    { auto: true },
  ],
});

export { expect };

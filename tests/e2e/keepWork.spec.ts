// Work kept in the browser survives a reload straight after an edit, and two tabs never overwrite each
// other's work silently: the second tab shows the work read-only, following the first tab's kept edits and
// saying it saves nothing, until the user takes over editing there, or the editing tab closes and the first tab
// waiting takes over on its own, with the work that tab kept last.
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { download } from './download';
import { parseProjectText } from '../../src/io/projectFile';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import type { Section } from '../../src/core/model/section';

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

test('a big document is kept in the browser as it is edited, and comes back after a reload vertex for vertex', async ({ page }) => {
  test.setTimeout(180_000);
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  // Two lines of 80,000 vertices (more than a document written in the edit's own task: the kept copy is written off
  // the page): an invented sin² fold over the 10,000 m between the pins, 800 m high, area aλ/2 = 4 km² each
  // (docs/method.md §Check values), sampled finely.
  const N = 80_000;
  const line = (base: number) => Array.from({ length: N }, (_, k) => {
    const x = -500 + (11_000 * k) / (N - 1);
    return [x, base + (x > 0 && x < 10_000 ? 800 * Math.sin((Math.PI * x) / 10_000) ** 2 : 0)];
  });
  const section = { units: 'm', pins: [0, 10_000], horizons: [
    { name: 'Upper long line', line: line(2000), regional: [[-500, 2000], [10_500, 2000]] },
    { name: 'Lower long line', line: line(0), regional: [[-500, 0], [10_500, 0]] },
  ] };
  const opened = sectionToProjectDoc(section as Section, 'long');
  await page.getByTestId('open-project').setInputFiles({ name: 'long.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(section)) });
  await expect(firstName(page)).toHaveValue('Upper long line');
  const status = page.getByTestId('autosave-status');
  // Two edits, each kept before the next: the first write carries every line, the second none of them.
  await rename(page, 'First rename');
  await expect(status).toHaveText('Unsaved changes · kept in browser', { timeout: 60_000 });
  const areas = await page.getByTestId('horizon-table').locator('tbody tr').allTextContents();
  expect(areas.join()).toContain('First rename');
  await rename(page, 'Second rename');
  await expect(firstName(page)).toHaveValue('Second rename');
  await expect(status).toHaveText('Unsaved changes · kept in browser', { timeout: 60_000 });
  await page.reload();
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 60_000 });
  await expect(firstName(page)).toHaveValue('Second rename', { timeout: 60_000 });
  // Every vertex came back: the same areas (the table shows them to the formatter's figures), the same vertex count.
  await expect.poll(async () => (await page.getByTestId('horizon-table').locator('tbody tr').allTextContents()).join()).toBe(areas.join().replace('First rename', 'Second rename'));
  await page.getByTestId('menu-project').click();
  const saved = parseProjectText((await download(page, () => page.getByTestId('save-project').click())).toString('utf8'));
  if (!saved.ok) throw new Error(saved.message);
  expect(saved.doc.horizons.map((h) => h.pointsPx.length)).toEqual([N, N]);
  expect(saved.doc.horizons[1].pointsPx[N - 1]).toEqual(opened.horizons[1].pointsPx[N - 1]);
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
  // The first tab, now read-only, follows the second tab's kept edit and cannot edit over it.
  await expect(firstName(page)).toHaveValue('Tab B edit');
  await rename(page, 'Tab A after losing editing');
  await expect(firstName(page)).toHaveValue('Tab B edit');

  await second.reload();
  await expect(second.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 30_000 });
  await expect(firstName(second)).toHaveValue('Tab B edit');
});

test('a read-only tab follows the editing tab\'s kept edits and never claims to have saved', async ({ page, context }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await rename(page, 'Kept by the editing tab');
  await expect(page.getByTestId('autosave-status')).toContainText('kept in browser');

  const second = await context.newPage();
  second.on('dialog', (d) => void d.accept());
  await gotoStarted(second);
  const banner = second.getByTestId('read-only-banner');
  await expect(banner).toContainText('This project is open for editing in another tab of this browser');
  await expect(banner).toContainText('it saves nothing');
  const status = second.getByTestId('autosave-status');
  await expect(status).toContainText('Read-only · another tab edits');
  await expect(status).not.toContainText('Saved');
  await expect(firstName(second)).toHaveValue('Kept by the editing tab');
  // "Start fresh" would clear the kept work, which is the other tab's: a read-only tab does not offer it.
  await expect(second.getByTestId('start-fresh')).toHaveCount(0);

  // Each edit the first tab keeps appears in the second without a reload, and the second says when it was kept.
  await rename(page, 'Newer work in the editing tab');
  await expect(firstName(second)).toHaveValue('Newer work in the editing tab');
  await expect(status).toContainText('its work as kept at');
  await expect(status).not.toContainText('Saved');
  await expect(status).not.toContainText('Unsaved');
  await second.screenshot({ path: test.info().outputPath('read-only-tab.png') });
  // A second horizon renamed too: the whole kept document is followed, not one field.
  const secondName = (p: Page) => p.getByTestId('horizon-list').getByLabel('Horizon name').nth(1);
  await secondName(page).fill('Second horizon renamed');
  await secondName(page).press('Enter');
  await expect(secondName(second)).toHaveValue('Second horizon renamed');
  await expect(firstName(second)).toHaveValue('Newer work in the editing tab');

  // Nothing the read-only tab does reaches the kept work: a reload of the editing tab brings back its own edits.
  await rename(second, 'Typed in the read-only tab');
  await expect(firstName(second)).toHaveValue('Newer work in the editing tab');
  await second.close();
  await page.reload();
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 30_000 });
  await expect(firstName(page)).toHaveValue('Newer work in the editing tab');
  await expect(secondName(page)).toHaveValue('Second horizon renamed');
});

test('when the editing tab closes, one waiting tab takes over on its own with that tab\'s last kept work, and says so', async ({ page, context }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await rename(page, 'Tab A first');
  const others: Page[] = [];
  for (let k = 0; k < 2; k++) {
    const other = await context.newPage();
    other.on('dialog', (d) => void d.accept());
    await gotoStarted(other);
    await expect(other.getByTestId('read-only-banner')).toContainText('open for editing in another tab');
    others.push(other);
  }
  // The last edit of the editing tab, then it closes without anyone taking over.
  await rename(page, 'Tab A last edit');
  await expect(page.getByTestId('autosave-status')).toContainText('kept in browser');
  await page.close();

  // Exactly one of the two waiting tabs edits now; the other stays read-only (the lock is one tab's at a time).
  const tookOver = (p: Page) => p.getByTestId('took-over-banner');
  await expect.poll(async () => (await tookOver(others[0]).count()) + (await tookOver(others[1]).count()), { timeout: 30_000 }).toBe(1);
  const [editor, waiter] = (await tookOver(others[0]).count()) === 1 ? others : [others[1], others[0]];
  await expect(tookOver(editor)).toHaveText(/^The other tab closed; this tab edits now\. It has loaded the work that tab kept last\./);
  await expect(editor.getByTestId('read-only-banner')).toHaveCount(0);
  // The work is the other tab's, not a last session brought back: no "Start fresh" that would clear it.
  await expect(editor.getByTestId('restore-banner')).toHaveCount(0);
  await expect(firstName(editor)).toHaveValue('Tab A last edit');
  await editor.screenshot({ path: test.info().outputPath('tab-takeover.png') });
  await expect(waiter.getByTestId('read-only-banner')).toContainText('open for editing in another tab');

  // It edits and keeps its edits; the tab still waiting follows them and cannot edit over them.
  await rename(editor, 'Edited in the tab that took over');
  await expect(editor.getByTestId('autosave-status')).toContainText('kept in browser');
  await expect(firstName(waiter)).toHaveValue('Edited in the tab that took over');
  await rename(waiter, 'Not while read-only');
  await expect(firstName(waiter)).toHaveValue('Edited in the tab that took over');
  await tookOver(editor).getByTestId('took-over-dismiss').click();
  await expect(tookOver(editor)).toHaveCount(0);

  // And when that one closes too, the last tab takes over with its work.
  await editor.close();
  await expect(tookOver(waiter)).toBeVisible({ timeout: 30_000 });
  await expect(firstName(waiter)).toHaveValue('Edited in the tab that took over');
  await rename(waiter, 'The last tab edits');
  await expect(firstName(waiter)).toHaveValue('The last tab edits');
});

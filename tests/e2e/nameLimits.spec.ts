// Names over the one length limit (src/core/model/limits.ts, 500 characters) are refused where they are typed, with
// the limit's words, so nothing the restore would refuse is ever kept: a pasted 501-character horizon name and a
// 600-character scenario name leave the names as they were, also after a reload.
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { expectLastMessage } from './messages';

test('a 501-character horizon name and a 600-character scenario name are refused with the limit, and a reload keeps the names', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  const field = page.getByLabel('Horizon name').first();
  const before = await field.inputValue();
  await field.fill('N'.repeat(501));
  await field.press('Enter');
  await expectLastMessage(page, 'error', 'the horizon name is too long (501 characters; the limit is 500)');
  await expect(field).toHaveValue(before);

  await page.getByTestId('scenario-rename').click();
  await page.getByTestId('scenario-name-input').fill('S'.repeat(600));
  await page.getByTestId('scenario-name-input').press('Enter');
  await expectLastMessage(page, 'error', 'the scenario name is too long (600 characters; the limit is 500)');
  await page.keyboard.press('Escape');

  // A name of exactly 500 characters fits, is kept, and comes back after a reload.
  await field.fill('M'.repeat(500));
  await field.press('Enter');
  await expect(field).toHaveValue('M'.repeat(500));
  await page.reload();
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 30_000 });
  await expect(page.getByLabel('Horizon name').first()).toHaveValue('M'.repeat(500));
  await expect(page.getByTestId('kept-aside-banner')).toHaveCount(0);
  await expect(page.getByTestId('scenario-list')).not.toContainText('SSSS');
});

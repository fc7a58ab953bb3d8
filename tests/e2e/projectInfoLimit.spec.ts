// The title and author are held to the one name-length limit (src/core/model/limits.ts, 500 characters): a longer
// one is refused with the limit's words and the dialog stays open; one within it is kept whole, never cut short.
import { test, expect } from './guard';
import { gotoStarted } from './startup';

test('a title over the name limit is refused with the reason; one within it is kept whole', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  const open = async () => {
    await page.getByTestId('menu-project').click();
    await page.getByTestId('menu-project-info').click();
  };
  await open();
  const before = await page.getByTestId('project-title').inputValue();
  // 501 characters: refused, with the same words as every other name field.
  await page.getByTestId('project-title').fill('T'.repeat(501));
  await expect(page.getByTestId('project-info-problem')).toContainText('the title is too long (501 characters; the limit is 500)');
  await page.getByTestId('project-info-save').click();
  await expect(page.getByTestId('project-info-dialog')).toHaveCount(1);
  await expect(page.getByTestId('project-info-problem')).toHaveAttribute('role', 'alert');
  await page.screenshot({ path: test.info().outputPath('title-too-long.png') });
  await page.getByTestId('project-info-cancel').click();
  await open();
  await expect(page.getByTestId('project-title')).toHaveValue(before);

  // 260 characters of title and author fit: both are kept whole, in the dialog and in the report.
  const title = `Invented ridge ${'a'.repeat(245)}`;
  await page.getByTestId('project-title').fill(title);
  await page.getByTestId('project-author').fill('b'.repeat(260));
  await expect(page.getByTestId('project-info-problem')).toHaveCount(0);
  await page.getByTestId('project-info-save').click();
  await expect(page.getByTestId('project-info-dialog')).toHaveCount(0);
  await open();
  await expect(page.getByTestId('project-title')).toHaveValue(title);
  await expect(page.getByTestId('project-author')).toHaveValue('b'.repeat(260));
});

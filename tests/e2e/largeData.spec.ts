// Large data through the real file inputs: the page keeps showing the project, exports still work and
// the limits answer with a message. Expected counts follow from the generated files.
import type { Page } from '@playwright/test';
import { download } from './download';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { expectLastMessage } from './messages';

const N = 150_000;

/** The invented three-horizon section of the file tests, its upper horizon traced with `n` vertices. */
function denseSection(n: number) {
  const kinks = [[-100, 500], [0, 500], [500, 900], [1000, 500], [1100, 500]];
  const line: number[][] = [];
  for (let i = 0; i < n; i++) {
    const t = (i / (n - 1)) * (kinks.length - 1);
    const k = Math.min(kinks.length - 2, Math.floor(t));
    const f = t - k;
    line.push([kinks[k][0] + f * (kinks[k + 1][0] - kinks[k][0]), kinks[k][1] + f * (kinks[k + 1][1] - kinks[k][1])]);
  }
  return {
    units: 'm',
    pins: [0, 1000],
    horizons: [
      { name: 'Upper marker', line, regional: [[-100, 500], [1100, 500]] },
      { name: 'Lower marker', line: [[-100, 0], [0, 0], [500, 300], [1000, 0], [1100, 0]], regional: [[-100, 0], [1100, 0]] },
    ],
  };
}

/** The horizon names in the side panel's list, as the user reads them in its name fields. */
function horizonNames(page: Page): Promise<string[]> {
  return page.getByTestId('horizon-list').getByLabel('Horizon name').evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value));
}


test('a horizon of 150,000 vertices opens, exports as SVG and PNG, and is drawn in the report figure', async ({ page }) => {
  test.setTimeout(120_000);
  await gotoStarted(page);
  await page.getByTestId('open-project').setInputFiles({ name: 'dense.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(denseSection(N))) });
  await expectLastMessage(page, 'info', 'Opened dense.json');
  await expect.poll(() => horizonNames(page)).toEqual(['Upper marker', 'Lower marker']);
  await page.getByTestId('menu-export').click();
  const svg = (await download(page, () => page.getByTestId('export-svg').click())).toString('utf8');
  expect(svg).toContain('Upper marker');
  expect(svg).toContain('class="area-depth"');
  await page.getByTestId('menu-export').click();
  const png = await download(page, () => page.getByTestId('export-png').click());
  // PNG signature (ISO/IEC 15948, §5.2).
  expect([...png.subarray(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  await page.getByTestId('open-report').click();
  await expect.poll(() => page.getByTestId('report-figure').evaluate((img: HTMLImageElement) => img.naturalWidth), { timeout: 60_000 }).toBeGreaterThan(0);
  await page.screenshot({ path: test.info().outputPath('dense-report.png') });
});

test('a CSV of 150,000 rows imports; one of 1,000,000 rows is refused with the count and the limit', async ({ page }) => {
  test.setTimeout(120_000);
  await gotoStarted(page);
  const rows = (n: number) => {
    const out = ['horizon,x_m,z_m'];
    for (let i = 0; i < n; i++) out.push(`Dense,${i / 100},${Math.sin(i / 1000) * 50}`);
    return out.join('\n');
  };
  await page.getByTestId('import-csv').setInputFiles({ name: 'big.csv', mimeType: 'text/csv', buffer: Buffer.from(rows(N)) });
  const dialog = page.getByTestId('import-dialog');
  await expect(dialog.getByTestId('import-preview')).toContainText('150000');
  await dialog.getByTestId('import-confirm').click();
  await expect(dialog).toHaveCount(0);
  await expect.poll(() => horizonNames(page)).toContain('Dense');
  const before = await horizonNames(page);
  await page.getByTestId('import-csv').setInputFiles({ name: 'huge.csv', mimeType: 'text/csv', buffer: Buffer.from(rows(1_000_000)) });
  await expect(dialog.getByTestId('import-error')).toContainText('too many vertices in one line for the app (1000000; the limit is 200000)', { timeout: 60_000 });
  await dialog.getByTestId('import-cancel').click();
  expect(await horizonNames(page)).toEqual(before);
  await page.screenshot({ path: test.info().outputPath('after-huge-csv.png') });
});

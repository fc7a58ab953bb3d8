// Coordinates outside the range Foldroot computes in (src/core/model/limits.ts, ±1e9 section units) are refused by
// the import dialog as the section opener and the command line refuse them: the dialog names the line, the vertex
// and the range, Import stays disabled and the open project is unchanged.
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { gotoStarted } from './startup';

const names = (page: Page) => page.getByTestId('horizon-list').getByLabel('Horizon name').evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value));

test('a CSV or GeoJSON with a coordinate of 1e160 is refused with the range; one within it imports', async ({ page }) => {
  await gotoStarted(page);
  const before = await names(page);
  const dialog = page.getByTestId('import-dialog');
  await page.getByTestId('import-csv').setInputFiles({ name: 'far.csv', mimeType: 'text/csv', buffer: Buffer.from('horizon,x_m,z_m\nFar,0,0\nFar,1e160,10\n') });
  await expect(dialog.getByTestId('import-error')).toContainText('Horizon "Far", vertex 2: a coordinate is outside the range Foldroot computes in (1e160; coordinates must lie within ±1e9 section units)');
  await expect(dialog.getByTestId('import-confirm')).toBeDisabled();
  await page.screenshot({ path: test.info().outputPath('far-csv.png') });
  await dialog.getByTestId('import-cancel').click();
  const geojson = { type: 'FeatureCollection', features: [{ type: 'Feature', properties: { name: 'Far' }, geometry: { type: 'LineString', coordinates: [[0, 0], [10, -1e308]] } }] };
  await page.getByTestId('import-geojson').setInputFiles({ name: 'far.geojson', mimeType: 'application/geo+json', buffer: Buffer.from(JSON.stringify(geojson)) });
  await expect(dialog.getByTestId('import-error')).toContainText('coordinates must lie within ±1e9 section units');
  await expect(dialog.getByTestId('import-confirm')).toBeDisabled();
  await dialog.getByTestId('import-cancel').click();
  expect(await names(page)).toEqual(before);

  await page.getByTestId('import-csv').setInputFiles({ name: 'near.csv', mimeType: 'text/csv', buffer: Buffer.from('horizon,x_m,z_m\nNear,0,0\nNear,1e9,10\n') });
  await expect(dialog.getByTestId('import-error')).toHaveCount(0);
  await dialog.getByTestId('import-confirm').click();
  await expect.poll(() => names(page)).toEqual([...before, 'Near']);
});

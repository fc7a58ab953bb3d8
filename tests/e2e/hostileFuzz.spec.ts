// A sample of generated corrupt and oversized GeoJSON, SVG and image files through the app's real file inputs (the
// Vitest fuzz, tests/io/hostileFuzz.test.ts, runs 1,000 per input through the same parsers): the page never blanks,
// no part fails, each file gets its dialog or message, and the open project is the same afterwards. A seeded
// generator (mulberry32, a public-domain PRNG) makes every run the same cases.
import type { Page } from '@playwright/test';
import { download } from './download';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { mulberry32, mutateBytes, mutateText as mutate } from '../fixtures/fuzz/mutate';

// FUZZ_CASES=1000 runs the full fuzz (1,000 files per input) on request; CI runs the sample of 40.
const CASES = Math.max(2, Math.floor(Number(process.env.FUZZ_CASES ?? 40) / 2) * 2);

const NASTY = ['\u0000', '"', '<', '>', '&#0;', ']]>', '{', '[', '1e309', '-0', 'NaN', '\ud800', '<!ENTITY a "aaaa">', '&a;'];
/** Truncations, insertions, deletions, long repeats (oversized) and changed characters. */
const mutateText = (text: string, rnd: () => number) => mutate(text, rnd, NASTY, 20_000);

const GEOJSON = JSON.stringify({ type: 'FeatureCollection', units: 'm', features: [{ type: 'Feature', properties: { name: 'Top' }, geometry: { type: 'LineString', coordinates: [[0, 10], [500, 40], [1000, 10]] } }] });
const SVG = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 100 50"><path id="Top" d="M0 10 L50 20 L100 10"/><polyline id="Base" points="0,40 50,45 100,40"/><path d="M0 0 A5 5 0 0 1 10 10"/></svg>';
// A 16 × 8 grey PNG's signature and header chunk, and a little-endian TIFF header with one IFD of a 16 × 8 image.
const PNG = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 16, 0, 0, 0, 8, 8, 0, 0, 0, 0, 0x3a, 0x7e, 0x9b, 0x55]);
const TIFF = Uint8Array.from([0x49, 0x49, 42, 0, 8, 0, 0, 0, 3, 0, 0, 1, 3, 0, 1, 0, 0, 0, 16, 0, 0, 0, 1, 1, 3, 0, 1, 0, 0, 0, 8, 0, 0, 0, 2, 1, 3, 0, 1, 0, 0, 0, 8, 0, 0, 0, 0, 0, 0, 0]);

/** The open project as saved to a file, without the moment it was saved. */
async function savedDoc(page: Page): Promise<unknown> {
  const bytes = await download(page, async () => {
    await page.getByTestId('menu-project').click();
    await page.getByTestId('save-project').click();
  });
  return (JSON.parse(bytes.toString('utf8')) as { doc: unknown }).doc;
}

/** The page is up: the app root, the horizon list and the section view are there, and no part has failed. */
async function expectPageUp(page: Page): Promise<void> {
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1);
  await expect(page.getByTestId('horizon-list')).toBeVisible();
  await expect(page.getByTestId('section-view')).toBeVisible();
  await expect(page.getByTestId('part-failed')).toHaveCount(0);
}

test('generated corrupt and oversized GeoJSON, SVG and image files leave the page up and the project unchanged', async ({ page }) => {
  test.setTimeout(300_000 * Math.max(1, CASES / 40));
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0, { timeout: 60_000 });
  const before = await savedDoc(page);
  const rnd = mulberry32(11);
  for (const [input, good, ext] of [['import-geojson', GEOJSON, 'geojson'], ['import-svg', SVG, 'svg']] as const) {
    for (let i = 0; i < CASES; i++) {
      const name = `fuzz-${i}.${ext}`;
      await page.getByTestId(input).setInputFiles({ name, mimeType: 'text/plain', buffer: Buffer.from(mutateText(good, rnd)) });
      // Every file gets its dialog (a preview or the reason it cannot be imported); it is closed without importing.
      const dialog = page.getByTestId('import-dialog');
      await expect(dialog.getByRole('heading', { level: 2 })).toHaveText(`Import horizons from ${name}`, { timeout: 60_000 });
      await dialog.getByTestId('import-cancel').click();
      await expect(dialog).toHaveCount(0);
      await expectPageUp(page);
    }
  }
  // Images through the scan input: each is refused with a message naming it, or opens; neither blanks the page.
  let refused = 0;
  for (const [good, ext] of [[PNG, 'png'], [TIFF, 'tif']] as const) {
    for (let i = 0; i < CASES / 2; i++) {
      const name = `fuzz-${i}.${ext}`;
      await page.getByTestId('open-image').setInputFiles({ name, mimeType: ext === 'png' ? 'image/png' : 'image/tiff', buffer: Buffer.from(mutateBytes(good, rnd)) });
      await expect(page.getByTestId('message-area')).toHaveAttribute('data-last-message', new RegExp(`${name.replace('.', '\\.')}`), { timeout: 60_000 });
      await expect(page.getByTestId('busy')).toHaveCount(0, { timeout: 60_000 });
      if ((await page.getByTestId('message-area').getAttribute('data-last-message'))?.startsWith('error:')) refused += 1;
      await expectPageUp(page);
    }
  }
  await page.screenshot({ path: test.info().outputPath('after-fuzz.png') });
  // A scan that opened would replace the scan (the user chose it); every case here is broken, so none did.
  expect(refused).toBe(CASES);
  expect(await savedDoc(page)).toEqual(before);
});

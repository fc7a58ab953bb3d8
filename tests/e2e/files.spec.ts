// Files: save and open, autosave and restore, imports, exports and the report, hostile files.
import { readFileSync, writeFileSync } from 'node:fs';
import type { Page } from '@playwright/test';
import { PNG } from 'pngjs';
import fc from 'fast-check';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { gradientPng } from './pngFixture';
import { fitCalibration } from '../../src/core/calibration/fitCalibration';
import { imageToSection } from '../../src/core/calibration/mapPoints';
import type { ProjectDoc } from '../../src/core/model/projectDoc';

const SECTION = {
  units: 'm',
  pins: [0, 1000],
  horizons: [
    { name: 'Upper marker', line: [[-100, 500], [0, 500], [500, 900], [1000, 500], [1100, 500]], regional: [[-100, 500], [1100, 500]] },
    { name: 'Middle marker', line: [[-100, 250], [0, 250], [500, 600], [1000, 250], [1100, 250]], regional: [[-100, 250], [1100, 250]] },
    { name: 'Lower marker', line: [[-100, 0], [0, 0], [500, 300], [1000, 0], [1100, 0]], regional: [[-100, 0], [1100, 0]] },
  ],
};
const HOSTILE = '<img src=x onerror=alert(1)>';

/** Opens the app and waits for the start-up demo to finish loading (it would otherwise replace what a test opens). */
async function ready(page: Page, fresh = false): Promise<void> {
  await gotoStarted(page);
  await expect(page.getByTestId('autosave-status')).toBeVisible();
  if (fresh) {
    await page.getByTestId('menu-project').click();
    await page.getByRole('menuitem', { name: 'New' }).click();
  }
}

async function download(page: Page, click: () => Promise<void>): Promise<Buffer> {
  const [dl] = await Promise.all([page.waitForEvent('download'), click()]);
  return readFileSync((await dl.path())!);
}

async function saveProject(page: Page): Promise<{ doc: ProjectDoc; scan: { dataBase64: string } | null }> {
  const bytes = await download(page, async () => {
    await page.getByTestId('menu-project').click();
    await page.getByTestId('save-project').click();
  });
  return JSON.parse(bytes.toString('utf8'));
}

async function openSection(page: Page, section: unknown = SECTION, name = 'fold-section.json'): Promise<void> {
  await page.getByTestId('open-project').setInputFiles({ name, mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(section)) });
}

function sectionLines(doc: ProjectDoc): { name: string; line: number[][] }[] {
  const fit = fitCalibration(doc.calibration!);
  if (!fit.ok) throw new Error(fit.message);
  return doc.horizons.map((h) => ({ name: h.name, line: h.pointsPx.map((p) => imageToSection(fit.fit, p)) }));
}

function expectLinesClose(actual: { name: string; line: number[][] }[], expected: { name: string; line: number[][] }[], tol = 1e-6): void {
  expect(actual.map((h) => h.name)).toEqual(expected.map((h) => h.name));
  actual.forEach((h, i) => {
    expect(h.line.length).toBe(expected[i].line.length);
    h.line.forEach((p, j) => {
      expect(Math.abs(p[0] - expected[i].line[j][0])).toBeLessThan(tol);
      expect(Math.abs(p[1] - expected[i].line[j][1])).toBeLessThan(tol);
    });
  });
}

test('save → reload → open gives back an identical document, scan included', async ({ page }) => {
  await ready(page, true);
  await page.getByTestId('open-image').setInputFiles({ name: 'gradient.png', mimeType: 'image/png', buffer: gradientPng(300, 200) });
  await expect(page.getByTestId('scan-name')).toContainText('gradient.png');
  await page.getByTestId('import-csv').setInputFiles({ name: 'h.csv', mimeType: 'text/csv', buffer: Buffer.from('horizon,x_m,z_m\nTop,0,10\nTop,50,30\nTop,100,10\n') });
  await page.getByTestId('import-confirm').click();
  const first = await saveProject(page);
  expect(first.doc.horizons).toHaveLength(1);
  expect(first.scan).not.toBeNull();
  await expect(page.getByTestId('autosave-status')).toHaveText('Saved · kept in browser');
  await page.reload();
  await page.getByTestId('start-fresh').click();
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('open-project').setInputFiles({ name: 'p.foldroot.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(first)) });
  await expect(page.getByTestId('message-info')).toContainText('Opened p.foldroot.json');
  await expect(page.getByTestId('scan-name')).toContainText('gradient.png — 300 × 200 px');
  const second = await saveProject(page);
  expect(second.doc).toEqual(first.doc);
  expect(second.scan!.dataBase64).toBe(first.scan!.dataBase64);
});

test('a reload in the middle of work brings back the last state, with the choice to start fresh', async ({ page }) => {
  await ready(page, true);
  await page.getByTestId('import-csv').setInputFiles({ name: 'h.csv', mimeType: 'text/csv', buffer: Buffer.from('horizon,x,z\nA,0,0\nA,10,5\nB,0,-5\nB,10,-6\n') });
  await page.getByTestId('import-units').selectOption('ft');
  await page.getByTestId('import-confirm').click();
  await expect(page.getByTestId('autosave-status')).toContainText('kept in browser');
  await page.reload();
  await expect(page.getByTestId('restore-banner')).toBeVisible();
  const restored = await saveProject(page);
  expect(restored.doc.units).toBe('ft');
  expectLinesClose(sectionLines(restored.doc), [{ name: 'A', line: [[0, 0], [10, 5]] }, { name: 'B', line: [[0, -5], [10, -6]] }]);
  await page.getByTestId('start-fresh').click();
  await expect(page.getByTestId('restore-banner')).toHaveCount(0);
  const fresh = await saveProject(page);
  expect(fresh.doc.horizons).toEqual([]);
});

test('CSV, GeoJSON and SVG imports of generated files give the expected horizons', async ({ page }) => {
  await ready(page, true);
  // CSV with a bad row: listed, the rest imported.
  await page.getByTestId('import-csv').setInputFiles({ name: 'h.csv', mimeType: 'text/csv', buffer: Buffer.from('horizon,x_m,z_m\nTop,0,100\nTop,400,180\nTop,abc,1\nTop,800,100\n') });
  await expect(page.getByTestId('import-problems')).toContainText('line 4');
  await expect(page.getByTestId('import-preview')).toContainText('Top');
  await page.getByTestId('import-confirm').click();
  // GeoJSON in feet into a metre project: converted (1 ft = 0.3048 m).
  const gj = { type: 'FeatureCollection', units: 'ft', features: [{ type: 'Feature', properties: { name: 'Base' }, geometry: { type: 'LineString', coordinates: [[0, 0], [1000, 500], [2000, 0]] } }] };
  await page.getByTestId('import-geojson').setInputFiles({ name: 'h.geojson', mimeType: 'application/geo+json', buffer: Buffer.from(JSON.stringify(gj)) });
  await page.getByTestId('import-confirm').click();
  // SVG with a group transform and a cubic; reference points map drawing (0,100)->(0,0) and (200,0)->(800,400).
  const svg = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 200 100"><g transform="translate(0 10)"><path id="Drawn" d="M0 40 L100 30 L200 40"/></g></svg>';
  await page.getByTestId('import-svg').setInputFiles({ name: 'd.svg', mimeType: 'image/svg+xml', buffer: Buffer.from(svg) });
  for (const [k, v] of Object.entries({ 'svg-ref1-sx': '0', 'svg-ref1-sy': '100', 'svg-ref1-x': '0', 'svg-ref1-z': '0', 'svg-ref2-sx': '200', 'svg-ref2-sy': '0', 'svg-ref2-x': '800', 'svg-ref2-z': '400' })) {
    await page.getByTestId(k).fill(v);
  }
  await page.getByTestId('import-confirm').click();
  const saved = await saveProject(page);
  expectLinesClose(sectionLines(saved.doc), [
    { name: 'Top', line: [[0, 100], [400, 180], [800, 100]] },
    { name: 'Base', line: [[0, 0], [304.8, 152.4], [609.6, 0]] },
    { name: 'Drawn', line: [[0, 200], [400, 240], [800, 200]] },
  ]);
});

test('exported PNG has the asked size and content; exported SVG parses', async ({ page }) => {
  await ready(page);
  await openSection(page);
  await expect(page.getByTestId('message-info')).toContainText('Opened fold-section.json');
  await page.getByTestId('menu-export').click();
  await page.getByTestId('png-size').selectOption('a3-300');
  const pngBytes = await download(page, () => page.getByTestId('export-png').click());
  const png = PNG.sync.read(pngBytes);
  expect([png.width, png.height]).toEqual([4961, 3508]);
  // Non-blank: a good share of non-white pixels, and the detachment red present.
  let ink = 0, red = 0;
  for (let i = 0; i < png.data.length; i += 4 * 97) {
    const [r, g, b] = [png.data[i], png.data[i + 1], png.data[i + 2]];
    if (r < 240 || g < 240 || b < 240) ink++;
    if (r > 150 && g < 80 && b < 80) red++;
  }
  expect(ink / (png.data.length / (4 * 97))).toBeGreaterThan(0.05);
  expect(red).toBeGreaterThan(10);
  writeFileSync(test.info().outputPath('export-a3.png'), pngBytes);
  await page.getByTestId('menu-export').click();
  const svg = (await download(page, () => page.getByTestId('export-svg').click())).toString('utf8');
  const parsed = await page.evaluate((text) => {
    const d = new DOMParser().parseFromString(text, 'image/svg+xml');
    return { error: d.getElementsByTagName('parsererror').length, root: d.documentElement.nodeName, texts: d.documentElement.textContent ?? '' };
  }, svg);
  expect(parsed.error).toBe(0);
  expect(parsed.root).toBe('svg');
  expect(parsed.texts).toContain('licensed professional');
  expect(parsed.texts).toContain('Upper marker');
});

test('the report page shows the method, results, figure and caution, and prints', async ({ page }) => {
  await ready(page);
  await openSection(page);
  await page.getByTestId('open-report').click();
  await expect(page.getByTestId('report-table')).toContainText('Middle marker');
  await expect(page.getByTestId('report-caution')).toContainText('licensed professional');
  await expect(page.getByTestId('report-summary')).toContainText('Detachment');
  await expect(page.getByTestId('report-figure')).toBeVisible();
  await expect.poll(() => page.getByTestId('report-figure').evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);
  await page.screenshot({ path: test.info().outputPath('report-page.png'), fullPage: true });
  await page.emulateMedia({ media: 'print' });
  await expect(page.locator('#root')).toBeHidden();
  await page.screenshot({ path: test.info().outputPath('report-print.png'), fullPage: true });
  await page.emulateMedia({ media: 'screen' });
  await page.getByTestId('report-close').click();
  await expect(page.getByTestId('report-page')).toHaveCount(0);
});

test('corrupt and hostile files give a message and leave the open project unchanged', async ({ page }) => {
  await ready(page);
  await openSection(page);
  const before = await saveProject(page);
  const good = JSON.stringify(before);
  // 24 seeded corruptions of the saved file, through the real file input.
  const cases = fc.sample(fc.oneof(
    fc.nat().map((n) => good.slice(0, n % good.length)),
    fc.tuple(fc.nat(), fc.integer({ min: 1, max: 255 })).map(([at, x]) => good.slice(0, at % good.length) + String.fromCharCode(good.charCodeAt(at % good.length) ^ x) + good.slice((at % good.length) + 1)),
    fc.constantFrom('[]', '{"format":"foldroot-project","version":99}', '['.repeat(100000) + ']'.repeat(100000), good.replace('"units":"m"', '"units":7')),
  ), { seed: 20240501, numRuns: 24 });
  for (const [i, text] of cases.entries()) {
    await page.getByTestId('open-project').setInputFiles({ name: `bad-${i}.json`, mimeType: 'application/json', buffer: Buffer.from(text) });
    await expect(page.getByTestId('busy')).toHaveCount(0);
  }
  await expect(page.getByTestId('message-error')).toBeVisible();
  const after = await saveProject(page);
  expect(after.doc).toEqual(before.doc);
  // Hostile names open as plain text: no element is created from them.
  const hostile = { ...SECTION, horizons: SECTION.horizons.map((h, i) => ({ ...h, name: i === 0 ? HOSTILE : `${h.name} "><b>bold</b>` })) };
  await openSection(page, hostile, `${HOSTILE}.json`);
  await page.getByTestId('open-report').click();
  await expect(page.getByTestId('report-table')).toContainText(HOSTILE);
  expect(await page.locator('img[src="x"]').count()).toBe(0);
  expect(await page.locator('.report-sheet b', { hasText: 'bold' }).count()).toBe(0);
});

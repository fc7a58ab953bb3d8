// Files: save and open, autosave and restore, imports, exports and the report, hostile files.
import { readFileSync, writeFileSync } from 'node:fs';
import type { Page } from '@playwright/test';
import { PNG } from 'pngjs';
import fc from 'fast-check';
import { download } from './download';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { gradientPng } from './pngFixture';
import { fitCalibration } from '../../src/core/calibration/fitCalibration';
import { imageToSection } from '../../src/core/calibration/mapPoints';
import type { ProjectDoc } from '../../src/core/model/projectDoc';
import { parseHorizonsCsv } from '../../src/io/csvHorizons';
import { parseProjectText } from '../../src/io/projectFile';
import { expectLastMessage } from './messages';

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
  await expectLastMessage(page, 'info', 'Opened p.foldroot.json');
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
  await expectLastMessage(page, 'info', 'Opened fold-section.json');
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

/** Sets the project's title and author through the Project menu's dialog. */
async function setTitleAndAuthor(page: Page, title: string, author: string): Promise<void> {
  await page.getByTestId('menu-project').click();
  await page.getByTestId('menu-project-info').click();
  await page.getByTestId('project-title').fill(title);
  await page.getByTestId('project-author').fill(author);
  await page.getByTestId('project-info-save').click();
  await expect(page.getByTestId('project-info-dialog')).toHaveCount(0);
}

/** The share of pixels that differ between two same-size PNGs, over the rows [y0, y1). */
function differingShare(a: PNG, b: PNG, y0: number, y1: number): number {
  let diff = 0;
  for (let y = y0; y < y1; y++) {
    for (let x = 0; x < a.width; x++) {
      const i = 4 * (y * a.width + x);
      if (Math.abs(a.data[i] - b.data[i]) + Math.abs(a.data[i + 1] - b.data[i + 1]) + Math.abs(a.data[i + 2] - b.data[i + 2]) > 30) diff++;
    }
  }
  return diff / ((y1 - y0) * a.width);
}

test('the title and author are set from the menus and the report, and appear in the report and the exported figure', async ({ page }) => {
  await ready(page);
  await openSection(page);
  await expectLastMessage(page, 'info', 'Opened fold-section.json');
  await page.getByTestId('menu-export').click();
  const plain = PNG.sync.read(await download(page, () => page.getByTestId('export-png').click()));
  // The fields start from the document (a section file is titled after its file name); Esc keeps it.
  await page.getByTestId('menu-project').click();
  await page.getByTestId('menu-project-info').click();
  await expect(page.getByTestId('project-title')).toHaveValue('fold-section');
  await expect(page.getByTestId('project-author')).toHaveValue('');
  await page.getByTestId('project-title').fill('Thrown away');
  await page.keyboard.press('Escape');
  await expect(page.getByTestId('project-info-dialog')).toHaveCount(0);
  await expect(page.getByTestId('autosave-status')).toHaveText(/^Saved/);
  // Set both (with spaces around, trimmed by the command) from the Project menu.
  await page.getByTestId('menu-project').click();
  await page.getByTestId('menu-project-info').click();
  await expect(page.getByTestId('project-title')).toHaveValue('fold-section');
  await page.getByTestId('project-title').fill('  Invented ridge fold, line 7  ');
  await page.getByTestId('project-author').fill('R. Tester');
  await page.screenshot({ path: test.info().outputPath('project-info-dialog.png') });
  await page.getByTestId('project-info-save').click();
  await expect(page.getByTestId('project-info-dialog')).toHaveCount(0);
  await expect(page.getByTestId('autosave-status')).toHaveText(/^Unsaved changes/);
  // The report shows them, and can change them too (the dialog opens above it).
  await page.getByTestId('open-report').click();
  await expect(page.getByTestId('report-title')).toHaveText('Invented ridge fold, line 7');
  await expect(page.getByTestId('report-byline')).toContainText('Author: R. Tester');
  await page.getByTestId('report-edit-info').click();
  await expect(page.getByTestId('project-author')).toHaveValue('R. Tester');
  await page.getByTestId('project-author').fill('R. Tester and K. Second');
  await page.screenshot({ path: test.info().outputPath('project-info-over-report.png') });
  await page.getByTestId('project-author').press('Enter');
  await expect(page.getByTestId('report-byline')).toContainText('Author: R. Tester and K. Second');
  await page.screenshot({ path: test.info().outputPath('report-with-title.png') });
  await page.getByTestId('report-close').click();
  // The Export menu offers the same fields next to the figure exports.
  await page.getByTestId('menu-export').click();
  await page.getByTestId('export-project-info').click();
  await expect(page.getByTestId('project-title')).toHaveValue('Invented ridge fold, line 7');
  await page.getByTestId('project-info-cancel').click();
  // The figure's title block carries them; the file is named after the title.
  await page.getByTestId('menu-export').click();
  const svg = (await download(page, () => page.getByTestId('export-svg').click())).toString('utf8');
  const texts = await page.evaluate((text) => Array.from(new DOMParser().parseFromString(text, 'image/svg+xml').querySelectorAll('.title-block text')).map((t) => t.textContent ?? ''), svg);
  expect(texts[0]).toBe('Invented ridge fold, line 7');
  expect(texts[1]).toContain('Author: R. Tester and K. Second');
  await page.getByTestId('menu-export').click();
  const [dl] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-png').click()]);
  expect(dl.suggestedFilename()).toBe('Invented-ridge-fold-line-7.png');
  const pngBytes = readFileSync((await dl.path())!);
  writeFileSync(test.info().outputPath('export-with-title.png'), pngBytes);
  const titled = PNG.sync.read(pngBytes);
  expect([titled.width, titled.height]).toEqual([plain.width, plain.height]);
  // Only the title block (figure units 16–82 of 990 in height) changed: the new title and author are drawn there.
  const blockEnd = Math.ceil((84 / 990) * titled.height);
  expect(differingShare(plain, titled, Math.floor((16 / 990) * titled.height), blockEnd)).toBeGreaterThan(0.002);
  expect(differingShare(plain, titled, blockEnd, titled.height)).toBe(0);
  // Saved in the project file and back after opening it.
  const saved = await saveProject(page);
  expect([saved.doc.title, saved.doc.author]).toEqual(['Invented ridge fold, line 7', 'R. Tester and K. Second']);
});

test('opening a file over unsaved changes asks first; Cancel keeps the project, OK opens the file', async ({ page }) => {
  await ready(page, true);
  const asked: string[] = [];
  let answer = false;
  page.on('dialog', (d) => {
    asked.push(d.message());
    void (answer ? d.accept() : d.dismiss());
  });
  // Nothing unsaved: no question.
  await openSection(page, SECTION, 'first.json');
  await expectLastMessage(page, 'info', 'Opened first.json');
  expect(asked).toEqual([]);
  await setTitleAndAuthor(page, 'Work in progress', 'R. Tester');
  await expect(page.getByTestId('autosave-status')).toHaveText(/^Unsaved changes/);
  // Cancel: the question names the file; nothing is opened and the changes are still there, unsaved.
  await openSection(page, { ...SECTION, horizons: SECTION.horizons.slice(0, 2) }, 'second.json');
  await expect.poll(() => asked.length).toBe(1);
  expect(asked[0]).toMatch(/Discard the changes not saved to a file and open second\.json\?/);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await expect(page.getByTestId('autosave-status')).toHaveText(/^Unsaved changes/);
  await expect(page.getByTestId('message-area')).not.toHaveAttribute('data-last-message', /Opened second\.json/);
  const kept = await saveProject(page);
  expect([kept.doc.title, kept.doc.author, kept.doc.horizons.length]).toEqual(['Work in progress', 'R. Tester', 3]);
  // A file that cannot be opened only gets its message, even with changes unsaved.
  await setTitleAndAuthor(page, 'Work in progress, more', 'R. Tester');
  await page.getByTestId('open-project').setInputFiles({ name: 'broken.json', mimeType: 'application/json', buffer: Buffer.from('{"format":') });
  await expect(page.getByTestId('message-error')).toContainText('broken.json is not valid JSON');
  expect(asked).toHaveLength(1);
  // OK: the file opens in place of the project.
  answer = true;
  await openSection(page, { ...SECTION, horizons: SECTION.horizons.slice(0, 2) }, 'second.json');
  await expectLastMessage(page, 'info', 'Opened second.json');
  expect(asked).toHaveLength(2);
  await expect(page.getByTestId('autosave-status')).toHaveText(/^Saved/);
  const opened = await saveProject(page);
  expect([opened.doc.title, opened.doc.horizons.length]).toEqual(['second', 2]);
});

// Seeded corrupt files through the real inputs: 100 project files and 100 section files (open-project) and 100
// horizon CSV files (import-csv), 300 in all; about 20 s on 2 cores. The timeout set in the
// test is room for a loaded CI machine, not a check on speed. Vitest runs the same kinds of
// corruption 200 times per parser without a browser (tests/io/corruptFiles.test.ts).
const FUZZ_SEED = 20240501;
// FUZZ_CASES=1000 runs the full fuzz (1,000 files per input) on request.
const FUZZ_PROJECT_CASES = Number(process.env.FUZZ_CASES ?? 100);
const FUZZ_CSV_CASES = FUZZ_PROJECT_CASES;

function flips(text: string) {
  return fc.array(fc.tuple(fc.nat(), fc.integer({ min: 1, max: 255 })), { minLength: 1, maxLength: 6 }).map((fl) => {
    const chars = text.split('');
    for (const [at, x] of fl) chars[at % chars.length] = String.fromCharCode(chars[at % chars.length].charCodeAt(0) ^ x);
    return chars.join('');
  });
}

test('corrupt and hostile files give a message and leave the open project unchanged', async ({ page }) => {
  test.setTimeout(120_000 * Math.max(1, FUZZ_PROJECT_CASES / 100));
  await ready(page);
  await openSection(page);
  await setTitleAndAuthor(page, 'Fuzz target', 'R. Tester');
  const before = await saveProject(page);
  const good = JSON.stringify(before);
  // Project files: truncated, bytes flipped, wrong types, a newer version, deep nesting.
  const projectCases = fc.sample(fc.oneof(
    fc.nat().map((n) => good.slice(0, n % good.length)),
    flips(good),
    fc.constantFrom('[]', '', '{"format":"foldroot-project","version":99}', '['.repeat(100000) + ']'.repeat(100000), good.replace('"units":"m"', '"units":7'), good.replace('"version":1', '"version":"1"')),
  ), { seed: FUZZ_SEED, numRuns: FUZZ_PROJECT_CASES });
  for (const [i, text] of projectCases.entries()) {
    const name = `bad-${i}.json`;
    await page.getByTestId('open-project').setInputFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text) });
    // The same parser in Node says what the page must say. Every message names the file, so it is this case's.
    const expected = parseProjectText(text, name);
    if (expected.ok) await expectLastMessage(page, 'info', `Opened ${name}`);
    else await expect(page.getByTestId('message-error')).toContainText(expected.message.split(' (')[0]);
  }
  await expect(page.getByTestId('busy')).toHaveCount(0);
  // Section files through the same input: truncated or with bytes flipped, only those the opener refuses (one
  // that still reads would rightly replace the project).
  const sectionText = JSON.stringify(SECTION);
  const sectionCases = fc.sample(fc.oneof(fc.nat().map((n) => sectionText.slice(0, n % sectionText.length)), flips(sectionText))
    .filter((text) => !parseProjectText(text, 'bad.json').ok), { seed: FUZZ_SEED + 1, numRuns: FUZZ_PROJECT_CASES });
  for (const [i, text] of sectionCases.entries()) {
    const name = `bad-section-${i}.json`;
    await page.getByTestId('open-project').setInputFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text) });
    const expected = parseProjectText(text, name);
    await expect(page.getByTestId('message-error')).toContainText(!expected.ok ? expected.message.split(' (')[0] : 'never');
  }
  await expect(page.getByTestId('busy')).toHaveCount(0);
  // Horizon CSV: the app's own export, then corrupted; cases that still read cleanly are not corrupt and are left out.
  await page.getByTestId('menu-export').click();
  const csv = (await download(page, () => page.getByTestId('export-horizons-csv').click())).toString('utf8');
  expect(csv.startsWith('# caution: ')).toBe(true);
  const csvCases = fc.sample(fc.oneof(
    fc.nat().map((n) => csv.slice(0, n % csv.length)),
    flips(csv),
    fc.array(fc.tuple(fc.constantFrom(HOSTILE, 'Top', ''), fc.oneof(fc.double().map(String), fc.constantFrom('1e999', 'NaN', '')), fc.string()), { minLength: 1, maxLength: 12 })
      .map((rows) => ['horizon,x,z', ...rows.map((r) => r.join(','))].join('\n')),
    fc.integer({ min: 1, max: 20_000 }).map((n) => 'horizon,x,z\n' + '"'.repeat(n)),
    fc.constantFrom('', 'x,y\n1,2', '\ufeff# only a comment', 'horizon,x_m,z_ft\nA,0,0\nA,1,1'),
  ).filter((text) => { const r = parseHorizonsCsv(text); return !r.ok || r.problems.length > 0; }), { seed: FUZZ_SEED, numRuns: FUZZ_CSV_CASES });
  expect(csvCases).toHaveLength(FUZZ_CSV_CASES);
  for (const [i, text] of csvCases.entries()) {
    const name = `bad-${i}.csv`;
    await page.getByTestId('import-csv').setInputFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(text) });
    const dialog = page.getByTestId('import-dialog');
    await expect(dialog.getByRole('heading', { level: 2 })).toHaveText(`Import horizons from ${name}`);
    const expected = parseHorizonsCsv(text);
    if (!expected.ok) {
      await expect(dialog.getByTestId('import-error')).toHaveText(expected.message);
      await expect(dialog.getByTestId('import-confirm')).toBeDisabled();
    } else {
      await expect(dialog.getByTestId('import-problems')).toContainText(`Problems (${expected.problems.length}`);
    }
    await dialog.getByTestId('import-cancel').click();
    await expect(dialog).toHaveCount(0);
  }
  await expect(page.getByTestId('autosave-status')).toHaveText(/^Saved/);
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

test('the demo figure carries elevation and distance scales, the reference, orange/blue fills and a readable inset; the report carries the Monte Carlo spread', async ({ page }) => {
  await ready(page);
  // The report before any Monte Carlo run says so.
  await page.getByTestId('open-report').click();
  await expect(page.getByTestId('report-monte-carlo')).toContainText('No Monte Carlo run yet — run one in the Uncertainty panel.');
  await expect(page.getByTestId('report-amplification')).toContainText('1 + W₀/D');
  await expect(page.getByTestId('report-reference')).toContainText('reference level at elevation');
  await page.getByTestId('report-close').click();
  // One run with seed 1 (the panel's defaults otherwise).
  await page.getByTestId('monte-carlo-section').locator('summary').click();
  await page.getByTestId('mc-run').click();
  await expect(page.getByTestId('mc-result')).toBeVisible({ timeout: 60_000 });
  const p50 = (await page.getByTestId('mc-p50').textContent()) ?? '';
  await page.getByTestId('open-report').click();
  const mc = page.getByTestId('report-monte-carlo');
  await expect(mc).toContainText('Monte Carlo run of the state shown.');
  await expect(mc).toContainText('P10');
  await expect(mc).toContainText('seed');
  // The pane's P50 (e.g. "2600 m") and the report's agree to the figures shown.
  expect(Number.isFinite(parseFloat(p50))).toBe(true);
  await expect(page.getByTestId('report-scenarios-note')).toContainText('one common reference');
  // The report's text: the detachment elevation and the Monte Carlo elevations are negative here.
  const reportText = await page.getByTestId('report-page').evaluate((el: HTMLElement) => el.innerText);
  expect(reportText).toMatch(/elevation \u2212\d/);
  expect(reportText.split('\n').filter((line) => /(^|[^\w])-\d/.test(line))).toEqual([]);
  await expect.poll(() => page.getByTestId('report-figure').evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);
  await page.screenshot({ path: test.info().outputPath('demo-report.png') });
  await page.getByTestId('report-uncertainty').screenshot({ path: test.info().outputPath('demo-report-uncertainty.png') });
  await page.getByTestId('report-scenarios').screenshot({ path: test.info().outputPath('demo-report-scenarios.png') });
  await page.locator('.report-graph').screenshot({ path: test.info().outputPath('demo-report-graph.png') });
  await page.getByTestId('report-close').click();
  // The figure: SVG structure, then the PNG at the default size and at A3 300 dpi.
  await page.getByTestId('menu-export').click();
  const svg = (await download(page, () => page.getByTestId('export-svg').click())).toString('utf8');
  writeFileSync(test.info().outputPath('demo-figure.svg'), svg);
  const found = await page.evaluate((text) => {
    const d = new DOMParser().parseFromString(text, 'image/svg+xml');
    const all = (sel: string) => Array.from(d.querySelectorAll(sel)).map((t) => t.textContent ?? '');
    return { axes: all('.section-axes text'), legend: all('.legend text'), inset: all('.area-depth text'), above: d.querySelectorAll('.fill-above').length, ref: d.querySelectorAll('.reference-level').length, bar: d.querySelectorAll('.fieller-bar').length };
  }, svg);
  expect(found.axes).toContain('Elevation z (m)');
  expect(found.axes.filter((t) => /^\u2212?[\d,]+$/.test(t)).length).toBeGreaterThanOrEqual(6);
  // The demo lies partly below sea level: its negative elevations take the minus sign U+2212 (Unicode MINUS
  // SIGN) in the figure's text, never the hyphen-minus (which the SVG attributes keep, as their grammar asks).
  expect(found.axes.some((t) => /^\u2212[\d,]+$/.test(t))).toBe(true);
  expect([...found.axes, ...found.legend, ...found.inset].filter((t) => /(^|[^\w])-\d/.test(t))).toEqual([]);
  expect(found.above).toBeGreaterThan(0);
  expect(found.ref).toBe(1);
  expect(found.legend).toContain('excess area above the regional (added)');
  expect(found.legend).toContain('excess area below the regional (subtracted)');
  expect(found.inset.some((t) => t.includes('km²'))).toBe(true);
  for (const size of ['screen', 'a3-300']) {
    await page.getByTestId('menu-export').click();
    await page.getByTestId('png-size').selectOption(size);
    const bytes = await download(page, () => page.getByTestId('export-png').click());
    writeFileSync(test.info().outputPath(`demo-figure-${size}.png`), bytes);
    const png = PNG.sync.read(bytes);
    // Orange of the above-regional fill (over the scan's light paper) somewhere in the section panel.
    let orange = 0;
    for (let i = 0; i < png.data.length; i += 4 * 13) {
      const [r, g, b] = [png.data[i], png.data[i + 1], png.data[i + 2]];
      if (r > 200 && g > 140 && g < 215 && b < 170 && r - b > 60) orange++;
    }
    expect(orange).toBeGreaterThan(50);
  }
});

test('a reload restores the last state fitted to the view, not at 100 %', async ({ page }) => {
  await ready(page, true);
  await page.getByTestId('open-image').setInputFiles({ name: 'wide.png', mimeType: 'image/png', buffer: gradientPng(3000, 1200) });
  await expect(page.getByTestId('scan-name')).toContainText('wide.png');
  await expect(page.getByTestId('autosave-status')).toContainText('kept in browser');
  const fitted = await page.getByTestId('zoom-readout').textContent();
  await page.reload();
  await expect(page.getByTestId('restore-banner')).toBeVisible();
  await expect(page.getByTestId('zoom-readout')).toHaveText(fitted!);
  expect(parseFloat(fitted!)).toBeLessThan(100);
});

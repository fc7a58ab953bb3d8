// Files over each input's size limit (src/core/model/limits.ts), generated for the run and never committed: the
// text inputs get sparse files one byte over the limit (no disk is used, and the browser is handed the path, so
// nothing is copied), the scan a tiny PNG whose header declares more pixels than the limit. Each is refused before
// it is read, with a message naming the limit; the page stays up and the open project is unchanged.
import type { Page } from '@playwright/test';
import { closeSync, openSync, ftruncateSync, writeFileSync } from 'node:fs';
import { test, expect } from './guard';
import { gotoStarted } from './startup';

const MiB = 1024 * 1024;

/** A sparse file of `bytes` zero bytes at `path` (the file system stores no blocks for it). */
function sparseFile(path: string, bytes: number): string {
  const fd = openSync(path, 'w');
  ftruncateSync(fd, bytes);
  closeSync(fd);
  return path;
}

/** CRC-32 of the bytes (the PNG chunk check, ISO/IEC 15948 annex D). */
function crc32(bytes: Uint8Array): number {
  let c = ~0;
  for (const b of bytes) {
    c ^= b;
    for (let k = 0; k < 8; k++) c = (c >>> 1) ^ (0xedb88320 & -(c & 1));
  }
  return ~c >>> 0;
}

/** A PNG of signature and IHDR only (no pixel data), declaring width × height pixels. */
function pngHeader(width: number, height: number): Buffer {
  const body = Buffer.alloc(17);
  body.write('IHDR', 0, 'latin1');
  body.writeUInt32BE(width, 4);
  body.writeUInt32BE(height, 8);
  body.set([8, 2, 0, 0, 0], 12);
  const chunk = Buffer.alloc(25);
  chunk.writeUInt32BE(13, 0);
  body.copy(chunk, 4);
  chunk.writeUInt32BE(crc32(body), 21);
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk]);
}

const names = (page: Page) => page.getByTestId('horizon-list').getByLabel('Horizon name').evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value));

test('files over each input\'s size limit are refused by name of the limit, and nothing else changes', async ({ page }) => {
  test.setTimeout(120_000);
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  const before = await names(page);
  expect(before.length).toBeGreaterThan(0);
  const title = await page.title();
  const out = (name: string) => test.info().outputPath(name);

  const cases: { input: string; path: string; words: RegExp }[] = [
    { input: 'open-project', path: sparseFile(out('over-limit.foldroot.json'), 500 * MiB + 1), words: /over-limit\.foldroot\.json cannot be opened: file too large \(500 MB; the limit is 500 MB\)/ },
    { input: 'open-project', path: sparseFile(out('over-limit-section.json'), 500 * MiB + 1), words: /over-limit-section\.json cannot be opened: file too large \(500 MB; the limit is 500 MB\)/ },
    { input: 'import-csv', path: sparseFile(out('over-limit.csv'), 64 * MiB + 1), words: /over-limit\.csv cannot be imported: file too large \(64 MB; the limit is 64 MB\)/ },
    { input: 'import-geojson', path: sparseFile(out('over-limit.geojson'), 64 * MiB + 1), words: /over-limit\.geojson cannot be imported: file too large \(64 MB; the limit is 64 MB\)/ },
    { input: 'import-svg', path: sparseFile(out('over-limit.svg'), 64 * MiB + 1), words: /over-limit\.svg cannot be imported: file too large \(64 MB; the limit is 64 MB\)/ },
  ];
  const png = out('over-limit.png');
  writeFileSync(png, pngHeader(20_000, 15_000));
  cases.push({ input: 'open-image', path: png, words: /too large to open \(300 megapixels, 20000 × 15000 px; the largest scan Foldroot opens is 200 megapixels\)/ });

  for (const c of cases) {
    await page.getByTestId(c.input).setInputFiles(c.path);
    await expect(page.getByText(c.words)).toBeVisible({ timeout: 30_000 });
    if (c.input.startsWith('import-')) await page.getByTestId('import-cancel').click();
    await expect(page.getByTestId('busy')).toHaveCount(0);
    // The page is still there, with the same project.
    await expect(page.locator('[data-startup="done"]')).toHaveCount(1);
    await expect(page.getByTestId('horizon-list')).toBeVisible();
    expect(await names(page)).toEqual(before);
    expect(await page.title()).toBe(title);
  }
});

// The exported figure of a rotated scan is drawn in section coordinates: the scan's own vertical
// lines (drawn on it along the pins) come out vertical in the PNG, the pins and detachment are
// vertical and horizontal in the SVG, and the chosen true scale is stated on the figure.
import { writeFileSync } from 'node:fs';
import { PNG } from 'pngjs';
import { calibratedProject } from './calibratedProject';
import { download } from './download';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import type { ImagePx } from '../../src/core/model/projectDoc';
import type { Section, XZ } from '../../src/core/model/section';

const SECTION: Section = {
  units: 'm',
  pins: [0, 1000],
  horizons: [
    { name: 'Upper marker', line: [[-100, 500], [0, 500], [500, 900], [1000, 500], [1100, 500]], regional: [[-100, 500], [1100, 500]] },
    { name: 'Middle marker', line: [[-100, 250], [0, 250], [500, 600], [1000, 250], [1100, 250]], regional: [[-100, 250], [1100, 250]] },
    { name: 'Lower marker', line: [[-100, 0], [0, 0], [500, 300], [1000, 0], [1100, 0]], regional: [[-100, 0], [1100, 0]] },
  ],
};
const DEG = 15;
const [W, H] = [950, 1220];

/** Section (x, z) → scan pixel: 0.4 px per metre across, 0.8 px per metre up (VE 2), turned 15°. */
function toPx([x, z]: XZ): ImagePx {
  const t = (DEG * Math.PI) / 180;
  const [a, b] = [0.4 * (x + 200), -0.8 * (z - 1000)];
  return [320 + Math.cos(t) * a - Math.sin(t) * b, 30 + Math.sin(t) * a + Math.cos(t) * b];
}

/** A pale scan with the two pin lines drawn on it in pure blue, 9 px wide (wider than the pins drawn over them), along x = 0 and x = 1000 m. */
function rotatedScan(): Buffer {
  const png = new PNG({ width: W, height: H });
  png.data.fill(236);
  for (const x of SECTION.pins) {
    for (let z = -250; z <= 950; z += 0.5) {
      const [u, v] = toPx([x, z]);
      for (let du = -4; du <= 4; du++) {
        const i = (Math.round(v) * W + Math.round(u) + du) * 4;
        png.data[i] = 0; png.data[i + 1] = 0; png.data[i + 2] = 255;
      }
    }
  }
  return PNG.sync.write(png);
}

function rotatedProject(): string {
  const scan = { id: 'turned-scan', name: 'turned.png', widthPx: W, heightPx: H, bytes: new Uint8Array(rotatedScan()) };
  const corners: XZ[] = [[-200, 1000], [1300, 1000], [-200, -300], [1300, -300], [500, 400], [0, 0]];
  return calibratedProject(SECTION, 'Turned scan', scan, toPx, corners, [[0, 300], [1000, 450]]);
}


test('a rotated scan exports at true scale with vertical pins, a level detachment and true axes', async ({ page }) => {
  await gotoStarted(page);
  await page.getByTestId('open-project').setInputFiles({ name: 'turned.foldroot.json', mimeType: 'application/json', buffer: Buffer.from(rotatedProject()) });
  await expect(page.getByTestId('scan-name')).toContainText(`turned.png — ${W} × ${H} px`);
  await page.getByTestId('menu-export').click();
  await page.getByTestId('figure-ve').selectOption('1');
  const svg = (await download(page, () => page.getByTestId('export-svg').click())).toString('utf8');
  expect(svg).toContain('True scale: vertical exaggeration 1×');
  const lines = (cls: string) => [...svg.matchAll(new RegExp(`<line class="${cls}" x1="([\\d.-]+)" y1="([\\d.-]+)" x2="([\\d.-]+)" y2="([\\d.-]+)"`, 'g'))].map((m) => m.slice(1).map(Number));
  const pins = lines('pin');
  expect(pins).toHaveLength(2);
  for (const [x1, , x2] of pins) expect(Math.abs(x2 - x1)).toBeLessThan(0.01);
  for (const [, y1, , y2] of [...lines('detachment'), ...lines('reference-level')]) expect(Math.abs(y2 - y1)).toBeLessThan(0.01);
  // Elevation grid lines are level and distance grid lines upright.
  for (const [, y1, , y2] of lines('grid-z')) expect(Math.abs(y2 - y1)).toBeLessThan(0.01);
  for (const [x1, , x2] of lines('grid-x')) expect(Math.abs(x2 - x1)).toBeLessThan(0.01);

  // The PNG at the figure's own size (1400 × 990): the scan's blue pin lines run straight down the page.
  await page.getByTestId('menu-export').click();
  await page.getByTestId('png-size').selectOption('screen');
  const bytes = await download(page, () => page.getByTestId('export-png').click());
  writeFileSync(test.info().outputPath('rotated-true-scale.png'), bytes);
  const png = PNG.sync.read(bytes);
  expect([png.width, png.height]).toEqual([1400, 990]);
  for (const [x1] of pins) {
    // Blue pixels of the scan near this pin, row by row: their columns must not drift with height.
    const columns: number[] = [], rows: number[] = [];
    for (let y = 100; y < 780; y += 4) {
      let sum = 0, n = 0;
      for (let x = Math.round(x1) - 40; x <= Math.round(x1) + 40; x++) {
        const i = (y * png.width + x) * 4;
        if (png.data[i + 2] > 180 && png.data[i] < 120 && png.data[i + 1] < 120) { sum += x; n++; }
      }
      if (n > 0) { columns.push(sum / n); rows.push(y); }
    }
    expect(columns.length).toBeGreaterThan(40);
    // Least-squares drift of the column per row: turned 15° the line would drift tan 15° ≈ 0.27 px per row.
    const n = rows.length, my = rows.reduce((s, v) => s + v, 0) / n, mc = columns.reduce((s, v) => s + v, 0) / n;
    let syy = 0, syc = 0;
    for (let j = 0; j < n; j++) { syy += (rows[j] - my) ** 2; syc += (rows[j] - my) * (columns[j] - mc); }
    expect(Math.abs(syc / syy)).toBeLessThan(0.01);
    expect(Math.abs(mc - x1)).toBeLessThan(3);
  }
});

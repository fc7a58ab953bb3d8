// An export made while a long line is still being checked for crossing itself (in the worker) waits for the check,
// then leaves the line out with the reason, exactly as the pane does: never the numbers of a line about to be
// found crossing. ("Crosses": the edit drags a vertex of the steep limb above the limb's own flat top, so both new
// segments pass through that flat stretch — a crossing by construction, as in tests/state/linesChecked.test.ts.)
// The check is quick on a quiet machine and slow on a loaded one; so that the export surely comes while it runs,
// the test holds the worker's messages (inside the worker, which then tests them as ever) until the wait is seen.
import type { Page, Worker } from '@playwright/test';
import { PNG } from 'pngjs';
import { calibratedProject } from './calibratedProject';
import { download } from './download';
import { fittedScan, screen } from './fittedScan';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import type { ImagePx } from '../../src/core/model/projectDoc';
import type { Section, XZ } from '../../src/core/model/section';

const N = 20_000;
/** The steep limb: flat at z = 0 to x = 1000 m, then N vertices down to (1500, −2000) (z falls at every one), then flat. */
function limb(): XZ[] {
  const line: XZ[] = [[-100, 0], [1000, 0]];
  for (let i = 1; i <= N; i++) line.push([1000 + (500 * i) / N + 0.3 * Math.sin(i * 0.7), -(2000 * i) / (N + 1)]);
  line.push([3100, -2000]);
  return line;
}
const SECTION: Section = {
  units: 'm',
  pins: [0, 3000],
  horizons: [
    { name: 'Upper marker', line: [[-100, 500], [0, 500], [1500, 900], [3000, 500], [3100, 500]], regional: [[-100, 500], [3100, 500]] },
    { name: 'Lower marker', line: [[-100, 200], [0, 200], [1500, 500], [3000, 200], [3100, 200]], regional: [[-100, 200], [3100, 200]] },
    { name: 'Steep limb', line: limb(), regional: [[-100, -1000], [3100, -1000]] },
  ],
};
const [W, H] = [1750, 1600];
/** Section (x, z) → scan pixel: 0.5 px per metre, x from −200 m, z down from 1000 m. */
const toPx = ([x, z]: XZ): ImagePx => [(x + 200) / 2, (1000 - z) / 2];

function project(): string {
  const png = new PNG({ width: W, height: H });
  png.data.fill(235);
  const scan = { id: 'plain-scan', name: 'plain.png', widthPx: W, heightPx: H, bytes: new Uint8Array(PNG.sync.write(png)) };
  return calibratedProject(SECTION, 'Crossing while checked', scan, toPx, [[-200, 1000], [3300, 1000], [-200, -2200]], [[0, 0], [3000, 0]]);
}

async function openLimb(page: Page): Promise<void> {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('open-project').setInputFiles({ name: 'limb.foldroot.json', mimeType: 'application/json', buffer: Buffer.from(project()) });
  await expect(page.getByTestId('scan-name')).toContainText(`plain.png — ${W} × ${H} px`, { timeout: 30_000 });
  // The limb as opened does not cross itself: its check answers and it stays in.
  await expect(page.getByTestId('strip-crossing-check')).toHaveCount(0, { timeout: 30_000 });
  await expect(page.getByTestId('results-strip').getByRole('button').filter({ hasText: 'Steep limb' })).toHaveAttribute('title', 'Excess area of Steep limb');
}

/** Holds the self-crossing worker's incoming lines until released (the worker's own handler then tests them, in order). */
async function holdChecks(page: Page): Promise<Worker> {
  const worker = page.workers().find((w) => w.url().includes('selfCrossing'));
  expect(worker).toBeDefined();
  await worker!.evaluate(() => {
    const scope = self as unknown as { onmessage: ((e: MessageEvent) => void) | null; releaseChecks?: () => void };
    const handle = scope.onmessage!;
    const held: MessageEvent[] = [];
    scope.onmessage = (e) => held.push(e);
    scope.releaseChecks = () => {
      scope.onmessage = handle;
      for (const e of held.splice(0)) handle(e);
    };
  });
  return worker!;
}

/** Drags the limb's middle vertex above its own flat top with the edit tool (real mouse events). */
async function crossTheLimb(page: Page): Promise<void> {
  const cam = await fittedScan(page, W, H);
  await page.getByTestId('tool-edit').click();
  const mid = SECTION.horizons[2].line![2 + N / 2];
  const from = screen(cam, ...toPx(mid));
  const to = screen(cam, ...toPx([900, 50]));
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y, { steps: 4 });
  await page.mouse.up();
}

const LEFT_OUT = /^left out: Steep limb — (.*crosses itself between the pins \(segments \d+–\d+ and \d+–\d+ cross.*)$/;

test('a results table exported right after a long line is edited to cross itself leaves it out, with the reason', async ({ page }) => {
  test.setTimeout(120_000);
  await openLimb(page);
  const worker = await holdChecks(page);
  await crossTheLimb(page);
  await expect(page.getByTestId('strip-crossing-check')).toBeVisible();
  // While the check runs: the export waits, says so, and can be cancelled.
  const downloaded = download(page, async () => {
    await page.getByTestId('menu-export').click();
    await page.getByTestId('export-results-csv').click();
  });
  await expect(page.getByTestId('busy-text')).toHaveText('Checking lines… The results table waits for the self-crossing check of the long lines.');
  await expect(page.getByTestId('busy-cancel')).toBeVisible();
  await page.screenshot({ path: test.info().outputPath('checking-lines.png') });
  await worker.evaluate(() => (self as unknown as { releaseChecks(): void }).releaseChecks());
  const csv = (await downloaded).toString('utf8');
  await expect(page.getByTestId('busy')).toHaveCount(0);

  // The pane, once the verdict is in, leaves the limb out; the table says the same, word for word.
  const note = page.getByTestId('diagnostics').locator('p').filter({ hasText: /^left out: Steep limb/ });
  await expect(note).toHaveText(LEFT_OUT, { timeout: 30_000 });
  const reason = LEFT_OUT.exec((await note.textContent())!)![1];
  expect(csv).toContain(`# left out,Steep limb — ${reason}`);
  expect(csv).not.toMatch(/^Steep limb,/m);
  expect(csv).toMatch(/^Upper marker,/m);
  expect(csv).toMatch(/^horizons_in_fit,2,/m);

  // The figure, exported now, names it too.
  const svg = (await download(page, async () => {
    await page.getByTestId('menu-export').click();
    await page.getByTestId('export-svg').click();
  })).toString('utf8');
  expect(svg).toContain('Left out of the analysis: Steep limb — ');
});

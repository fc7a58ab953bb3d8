// A long line is tested for self-crossing in a worker, not on the page's thread: the section opens with its numbers,
// and a line that crosses itself is left out, with the place it crosses, once the worker's verdict is in. ("Crosses"
// as @turf/kinks, a general-purpose library from the registry, finds it; see tests/core/geometry/crossingVerdicts.test.ts.)
import { test, expect } from './guard';
import { gotoStarted } from './startup';

/** A section file of one steep limb of n vertices (z falls at every vertex) and, when `loop`, a stretch thrown back across it. */
function limbSection(n: number, loop: boolean): string {
  const line: [number, number][] = [[-100, 0], [1000, 0]];
  for (let i = 1; i <= n; i++) line.push([1000 + (500 * i) / n + 0.3 * Math.sin(i * 0.7), -(2000 * i) / (n + 1)]);
  if (loop) {
    const m = 2 + Math.floor(n / 2);
    line[m] = [line[m - 2][0] - 5, line[m - 3][1] + 1];
    line[m + 1] = [line[m - 2][0] + 5, line[m + 1][1]];
  }
  line.push([3100, -2000]);
  return JSON.stringify({ units: 'm', pins: [0, 3000], horizons: [
    { name: 'Steep limb', line, regional: [[-100, -1000], [3100, -1000]] },
    { name: 'Flat bed', line: [[-100, 500], [3100, 500]], regional: [[-100, 400], [3100, 400]] },
  ] });
}

test('a long line is tested for self-crossing in a worker and left out when it crosses', async ({ page }) => {
  const workers: string[] = [];
  page.on('worker', (w) => workers.push(w.url()));
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await page.getByTestId('open-project').setInputFiles({ name: 'looped-limb.json', mimeType: 'application/json', buffer: Buffer.from(limbSection(3000, true)) });
  await expect(page.getByLabel('Show Steep limb', { exact: true })).toBeVisible({ timeout: 30_000 });
  const limb = page.getByTestId('results-strip').getByRole('button').filter({ hasText: 'Steep limb' });
  await expect(limb).toHaveAttribute('title', /left out of the analysis: .*crosses itself between the pins \(segments \d+–\d+ and \d+–\d+ cross/, { timeout: 30_000 });
  await expect(page.getByTestId('strip-crossing-check')).toHaveCount(0);
  expect(workers.some((u) => u.includes('selfCrossing'))).toBe(true);

  // The same limb without the loop is measured, and stays in once its verdict is in.
  await page.getByTestId('open-project').setInputFiles({ name: 'limb.json', mimeType: 'application/json', buffer: Buffer.from(limbSection(3000, false)) });
  await expect(page.getByTestId('strip-crossing-check')).toHaveCount(0, { timeout: 30_000 });
  await expect(limb).toHaveAttribute('title', 'Excess area of Steep limb');
  await expect(limb).toContainText('km²');
});

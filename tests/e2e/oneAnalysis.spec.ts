// The results strip and the interpretation pane read one analysis: opened with a horizon whose regional
// crosses itself, or misses a pin, both leave that horizon out with the reason and show the same
// detachment depth for the rest. Check value: the analytic forward model of
// tests/fixtures/forwardModel/forwardModel.ts (Epard & Groshong, 1993, A = D·(zd − h)), its detachment 3000 m
// below the highest regional. Without the deepest horizon the other three stay on the line, so both views show
// a depth of 3000 m.
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { expectLastMessage } from './messages';
import { forwardHorizon } from '../fixtures/forwardModel/forwardModel';

function section(h4Regional: [number, number][]): string {
  const horizons = [0, 1, 2, 3].map((k) => ({ ...forwardHorizon(k), ...(k === 3 ? { regional: h4Regional } : {}) }));
  return JSON.stringify({ units: 'm', pins: [0, 10_000], horizons });
}

const cases: [string, [number, number][], RegExp][] = [
  ['crosses itself', [[-800, -2000], [6000, -2000], [3000, -2100], [4000, -1900], [10_800, -2000]], /crosses itself/],
  ['misses a pin', [[-800, -2000], [9500, -2000]], /does not reach the right pin/],
];

for (const [name, regional, reason] of cases) {
  test(`strip and pane show one depth and leave out a horizon whose regional ${name}`, async ({ page }) => {
    await gotoStarted(page);
    await page.getByTestId('open-project').setInputFiles({ name: 'four.json', mimeType: 'application/json', buffer: Buffer.from(section(regional)) });
    await expectLastMessage(page, 'info', 'Opened four.json');
    const strip = page.getByTestId('strip-detachment-depth');
    const pane = page.getByTestId('result-detachment-depth');
    await expect(strip).toHaveText(/3[,\s]?000 m/);
    await expect(pane).toHaveText(((await strip.textContent()) ?? '').trim());
    await expect(page.getByTestId('strip-note')).toContainText('Left out: H4');
    await expect(page.getByTestId('strip-note')).toContainText(reason);
    await expect(page.getByTestId('diagnostics')).toContainText('left out: H4');
    await expect(page.getByTestId('diagnostics')).toContainText(reason);
    await expect(page.getByTestId('result-n')).toHaveText('3');
    await page.getByTestId('results-strip').screenshot({ path: test.info().outputPath(`strip-${name.replace(/ /g, '-')}.png`) });
    await page.getByTestId('interpretation-pane').screenshot({ path: test.info().outputPath(`pane-${name.replace(/ /g, '-')}.png`) });
  });
}

// The results strip and the interpretation pane read one analysis: opened with a horizon whose regional
// crosses itself, or misses a pin, both leave that horizon out with the reason and show the same
// detachment depth for the rest. Check value: an analytic forward model (Epard & Groshong, 1993,
// A = D·(zd − h)): D = 1000 m, regionals at −500 … −2000 m and the detachment 3000 m below the highest;
// each excess area is a triangle fold 8000 m wide (area = base × height / 2). Without the deepest horizon
// the other three stay on the line, so both views show a depth of 3000 m.
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { expectLastMessage } from './messages';

function section(h4Regional: [number, number][]): string {
  const horizons = [0, 1, 2, 3].map((k) => {
    const r = -500 * (k + 1);
    const height = (2 * 1000 * (3000 - 500 * k)) / 8000;
    return { name: `H${k + 1}`, line: [[-800, r], [1000, r], [5000, r + height], [9000, r], [10_800, r]], regional: k === 3 ? h4Regional : [[-800, r], [10_800, r]] };
  });
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

// The invented faulted examples open from the Project menu in the built app: the scan, the fault and the
// horizons in pieces, and the strip gives the forward model's D and detachment depth (public/demo/<id>/truth.json,
// src/core/forward/faultedSection.ts) to the digitising error. The fold belt stays the start-up demo.
import { readFileSync } from 'node:fs';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { maxOf } from '../../src/core/stats/minMax';

const num = (s: string | null) => Number(/-?[\d.]+/.exec((s ?? '').replace(/\u2212/g, '-'))![0]);

for (const id of ['thrust', 'normal'] as const) {
  test(`the ${id} example opens from the Project menu and gives its truth's D and depth within 1 %`, async ({ page }) => {
    const truth = JSON.parse(readFileSync(`public/demo/${id}/truth.json`, 'utf8')) as { displacement: number; detachmentElevation: number };
    const section = JSON.parse(readFileSync(`public/demo/${id}/section.json`, 'utf8')) as { horizons: { regional: [number, number][] }[] };
    const reference = maxOf(section.horizons.map((h) => h.regional[0][1]));
    await gotoStarted(page);
    await expect(page.getByTestId('demo-note')).toBeVisible();
    await expect(page.getByTestId('busy')).toHaveCount(0);
    await page.getByTestId('menu-project').click();
    await page.getByTestId(`open-example-${id}`).click();
    await expect(page.getByTestId('busy')).toHaveCount(0);
    await expect(page.getByTestId('fault-list').locator('li')).toHaveCount(1);
    await expect(page.getByTestId('demo-note')).toBeVisible();
    await expect(page.getByTestId('strip-displacement')).toHaveText(/\d m$/);
    const D = num(await page.getByTestId('strip-displacement').textContent());
    const depth = num(await page.getByTestId('strip-detachment-depth').textContent());
    const truthDepth = reference - truth.detachmentElevation;
    console.log(`${id}: app D = ${D} m (truth ${truth.displacement}), depth = ${depth} m (truth ${truthDepth})`);
    expect(Math.abs(D - truth.displacement)).toBeLessThan(0.01 * Math.abs(truth.displacement));
    expect(Math.abs(depth - truthDepth)).toBeLessThan(0.01 * truthDepth);
    await page.screenshot({ path: test.info().outputPath(`example-${id}.png`) });
    // The report names the fault, how many horizons it cuts, and the regime with the signed displacement.
    const faultName = id === 'thrust' ? 'Brennock Thrust' : 'Grellan Fault';
    await page.getByTestId('open-report').click();
    await expect(page.getByTestId('report-faults')).toContainText(`${faultName} (cuts 4 horizons`);
    await expect(page.getByTestId('report-summary')).toContainText(id === 'thrust' ? 'shortening (D = ' : 'extension (E = −D = ');
  });
}

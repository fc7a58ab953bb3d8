// The counted limits (src/core/model/limits.ts: 2000 horizons, 200 scenarios) hold where the user makes a horizon or a
// scenario — the scenario buttons New and Duplicate, a typed horizon, the Draw horizon tool finished with Enter, a CSV
// import — with the limit's words, and the project stays as it was (also after a reload: the kept copy is the
// project's, nothing set aside). Counts follow from the generated project: 2000 horizons, 200 scenarios.
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import type { Section } from '../../src/core/model/section';
import { serializeProject } from '../../src/io/projectFile';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { expectLastMessage } from './messages';

/** An invented section of 2000 flat horizons 1 m apart, with 200 scenarios (the first and 199 without regionals). */
function fullProject(): string {
  const section: Section = {
    units: 'm',
    pins: [0, 1000],
    horizons: Array.from({ length: 2000 }, (_, i) => ({ name: `Bed ${i + 1}`, line: [[0, -i], [500, -i - 0.5], [1000, -i]], regional: [[0, -i], [1000, -i]] })),
  };
  const doc = sectionToProjectDoc(section, 'Full project');
  const first = doc.scenarios[0];
  doc.scenarios = Array.from({ length: 200 }, (_, k) => (k === 0 ? first : { ...first, id: `full-${k}`, name: `Copy ${k}`, regionals: {} }));
  return serializeProject(doc, null);
}

test('at 200 scenarios and 2000 horizons, New, Duplicate, a typed or drawn horizon and an import are refused with the limit', async ({ page }) => {
  test.setTimeout(180_000);
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await page.getByTestId('open-project').setInputFiles({ name: 'full.json', mimeType: 'application/json', buffer: Buffer.from(fullProject()) });
  const scenarios = page.getByTestId('scenario-list').locator('li');
  const horizons = page.getByTestId('horizon-list').locator('li');
  // Two thousand horizons take a while to open and list on a shared machine.
  await expect(horizons).toHaveCount(2000, { timeout: 120_000 });
  await expectLastMessage(page, 'info', 'Opened full.json');
  await expect(scenarios).toHaveCount(200);
  await expect(page.getByTestId('busy')).toHaveCount(0, { timeout: 60_000 });

  // Each refusal follows one of another kind, so every check sees its own message.
  const noScenario = 'No scenario was added: there would be too many scenarios for the app (201; the limit is 200)';
  const noHorizon = 'No horizon was added: there would be too many horizons for the app (2001; the limit is 2000)';
  await page.getByTestId('scenario-new').click();
  await expectLastMessage(page, 'error', noScenario);
  await page.getByText('Type or paste x, z').click();
  await page.getByTestId('xz-table').fill('0, 10\n1000, 10');
  await page.getByTestId('xz-add').click();
  await expectLastMessage(page, 'error', noHorizon);
  await page.getByTestId('scenario-duplicate').click();
  await expectLastMessage(page, 'error', noScenario);
  await expect(scenarios).toHaveCount(200);

  // Draw horizon by its key, two clicks in the view, finished with Enter.
  await page.getByTestId('section-view').click({ position: { x: 50, y: 50 } });
  await page.keyboard.press('Escape');
  await page.keyboard.press('d');
  await page.getByTestId('section-view').click({ position: { x: 100, y: 120 } });
  await page.getByTestId('section-view').click({ position: { x: 300, y: 140 }, modifiers: ['Alt'] });
  await page.keyboard.press('Enter');
  await expectLastMessage(page, 'error', noHorizon);

  await page.getByTestId('import-csv').setInputFiles({ name: 'one.csv', mimeType: 'text/csv', buffer: Buffer.from('horizon,x_m,z_m\nExtra,0,5\nExtra,1000,5\n') });
  await page.getByTestId('import-dialog').getByTestId('import-confirm').click();
  await expectLastMessage(page, 'error', 'Nothing was imported from one.csv: with the horizons already in the project there would be too many horizons for the app (2001; the limit is 2000)');
  await expect(horizons).toHaveCount(2000);
  await page.screenshot({ path: test.info().outputPath('creation-limits.png') });

  // One scenario fewer, and New makes one again.
  await page.getByTestId('scenario-delete').click();
  await expect(scenarios).toHaveCount(199);
  await page.getByTestId('scenario-new').click();
  await expect(scenarios).toHaveCount(200);

  await page.reload();
  await expect(page.locator('[data-startup="done"]')).toHaveCount(1, { timeout: 60_000 });
  await expect(horizons).toHaveCount(2000, { timeout: 60_000 });
  await expect(scenarios).toHaveCount(200);
  await expect(page.getByTestId('kept-aside-banner')).toHaveCount(0);
});

// A faulted section digitised through the UI with real mouse and keyboard events: a fault drawn with the
// Fault tool, two horizons each drawn in two pieces snapped onto it, pins and flat regionals typed. The
// section is the forward model's (vertical simple shear over a ramp-flat fault; Gibbs 1983, J. Struct.
// Geol. 5, for the construction; exactness docs/method.md §Forward models), so the area–depth line must
// give its D and zd (Epard & Groshong 1993; Groshong 1994 for extension) to the digitising error.
import type { Page } from '@playwright/test';
import { faultedSection } from '../../src/core/forward/faultedSection';
import type { XZ } from '../../src/core/model/section';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { clickAt, fittedScan, screen, type Cam } from './fittedScan';
import { gradientPng } from './pngFixture';

const W = 1000;
const H = 600;
// The scan's calibration: x = 30 u − 4500 m, z = 2600 − 10 v m.
const toPx = ([x, z]: XZ): [number, number] => [(x + 4500) / 30, (2600 - z) / 10];
// The model's ramp-flat fault, and the stretch of it digitised (what the scan shows, from the lower flat to the upper).
const RAMP_FLAT: XZ[] = [[-8000, -3000], [6000, -3000], [8000, -1800], [9000, -600], [10500, 800], [30000, 800]];
const FAULT_DRAWN: XZ[] = [[-4000, -3000], ...RAMP_FLAT.slice(1, 5), [25000, 800]];
// Levels whose hanging-wall vertices all stay well clear of the fault (> 20 scan px), so only the cutoffs snap.
const LEVELS = [{ name: 'Upper', regionalElevation: 500 }, { name: 'Lower', regionalElevation: -1000 }];

const num = (s: string | null) => Number(/-?[\d.]+/.exec((s ?? '').replace(/\u2212/g, '-'))![0]);

async function calibrated(page: Page): Promise<Cam> {
  page.on('dialog', (d) => void d.accept());
  // A large view: the model's closest vertices lie 9 scan px apart, which must stay more than the double-click
  // distance (6 screen px) apart on the screen.
  await page.setViewportSize({ width: 1920, height: 1200 });
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await page.getByTestId('open-image').setInputFiles({ name: 'faulted.png', mimeType: 'image/png', buffer: gradientPng(W, H) });
  await expect(page.getByTestId('scan-name')).toContainText('faulted.png');
  const cam = await fittedScan(page, W, H);
  await page.getByTestId('tool-calibrate').click();
  await page.getByTestId('cal-mode-affine').click();
  for (const [k, [u, v]] of ([[50, 50], [950, 60], [940, 450], [60, 440]] as [number, number][]).entries()) {
    await clickAt(page, cam, u, v);
    await expect(page.getByTestId(`cal-x-${k}`)).toBeFocused();
    await page.getByTestId(`cal-x-${k}`).fill(String(30 * u - 4500));
    await page.getByTestId(`cal-z-${k}`).fill(String(2600 - 10 * v));
    await page.getByTestId(`cal-z-${k}`).press('Enter');
  }
  return cam;
}

/** Digitises the forward model with displacement D and returns its truth. */
async function digitise(page: Page, cam: Cam, D: number) {
  const { section, truth } = faultedSection({ units: 'm', pins: [0, 20000], displacement: D, fault: RAMP_FLAT, horizons: LEVELS });
  // Straight stretches: the generated scan has no drawn lines to follow.
  await page.getByTestId('tool-fault').click();
  await page.getByTestId('follow-line').uncheck();
  for (const q of FAULT_DRAWN) await clickAt(page, cam, ...toPx(q));
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('fault-list').locator('li')).toHaveCount(1);
  await page.getByTestId('tool-draw').click();
  for (const h of section.horizons) {
    const [hanging, footwall] = h.pieces!;
    // The hanging-wall piece; its last click (the cutoff) lands on the fault and ends the piece.
    for (const q of hanging) await clickAt(page, cam, ...toPx(q));
    await expect(page.getByTestId('tool-hint')).toHaveAttribute('data-state', 'continuing');
    // The footwall piece: its first click (the other cutoff) lands on the same fault.
    for (const q of footwall) await clickAt(page, cam, ...toPx(q));
    await page.keyboard.press('Enter');
  }
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(2);
  await page.getByTestId('tool-pins').click();
  await clickAt(page, cam, ...toPx([0, -3300]));
  await clickAt(page, cam, ...toPx([20000, -3300]));
  await page.getByTestId('pin-left-x').fill('0');
  await page.getByTestId('pin-left-x').press('Enter');
  await page.getByTestId('pin-right-x').fill('20000');
  await page.getByTestId('pin-right-x').press('Enter');
  await expect(page.getByTestId('pin-width')).toContainText('20000 m');
  for (const [i, level] of LEVELS.entries()) {
    await page.getByTestId(`horizon-row-h${i + 1}`).click({ position: { x: 8, y: 10 } });
    await page.getByTestId('regional-z-flat').fill(String(level.regionalElevation));
    await page.getByTestId('regional-z-flat').press('Enter');
  }
  return truth;
}

test('a fault, two horizons drawn in two pieces snapped to it, pins and regionals give the forward model’s D and zd', async ({ page }) => {
  const cam = await calibrated(page);
  const truth = await digitise(page, cam, 1500);
  // Each horizon is one line of two pieces (the fault stretch is drawn as part of its outline).
  await expect(page.getByTestId('strip-area-h1')).toHaveText(/\d (km²|m²)$/);
  const D = num(await page.getByTestId('strip-displacement').textContent());
  const depth = num(await page.getByTestId('strip-detachment-depth').textContent());
  // Digitising error: a click lands within half a screen pixel, about 20 m across and 7 m up here.
  expect(Math.abs(D - truth.displacement)).toBeLessThan(0.03 * truth.displacement);
  expect(Math.abs(depth - truth.detachmentDepth)).toBeLessThan(0.03 * truth.detachmentDepth);
  await expect(page.getByTestId('strip-regime')).toHaveText('shortening');
  await page.screenshot({ path: test.info().outputPath('faulted-thrust.png') });

  // Resting on a cutoff shows the fault's slip, heave and throw there: heave = D for this model.
  const cut = truth.horizons[0].footwallCutoff;
  const p = screen(cam, ...toPx(cut));
  await page.getByTestId('tool-select').click();
  await page.mouse.move(p.x, p.y);
  const readout = page.getByTestId('cutoff-readout');
  await expect(readout).toBeVisible();
  await expect(readout).toContainText('Fault 1 — slip');
  const heave = num(/heave ([^·]+)/.exec((await readout.textContent()) ?? '')![1]);
  expect(Math.abs(heave - 1500)).toBeLessThan(60);
  await page.screenshot({ path: test.info().outputPath('faulted-cutoff-hover.png') });

  // Moving the whole fault (Shift-drag) leaves the cutoffs behind: the piece ends are ringed and the pane names the problem.
  await page.getByTestId('tool-edit').click();
  const flat = screen(cam, ...toPx([2000, -3000]));
  await page.keyboard.down('Shift');
  await page.mouse.move(flat.x, flat.y);
  await page.mouse.down();
  await page.mouse.move(flat.x - 30, flat.y, { steps: 4 });
  await page.mouse.up();
  await page.keyboard.up('Shift');
  await expect(page.getByTestId('diagnostics')).toContainText('off fault "Fault 1"');
  await expect(page.locator('canvas').first()).toBeVisible();
  await page.screenshot({ path: test.info().outputPath('faulted-end-off-fault.png') });
  await page.keyboard.press('Control+z');
  await expect(page.getByTestId('diagnostics')).not.toContainText('off fault');
  await expect(page.getByTestId('strip-displacement')).toHaveText(/^1\d{3} m$/);
});

test('an extensional section through the whole UI: regime, signed displacement, graph, scenarios, sensitivity and Monte Carlo', async ({ page }) => {
  const cam = await calibrated(page);
  const truth = await digitise(page, cam, -1200);
  const D = num(await page.getByTestId('strip-displacement').textContent());
  const depth = num(await page.getByTestId('strip-detachment-depth').textContent());
  expect(D).toBeLessThan(0);
  expect(Math.abs(D - truth.displacement)).toBeLessThan(0.03 * Math.abs(truth.displacement));
  expect(Math.abs(depth - truth.detachmentDepth)).toBeLessThan(0.03 * truth.detachmentDepth);
  await expect(page.getByTestId('strip-regime')).toHaveText('extension');
  const pane = page.getByTestId('interpretation-pane');
  await expect(page.getByTestId('result-regime')).toContainText('extension (E = −D = ');
  await expect(page.getByTestId('result-displacement')).toContainText('−');
  await expect(page.getByTestId('graph-detachment')).toBeVisible();
  await pane.screenshot({ path: test.info().outputPath('extension-pane.png') });
  await page.screenshot({ path: test.info().outputPath('extension-workspace.png') });

  // A second scenario (a copy) keeps the extensional fit.
  await page.getByTestId('scenario-duplicate').click();
  await expect(page.getByTestId('scenario-compare')).toContainText('−');
  await expect(page.getByTestId('result-regime')).toContainText('extension');

  // Sensitivity: 1 + W/D for D < 0 (docs/method.md §Sensitivity to the regional).
  await page.getByTestId('sensitivity-section').locator('summary').click();
  const amp = 1 + 20000 / D;
  const text = (await page.getByTestId('sensitivity-amplification').textContent()) ?? '';
  const m = /1 \+ W\/D = (−?\d+\.\d)/.exec(text);
  expect(m, text).not.toBeNull();
  expect(Math.abs(num(m![1]) - amp)).toBeLessThan(0.5);
  await expect(page.getByTestId('sensitivity-offset-plot')).toBeVisible();
  await page.getByTestId('sensitivity-offset-plot').scrollIntoViewIfNeeded();
  await pane.screenshot({ path: test.info().outputPath('extension-sensitivity.png') });

  // Monte Carlo: a small seeded run gives a P50 near the detachment depth.
  await page.getByTestId('monte-carlo-section').locator('summary').click();
  await page.getByTestId('mc-runs').fill('500');
  await page.getByTestId('mc-seed').fill('7');
  await page.getByTestId('mc-run').click();
  await expect(page.getByTestId('mc-result')).toBeVisible({ timeout: 60_000 });
  const p50 = num(await page.getByTestId('mc-p50').textContent());
  expect(Math.abs(p50 - depth)).toBeLessThan(0.1 * depth);
  await page.getByTestId('mc-result').scrollIntoViewIfNeeded();
  await pane.screenshot({ path: test.info().outputPath('extension-monte-carlo.png') });
});

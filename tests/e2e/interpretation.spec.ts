// The interpretation pane on the demo the app opens at start: the numbers shown equal the engine's
// for public/demo/section.json (to display rounding), which lie close to public/demo/truth.json (the forward
// model its scan was drawn from, digitised by hand with jitter); toggling a horizon, switching scenarios, and a repeatable Monte Carlo run
// that leaves the page responsive; and a Shift-drag of the regionals with the mouse, during and after
// which the strip, the pane, the graph and the detachment drawn on the section agree with the engine
// run here on the document the app then saves.
import { readFileSync } from 'node:fs';
import type { Locator, Page } from '@playwright/test';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { analyseSection, type SectionAnalysis } from '../../src/core/analysis/analyseSection';
import { monteCarlo } from '../../src/core/analysis/monteCarlo';
import { fitCalibration } from '../../src/core/calibration/fitCalibration';
import { sectionToImage } from '../../src/core/calibration/mapPoints';
import { interpolateZAt } from '../../src/core/geometry/interpolateZAt';
import { paletteColour } from '../../src/core/model/horizonPalette';
import { docToSection } from '../../src/core/model/docToSection';
import type { ControlPoint, ProjectDoc } from '../../src/core/model/projectDoc';
import type { AnySection, Section } from '../../src/core/model/section';
import { fitCamera } from '../../src/state/camera';
import { expectLastMessage } from './messages';

const demo = JSON.parse(readFileSync('public/demo/section.json', 'utf8')) as Section;
const truth = JSON.parse(readFileSync('public/demo/truth.json', 'utf8')) as { displacement: number; detachmentElevation: number };
const demoCalibration = JSON.parse(readFileSync('public/demo/calibration.json', 'utf8')) as { imageWidthPx: number; imageHeightPx: number; controlPoints: ControlPoint[] };

function engine(section: AnySection): SectionAnalysis {
  const out = analyseSection(section);
  if (!out.ok) throw new Error(out.problems.map((p) => p.message).join('\n'));
  return out.analysis;
}

/** The number at the start of a displayed value such as "−2600 m" (the strip's typographic minus) or "0.9998". */
async function shown(loc: Locator): Promise<number> {
  const text = ((await loc.textContent()) ?? '').replace(/\u2212/g, '-');
  const m = /^\s*(-?\d+(?:\.\d+)?)/.exec(text);
  if (!m) throw new Error(`no number in "${text}"`);
  return Number(m[1]);
}

/** Displayed to whole units (or to `decimals`): within half the last digit, plus float noise of the pixel round trip. */
function expectRounded(displayed: number, value: number, decimals = 0): void {
  expect(Math.abs(displayed - value)).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-6);
}

async function expectPaneMatches(page: Page, a: SectionAnalysis): Promise<void> {
  const ad = a.areaDepth!;
  expectRounded(await shown(page.getByTestId('result-detachment-elevation')), ad.detachmentElevation!);
  expectRounded(await shown(page.getByTestId('result-detachment-depth')), ad.detachmentDepth!);
  expectRounded(await shown(page.getByTestId('result-displacement')), ad.displacement);
  expectRounded(await shown(page.getByTestId('result-r2')), ad.r2, 4);
  await expect(page.getByTestId('result-n')).toHaveText(String(ad.n));
}

async function openDemo(page: Page): Promise<void> {
  await gotoStarted(page);
  await expect(page.getByTestId('result-detachment-elevation')).toContainText(' m', { timeout: 20_000 });
}

test('the pane shows the engine’s detachment for the demo, with an interval that holds the truth it was built from', async ({ page }) => {
  await openDemo(page);
  const a = engine(demo);
  await expectPaneMatches(page, a);
  // The number comes first, then the unit, rounded as the strip rounds the same quantity (formatQuantity).
  await expect(page.getByTestId('result-detachment-elevation')).toHaveText(/^−?\d+ m$/);
  await expect(page.getByTestId('result-displacement')).toHaveText(/^\d+ m$/);
  await expect(page.getByTestId('result-detachment-depth')).toHaveText((await page.getByTestId('strip-detachment-depth').textContent()) ?? '');
  // The demo is digitised by hand from its scan (jittered clicks): the points scatter, so the pane gives a
  // real 95% interval on the depth, and the section shows its band.
  await expect(page.getByTestId('interval-detachment-depth')).toHaveText(/^95%: \d+ to \d+ m$/);
  // r² has no interval: its place is empty and takes no room.
  await expect(page.getByTestId('interval-r2')).toHaveText('');
  await expect(page.getByTestId('interval-r2')).toBeHidden();
  const band = () => page.evaluate(`(() => window.Konva.stages[0].find('Line').filter((l) => l.closed() && Math.abs(l.opacity() - 0.14) < 1e-9).length)()`);
  await expect.poll(band).toBe(1);
  await expect(page.getByTestId('demo-note')).toHaveText('Invented demo — Project ▸ New to start your own.');
  // Erosion cuts the top horizon at the overturned crest: section.json marks that stretch projected, the
  // section draws it dashed (with its halo), and the pane says how much of that horizon's area is projected.
  const projectedHorizons = demo.horizons.filter((h) => (h.projected ?? []).length > 0);
  expect(projectedHorizons.map((h) => h.name)).toEqual([demo.horizons[0].name]);
  // The demo draws its first horizon in the palette's first colour (state/openDemo.ts); the detachment is dashed in another colour.
  const dashed = () => page.evaluate(`(() => window.Konva.stages[0].find('Line').filter((l) => l.stroke() === '${paletteColour(0)}' && (l.dash() ?? []).length > 0).length)()`);
  await expect.poll(dashed).toBeGreaterThanOrEqual(1);
  await expect(page.getByTestId('diagnostics')).toContainText(`Horizon "${demo.horizons[0].name}"`);
  await expect(page.getByTestId('diagnostics')).toContainText('are projected (interpreted)');
  // Against the forward model it was built from (truth.json): within 1 % of D and of the depth, and the
  // truth inside the engine's interval (the digitising error the demo's README states).
  const ad = a.areaDepth!;
  expect(Math.abs(ad.displacement / truth.displacement - 1)).toBeLessThan(0.01);
  expect(Math.abs(ad.detachmentElevation! - truth.detachmentElevation)).toBeLessThan(0.01 * ad.detachmentDepth!);
  const truthDepth = a.referenceElevation - truth.detachmentElevation;
  expect(ad.detachmentDepthCI95![0]).toBeLessThan(truthDepth);
  expect(ad.detachmentDepthCI95![1]).toBeGreaterThan(truthDepth);
  // One point per horizon, the caution visible, the detachment marked on the graph.
  await expect(page.locator('[data-testid^="graph-point-"]')).toHaveCount(demo.horizons.length);
  await expect(page.getByTestId('graph-detachment')).toBeVisible();
  await expect(page.getByTestId('pane-caution')).toContainText('licensed professional');
  await page.screenshot({ path: test.info().outputPath('pane-demo.png') });
  await page.getByTestId('interpretation-pane').screenshot({ path: test.info().outputPath('pane-only.png') });
});

test('clicking a graph point leaves its horizon out, and the values follow the engine', async ({ page }) => {
  await openDemo(page);
  const point = page.getByTestId('graph-point-0');
  await expect(point).toHaveAttribute('data-included', 'yes');
  await point.click();
  await expect(point).toHaveAttribute('data-included', 'no');
  const without = engine({ ...demo, horizons: demo.horizons.map((h, i) => (i === 0 ? { ...h, include: false } : h)) });
  await expect(page.getByTestId('result-n')).toHaveText(String(demo.horizons.length - 1));
  await expectPaneMatches(page, without);
  // The table row's box shows the same state, and ticking it brings the horizon back.
  await expect(page.getByTestId('include-0')).not.toBeChecked();
  await page.getByTestId('include-0').check();
  await expect(point).toHaveAttribute('data-included', 'yes');
  await expectPaneMatches(page, engine(demo));
});

test('leaving out all but two horizons says so in plain words', async ({ page }) => {
  await openDemo(page);
  for (let i = 0; i < demo.horizons.length - 2; i++) await page.getByTestId(`graph-point-${i}`).click();
  await expect(page.getByTestId('result-n')).toHaveText('2');
  await expect(page.getByTestId('diagnostics')).toContainText('Too few horizons for intervals');
  const two = engine({ ...demo, horizons: demo.horizons.map((h, i) => ({ ...h, include: i >= demo.horizons.length - 2 })) });
  await expectPaneMatches(page, two);
});

test('scenarios: duplicate, change the copy, switch back, compare', async ({ page }) => {
  await openDemo(page);
  const base = engine(demo);
  await page.getByTestId('scenario-duplicate').click();
  await expect(page.getByTestId('scenario-select').locator('option')).toHaveCount(2);
  await expect(page.getByTestId('scenario-select')).toHaveValue('scenario-2');
  // The copy starts equal, then leaves out the deepest horizon.
  await expectPaneMatches(page, base);
  const last = demo.horizons.length - 1;
  await page.getByTestId(`graph-point-${last}`).click();
  const changed = engine({ ...demo, horizons: demo.horizons.map((h, i) => (i === last ? { ...h, include: false } : h)) });
  await expectPaneMatches(page, changed);
  // Rename the copy.
  await page.getByTestId('scenario-rename').click();
  await page.getByTestId('scenario-name-input').fill('Without the deepest');
  await page.getByTestId('scenario-name-input').press('Enter');
  await expect(page.getByTestId('scenario-select').locator('option:checked')).toHaveText('Without the deepest');
  // Back to the first scenario: its own inclusion, its own numbers.
  await page.getByTestId('scenario-select').selectOption('scenario-1');
  await expectPaneMatches(page, base);
  await expect(page.getByTestId(`graph-point-${last}`)).toHaveAttribute('data-included', 'yes');
  const rows = page.getByTestId('scenario-compare').locator('tbody tr');
  await expect(rows).toHaveCount(2);
  await expect(rows.nth(1)).toContainText('Without the deepest');
  await expect(page.getByTestId('scenario-overlay').locator('.fit-line')).toHaveCount(2);
  await page.getByTestId('interpretation-pane').screenshot({ path: test.info().outputPath('pane-scenarios.png') });
});

test('the sensitivity plot states the amplification 1 + W/D of the engine’s fit', async ({ page }) => {
  await openDemo(page);
  await page.getByTestId('sensitivity-section').locator('summary').click();
  const a = engine(demo);
  const amp = 1 + a.pinWidth / a.areaDepth!.displacement;
  const text = (await page.getByTestId('sensitivity-amplification').textContent()) ?? '';
  const m = /1 \+ W\/D = (\d+\.\d)/.exec(text);
  expect(m).not.toBeNull();
  expect(Math.abs(Number(m![1]) - amp)).toBeLessThanOrEqual(0.05 + 1e-9);
  await expect(page.getByTestId('sensitivity-offset-plot')).toBeVisible();
  await page.getByTestId('sensitivity-offset-plot').scrollIntoViewIfNeeded();
  await page.getByTestId('interpretation-pane').screenshot({ path: test.info().outputPath('pane-sensitivity.png') });
});

test('Monte Carlo with a fixed seed repeats exactly, matches the engine, and the page answers clicks while it runs', async ({ page }) => {
  await openDemo(page);
  const mc = page.getByTestId('monte-carlo-section');
  await mc.locator('summary').click();
  const runs = 8000;
  await page.getByTestId('mc-runs').fill(String(runs));
  await page.getByTestId('mc-seed').fill('4242');
  await page.getByTestId('mc-sigma-vertex').fill('10');
  await page.getByTestId('mc-sigma-offset').fill('20');
  // Every vertex perturbed and re-measured: the slow path, so the run lasts long enough to click during it.
  await page.getByTestId('mc-vertices').check();
  const percentiles = async (): Promise<string[]> => {
    await page.getByTestId('mc-run').click();
    await expect(page.getByTestId('mc-progress')).toBeVisible();
    // A click handled during the run: the sensitivity section opens while the progress bar is still shown.
    const sensitivity = page.getByTestId('sensitivity-section');
    await sensitivity.locator('summary').click();
    await expect(sensitivity).toHaveAttribute('open', '');
    await expect(page.getByTestId('mc-progress')).toBeVisible();
    await sensitivity.locator('summary').click();
    await expect(page.getByTestId('mc-result')).toBeVisible({ timeout: 120_000 });
    return Promise.all(['mc-p10', 'mc-p50', 'mc-p90', 'mc-failed'].map(async (id) => (await page.getByTestId(id).textContent()) ?? ''));
  };
  const first = await percentiles();
  await page.getByTestId('mc-result').scrollIntoViewIfNeeded();
  await page.getByTestId('interpretation-pane').screenshot({ path: test.info().outputPath('pane-monte-carlo.png') });
  const second = await percentiles();
  expect(second).toEqual(first);
  // The same run in the test process, on the demo's section file (the app's section went through the
  // scan's pixels and back, so agreement is to display rounding).
  const out = monteCarlo(demo, { runs, seed: 4242, sigmaVertex: 10, sigmaOffset: 20, sigmaHorizonOffset: 0, sigmaTilt: 0, sigmaScale: 0, method: 'vertices' });
  if (!out.ok) throw new Error('engine Monte Carlo failed');
  const d = out.result.depth!;
  const num = (s: string) => Number(/^-?\d+/.exec(s.replace(/\u2212/g, '-'))![0]);
  expectRounded(num(first[0]), d.p10);
  expectRounded(num(first[1]), d.p50);
  expectRounded(num(first[2]), d.p90);
  expect(d.p90 - d.p10).toBeGreaterThan(100);
  await expect(page.getByTestId('mc-histogram')).toBeVisible();
});

test('Monte Carlo can be cancelled', async ({ page }) => {
  await openDemo(page);
  await page.getByTestId('monte-carlo-section').locator('summary').click();
  await page.getByTestId('mc-runs').fill('100000');
  await page.getByTestId('mc-vertices').check();
  await page.getByTestId('mc-run').click();
  await expect(page.getByTestId('mc-progress')).toBeVisible();
  await page.getByTestId('mc-cancel').click();
  await expect(page.getByTestId('mc-progress')).toHaveCount(0);
  await expect(page.getByTestId('mc-result')).toHaveCount(0);
  await expect(page.getByTestId('mc-run')).toBeEnabled();
});

/** The strip's number: about four significant figures with a typographic minus (formatQuantity). */
async function stripNumber(loc: Locator): Promise<number> {
  const text = ((await loc.textContent()) ?? '').replace(/\u2212/g, '-');
  const m = /^\s*(-?\d+(?:\.\d+)?) m$/.exec(text);
  if (!m) throw new Error(`no length in "${text}"`);
  return Number(m[1]);
}

/** Within half a unit of the fourth significant figure, as the strip rounds. */
function expectFourFigures(displayed: number, value: number): void {
  const mag = Math.floor(Math.log10(Math.abs(value)));
  expect(Math.abs(displayed - value)).toBeLessThanOrEqual(0.5 * 10 ** Math.max(mag - 3, -6) + 1e-6);
}

interface Shown { strip: number; elevation: number; depth: number; displacement: number; graph: number; label: string; lineRow: number }

/**
 * The detachment drawn on the section: its label (canvas text) and the median screen row of its line right of the
 * view's middle. Its group is drawn alone at the view's size (the overlay's canvas also holds the handles, which a
 * regional's colour can make as red as the line).
 */
async function sectionDetachment(page: Page): Promise<{ label: string; lineRow: number }> {
  return page.evaluate(`(() => {
    const stage = window.Konva.stages[0];
    // The label's text, as its picture was last drawn with (canvas/labelPicture.ts).
    const text = stage.findOne('.detachment-label')?.getAttr('label');
    if (!text) return { label: '', lineRow: NaN };
    const marks = stage.findOne('.detachment');
    const canvas = marks.toCanvas({ x: 0, y: 0, width: stage.width(), height: stage.height(), pixelRatio: window.devicePixelRatio || 1 });
    const ctx = canvas.getContext('2d');
    const ratio = canvas.width / stage.width();
    const rows = [];
    // Columns right of the middle of the view, clear of the label over the line's left end; the line is dashed.
    for (let f = 0.6; f <= 0.8; f += 0.005) {
      const x = Math.round(stage.width() * f * ratio);
      const col = ctx.getImageData(x, 0, 1, canvas.height).data;
      const hits = [];
      // The line is the opaque red; the 95% band is the same red at low opacity.
      for (let y = 0; y < canvas.height; y++) if (col[4 * y + 3] > 200 && col[4 * y] > 140 && col[4 * y + 1] < 90) hits.push(y);
      if (hits.length) rows.push(hits.reduce((a, b) => a + b, 0) / hits.length / ratio);
    }
    rows.sort((a, b) => a - b);
    return { label: text, lineRow: rows.length ? rows[Math.floor(rows.length / 2)] : NaN };
  })()`);
}

async function shownValues(page: Page): Promise<Shown> {
  const graphText = ((await page.getByTestId('graph-detachment').textContent()) ?? '').replace(/\u2212/g, '-');
  const g = /detachment (-?\d+(?:\.\d+)?) m/.exec(graphText);
  if (!g) throw new Error(`no depth in the graph's label "${graphText}"`);
  return {
    strip: await stripNumber(page.getByTestId('strip-detachment-depth')),
    elevation: await shown(page.getByTestId('result-detachment-elevation')),
    depth: await shown(page.getByTestId('result-detachment-depth')),
    displacement: await shown(page.getByTestId('result-displacement')),
    graph: Number(g[1]),
    ...(await sectionDetachment(page)),
  };
}

/** Everything shown agrees with the engine's analysis, to each place's display rounding. */
function expectShownMatches(v: Shown, a: SectionAnalysis): void {
  const ad = a.areaDepth!;
  expectFourFigures(v.strip, ad.detachmentDepth!);
  expectRounded(v.elevation, ad.detachmentElevation!);
  expectRounded(v.depth, ad.detachmentDepth!);
  expectRounded(v.displacement, ad.displacement);
  expectRounded(v.graph, ad.detachmentDepth!);
  // The label on the section (DetachmentMarks): elevation, then depth below the reference, rounded as the strip.
  const m = /^Proposed detachment (-?\d+(?:\.\d+)?) m\ndepth (-?\d+(?:\.\d+)?) m below (-?\d+(?:\.\d+)?) m/.exec(v.label.replace(/\u2212/g, '-'));
  expect(m, `label "${v.label}"`).not.toBeNull();
  expectRounded(Number(m![1]), ad.detachmentElevation!);
  expectRounded(Number(m![2]), ad.detachmentDepth!);
  expectRounded(Number(m![3]), a.referenceElevation);
}

test('Shift-dragging the regionals up: the strip, pane, graph and the line on the section follow the engine, shallower; undo restores them', async ({ page }) => {
  await openDemo(page);
  const before = engine(demo);
  const start = await shownValues(page);
  expectShownMatches(start, before);
  expect(start.lineRow).toBeGreaterThan(0);

  // Where the app drew the top horizon's regional (openDemo: the demo calibration, the scan fitted to the view),
  // midway between two of its vertices so the press takes the line, not a handle.
  await page.getByTestId('tool-regional').click();
  const cal = fitCalibration({ kind: 'affine', points: demoCalibration.controlPoints });
  if (!cal.ok) throw new Error(cal.message);
  const view = page.getByTestId('section-view');
  const size = await view.evaluate((el) => ({ w: el.clientWidth, h: el.clientHeight }));
  const box = (await view.boundingBox())!;
  const cam = fitCamera(demoCalibration.imageWidthPx, demoCalibration.imageHeightPx, size.w, size.h);
  const top = demo.horizons[0].regional;
  const x = 10500;
  const [u, v] = sectionToImage(cal.fit, [x, interpolateZAt(top.map((q) => q[0]), top.map((q) => q[1]), x)]);
  const grab = { x: Math.round(box.x + cam.x + u * cam.scale), y: Math.round(box.y + cam.y + v * cam.scale) };

  // Shift-drag every regional up one screen pixel and hold: the numbers follow while the button is down.
  await page.mouse.move(grab.x, grab.y);
  await page.keyboard.down('Shift');
  await page.mouse.down();
  await page.mouse.move(grab.x, grab.y - 1);
  await expect.poll(() => stripNumber(page.getByTestId('strip-detachment-depth'))).toBeLessThan(start.strip);
  await expect.poll(async () => (await sectionDetachment(page)).label).not.toBe(start.label);
  const during = await shownValues(page);
  await page.screenshot({ path: test.info().outputPath('regionals-dragging.png') });
  // Released where it was held: the document is the one shown during the drag.
  await page.mouse.up();
  await page.keyboard.up('Shift');
  const after = await shownValues(page);
  expect(after).toEqual(during);

  // The engine, here, on the document the app now holds (Project ▾ → Save).
  const [dl] = await Promise.all([page.waitForEvent('download'), (async () => {
    await page.getByTestId('menu-project').click();
    await page.getByTestId('save-project').click();
  })()]);
  const saved = JSON.parse(readFileSync((await dl.path())!, 'utf8')) as { doc: ProjectDoc };
  const ds = docToSection(saved.doc);
  if (!ds.ok) throw new Error(ds.message);
  const moved = engine(ds.section);
  expectShownMatches(during, moved);
  await expectPaneMatches(page, moved);

  // The direction and size the method predicts (docs/method.md §Sensitivity to the regional): raising every
  // regional by δ leaves D as it was and raises the detachment by δ(1 + W0/D), so it is shallower.
  const delta = moved.horizons[0].regionalElevation - before.horizons[0].regionalElevation;
  expect(delta).toBeGreaterThan(0);
  moved.horizons.forEach((h, i) => expect(Math.abs(h.regionalElevation - before.horizons[i].regionalElevation - delta)).toBeLessThan(1e-6));
  const ad0 = before.areaDepth!;
  const ad1 = moved.areaDepth!;
  expect(Math.abs(ad1.displacement - ad0.displacement)).toBeLessThan(1e-6 * ad0.displacement);
  const rise = ad1.detachmentElevation! - ad0.detachmentElevation!;
  expect(Math.abs(rise - delta * (1 + before.pinWidth / ad0.displacement))).toBeLessThan(1e-6 * Math.abs(rise));
  expect(ad1.detachmentDepth!).toBeLessThan(ad0.detachmentDepth!);
  expect(during.depth).toBeLessThan(start.depth);
  expect(during.elevation).toBeGreaterThan(start.elevation);
  // The line on the section moved up with it: the regionals rose one screen pixel for δ, the line rises rise/δ pixels
  // (the trend line is parallel to the regionals; the scan is rotated by well under a degree).
  expect(start.lineRow - during.lineRow).toBeGreaterThan(0);
  expect(Math.abs(start.lineRow - during.lineRow - rise / delta)).toBeLessThanOrEqual(2);

  // One undo step brings every number and the line back.
  await page.keyboard.press('Control+z');
  await expect.poll(() => stripNumber(page.getByTestId('strip-detachment-depth'))).toBe(start.strip);
  expect(await shownValues(page)).toEqual(start);
  await expectPaneMatches(page, before);
});

test('a Monte Carlo result is marked as for an earlier state once the section changes, and never shows a stale point estimate', async ({ page }) => {
  await openDemo(page);
  await page.getByTestId('monte-carlo-section').locator('summary').click();
  await page.getByTestId('mc-runs').fill('2000');
  await page.getByTestId('mc-run').click();
  const result = page.getByTestId('mc-result');
  await expect(result).toBeVisible({ timeout: 60_000 });
  await expect(result).toHaveAttribute('data-stale', 'no');
  await expect(result).toContainText('Dashed line: the estimate without perturbation');
  const p50 = await page.getByTestId('mc-p50').textContent();
  // Leave the first horizon out: the section the run used is no longer the current one.
  await page.getByTestId('graph-point-0').click();
  await expect(result).toHaveAttribute('data-stale', 'yes');
  await expect(page.getByTestId('mc-stale')).toHaveText('These results are for an earlier state of the section — run again.');
  await expect(result).not.toContainText('estimate without perturbation');
  // Still visible, marked, with the numbers of the run.
  await expect(page.getByTestId('mc-p50')).toHaveText(p50 ?? '');
  await result.scrollIntoViewIfNeeded();
  await page.getByTestId('interpretation-pane').screenshot({ path: test.info().outputPath('pane-monte-carlo-stale.png') });
  // Back to the section it was run on (the key is of the content, not of the edit): current again.
  await page.getByTestId('graph-point-0').click();
  await expect(result).toHaveAttribute('data-stale', 'no');
  await expect(result).toContainText('estimate without perturbation');
});

test('Monte Carlo and sensitivity results of one project never show against the next one opened, nor does a run still going', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await openDemo(page);
  await page.getByTestId('monte-carlo-section').locator('summary').click();
  await page.getByTestId('mc-runs').fill('2000');
  await page.getByTestId('mc-run').click();
  await expect(page.getByTestId('mc-result')).toBeVisible({ timeout: 60_000 });
  await page.getByTestId('open-report').click();
  await expect(page.getByTestId('report-monte-carlo')).toContainText('Monte Carlo run of the state shown.');
  await page.getByTestId('report-close').click();
  // Open the demo's own section file (public/demo/section.json): another project, the same scenario id and
  // the same section in section units, so a result keyed by its section alone would even pass for current.
  await page.getByTestId('open-project').setInputFiles({ name: 'section.json', mimeType: 'application/json', buffer: readFileSync('public/demo/section.json') });
  await expectLastMessage(page, 'info', 'Opened section.json');
  await expect(page.getByTestId('result-detachment-elevation')).toContainText(' m');
  await expect(page.getByTestId('mc-run')).toBeVisible();
  await expect(page.getByTestId('mc-result')).toHaveCount(0);
  await page.getByTestId('open-report').click();
  await expect(page.getByTestId('report-monte-carlo')).toContainText('No Monte Carlo run yet — run one in the Uncertainty panel.');
  await page.getByTestId('report-close').click();
  await page.getByTestId('interpretation-pane').screenshot({ path: test.info().outputPath('pane-after-open.png') });
  // A run still going when the project is replaced does not finish into the new one.
  await page.getByTestId('mc-runs').fill('100000');
  await page.getByTestId('mc-vertices').check();
  await page.getByTestId('mc-run').click();
  await expect(page.getByTestId('mc-progress')).toBeVisible();
  await page.getByTestId('open-project').setInputFiles({ name: 'again.json', mimeType: 'application/json', buffer: readFileSync('public/demo/section.json') });
  await expectLastMessage(page, 'info', 'Opened again.json');
  await expect(page.getByTestId('mc-progress')).toHaveCount(0);
  await expect(page.getByTestId('mc-run')).toBeEnabled();
  await expect(page.getByTestId('mc-result')).toHaveCount(0);
});

test('negative numbers on the page take the minus sign U+2212, as in the strip: graph readout, panes and cursor readout', async ({ page }) => {
  // Unicode's MINUS SIGN (U+2212) for text a person reads; the hyphen-minus stays in data files.
  await openDemo(page);
  // The demo's detachment lies below sea level: the strip and the pane say so with the minus sign.
  await expect(page.getByTestId('result-detachment-elevation')).toHaveText(/^\u2212\d+ m$/);
  // Left of the zero-area line the graph's cursor readout gives a negative area.
  const graph = (await page.getByTestId('area-depth-graph').boundingBox())!;
  await page.mouse.move(graph.x + graph.width * 0.16, graph.y + graph.height * 0.5);
  await expect(page.getByTestId('area-depth-graph-readout')).toHaveText(/^Cursor: \u2212\d/);
  await page.getByTestId('sensitivity-section').locator('summary').click();
  await page.getByTestId('monte-carlo-section').locator('summary').click();
  await page.getByTestId('mc-runs').fill('2000');
  await page.getByTestId('mc-run').click();
  await expect(page.getByTestId('mc-result')).toBeVisible({ timeout: 60_000 });
  await page.mouse.move(graph.x + graph.width * 0.16, graph.y + graph.height * 0.5);
  // Over the section view the cursor readout (below sea level at the bottom of the scan) too.
  const view = (await page.getByTestId('section-view').boundingBox())!;
  await page.mouse.move(view.x + view.width / 2, view.y + view.height * 0.8);
  await expect(page.getByTestId('cursor-readout')).toHaveText(/z \u2212\d/);
  const text = await page.evaluate(() => document.body.innerText);
  // No hyphen-minus used as a sign anywhere on the page ("1-2-5" or "Depth-to-detachment" follow a letter or digit).
  expect(text.split('\n').filter((line) => /(^|[^\w])-\d/.test(line))).toEqual([]);
  await page.getByTestId('interpretation-pane').screenshot({ path: test.info().outputPath('pane-minus-signs.png') });
});

/** The screen point on the top horizon's regional at x (section units), where the app draws it after start-up. */
async function topRegionalAt(page: Page, x: number): Promise<{ x: number; y: number }> {
  const cal = fitCalibration({ kind: 'affine', points: demoCalibration.controlPoints });
  if (!cal.ok) throw new Error(cal.message);
  const view = page.getByTestId('section-view');
  const size = await view.evaluate((el) => ({ w: el.clientWidth, h: el.clientHeight }));
  const box = (await view.boundingBox())!;
  const cam = fitCamera(demoCalibration.imageWidthPx, demoCalibration.imageHeightPx, size.w, size.h);
  const top = demo.horizons[0].regional;
  const [u, v] = sectionToImage(cal.fit, [x, interpolateZAt(top.map((q) => q[0]), top.map((q) => q[1]), x)]);
  return { x: Math.round(box.x + cam.x + u * cam.scale), y: Math.round(box.y + cam.y + v * cam.scale) };
}

test('scenarios are compared on detachment elevation and depths below one common reference, the table and legend in view', async ({ page }) => {
  await openDemo(page);
  await page.getByTestId('scenario-duplicate').click();
  // Raise every regional of the copy by Shift-dragging the top one up 1 screen pixel: its own reference (its highest
  // regional) moves up. One pixel is about 24 m at the fitted view; amplified about 19 times (1 + W0/D), the copy's
  // detachment rises some 450 m and stays below its deepest horizon (2 px would lift it above, and rightly give none).
  await page.getByTestId('tool-regional').click();
  const grab = await topRegionalAt(page, 10500);
  await page.mouse.move(grab.x, grab.y);
  await page.keyboard.down('Shift');
  await page.mouse.down();
  await page.mouse.move(grab.x, grab.y - 0.5);
  await page.mouse.move(grab.x, grab.y - 1);
  await page.mouse.up();
  await page.keyboard.up('Shift');
  const [dl] = await Promise.all([page.waitForEvent('download'), (async () => {
    await page.getByTestId('menu-project').click();
    await page.getByTestId('save-project').click();
  })()]);
  const saved = JSON.parse(readFileSync((await dl.path())!, 'utf8')) as { doc: ProjectDoc };
  const analysisOf = (id: string) => {
    const ds = docToSection(saved.doc, id);
    if (!ds.ok) throw new Error(ds.message);
    return engine(ds.section);
  };
  const base = analysisOf('scenario-1');
  const copy = analysisOf('scenario-2');
  expect(copy.referenceElevation).toBeGreaterThan(base.referenceElevation);
  // The table: elevations as the engine's; depths below the base case's reference for both rows.
  const elevation = async (id: string) => shown(page.getByTestId(`compare-elevation-${id}`));
  expectFourFigures(await elevation('scenario-1'), base.areaDepth!.detachmentElevation!);
  expectFourFigures(await elevation('scenario-2'), copy.areaDepth!.detachmentElevation!);
  await expect(page.getByTestId('scenario-reference')).toContainText('the highest regional of Base case');
  const rows = page.getByTestId('scenario-compare').locator('tbody tr');
  const depthCell = async (i: number) => shown(rows.nth(i).locator('td').nth(2));
  expectFourFigures(await depthCell(0), base.referenceElevation - base.areaDepth!.detachmentElevation!);
  expectFourFigures(await depthCell(1), base.referenceElevation - copy.areaDepth!.detachmentElevation!);
  // Every column of the comparison inside the pane (nothing cut at its right edge).
  const pane = (await page.getByTestId('interpretation-pane').boundingBox())!;
  const table = page.getByTestId('scenario-compare');
  await table.scrollIntoViewIfNeeded();
  const tableBox = (await table.boundingBox())!;
  expect(tableBox.x + tableBox.width).toBeLessThanOrEqual(pane.x + pane.width);
  // The overlay graph: the legend sits below the plot, not over its points.
  const overlay = page.getByTestId('scenario-overlay');
  const legend = page.getByTestId('scenario-overlay-legend');
  await legend.scrollIntoViewIfNeeded();
  const g = (await overlay.boundingBox())!;
  const l = (await legend.boundingBox())!;
  expect(l.y).toBeGreaterThanOrEqual(g.y + g.height - 1);
  await expect(legend).toContainText('Base case');
  await page.getByTestId('interpretation-pane').screenshot({ path: test.info().outputPath('pane-compare.png') });
});

for (const [w, h] of [[1400, 900], [1920, 1080]] as const) {
  test(`at ${w}×${h} the per-horizon table fits the pane and a scenario's message is not cut`, async ({ page }) => {
    await page.setViewportSize({ width: w, height: h });
    await openDemo(page);
    const box = page.getByTestId('horizon-table-box');
    const fits = await box.evaluate((el) => el.scrollWidth <= el.clientWidth + 1);
    expect(fits).toBe(true);
    await page.screenshot({ path: test.info().outputPath(`pane-${w}.png`) });
    await page.getByTestId('scenario-new').click();
    const message = page.getByTestId('scenario-message-scenario-2');
    await expect(message).toHaveText('Place the two pins.');
    expect(await message.evaluate((el) => el.scrollWidth <= el.clientWidth + 1)).toBe(true);
    await page.getByTestId('scenario-select').selectOption('scenario-1');
    await page.getByTestId('sensitivity-section').locator('summary').click();
    await page.getByTestId('sensitivity-offset-plot').scrollIntoViewIfNeeded();
    await page.screenshot({ path: test.info().outputPath(`pane-${w}-sensitivity.png`) });
  });
}

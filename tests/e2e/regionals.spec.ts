// Regionals a geologist knows from wells or thicknesses: typed as elevations at the pins, as one flat
// elevation, or through a point at a dip; the typed fields and a drag on the section stay in step, and
// each typed value is one undo step. Proposed regionals sit on the bed near the pins. Elevations follow
// from the generated scan's calibration (10 m per pixel, z = 1000 m at the top: z = 1000 − 10 v) and
// plane trigonometry (a dip θ drops tan θ per unit across).
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { gotoStarted } from './startup';
import { clickAt, fittedScan, screen, type Cam } from './fittedScan';
import { gradientPng } from './pngFixture';
import { download } from './download';
import { parseProjectText } from '../../src/io/projectFile';
import { analyseDoc } from '../../src/core/analysis/analyseDocGesture';
import { formatArea, formatLength } from '../../src/format/formatQuantity';
import { HORIZON_COLUMNS, screenCell, tableAreaUnit } from '../../src/format/horizonColumns';
import { forwardSection } from '../../src/core/forward/forwardSection';
import { sectionToProjectDoc } from '../../src/core/model/migrations/sectionToProjectDoc';
import { summaryRowsOf } from '../../src/panels/interpretation/summaryRows';
import { EXACT_FIT_TEXT } from '../../src/core/analysis/isExactFit';

const W = 1000;
const H = 500;

const fitted = (page: Page) => fittedScan(page, W, H);

async function setUp(page: Page): Promise<Cam> {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await page.getByTestId('open-image').setInputFiles({ name: 'section.png', mimeType: 'image/png', buffer: gradientPng(W, H) });
  await expect(page.getByTestId('scan-name')).toContainText('section.png');
  const cam = await fitted(page);
  await page.getByTestId('tool-calibrate').click();
  await page.getByTestId('cal-mode-affine').click();
  for (const [k, [u, v]] of ([[50, 50], [950, 60], [940, 450], [60, 440]] as [number, number][]).entries()) {
    await clickAt(page, cam, u, v);
    await expect(page.getByTestId(`cal-x-${k}`)).toBeFocused();
    await page.getByTestId(`cal-x-${k}`).fill(String(10 * u));
    await page.getByTestId(`cal-z-${k}`).fill(String(1000 - 10 * v));
    await page.getByTestId(`cal-z-${k}`).press('Enter');
  }
  // One anticline at v = 300 (z = −2000 m), 100 px high, between u = 150 and 850, with a vertex every 25 px.
  await page.getByTestId('tool-draw').click();
  for (let u = 50; u <= 950; u += 25) {
    const t = u > 150 && u < 850 ? Math.sin((Math.PI * (u - 150)) / 700) ** 2 : 0;
    await clickAt(page, cam, u, 300 - 100 * t);
  }
  await page.keyboard.press('Enter');
  await page.getByTestId('tool-pins').click();
  await clickAt(page, cam, 100, 470);
  await clickAt(page, cam, 900, 470);
  await page.getByTestId('pin-left-x').fill('1000');
  await page.getByTestId('pin-left-x').press('Enter');
  await page.getByTestId('pin-right-x').fill('9000');
  await page.getByTestId('pin-right-x').press('Enter');
  await expect(page.getByTestId('pin-width')).toContainText('8000 m');
  await page.getByTestId('horizon-row-h1').click({ position: { x: 8, y: 10 } });
  await expect(page.getByTestId('regional-fields')).toBeVisible();
  return cam;
}

/** Sets the regional flat at −2000 m (v = 300), takes the Regional tool and presses the mouse on the regional at u = 500: the drag's start, in page px. */
async function grabFlatRegional(page: Page, cam: Cam): Promise<{ x: number; y: number }> {
  await page.getByTestId('regional-z-flat').fill('-2000');
  await page.getByTestId('regional-z-flat').press('Enter');
  await expect(page.getByTestId('regional-summary')).toContainText('mean elevation −2000 m, dip 0°');
  await page.getByTestId('tool-regional').click();
  const grab = screen(cam, 500, 300);
  await page.mouse.move(grab.x, grab.y);
  await page.mouse.down();
  return grab;
}


/** The project saved from the page, analysed in Node by the engine the app runs. */
async function savedAnalysis(page: Page) {
  await page.getByTestId('menu-project').click();
  const opened = parseProjectText((await download(page, () => page.getByTestId('save-project').click())).toString('utf8'));
  if (!opened.ok) throw new Error(opened.message);
  const d = analyseDoc(opened.doc);
  if (!d.outcome?.ok) throw new Error('the saved document has no analysis');
  return d.outcome.analysis;
}

test('a regional is typed at the pins, flat, or through a point at a dip; drag and fields stay in step; one undo per value', async ({ page }) => {
  const cam = await setUp(page);
  const summary = page.getByTestId('regional-summary');
  await expect(summary).toContainText('No regional yet');

  // Elevations at both pins: the left one first gives a flat regional, the right one tilts it.
  await page.getByTestId('regional-z-left').fill('-2000');
  await page.getByTestId('regional-z-left').press('Enter');
  await expect(summary).toContainText('mean elevation −2000 m, dip 0°');
  await page.getByTestId('regional-z-right').fill('-2080');
  await page.getByTestId('regional-z-right').press('Enter');
  // Mean (−2000 − 2080) / 2 = −2040; dip atan(80 / 8000) = 0.573° down to the right.
  await expect(summary).toContainText('mean elevation −2040 m, dip 0.573° down to the right');
  await expect(page.getByTestId('strip-area-h1')).toHaveText(/\d (km²|m²)$/);
  await page.screenshot({ path: test.info().outputPath('regional-typed.png') });

  // One undo step per typed value: Ctrl+Z takes back the right pin's value only.
  await page.getByTestId('section-view').focus();
  await page.keyboard.press('Control+z');
  await expect(summary).toContainText('mean elevation −2000 m, dip 0°');
  await expect(page.getByTestId('regional-z-right')).toHaveValue('-2000');

  // Flat at one elevation.
  await page.getByTestId('regional-z-flat').fill('-1990');
  await page.getByTestId('regional-z-flat').press('Enter');
  await expect(page.getByTestId('regional-z-left')).toHaveValue('-1990');
  await expect(page.getByTestId('regional-z-right')).toHaveValue('-1990');

  // Through x = 1000 (the left pin), z = −1990 at a dip of 2°: at the right pin −1990 − 8000 tan 2° = −2269.37.
  await page.getByTestId('regional-through-x').fill('1000');
  await page.getByTestId('regional-through-x').press('Enter');
  await expect(page.getByTestId('regional-through-z')).toHaveValue('-1990');
  await page.getByTestId('regional-dip').fill('2');
  await page.getByTestId('regional-dip').press('Enter');
  await expect(page.getByTestId('regional-z-right')).toHaveValue(String(Math.round((-1990 - 8000 * Math.tan((2 * Math.PI) / 180)) * 100) / 100));
  await expect(page.getByTestId('regional-z-left')).toHaveValue('-1990');
  await expect(summary).toContainText('dip 2° down to the right');
  // A dip of 90° is refused with a message, and the regional stays.
  await page.getByTestId('regional-dip').fill('90');
  await page.getByTestId('regional-dip').press('Enter');
  await expect(page.getByTestId('message-error')).toContainText('a dip must lie between −90° and 90°');
  await expect(summary).toContainText('dip 2° down to the right');

  // Back to flat at −2000 m (v = 300), then drag the regional up 10 px (100 m) with the Regional tool:
  // the fields follow the drag.
  const grab = await grabFlatRegional(page, cam);
  await page.mouse.move(grab.x, grab.y - 10 * cam.scale, { steps: 4 });
  await page.mouse.up();
  // The drag moves the regional by whole screen pixels: about 100 m up, the same at both pins.
  const left = Number(await page.getByTestId('regional-z-left').inputValue());
  const right = Number(await page.getByTestId('regional-z-right').inputValue());
  expect(left).toBeGreaterThan(-2000 + 100 - 10 / cam.scale * 10);
  expect(left).toBeLessThan(-2000 + 100 + 10 / cam.scale * 10);
  expect(right).toBeCloseTo(left, 6);
  await expect(page.getByTestId('regional-z-flat')).toHaveValue(String(left));
  // The drag was one undo step: Ctrl+Z puts it back at −2000 m.
  await page.keyboard.press('Control+z');
  await expect(page.getByTestId('regional-z-left')).toHaveValue('-2000');
});

test('Propose regional puts the regional on the bed near the pins, not below it', async ({ page }) => {
  await setUp(page);
  await page.getByTestId('propose-regional').click();
  // The bed is flat at v = 300 near both pins (z = −2000 m): the clicks land within a screen pixel of it.
  const left = Number(await page.getByTestId('regional-z-left').inputValue());
  const right = Number(await page.getByTestId('regional-z-right').inputValue());
  for (const z of [left, right]) expect(Math.abs(z + 2000)).toBeLessThan(10);
  await page.screenshot({ path: test.info().outputPath('regional-proposed.png') });
});

/**
 * The fills and regionals as drawn (their two canvases, the dragged ones' over the still ones, composited as the
 * browser does), down one column of the view from y0 to y1 (page px): RGBA per pixel.
 */
async function drawnFillColumn(page: Page, x: number, y0: number, y1: number): Promise<number[]> {
  const box = (await page.getByTestId('section-view').boundingBox())!;
  return page.evaluate(([cx, top, bottom]) => {
    const stage = (window as unknown as { Konva: { stages: { getLayers: () => { name: () => string; getCanvas: () => { _canvas: HTMLCanvasElement } }[] }[] } }).Konva.stages[0];
    const layers = stage.getLayers().filter((l) => /fills-and-regionals/.test(l.name()));
    const ratio = window.devicePixelRatio || 1;
    const out = new Array<number>(4 * (bottom - top)).fill(0);
    for (const layer of layers) {
      const c = layer.getCanvas()._canvas;
      const d = c.getContext('2d')!.getImageData(Math.round(cx * ratio), Math.round(top * ratio), 1, Math.round((bottom - top) * ratio)).data;
      for (let k = 0; k < bottom - top; k++) {
        const i = 4 * Math.round(k * ratio);
        const a = d[i + 3] / 255;
        for (let ch = 0; ch < 3; ch++) out[4 * k + ch] = Math.round(d[i + ch] * a + out[4 * k + ch] * (1 - a));
        out[4 * k + 3] = Math.round(255 * (a + (out[4 * k + 3] / 255) * (1 - a)));
      }
    }
    return out;
  }, [x - box.x, Math.round(y0 - box.y), Math.round(y1 - box.y)] as const);
}

test('a continuous drag of a regional, moves faster than frames: held and let go, the fill and numbers are those of the last position', async ({ page }) => {
  const cam = await setUp(page);
  const grab = await grabFlatRegional(page, cam);

  // 30 moves up one screen pixel each, then one of 6: generated in the page three to a task (the last task four),
  // faster than the page draws frames (a mouse reporting quickly). 36 screen px = 36 / scale scan px = 360 / scale m up (z = 1000 − 10 v).
  const rise = 36;
  await page.evaluate(async ([x, y]) => {
    const view = document.querySelector('[data-testid="section-view"]')!;
    const move = (dy: number) => view.dispatchEvent(new PointerEvent('pointermove', { clientX: x, clientY: y - dy, bubbles: true, pointerId: 1, pointerType: 'mouse', isPrimary: true, buttons: 1 }));
    for (let k = 1; k <= 30; k++) {
      move(k);
      if (k % 3 === 0 && k < 30) await new Promise((r) => setTimeout(r, 0));
    }
    // In the same task as the two before it: a page that took only the first move of a frame would stop 8 px short.
    move(36);
  }, [grab.x, grab.y] as const);
  const expected = -2000 + (10 * rise) / cam.scale;
  // Held: the typed fields, the readout beside the pointer and the strip follow to the last position, not one before.
  await expect.poll(async () => Number(await page.getByTestId('regional-z-left').inputValue())).toBeCloseTo(expected, 1);
  await expect(page.getByTestId('drag-readout')).toHaveText(/^Δz \+\d+(\.\d+)? m$/);
  const readout = Number(((await page.getByTestId('drag-readout').textContent()) ?? '').replace(/^Δz \+/, '').replace(/ m$/, ''));
  // The readout shows as many decimals as one screen pixel resolves (10 / scale m): within half a pixel of the rise.
  expect(Math.abs(readout - (10 * rise) / cam.scale)).toBeLessThan(5 / cam.scale);
  const heldArea = await page.getByTestId('strip-area-h1').textContent();
  const heldDepth = await page.getByTestId('horizon-table').textContent();
  // Down the crest's column, from above the crest (v = 180) to below the flat flanks (v = 320).
  const top = screen(cam, 500, 180);
  const bottom = screen(cam, 500, 320);
  const held = await drawnFillColumn(page, top.x, top.y, bottom.y);
  await page.screenshot({ path: test.info().outputPath('regional-continuous-held.png') });

  // Let go where the pointer last was: nothing changes.
  await page.evaluate(([x, y]) => {
    window.dispatchEvent(new PointerEvent('pointerup', { clientX: x, clientY: y, bubbles: true, pointerId: 1, pointerType: 'mouse', isPrimary: true, button: 0, buttons: 0 }));
  }, [grab.x, grab.y - rise] as const);
  await page.mouse.up();
  await expect(page.getByTestId('drag-readout')).toBeHidden();
  expect(Number(await page.getByTestId('regional-z-left').inputValue())).toBeCloseTo(expected, 1);
  await expect(page.getByTestId('strip-area-h1')).toHaveText(heldArea!);
  await expect(page.getByTestId('horizon-table')).toHaveText(heldDepth!);
  expect(await drawnFillColumn(page, top.x, top.y, bottom.y)).toEqual(held);
  await page.screenshot({ path: test.info().outputPath('regional-continuous-released.png') });

  // The same regional typed in (another way to the same document): the same fill, drawn where the regional is,
  // and the same numbers.
  const typed = Number(await page.getByTestId('regional-z-left').inputValue());
  await page.getByTestId('regional-z-flat').fill('-1000');
  await page.getByTestId('regional-z-flat').press('Enter');
  await expect(page.getByTestId('strip-area-h1')).not.toHaveText(heldArea!);
  await page.getByTestId('regional-z-flat').fill(String(typed));
  await page.getByTestId('regional-z-flat').press('Enter');
  await expect(page.getByTestId('strip-area-h1')).toHaveText(heldArea!);
  await expect(page.getByTestId('horizon-table')).toHaveText(heldDepth!);
  const again = await drawnFillColumn(page, top.x, top.y, bottom.y);
  // The field rounds to a hundredth of a metre, a thousandth of a screen pixel: no drawn pixel moves by more than 1 in 255.
  expect(again.length).toBe(held.length);
  expect(again.reduce((m, c, i) => Math.max(m, Math.abs(c - held[i])), 0)).toBeLessThanOrEqual(1);
  // The regional's line in that column is where the drag left it (the fill's edge and the dashes there): the
  // column is not empty at its row, and the fill reaches it.
  const row = Math.round((screen(cam, 500, 300 - (rise / cam.scale)).y - top.y));
  const alpha = (k: number) => held[4 * k + 3];
  expect(Math.max(alpha(row - 1), alpha(row), alpha(row + 1))).toBeGreaterThan(0);
});

test('the numbers written while a regional is dragged are those the panes show after the release, and the formatter\'s for the document', async ({ page }) => {
  const cam = await setUp(page);
  const grab = await grabFlatRegional(page, cam);
  // Every number the strip and the pane write during a drag (their live texts), in page order.
  const liveTexts = () => page.evaluate(() => [...document.querySelectorAll('[data-testid="results-strip"] [data-live], [data-testid="interpretation-pane"] [data-live]')]
    .map((e) => `${e.getAttribute('data-testid') ?? e.tagName} ${e.textContent}`));
  const before = await liveTexts();
  const area = page.getByTestId('strip-area-h1');
  const areaBefore = await area.textContent();
  // Real moves, one a task, up 40 screen px: 400 / scale m (z = 1000 − 10 v).
  for (let k = 1; k <= 20; k++) await page.mouse.move(grab.x, grab.y - 2 * k);
  const expected = -2000 + 400 / cam.scale;
  await expect.poll(async () => Number(await page.getByTestId('regional-z-left').inputValue())).toBeCloseTo(expected, 1);
  await expect(area).not.toHaveText(areaBefore!);
  const held = await liveTexts();
  expect(held).not.toEqual(before);

  await page.mouse.up();
  await expect(page.getByTestId('drag-readout')).toBeHidden();
  // After the release the panes render the document: the same texts, in the same places.
  expect(await liveTexts()).toEqual(held);

  // The one formatter over the saved document's analysis (the engine the app runs, here in Node).
  const a = await savedAnalysis(page);
  const unit = tableAreaUnit(a);
  await expect(area).toHaveText(formatArea(a.horizons[0].excessArea, a.units, unit));
  const column = HORIZON_COLUMNS.find((c) => c.key === 'excessArea')!;
  await expect(page.getByTestId('horizon-table').locator('tbody tr').first()).toContainText(screenCell(column, a.horizons[0], unit));
  await expect(page.getByTestId('summary-table')).toContainText(formatLength(a.pinWidth, a.units));
});

test('a section that balances exactly, its top regional dragged: the intervals and the common reference follow as live numbers', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  // The forward model folds six beds over one detachment: their excess areas lie exactly on the area–depth line
  // (Epard & Groshong's construction run forwards, docs/method.md §Check values), so the fit is exact and has no interval.
  const { section } = forwardSection({
    units: 'm', displacement: 2500, detachmentElevation: -4500, pins: [1000, 21000], extent: [0, 22000], samplesPerFold: 40,
    horizons: ['First', 'Second', 'Third', 'Fourth', 'Fifth', 'Sixth'].map((name, i) => ({ name: `${name} bed`, regionalElevation: 1000 - 500 * i })),
    folds: [{ shape: 'rounded', from: 3000, to: 11000, weight: 1 }, { shape: 'box', from: 12000, to: 19000, limb: 0.25, weight: 0.6 }],
  });
  await page.getByTestId('open-project').setInputFiles({ name: 'balanced.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(section)) });
  await expect(page.getByTestId('interval-r2')).toHaveText(EXACT_FIT_TEXT);
  await expect(page.getByTestId('interval-detachment-depth')).toBeHidden();
  const reference = await page.getByTestId('scenario-reference').textContent();
  expect(reference).toContain('1000 m, the highest regional of');

  // The top regional at mid-span, where the app drew it (the shapes layer's transform of its image pixels).
  const doc = sectionToProjectDoc(section);
  const reg = doc.scenarios[0].regionals[doc.horizons[0].id];
  const u = (reg[0][0] + reg[reg.length - 1][0]) / 2;
  const v = reg[0][1] + ((reg[reg.length - 1][1] - reg[0][1]) * (u - reg[0][0])) / (reg[reg.length - 1][0] - reg[0][0]);
  const at = await page.evaluate(([pu, pv]) => (window as unknown as { Konva: { stages: { findOne: (s: string) => { getAbsoluteTransform: () => { point: (p: { x: number; y: number }) => { x: number; y: number } } } }[] } })
    .Konva.stages[0].findOne('Layer').getAbsoluteTransform().point({ x: pu, y: pv }), [u, v] as const);
  const box = (await page.getByTestId('section-view').boundingBox())!;
  await page.getByTestId('tool-regional').click();
  await page.mouse.move(box.x + at.x, box.y + at.y);
  await page.mouse.down();
  const liveTexts = () => page.evaluate(() => [...document.querySelectorAll('[data-testid="interpretation-pane"] [data-live]')]
    .map((e) => `${e.getAttribute('data-testid') ?? e.tagName} ${e.textContent}`));
  for (let k = 1; k <= 2; k++) await page.mouse.move(box.x + at.x, box.y + at.y - k);
  // Held: the fit is no longer exact, so the intervals appear, and the raised regional is the new reference.
  await expect(page.getByTestId('interval-detachment-depth')).toHaveText(/^95%: /);
  await expect(page.getByTestId('interval-r2')).toHaveText('');
  await expect(page.getByTestId('interval-r2')).toBeHidden();
  await expect(page.getByTestId('scenario-reference')).not.toHaveText(reference!);
  const held = await liveTexts();
  await page.mouse.up();
  await expect(page.getByTestId('drag-readout')).toBeHidden();
  // After the release the pane renders the document: the same texts, in the same places.
  expect(await liveTexts()).toEqual(held);

  // The saved document's analysis through the one formatter (the engine the app runs, here in Node).
  const a = await savedAnalysis(page);
  const depthRow = summaryRowsOf(a).find((r) => r.key === 'detachment-depth')!;
  await expect(page.getByTestId('interval-detachment-depth')).toHaveText(`95%: ${depthRow.interval}`);
  await expect(page.getByTestId('scenario-reference')).toContainText(`${formatLength(a.referenceElevation, a.units)}, the highest regional of`);
  expect(a.referenceElevation).toBeGreaterThan(1000);
});

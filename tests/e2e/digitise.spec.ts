// The digitising journey with real mouse and keyboard events: open a generated scan, calibrate it with
// control points, draw horizons by clicks, place pins, draw a regional and derive the others, drag
// every regional up and see the detachment get shallower (docs/method.md §Sensitivity to the regional:
// raising every regional by δ moves the detachment up by δ(1 + W0/D)), undo and redo, zoom and pan.
import { readFileSync } from 'node:fs';
import type { Page } from '@playwright/test';
import { test, expect } from './guard';
import { freshProject, gotoStarted } from './startup';
import { clickAt, fittedScan, screen, type Cam } from './fittedScan';
import { gradientPng } from './pngFixture';
import { viewPixel } from './canvasPixels';
import { paletteColour } from '../../src/core/model/horizonPalette';
import { expectLastMessage } from './messages';

const W = 1000;
const H = 500;

const fitted = (page: Page) => fittedScan(page, W, H);

/** The known section coordinates of the generated scan: 10 m per pixel, z = 1000 m at the top. */
const known = (u: number, v: number) => ({ x: 10 * u, z: 1000 - 10 * v });

/** A detachment-fold profile: a sin² bump of the given height (px) between u = 150 and 850. */
function profile(level: number, bump: number): [number, number][] {
  const pts: [number, number][] = [];
  for (let u = 60; u <= 940; u += 40) {
    const t = u > 150 && u < 850 ? Math.sin((Math.PI * (u - 150)) / 700) ** 2 : 0;
    pts.push([u, level - bump * t]);
  }
  return pts;
}

async function depthOf(page: Page): Promise<number> {
  const text = (await page.getByTestId('strip-detachment-depth').textContent()) ?? '';
  return Number(text.replace('−', '-').split(' ')[0]);
}

async function openAndCalibrate(page: Page): Promise<Cam> {
  await freshProject(page);
  await page.getByTestId('open-image').setInputFiles({ name: 'section.png', mimeType: 'image/png', buffer: gradientPng(W, H) });
  await expect(page.getByTestId('scan-name')).toContainText('section.png');
  const cam = await fitted(page);
  await page.getByTestId('tool-calibrate').click();
  await page.getByTestId('cal-mode-affine').click();
  const marks: [number, number][] = [[50, 50], [950, 60], [940, 450], [60, 440]];
  for (const [k, [u, v]] of marks.entries()) {
    await clickAt(page, cam, u, v);
    // The click focuses the new point's value field; type its known coordinates.
    await expect(page.getByTestId(`cal-x-${k}`)).toBeFocused();
    const q = known(u, v);
    await page.getByTestId(`cal-x-${k}`).fill(String(q.x));
    await page.getByTestId(`cal-z-${k}`).fill(String(q.z));
    await page.getByTestId(`cal-z-${k}`).press('Enter');
  }
  return cam;
}

test('calibrate with control points: residuals, warning on a mistyped value, vertical exaggeration', async ({ page }) => {
  await openAndCalibrate(page);
  // 10 m per pixel across and down: no exaggeration.
  await expect(page.getByTestId('cal-ve')).toHaveText('1×');
  for (let k = 0; k < 4; k++) {
    const m = /^(< )?([\d.]+) px$/.exec((await page.getByTestId(`cal-residual-${k}`).textContent()) ?? '');
    expect(m, `residual of point ${k}`).not.toBeNull();
    expect(Number(m![2])).toBeLessThan(0.5);
  }
  await expect(page.getByTestId('cal-warning')).toHaveCount(0);
  // A value mistyped by 200 m (20 px) must be flagged.
  await page.getByTestId('cal-x-2').fill('9600');
  await page.getByTestId('cal-x-2').press('Enter');
  await expect(page.getByTestId('cal-warning')).toBeVisible();
  await expect(page.getByTestId('cal-row-2')).toHaveClass(/warn/);
  await page.screenshot({ path: test.info().outputPath('calibration-warning.png') });
  await page.keyboard.press('Control+z');
  await expect(page.getByTestId('cal-warning')).toHaveCount(0);
});

test('digitise horizons, pins and regionals; raising every regional makes the detachment shallower; undo, redo, zoom and pan', async ({ page }) => {
  const cam = await openAndCalibrate(page);

  // Three horizons by clicks: finished with a double-click, Enter, and Enter after a Backspace.
  await page.getByTestId('tool-draw').click();
  const horizons = [profile(150, 110), profile(250, 80), profile(350, 50)];
  for (const [k, pts] of horizons.entries()) {
    for (const [i, [u, v]] of pts.entries()) {
      if (k === 0 && i === pts.length - 1) {
        const p = screen(cam, u, v);
        await page.mouse.dblclick(p.x, p.y);
      } else await clickAt(page, cam, u, v);
    }
    if (k === 2) {
      await clickAt(page, cam, 990, 300);
      await page.keyboard.press('Backspace');
    }
    if (k > 0) await page.keyboard.press('Enter');
  }
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(3);

  // Pins at u = 120 and 880 (x = 1200 m and 8800 m), then typed to check the fields.
  await page.getByTestId('tool-pins').click();
  await clickAt(page, cam, 120, 470);
  await clickAt(page, cam, 880, 470);
  await expect(page.getByTestId('pin-left-x')).toHaveValue(/^120\d/);
  await page.getByTestId('pin-left-x').fill('1200');
  await page.getByTestId('pin-left-x').press('Enter');
  await page.getByTestId('pin-right-x').fill('8800');
  await page.getByTestId('pin-right-x').press('Enter');
  await expect(page.getByTestId('pin-width')).toContainText('7600 m');
  // Typed values that would cross the other pin, lie far beyond the scan or are not numbers are refused
  // with a message, and both pins stay where they were (no silent swap).
  const error = page.getByTestId('message-error');
  for (const [typed, said] of [['9000', 'left pin must lie left of the right pin'], ['1e99', 'far outside the scan'], ['abc', '“abc” is not a number — kept 1200']]) {
    await page.getByTestId('pin-left-x').fill(typed);
    await page.getByTestId('pin-left-x').press('Enter');
    await expect(error).toContainText(said);
    await expect(page.getByTestId('pin-left-x')).toHaveValue('1200');
    await expect(page.getByTestId('pin-right-x')).toHaveValue('8800');
  }
  await expect(page.getByTestId('pin-width')).toContainText('7600 m');

  // The top horizon's regional by two clicks (the second a double-click), the rest as a parallel set.
  await page.getByTestId('horizon-row-h1').click({ position: { x: 8, y: 10 } });
  await expect(page.getByTestId('horizon-row-h1')).toHaveClass(/selected/);
  await page.getByTestId('tool-regional').click();
  await clickAt(page, cam, 40, 150);
  const end = screen(cam, 960, 150);
  await page.mouse.dblclick(end.x, end.y);
  await page.getByTestId('parallel-set').click();
  await expect(page.getByTestId('strip-detachment-depth')).toHaveText(/^\d+(\.\d+)? m$/);
  const before = await depthOf(page);
  await expect(page.getByTestId('strip-displacement')).toHaveText(/^\d+(\.\d+)? m$/);
  await page.screenshot({ path: test.info().outputPath('digitised.png') });

  // Renaming a horizon to a name another one has is refused: the analysis keys results by name.
  await page.getByTestId('horizon-name-h2').fill('Horizon 1');
  await page.getByTestId('horizon-name-h2').press('Enter');
  await expect(error).toContainText('“Horizon 1” is already the name of another horizon — kept “Horizon 2”');
  await expect(page.getByTestId('horizon-name-h2')).toHaveValue('Horizon 2');
  expect(await depthOf(page)).toBe(before);
  await error.getByRole('button', { name: 'Dismiss' }).click();

  // Shift-drag the top regional up by 12 px (120 m): every regional rises; the numbers follow the drag,
  // and a label beside the pointer gives the shift.
  const grab = screen(cam, 500, 150);
  await page.mouse.move(grab.x, grab.y);
  await page.keyboard.down('Shift');
  await page.mouse.down();
  await page.mouse.move(grab.x, grab.y - 6 * cam.scale, { steps: 3 });
  await expect(page.getByTestId('drag-readout')).toHaveText(/^all regionals Δz \+\d+ m$/);
  await page.screenshot({ path: test.info().outputPath('drag-readout.png') });
  const midDrag = await depthOf(page);
  await page.mouse.move(grab.x, grab.y - 12 * cam.scale, { steps: 3 });
  await page.mouse.up();
  await page.keyboard.up('Shift');
  await expect(page.getByTestId('drag-readout')).toBeHidden();
  const after = await depthOf(page);
  expect(midDrag).toBeLessThan(before);
  expect(after).toBeLessThan(midDrag);
  await page.screenshot({ path: test.info().outputPath('regionals-raised.png') });

  // One undo entry for the whole drag.
  await page.keyboard.press('Control+z');
  await expect.poll(() => depthOf(page)).toBe(before);
  await page.keyboard.press('Control+Shift+z');
  await expect.poll(() => depthOf(page)).toBe(after);

  // Zoom about the cursor and pan with the space bar still work with a tool active, and edit nothing.
  const zoomBefore = await page.getByTestId('zoom-readout').textContent();
  const c = screen(cam, 500, 250);
  await page.mouse.move(c.x, c.y);
  for (let i = 0; i < 3; i++) await page.mouse.wheel(0, -200);
  await expect(page.getByTestId('zoom-readout')).not.toHaveText(zoomBefore ?? '');
  const at = await viewPixel(page, c.x - cam.box.x, c.y - cam.box.y);
  await page.keyboard.down('Space');
  await page.mouse.down();
  await page.mouse.move(c.x - 120, c.y, { steps: 5 });
  await page.mouse.up();
  await page.keyboard.up('Space');
  const moved = await viewPixel(page, c.x - cam.box.x - 120, c.y - cam.box.y);
  expect(Math.abs(moved[0] - at[0]) + Math.abs(moved[1] - at[1])).toBeLessThanOrEqual(6);
  expect(await depthOf(page)).toBe(after);
  await page.screenshot({ path: test.info().outputPath('zoomed-panned.png') });
});

test('edit a horizon: drag a vertex, mark a projected run, undo each as one step; help lists the shortcuts', async ({ page }) => {
  const cam = await openAndCalibrate(page);
  await page.getByTestId('tool-draw').click();
  for (const [u, v] of [[100, 300], [300, 200], [500, 150], [700, 200], [900, 300]] as const) await clickAt(page, cam, u, v);
  await page.keyboard.press('Enter');
  await page.getByTestId('tool-edit').click();
  await expect(page.getByTestId('tool-edit')).toHaveAttribute('aria-pressed', 'true');
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(1);
  const pixelAt = (u: number, v: number) => viewPixel(page, screen(cam, u, v).x - cam.box.x, screen(cam, u, v).y - cam.box.y);
  // The line's colour, read mid-segment between (100, 300) and (300, 200): vertices may carry handles.
  const lineColour = await pixelAt(200, 250);
  const from = screen(cam, 500, 150);
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(from.x, from.y + 60 * cam.scale, { steps: 4 });
  await page.mouse.up();
  // Move the pointer off the line so that no hover highlight is drawn over it.
  await page.mouse.move(cam.box.x + 8, cam.box.y + cam.box.height - 8);
  // The line now passes 60 px lower at the crest; the old crest shows the scan again. The moved vertex
  // itself may carry its handle, so look on the new segment from (300, 200) to (500, 210), at u = 450.
  const colourDistance = (a: number[], b: number[]) => Math.abs(a[0] - b[0]) + Math.abs(a[1] - b[1]) + Math.abs(a[2] - b[2]);
  const lineNear = async (u: number, v: number) => {
    let best = Infinity;
    for (let dv = -2; dv <= 2; dv += 0.5) best = Math.min(best, colourDistance(await pixelAt(u, v + dv), lineColour));
    return best;
  };
  await expect.poll(() => lineNear(450, 207.5)).toBeLessThan(40);
  expect(await lineNear(450, 162.5)).toBeGreaterThan(40);
  await page.keyboard.press('Control+z');
  await expect.poll(() => lineNear(450, 162.5)).toBeLessThan(40);

  await page.getByTestId('tool-projected').click();
  await clickAt(page, cam, 300, 200);
  await clickAt(page, cam, 700, 200);
  await page.screenshot({ path: test.info().outputPath('projected-run.png') });
  await page.keyboard.press('?');
  await expect(page.getByTestId('help-overlay')).toContainText('Draw horizon');
  // Every key README's usage lists, among them 1 (actual size) and Ctrl/Cmd + Y (redo).
  await expect(page.getByTestId('help-overlay')).toContainText('Actual size');
  await expect(page.getByTestId('help-overlay')).toContainText('Ctrl/Cmd + Y');
  await page.screenshot({ path: test.info().outputPath('help.png') });
  await page.keyboard.press('Escape');
  await expect(page.getByTestId('help-overlay')).toHaveCount(0);
});

test('workspace basics: full caution in the strip, New returns to Select, Open scan… by keyboard, named selects', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  // The demo's strip carries the whole caution of docs/method.md §Cautions, not a shortened one.
  await expect(page.getByTestId('strip-caution')).toContainText('the decision belongs to a licensed professional under local codes');
  for (const [width, height] of [[1400, 900], [1920, 1080]]) {
    await page.setViewportSize({ width, height });
    await page.screenshot({ path: test.info().outputPath(`demo-workspace-${width}.png`) });
  }

  await page.getByTestId('tool-regional').click();
  await page.getByTestId('menu-project').click();
  await page.getByRole('menuitem', { name: 'New' }).click();
  await expect(page.getByTestId('horizon-list').locator('li')).toHaveCount(0);
  await expect(page.getByTestId('tool-select')).toHaveAttribute('aria-pressed', 'true');

  // "Open scan…" is a real button: focused and pressed with Enter it opens the file chooser.
  const open = page.getByRole('button', { name: 'Open scan…' });
  await open.focus();
  await expect(open).toBeFocused();
  // Enter on the focused button clicks the hidden file input (which opens the system's file chooser).
  // The input's click is observed in the page: Chromium's headless file-chooser event is not reliable.
  await page.evaluate(() => {
    const input = document.querySelector('[data-testid="open-image"]') as HTMLInputElement;
    input.dataset.clicks = '0';
    input.addEventListener('click', () => (input.dataset.clicks = String(Number(input.dataset.clicks) + 1)));
  });
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('open-image')).toHaveAttribute('data-clicks', '1');
  await page.getByTestId('open-image').setInputFiles({ name: 'keyboard.png', mimeType: 'image/png', buffer: gradientPng(W, H) });
  await expect(page.getByTestId('scan-name')).toContainText('keyboard.png');

  // The units select has a name, and says that switching only relabels.
  await expect(page.getByRole('combobox', { name: 'Units' })).toBeVisible();
  await expect(page.getByTestId('units-note')).toContainText('labels only — coordinates are not converted');
});

/** Rows (view px) in the column x where the composited view shows the colour within `tol` (sum of channel differences). */
async function rowsOfColour(page: Page, x: number, colour: [number, number, number], tol = 60): Promise<number[]> {
  return page.evaluate(
    ([px, c, t]) => {
      const box = document.querySelector('[data-testid="section-view"]') as HTMLElement;
      const ratio = window.devicePixelRatio || 1;
      const h = Math.floor(box.clientHeight * ratio);
      const top: number[][] = Array.from({ length: h }, () => [0, 0, 0, 0]);
      for (const canvas of Array.from(box.querySelectorAll('canvas'))) {
        const d = canvas.getContext('2d')!.getImageData(Math.round(px * ratio), 0, 1, Math.min(h, canvas.height)).data;
        for (let y = 0; y < Math.min(h, canvas.height); y++) if (d[4 * y + 3] > 0) top[y] = [d[4 * y], d[4 * y + 1], d[4 * y + 2], d[4 * y + 3]];
      }
      const rows: number[] = [];
      top.forEach((p, y) => {
        if (p[3] > 200 && Math.abs(p[0] - c[0]) + Math.abs(p[1] - c[1]) + Math.abs(p[2] - c[2]) < t) rows.push(y / ratio);
      });
      return rows;
    },
    [x, colour, tol] as const,
  );
}

/** Vertices the section view draws as lines (every Konva Line on the stage). */
async function drawnLineVertices(page: Page): Promise<number> {
  return page.evaluate(`(() => window.Konva.stages[0].find('Line').reduce((n, l) => n + l.points().length / 2, 0))()`);
}

test('a horizon of 100 000 vertices is drawn at screen resolution, redrawn on zoom, selected by a click, and kept whole', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  // A sin² bump 800 m high over the 10 000 m between the pins (area aλ/2 = 4 km², docs/method.md §Check values), with a
  // ripple of 20 m and 50 m wavelength: 200 whole wavelengths between the pins add no area.
  const N = 100_000;
  const line: [number, number][] = [];
  for (let k = 0; k < N; k++) {
    const x = -500 + (11_000 * k) / (N - 1);
    const bump = x > 0 && x < 10_000 ? 800 * Math.sin((Math.PI * x) / 10_000) ** 2 : 0;
    line.push([x, 500 + bump + 20 * Math.sin((2 * Math.PI * x) / 50)]);
  }
  const section = { units: 'm', pins: [0, 10_000], horizons: [{ name: 'Long line', line, regional: [[-500, 500], [10_500, 500]] }] };
  await page.getByTestId('open-project').setInputFiles({ name: 'long.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(section)) });
  await expectLastMessage(page, 'info', 'Opened long.json');
  // The analysis uses every vertex: the excess area is the bump's 4 km² to four significant figures (the
  // display rule drops trailing zeros, so 3.9996 … 4.0004 km² read "4"; 3.999 or 4.001 would show).
  await expect(page.getByTestId('horizon-table').locator('tbody tr').first().locator('td').nth(1)).toHaveText('4');
  const box = (await page.getByTestId('section-view').boundingBox())!;
  // Drawn: the line's red (#d1495b, the palette's first colour) crosses the view at a quarter, half and three quarters.
  expect(paletteColour(0)).toBe('#d1495b');
  const red: [number, number, number] = [209, 73, 91];
  for (const f of [0.25, 0.5, 0.75]) await expect.poll(async () => (await rowsOfColour(page, box.width * f, red)).length).toBeGreaterThan(0);
  // At screen resolution: no more than four vertices per pixel column for the line, again for the white outline
  // drawn under it, and again for its fill (min/max decimation) over the view and a view's width each side,
  // where 100 000 each would be drawn otherwise.
  const bound = 3 * 4 * (3 * Math.ceil(box.width) + 3) + 50;
  const fitted = await drawnLineVertices(page);
  expect(fitted).toBeLessThanOrEqual(bound);
  await page.screenshot({ path: test.info().outputPath('long-line-fitted.png') });

  // Zoomed in about the middle, it is drawn again at the new resolution, still bounded, still there.
  const mid = { x: box.x + box.width / 2, y: box.y + (await rowsOfColour(page, box.width / 2, red))[0] };
  await page.mouse.move(mid.x, mid.y);
  for (let i = 0; i < 4; i++) await page.mouse.wheel(0, -400);
  await expect.poll(() => drawnLineVertices(page)).not.toBe(fitted);
  expect(await drawnLineVertices(page)).toBeLessThanOrEqual(bound);
  await expect.poll(async () => (await rowsOfColour(page, box.width / 2, red)).length).toBeGreaterThan(0);
  await page.screenshot({ path: test.info().outputPath('long-line-zoomed.png') });
  // Panned by more than a view's width (12 × 80 px with the arrow key), the part now in view is drawn in detail.
  for (let i = 0; i < 12; i++) await page.keyboard.press('ArrowLeft');
  await expect.poll(async () => (await rowsOfColour(page, box.width / 2, red)).length).toBeGreaterThan(0);
  await expect.poll(async () => (await rowsOfColour(page, box.width * 0.1, red)).length).toBeGreaterThan(0);
  expect(await drawnLineVertices(page)).toBeLessThanOrEqual(bound);

  // A click on the drawn line selects its horizon (the tools pick from the document's every vertex).
  await page.getByTestId('tool-select').click();
  const rows = await rowsOfColour(page, box.width / 2, red);
  await page.mouse.click(box.x + 8, box.y + 8);
  await expect(page.getByTestId('horizon-list').locator('li.selected')).toHaveCount(0);
  await page.mouse.click(box.x + box.width / 2, box.y + rows[Math.floor(rows.length / 2)]);
  await expect(page.getByTestId('horizon-list').locator('li').first()).toHaveClass(/selected/);

  // Editing: with thousands of vertices in view their handles would merge into a band, so the view asks the
  // user to zoom in instead; zoomed in far enough, the handles of the vertices in view are drawn.
  const handleShapes = `(() => window.Konva.stages[0].find('Shape').filter((s) => s.getClassName() === 'Shape' && s.fill() === '#ffffff' && s.stroke() === '${paletteColour(0)}').length)()`;
  const zoomNote = () => page.evaluate(`(() => window.Konva.stages[0].find('Text').map((t) => t.text()).filter((t) => t.includes('zoom in to see')).join())()`);
  await page.getByTestId('tool-edit').click();
  await expect.poll(zoomNote).toMatch(/^\d+ vertices of “Long line” in view: zoom in to see/);
  expect(await page.evaluate(handleShapes)).toBe(0);
  await page.screenshot({ path: test.info().outputPath('long-line-zoom-note.png') });
  await page.mouse.move(box.x + box.width / 2, box.y + rows[Math.floor(rows.length / 2)]);
  for (let i = 0; i < 12; i++) await page.mouse.wheel(0, -400);
  await expect.poll(zoomNote).toBe('');
  // The handles' shape (white squares outlined in the line's colour) is on the stage, and was not before.
  await expect.poll(() => page.evaluate(handleShapes)).toBe(1);
  await page.screenshot({ path: test.info().outputPath('long-line-handles.png') });
  await page.getByTestId('tool-select').click();

  // The document keeps all 100 000 vertices.
  const [dl] = await Promise.all([page.waitForEvent('download'), (async () => {
    await page.getByTestId('menu-project').click();
    await page.getByTestId('save-project').click();
  })()]);
  const saved = JSON.parse(readFileSync((await dl.path())!, 'utf8')) as { doc: { horizons: { pointsPx: unknown[] }[] } };
  expect(saved.doc.horizons[0].pointsPx).toHaveLength(N);
});

test('Enter and Space: a focused button, box or summary keeps its own; the tools take them from the section view or mid-gesture', async ({ page }) => {
  page.on('dialog', (d) => void d.accept());
  await gotoStarted(page);
  await expect(page.getByTestId('busy')).toHaveCount(0);
  const zoom = page.getByTestId('zoom-readout');
  const rows = page.getByTestId('horizon-list').locator('li');
  const view = page.getByTestId('section-view');
  const box = (await view.boundingBox())!;

  // Enter, then Space, on the focused "Zoom in" button press it (each press zooms in).
  const zoomIn = page.getByRole('button', { name: 'Zoom in' });
  await zoomIn.focus();
  let before = await zoom.textContent();
  await page.keyboard.press('Enter');
  await expect(zoom).not.toHaveText(before ?? '');
  before = await zoom.textContent();
  await page.keyboard.press('Space');
  await expect(zoom).not.toHaveText(before ?? '');
  // Space on a focused tool button chooses that tool; Space on the focused checkbox ticks it; Enter on a
  // focused summary opens its section.
  await page.getByTestId('tool-pins').focus();
  await page.keyboard.press('Space');
  await expect(page.getByTestId('tool-pins')).toHaveAttribute('aria-pressed', 'true');
  await page.getByTestId('toggle-grid').focus();
  await page.keyboard.press('Space');
  await expect(page.getByTestId('toggle-grid')).toBeChecked();
  await page.getByTestId('sensitivity-section').locator('summary').focus();
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('sensitivity-section')).toHaveAttribute('open', '');

  // The tools: after "Draw horizon" is pressed, clicks on the view give it the keyboard, and Enter finishes the line.
  const n = await rows.count();
  await page.getByTestId('tool-draw').click();
  for (const f of [0.3, 0.5, 0.7]) await page.mouse.click(box.x + box.width * f, box.y + box.height * 0.15);
  await expect(view).toBeFocused();
  await page.keyboard.press('Enter');
  await expect(rows).toHaveCount(n + 1);
  // Held in the view, Space is for panning (the cursor turns to a hand), not for the last button pressed.
  await page.keyboard.down('Space');
  await expect(view).toHaveCSS('cursor', 'grab');
  await page.keyboard.up('Space');

  // Mid-gesture with no control focused (a click on the pane's text), Enter still finishes the line.
  for (const f of [0.3, 0.6]) await page.mouse.click(box.x + box.width * f, box.y + box.height * 0.1);
  await page.getByRole('heading', { name: 'Area–depth graph' }).click();
  await expect(view).not.toBeFocused();
  await page.keyboard.press('Enter');
  await expect(rows).toHaveCount(n + 2);

  // Mid-gesture but with a button focused, the button keeps Enter: the line goes on (the tool still placing).
  for (const f of [0.35, 0.65]) await page.mouse.click(box.x + box.width * f, box.y + box.height * 0.2);
  await zoomIn.focus();
  before = await zoom.textContent();
  await page.keyboard.press('Enter');
  await expect(zoom).not.toHaveText(before ?? '');
  await expect(page.getByTestId('tool-hint')).toHaveAttribute('data-state', 'placing');
  await expect(rows).toHaveCount(n + 2);
  // Nor does Space held on that button start a pan.
  await page.keyboard.down('Space');
  await expect(view).toHaveCSS('cursor', 'crosshair');
  await page.keyboard.up('Space');
  // With the view focused again (as Tab reaches it), Enter finishes the line.
  await view.focus();
  await page.keyboard.press('Enter');
  await expect(rows).toHaveCount(n + 3);
  await page.screenshot({ path: test.info().outputPath('keys-lines-finished.png') });
});

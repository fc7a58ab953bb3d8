import { describe, expect, it } from 'vitest';
import type { ImagePx } from '../../src/core/model/projectDoc';
import { sectionFrame } from '../../src/core/model/commands/sectionFrame';
import { roughReduction } from '../../src/core/trace/roughReduction';
import { roughToImage } from '../../src/core/trace/roughToImage';
import { TraceSession } from '../../src/core/trace/traceSession';
import { tilesOver, traceWindow } from '../../src/core/trace/traceWindow';
import { COARSE_PIXELS, ROUGH_READ_PIXELS } from '../../src/io/lineTracer';
import { hoverStretch, startLine } from '../../src/tools/tracedLine';
import type { LineTracer, ToolContext } from '../../src/tools/toolTypes';
import { renderScan, sineCurve, type ScanSpec } from '../core/trace/syntheticScan';
import { boxResize, distanceStats, pointsOnCurve } from '../core/trace/traceHelpers';
import { toolDoc } from './toolFixture';

// The rough first preview of a long stretch, as the tracer makes it: the search window read halved (by the browser's
// smoothing resize) and reduced by blocks to about COARSE_PIXELS pixels (the darkest pixel of each), searched, and its
// path mapped back to the scan.
// Truth is the sine line the scan was drawn from, anti-aliased (analytic): the rough path must follow it within its
// own resolution (one reduced pixel), and the full-resolution path must then replace it in the preview.
const curve = sineCurve(150, 40, 700, 0.4);
const spec: ScanSpec = { w: 1800, h: 300, paper: [238, 230, 212], angleRad: 0.01, noise: 5, seed: 21, layers: [{ kind: 'ink', curve, widthPx: 2.5, colour: [35, 30, 28] }] };
const scan = renderScan(spec);
const [from, to] = pointsOnCurve(scan, curve, [60, 1740]);
const whole = { x0: 0, y0: 0, w: scan.w, h: scan.h };

/** The rough stretch from `from` to `to` and the image px per reduced pixel (the larger of across and down). */
function rough(): { points: ImagePx[]; stepPx: number } {
  const win = traceWindow(from, to, scan.w, scan.h);
  const r = roughReduction(win.w, win.h, COARSE_PIXELS, ROUGH_READ_PIXELS);
  // The window is past the read budget: the browser halves it (its smoothing resize, a 2 × 2 mean), as the tracer asks.
  expect(r.scale).toBe(2);
  const windowRgba = boxResize(scan.rgba, scan.w, win, r.readW, r.readH);
  const session = new TraceSession();
  // As the rough worker does: the read window reduced by blocks, the darkest pixel of each, as one tile.
  const { w: cw, h: ch } = session.putPooledTile('rough', windowRgba, r.readW, r.readH, r.pool);
  const { sx, sy } = r;
  expect([cw, ch]).toEqual([r.cw, r.ch]);
  const grid = { x0: 0, y0: 0, w: cw, h: ch };
  const at = (p: readonly [number, number]): [number, number] => [(p[0] - win.x0) / sx, (p[1] - win.y0) / sy];
  session.buildTree(1, at(from), grid, ['rough']);
  const path = session.path(1, at(to));
  if (!path) throw new Error('no rough path');
  return { points: roughToImage(path, win, sx, sy, from, to), stepPx: Math.max(sx, sy) };
}

function refined(): ImagePx[] {
  const win = traceWindow(from, to, scan.w, scan.h);
  const tiles = tilesOver(win, scan.w, scan.h);
  const session = new TraceSession();
  for (const t of tiles) session.putTile(t.key, t, scan.rgba, whole);
  session.buildTree(1, from, win, tiles.map((t) => t.key));
  const path = session.path(1, to);
  if (!path) throw new Error('no path');
  return path;
}

describe('the rough first preview of a long stretch', () => {
  const r = rough();
  const full = refined();

  it('follows an anti-aliased sine line within its resolution', () => {
    // Reducing 1,800 × 300 px to about 16,000 px takes blocks of 5 px (or more): the line is a thin ridge there.
    expect(r.stepPx).toBeGreaterThan(3);
    const inner = r.points.slice(1, -1);
    // It follows the waves (a chord of 1,680 px across two of them would be tens of pixels off) ...
    expect(inner.length).toBeGreaterThan(5);
    const { rms, max } = distanceStats(scan, curve, inner);
    // ... within half a reduced pixel everywhere, and a quarter of one in the mean square.
    expect(max).toBeLessThan(r.stepPx / 2);
    expect(rms).toBeLessThan(r.stepPx / 4);
    // The full-resolution path is the finer one: well under half a pixel.
    expect(distanceStats(scan, curve, full).rms).toBeLessThan(0.15);
  });

  it('is replaced in the preview by the full-resolution path once that is ready', () => {
    let ready = false;
    const tracer: LineTracer = { snap: () => null, stretch: () => (ready ? full : r.points), rough: (points) => points === r.points };
    const doc = toolDoc();
    const ctx: ToolContext = { doc, frame: sectionFrame(doc), tolerancePx: 4, selectedHorizonId: null, calibrationPick: 'points', tracer, followLine: true };
    const line = startLine(from, ctx, false, true);
    const first = hoverStretch(line, to, ctx, false, null);
    expect(first.preview).toEqual(r.points);
    // The rough path is a stand-in: the preview says it is still tracing.
    expect(first.tracing).toBe(true);
    ready = true;
    const next = hoverStretch(line, to, ctx, false, first.exact);
    expect(next.preview).toEqual(full);
    expect(next.preview).not.toEqual(first.preview);
    expect(next.tracing).toBe(false);
  });
});

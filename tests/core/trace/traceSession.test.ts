import { describe, expect, it } from 'vitest';
import { TraceSession } from '../../../src/core/trace/traceSession';
import { tilesOver, traceWindow, windowCovers } from '../../../src/core/trace/traceWindow';
import { renderScan, sineCurve } from './syntheticScan';
import { distanceStats, featuresOf, pointsOnCurve } from './traceHelpers';
import { pixelFeatures } from '../../../src/core/trace/pixelFeatures';

describe('tracing by tiles in a window (what the worker does)', () => {
  const curve = sineCurve(150, 35, 700, 0.2);
  const scan = renderScan({ w: 900, h: 300, paper: [238, 230, 212], angleRad: 0.01, noise: 5, seed: 4, layers: [{ kind: 'ink', curve, widthPx: 2.4, colour: [30, 28, 25] }] });

  it('gives tile features equal to the whole scan\'s (a one-pixel border carries the neighbours)', () => {
    // Reference: the features of the whole image, computed in one piece.
    const whole = featuresOf(scan);
    const win = { x0: 0, y0: 0, w: scan.w, h: scan.h };
    for (const t of tilesOver(win, scan.w, scan.h, 256).slice(0, 3)) {
      const cx0 = Math.max(0, t.x0 - 1);
      const cy0 = Math.max(0, t.y0 - 1);
      const cw = Math.min(scan.w, t.x0 + t.w + 1) - cx0;
      const ch = Math.min(scan.h, t.y0 + t.h + 1) - cy0;
      const crop = new Uint8ClampedArray(cw * ch * 4);
      for (let y = 0; y < ch; y++) crop.set(scan.rgba.subarray(((cy0 + y) * scan.w + cx0) * 4, ((cy0 + y) * scan.w + cx0 + cw) * 4), y * cw * 4);
      const f = pixelFeatures(crop, cw, ch, cx0, cy0, t);
      for (const [i, j] of [[0, 0], [t.w - 1, t.h - 1], [17, 101]]) {
        expect(f.edge[j * t.w + i]).toBeCloseTo(whole.edge[(t.y0 + j) * scan.w + t.x0 + i], 6);
        expect(f.dark[j * t.w + i]).toBeCloseTo(whole.dark[(t.y0 + j) * scan.w + t.x0 + i], 6);
      }
    }
  });

  it('traces a stretch from tiles over the window around the anchor and the pointer, on the line', () => {
    const [from, to] = pointsOnCurve(scan, curve, [40, 860]);
    const win = traceWindow(from, to, scan.w, scan.h);
    expect(windowCovers(win, from)).toBe(true);
    expect(windowCovers(win, to)).toBe(true);
    const session = new TraceSession();
    const tiles = tilesOver(win, scan.w, scan.h);
    for (const t of tiles) {
      // Whole-image buffer as the crop: the session reads the tile's pixels and their neighbours from it.
      session.putTile(t.key, t, scan.rgba, { x0: 0, y0: 0, w: scan.w, h: scan.h });
    }
    session.buildTree(1, from, win, tiles.map((t) => t.key));
    const pts = session.path(1, to);
    expect(pts).not.toBeNull();
    expect(pts![0]).toEqual(from);
    expect(pts!.at(-1)).toEqual(to);
    expect(pts!.length).toBeGreaterThan(10);
    // Analytic truth: the curve the ink was drawn from.
    expect(distanceStats(scan, curve, pts!).rms).toBeLessThan(0.15);
    // A tree no longer kept answers null.
    for (let id = 2; id <= 6; id++) session.buildTree(id, from, { x0: win.x0, y0: win.y0, w: 20, h: 20 }, []);
    expect(session.path(1, to)).toBeNull();
    expect(session.bytesHeld()).toBeGreaterThan(0);
  });

  it('grows the window ahead of the pointer and across the stretch, clipped to the image', () => {
    // Arithmetic of the rule (48 px + 5 % around both points, 64 px + 30 % ahead) for a 200 px stretch: 58 px around,
    // 124 px ahead: x from 100 − 58 = 42 to 300 + 124 = 424, y from 100 − 58 = 42 to 120 + 58 = 178.
    expect(traceWindow([100, 100], [300, 120], 2000, 1000)).toEqual({ x0: 42, y0: 42, w: 382, h: 136 });
    // Leftwards near the image's edge: clipped at 0.
    expect(traceWindow([300, 100], [100, 120], 2000, 1000)).toEqual({ x0: 0, y0: 42, w: 358, h: 136 });
    // A window clipped at the image's edge covers the pixels along that edge; elsewhere it keeps an inset.
    expect(windowCovers({ x0: 0, y0: 0, w: 100, h: 50 }, [99.5, 10], 100, 50)).toBe(true);
    expect(windowCovers({ x0: 0, y0: 0, w: 100, h: 50 }, [99.5, 10], 1000, 500)).toBe(false);
  });
});

import { describe, expect, it } from 'vitest';
import { TraceSession } from '../../../src/core/trace/traceSession';
import { tilesOver, traceWindow } from '../../../src/core/trace/traceWindow';
import { renderScan, sineCurve } from './syntheticScan';
import { distanceStats, pointsOnCurve } from './traceHelpers';

// A tree built in one session (the worker) and handed to another (the page) as transferred typed arrays must
// answer every pointer position exactly as a session that built the tree itself, centres carried over included.
describe('a tree handed from the session that built it to another', () => {
  const curve = sineCurve(150, 35, 700, 0.3);
  const scan = renderScan({ w: 1400, h: 300, paper: [238, 230, 212], angleRad: 0.01, noise: 5, seed: 8, layers: [{ kind: 'ink', curve, widthPx: 2.6, colour: [30, 28, 25] }] });
  const whole = { x0: 0, y0: 0, w: scan.w, h: scan.h };
  const [from, toward, far, near] = pointsOnCurve(scan, curve, [40, 1100, 1300, 1110]);
  const win = traceWindow(from, toward, scan.w, scan.h);
  const tiles = tilesOver(win, scan.w, scan.h);

  function built(): TraceSession {
    const s = new TraceSession();
    for (const t of tiles) s.putTile(t.key, t, scan.rgba, whole);
    s.buildTree(1, from, win, tiles.map((t) => t.key));
    return s;
  }

  it('reads the same paths after the hand-over, and the builder no longer holds the tree', () => {
    const worker = built();
    // As the worker does: the path to the pointer when the tree was asked for, so its centres come along.
    const first = worker.path(1, toward);
    const taken = worker.takeTree(1);
    expect(taken).not.toBeNull();
    expect(worker.path(1, toward)).toBeNull();
    // postMessage with the buffers transferred: structuredClone with the same transfer list.
    const handed = structuredClone(taken!.handed, { transfer: taken!.transfer });
    // The builder's arrays moved: they are detached now, not copied.
    expect(taken!.handed.pred.byteLength).toBe(0);
    const page = new TraceSession();
    page.putTree(handed);
    expect(page.hasTree(1)).toBe(true);
    // Reference: a session that built the same tree and reads each position with no centres carried over.
    const fresh = built();
    for (const to of [toward, near, far]) expect(page.path(1, to)).toEqual(fresh.path(1, to));
    expect(page.path(1, toward)).toEqual(first);
    // Analytic truth: the sine the ink was drawn from.
    expect(distanceStats(scan, curve, page.path(1, far)!).rms).toBeLessThan(0.15);
  });

  it('offers its window\'s features for a snap inside the window only', () => {
    const page = new TraceSession();
    const taken = built().takeTree(1)!;
    page.putTree(taken.handed);
    expect(page.featuresOver(win.x0 + 10, win.y0 + 10, win.x0 + 60, win.y0 + 60)).not.toBeNull();
    expect(page.featuresOver(win.x0 - 1, win.y0 + 10, win.x0 + 60, win.y0 + 60)).toBeNull();
    expect(page.featuresOver(win.x0 + 10, win.y0 + 10, win.x0 + win.w + 1, win.y0 + 60)).toBeNull();
  });
});

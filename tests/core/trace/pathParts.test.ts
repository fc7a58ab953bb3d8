import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { centreAcross } from '../../../src/core/trace/centreAcross';
import { pixelFeatures } from '../../../src/core/trace/pixelFeatures';
import { pathToSource, shortestPathTree } from '../../../src/core/trace/shortestPathTree';
import { simplifyPolyline } from '../../../src/core/trace/simplifyPolyline';
import { snapToLine } from '../../../src/core/trace/snapToLine';
import { renderScan, straightCurve } from './syntheticScan';

const paper: [number, number, number] = [240, 236, 225];
const ink: [number, number, number] = [20, 20, 20];

describe('shortestPathTree (Dijkstra with a bucket queue)', () => {
  it('gives the octile distance on a uniform cost image', () => {
    // Analytic: with step cost c (diagonal ⌊181c/128⌋), the least cost to (dx, dy) is
    // (max − min)·c + min·⌊181c/128⌋ — the chamfer/octile distance (Rosenfeld & Pfaltz 1968).
    const w = 40;
    const h = 30;
    const c = 7;
    const diag = (c * 181) >> 7;
    const cost = new Uint8Array(w * h).fill(c);
    const sx = 12;
    const sy = 9;
    const tree = shortestPathTree(cost, w, h, sy * w + sx);
    for (let y = 0; y < h; y += 3) {
      for (let x = 0; x < w; x += 5) {
        const dx = Math.abs(x - sx);
        const dy = Math.abs(y - sy);
        expect(tree.dist[y * w + x]).toBe((Math.max(dx, dy) - Math.min(dx, dy)) * c + Math.min(dx, dy) * diag);
      }
    }
  });

  it('walks a cheap corridor rather than the straight chord', () => {
    // Analytic: an L-shaped corridor of cost 1 in a field of cost 50; the chord would cost far more.
    const w = 30;
    const h = 30;
    const cost = new Uint8Array(w * h).fill(50);
    for (let x = 2; x <= 27; x++) cost[2 * w + x] = 1;
    for (let y = 2; y <= 27; y++) cost[y * w + 27] = 1;
    const tree = shortestPathTree(cost, w, h, 2 * w + 2);
    const path = pathToSource(tree, 27 * w + 27);
    expect(path[0]).toBe(2 * w + 2);
    expect(path[path.length - 1]).toBe(27 * w + 27);
    for (const k of path) expect(cost[k]).toBe(1);
  });

  it('reaches nothing from a source outside the window', () => {
    const tree = shortestPathTree(new Uint8Array(4).fill(1), 2, 2, 9);
    expect(pathToSource(tree, 0)).toEqual([]);
  });
});

describe('simplifyPolyline (Douglas–Peucker)', () => {
  it('reduces collinear points to the two ends and keeps a corner', () => {
    // Analytic: points on y = 2x are all on the chord; a triangle's apex is 10 from its base.
    expect(simplifyPolyline([[0, 0], [1, 2], [2, 4], [3, 6]], 0.1)).toEqual([[0, 0], [3, 6]]);
    expect(simplifyPolyline([[0, 0], [5, 5], [10, 10], [15, 5], [20, 0]], 0.5)).toEqual([[0, 0], [10, 10], [20, 0]]);
  });

  it('drops no vertex farther than the tolerance from the kept line (property)', () => {
    const pts = fc.array(fc.tuple(fc.double({ min: -100, max: 100, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true })), { minLength: 3, maxLength: 40 });
    fc.assert(fc.property(pts, fc.double({ min: 0.01, max: 5, noNaN: true }), (p, tol) => {
      const kept = simplifyPolyline(p, tol);
      // Map each kept vertex to its index in the input (kept vertices come in input order).
      const idx: number[] = [];
      let j = 0;
      for (let i = 0; i < p.length && j < kept.length; i++) if (p[i][0] === kept[j][0] && p[i][1] === kept[j][1]) { idx.push(i); j++; }
      expect(idx.length).toBe(kept.length);
      expect(idx[0]).toBe(0);
      expect(idx[idx.length - 1]).toBe(p.length - 1);
      for (let s = 0; s + 1 < idx.length; s++) {
        const [ax, ay] = p[idx[s]];
        const [bx, by] = p[idx[s + 1]];
        const len = Math.hypot(bx - ax, by - ay);
        for (let i = idx[s] + 1; i < idx[s + 1]; i++) {
          const d = len > 0 ? Math.abs((p[i][0] - ax) * (by - ay) - (p[i][1] - ay) * (bx - ax)) / len : Math.hypot(p[i][0] - ax, p[i][1] - ay);
          expect(d).toBeLessThanOrEqual(tol + 1e-9);
        }
      }
    }));
  });
});

describe('line centre at sub-pixel precision', () => {
  it('finds the centre of a horizontal ink line drawn between pixel rows', () => {
    // Analytic: the line's centre is y = 20.3 exactly; anti-aliasing spreads it over rows 19–21.
    const scan = renderScan({ w: 60, h: 40, paper, angleRad: 0, noise: 0, seed: 1, layers: [{ kind: 'ink', curve: straightCurve(20.3, 0), widthPx: 2, colour: ink }] });
    const f = pixelFeatures(scan.rgba, scan.w, scan.h, 0, 0);
    expect(20.5 + centreAcross(f, 30.5, 20.5, 0, 1)).toBeCloseTo(20.3, 1);
    const snapped = snapToLine(f, 30.2, 23.1, 5);
    expect(snapped).not.toBeNull();
    expect(snapped![1]).toBeCloseTo(20.3, 1);
    // Along the line the click keeps its position (the disc stays balanced on a straight line).
    expect(Math.abs(snapped![0] - 30.2)).toBeLessThan(0.2);
  });

  it('snaps a click near a drawn cross to where its arms meet', () => {
    // Analytic: arms along x = 25.6 and y = 17.4, so the centre is (25.6, 17.4).
    const scan = renderScan({
      w: 50, h: 36, paper, angleRad: 0, noise: 3, seed: 2,
      layers: [{ kind: 'ink', curve: straightCurve(17.4, 0), widthPx: 1.5, colour: ink }],
    });
    // The vertical arm: paint its coverage by hand (the curve model is v = f(u)).
    for (let y = 0; y < scan.h; y++) for (let x = 0; x < scan.w; x++) {
      const a = Math.min(1, Math.max(0, 0.75 + 0.5 - Math.abs(x + 0.5 - 25.6)));
      const k = (y * scan.w + x) * 4;
      for (let c = 0; c < 3; c++) scan.rgba[k + c] = Math.round(scan.rgba[k + c] * (1 - a) + ink[c] * a);
    }
    const f = pixelFeatures(scan.rgba, scan.w, scan.h, 0, 0);
    const snapped = snapToLine(f, 23.9, 19.2, 6);
    expect(snapped).not.toBeNull();
    expect(Math.hypot(snapped![0] - 25.6, snapped![1] - 17.4)).toBeLessThan(0.15);
  });

  it('finds no line across bare paper (NaN, not a made-up centre)', () => {
    const scan = renderScan({ w: 30, h: 30, paper, angleRad: 0, noise: 4, seed: 8, layers: [] });
    const f = pixelFeatures(scan.rgba, scan.w, scan.h, 0, 0);
    expect(centreAcross(f, 15, 15, 0, 1)).toBeNaN();
  });

  it('leaves a click on bare paper alone', () => {
    const scan = renderScan({ w: 30, h: 30, paper, angleRad: 0, noise: 4, seed: 9, layers: [] });
    const f = pixelFeatures(scan.rgba, scan.w, scan.h, 0, 0);
    expect(snapToLine(f, 15, 15, 6)).toBeNull();
  });
});

// Min/max decimation for drawing, checked against an analytic curve and random lines: the drawn line
// must stay within one screen pixel of the original (in both directions, a Hausdorff distance), keep
// only original vertices in their order, and hold at most about four vertices per pixel column. The
// method is min/max ("M4") decimation as plotting libraries use it (Jugel et al. 2014, "M4: a
// visualization-oriented time series data aggregation", PVLDB 7(10); recalled from memory).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decimatePolyline } from '../../src/canvas/decimatePolyline';
import { minOf, maxOf } from '../../src/core/stats/minMax';

type Pt = [number, number];

const toPoints = (flat: ArrayLike<number>): Pt[] => Array.from({ length: flat.length / 2 }, (_, k) => [flat[2 * k], flat[2 * k + 1]] as Pt);

function segmentDistance(p: Pt, a: Pt, b: Pt): number {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy));
}

/**
 * Distance from each query point to a polyline, all in screen px. Segments are filed under every pixel column
 * they cross; a point looks in its own column and its neighbours, so any distance up to one pixel is exact
 * (a farther segment is more than a pixel away) and larger ones come out as at least that.
 */
function distancesToPolyline(points: Pt[], line: Pt[]): number[] {
  const buckets = new Map<number, number[]>();
  for (let k = 0; k + 1 < line.length; k++) {
    const c0 = Math.floor(Math.min(line[k][0], line[k + 1][0]));
    const c1 = Math.floor(Math.max(line[k][0], line[k + 1][0]));
    for (let c = c0; c <= c1; c++) {
      const list = buckets.get(c) ?? [];
      list.push(k);
      buckets.set(c, list);
    }
  }
  return points.map((p) => {
    let best = Infinity;
    const c = Math.floor(p[0]);
    for (let d = -1; d <= 1; d++) for (const k of buckets.get(c + d) ?? []) best = Math.min(best, segmentDistance(p, line[k], line[k + 1]));
    return Math.min(best, 2);
  });
}

/** Points along each segment of the line, at most `step` apart (screen px). */
function alongSegments(line: Pt[], step: number): Pt[] {
  // Distances change by at most the step between samples (1-Lipschitz), so between two samples the true
  // distance exceeds the larger sampled one by at most step / 2.
  const out: Pt[] = [];
  for (let k = 0; k + 1 < line.length; k++) {
    const [a, b] = [line[k], line[k + 1]];
    const m = Math.max(1, Math.ceil(Math.hypot(b[0] - a[0], b[1] - a[1]) / step));
    for (let i = 0; i < m; i++) out.push([a[0] + ((b[0] - a[0]) * i) / m, a[1] + ((b[1] - a[1]) * i) / m]);
  }
  if (line.length) out.push(line[line.length - 1]);
  return out;
}

/** Index in the original of each kept point, walking forward (throws if a kept point is not a later original vertex). */
function keptIndices(original: Pt[], kept: Pt[]): number[] {
  const idx: number[] = [];
  let i = 0;
  for (const q of kept) {
    while (i < original.length && (original[i][0] !== q[0] || original[i][1] !== q[1])) i++;
    if (i === original.length) throw new Error(`kept point ${q} is not a later original vertex`);
    idx.push(i++);
  }
  return idx;
}

/** Hausdorff distance in screen px between the lines at `scale`, both ways; `step` samples the segments. */
function screenHausdorff(original: Pt[], kept: Pt[], scale: number, step: number): { there: number; back: number } {
  const screen = (l: Pt[]) => l.map(([u, v]) => [u * scale, v * scale] as Pt);
  const [o, k] = [screen(original), screen(kept)];
  const largest = (xs: number[]) => xs.reduce((m, x) => Math.max(m, x), 0);
  return {
    there: largest(distancesToPolyline(alongSegments(o, step), k)),
    back: largest(distancesToPolyline(alongSegments(k, step), o)),
  };
}

describe('decimatePolyline(flat, scale)', () => {
  // An analytic horizon: a 400 px fold with a 3.7 px ripple, 100 000 vertices over 2000 image px (50 per px).
  const N = 100_000;
  const flat = new Float64Array(2 * N);
  for (let k = 0; k < N; k++) {
    const u = (2000 * k) / (N - 1);
    flat[2 * k] = u;
    flat[2 * k + 1] = 300 + 120 * Math.sin((2 * Math.PI * u) / 400) + 15 * Math.sin((2 * Math.PI * u) / 3.7);
  }
  const original = toPoints(flat);

  for (const scale of [0.05, 0.37, 1, 3]) {
    it(`keeps an analytic 100 000-vertex curve within one screen pixel at ${scale} screen px per image px, with ≤ 4 vertices per pixel column`, () => {
      const kept = toPoints(decimatePolyline(flat, scale));
      // Pixel columns the curve spans (u from 0 to 2000).
      const columns = Math.floor(2000 * scale) - Math.floor(0 * scale) + 1;
      expect(kept.length).toBeLessThanOrEqual(4 * columns);
      expect(kept.length).toBeLessThan(N);
      // Only original vertices, in order, with both ends.
      const idx = keptIndices(original, kept);
      expect(idx[0]).toBe(0);
      expect(idx[idx.length - 1]).toBe(N - 1);
      const { there, back } = screenHausdorff(original, kept, scale, 0.25);
      expect(there).toBeLessThanOrEqual(1);
      expect(back).toBeLessThanOrEqual(1);
      // A generous limit for the brute-force distances on a busy machine (not a speed check).
    }, 60_000);
  }

  it('zoomed in, keeps the window of columns exact and each side of it as one column, so off-screen parts cost nothing', () => {
    // 20 screen px per image px: the curve spans 40 000 columns; a view 800 px wide with a view's width each side.
    const scale = 20;
    const columns: [number, number] = [10_000, 12_399];
    const kept = toPoints(decimatePolyline(flat, scale, columns));
    // The window's columns, and one merged column each side.
    expect(kept.length).toBeLessThanOrEqual(4 * (columns[1] - columns[0] + 1 + 2));
    keptIndices(original, kept);
    // Within the window (screen x from 10 000 to 12 400), the two lines are within one pixel both ways.
    const inWindow = (l: Pt[]) => l.filter(([u]) => u * scale >= columns[0] - 2 && u * scale < columns[1] + 3);
    const screen = (l: Pt[]) => l.map(([u, v]) => [u * scale, v * scale] as Pt);
    const visible = (l: Pt[]) => l.filter(([x]) => x >= columns[0] && x < columns[1] + 1);
    const [o, k] = [screen(inWindow(original)), screen(inWindow(kept))];
    const largest = (xs: number[]) => xs.reduce((m, x) => Math.max(m, x), 0);
    expect(largest(distancesToPolyline(visible(alongSegments(o, 0.25)), k))).toBeLessThanOrEqual(1);
    expect(largest(distancesToPolyline(visible(alongSegments(k, 0.25)), o))).toBeLessThanOrEqual(1);
  }, 60_000);

  it('follows the full height of a steep ripple inside one column (the extremes are kept, not averaged away)', () => {
    const kept = toPoints(decimatePolyline(flat, 0.05));
    // In the column u ∈ [0, 20) the curve reaches min and max of the original there.
    const inCol = (l: Pt[]) => l.filter(([u]) => u < 20).map(([, v]) => v);
    expect(minOf(inCol(kept))).toBe(minOf(inCol(original)));
    expect(maxOf(inCol(kept))).toBe(maxOf(inCol(original)));
  });

  it('returns short lines and unusable scales unchanged', () => {
    expect(decimatePolyline([0, 0, 1, 1, 2, 0, 3, 1], 0.001)).toEqual([0, 0, 1, 1, 2, 0, 3, 1]);
    expect(decimatePolyline(flat.subarray(0, 20), 0)).toEqual(Array.from(flat.subarray(0, 20)));
    expect(decimatePolyline(flat.subarray(0, 20), Number.NaN)).toEqual(Array.from(flat.subarray(0, 20)));
  });

  it('keeps any line — folded back, overturned, vertical — within one screen pixel, as original vertices in order', () => {
    const step = fc.tuple(fc.double({ min: -6, max: 6, noNaN: true }), fc.double({ min: -6, max: 6, noNaN: true }));
    fc.assert(
      fc.property(fc.array(step, { minLength: 5, maxLength: 150 }), fc.double({ min: 0.05, max: 4, noNaN: true }), (steps, scale) => {
        const line: Pt[] = [[100, 100]];
        for (const [du, dv] of steps) line.push([line[line.length - 1][0] + du, line[line.length - 1][1] + dv]);
        const kept = toPoints(decimatePolyline(line.flat(), scale));
        // Original vertices in order (a repeated vertex may match an earlier copy), both ends kept.
        keptIndices(line, kept);
        expect(kept[0]).toEqual(line[0]);
        expect(kept[kept.length - 1]).toEqual(line[line.length - 1]);
        const { there, back } = screenHausdorff(line, kept, scale, 0.25);
        expect(there).toBeLessThanOrEqual(1);
        expect(back).toBeLessThanOrEqual(1);
      }),
    );
  });
});

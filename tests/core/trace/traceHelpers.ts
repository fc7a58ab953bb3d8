// Runs the pure tracing pipeline over a whole synthetic scan, as the app's worker does over a window.
import { pixelFeatures, type PixelFeatures } from '../../../src/core/trace/pixelFeatures';
import { shortestPathTree } from '../../../src/core/trace/shortestPathTree';
import { snapToLine } from '../../../src/core/trace/snapToLine';
import { traceCost } from '../../../src/core/trace/traceCost';
import { pixelIndexAt, traceStretch } from '../../../src/core/trace/traceStretch';
import { distanceToCurve, fromFrame, type Curve, type SyntheticScan } from './syntheticScan';

/** Features of the whole scan. */
export function featuresOf(scan: SyntheticScan): PixelFeatures {
  return pixelFeatures(scan.rgba, scan.w, scan.h, 0, 0);
}

/** Traces through anchors (each snapped within `snapPx` first); returns the joined vertices. */
export function traceThrough(scan: SyntheticScan, f: PixelFeatures, anchors: [number, number][], snapPx = 4): [number, number][] {
  const cost = traceCost(f);
  const snapped = anchors.map((a) => snapToLine(f, a[0], a[1], snapPx) ?? a);
  const out: [number, number][] = [snapped[0]];
  for (let i = 1; i < snapped.length; i++) {
    const tree = shortestPathTree(cost, f.w, f.h, pixelIndexAt(f, snapped[i - 1][0], snapped[i - 1][1]));
    const stretch = traceStretch(tree, f, snapped[i - 1], snapped[i]);
    if (!stretch) throw new Error('stretch not traced');
    for (let k = 1; k < stretch.length; k++) out.push(stretch[k]);
  }
  return out;
}

/** Image points on the curve at frame u values, nudged off the line by `offPx` (a click beside the ink). */
export function pointsOnCurve(scan: SyntheticScan, curve: Curve, us: number[], offPx = 0): [number, number][] {
  return us.map((u) => fromFrame(scan.spec, u, curve.f(u) + offPx));
}

/** Root mean square and largest distance of points from the curve, in image px. */
export function distanceStats(scan: SyntheticScan, curve: Curve, pts: [number, number][]): { rms: number; max: number } {
  let s = 0;
  let max = 0;
  for (const p of pts) {
    const d = distanceToCurve(scan.spec, curve, p[0], p[1]);
    s += d * d;
    if (d > max) max = d;
  }
  return { rms: Math.sqrt(s / pts.length), max };
}

/**
 * The window `win` of an image `w` px across (`rgba`) resized to cw × ch as a browser's smoothing resize does at
 * these ratios: each output pixel the area-weighted mean of the image pixels under it (a box filter; at exactly
 * half it is the 2 × 2 mean that mipmapping gives).
 */
export function boxResize(rgba: ArrayLike<number>, w: number, win: { x0: number; y0: number; w: number; h: number }, cw: number, ch: number): Uint8ClampedArray {
  const out = new Uint8ClampedArray(cw * ch * 4);
  const sx = win.w / cw;
  const sy = win.h / ch;
  for (let j = 0; j < ch; j++) {
    const v0 = win.y0 + j * sy;
    for (let i = 0; i < cw; i++) {
      const u0 = win.x0 + i * sx;
      const acc = [0, 0, 0, 0];
      let area = 0;
      for (let y = Math.floor(v0); y < v0 + sy; y++) {
        const wy = Math.min(v0 + sy, y + 1) - Math.max(v0, y);
        for (let x = Math.floor(u0); x < u0 + sx; x++) {
          const a = wy * (Math.min(u0 + sx, x + 1) - Math.max(u0, x));
          for (let c = 0; c < 4; c++) acc[c] += a * rgba[(y * w + x) * 4 + c];
          area += a;
        }
      }
      for (let c = 0; c < 4; c++) out[(j * cw + i) * 4 + c] = Math.round(acc[c] / area);
    }
  }
  return out;
}

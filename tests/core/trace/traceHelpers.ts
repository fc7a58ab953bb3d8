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

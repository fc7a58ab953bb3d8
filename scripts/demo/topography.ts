// An invented land surface: above every horizon except over the crest of the overturned anticline, where
// erosion has cut down through the top horizon (its crest there is projected, as a geologist draws it).
import type { XZ } from '../../src/core/model/section';
import { maxOf } from '../../src/core/stats/minMax';

/** Returns the highest z of the polyline at x (any segment spanning x), or −Infinity. */
export function highestZAt(line: XZ[], x: number): number {
  let best = -Infinity;
  for (let i = 0; i + 1 < line.length; i++) {
    const [x0, z0] = line[i];
    const [x1, z1] = line[i + 1];
    if ((x0 - x) * (x1 - x) > 0 || x0 === x1) continue;
    best = Math.max(best, z0 + ((z1 - z0) * (x - x0)) / (x1 - x0));
  }
  return best;
}

/** Returns the surface sampled every `step` m over [x0, x1]: a smoothed upper envelope of `line` plus clearance and hills. */
export function topography(line: XZ[], x0: number, x1: number, step = 50): XZ[] {
  const xs: number[] = [];
  for (let x = x0; x <= x1 + 1e-9; x += step) xs.push(x);
  const env = xs.map((x) => highestZAt(line, x));
  // Max filter of radius R, then a smoothing kernel no wider than R: the result stays >= the envelope.
  const R = Math.round(600 / step);
  const maxed = env.map((_, i) => maxOf(env.slice(Math.max(0, i - R), i + R + 1)));
  const smooth = maxed.map((_, i) => {
    let s = 0;
    let w = 0;
    for (let j = -R; j <= R; j++) {
      const k = Math.min(xs.length - 1, Math.max(0, i + j));
      const wt = Math.exp(-((j / (R / 2)) ** 2));
      s += wt * maxed[k];
      w += wt;
    }
    return s / w;
  });
  // Hills: a few positive bumps of our own choosing so the surface is not a copy of the folds.
  const hills = (x: number): number => 170 + 60 * Math.sin(x / 1300) ** 2 + 45 * Math.sin(x / 610 + 1.3) ** 2;
  return xs.map((x, i) => [x, eroded(x, smooth[i] + hills(x))]);
}

/** Where the demo's land surface is cut down over the overturned anticline (m): the valley's middle, half-width and floor level. */
export const DEMO_EROSION = { centre: 19400, halfWidth: 1500, level: 1740 };

/** Returns the surface elevation z cut down to the valley floor near the erosion window (a smooth minimum; never raised). */
function eroded(x: number, z: number): number {
  const { centre, halfWidth, level } = DEMO_EROSION;
  // The floor undulates a little and rises steeply outside the window, so the cut has valley sides, not a step.
  const outside = Math.max(0, Math.abs(x - centre) - halfWidth) / 1000;
  const floor = level + 35 * Math.sin(x / 380) ** 2 + 1200 * outside ** 2;
  // Smooth minimum of width k: at most k·ln 2 below the lower of the two, and equal to it far from the other.
  const k = 50;
  const m = Math.min(z, floor);
  return m - k * Math.log(Math.exp((m - z) / k) + Math.exp((m - floor) / k));
}

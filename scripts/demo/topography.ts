// An invented land surface that stays above every horizon (so no part of the demo is eroded).
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
  return xs.map((x, i) => [x, smooth[i] + hills(x)]);
}

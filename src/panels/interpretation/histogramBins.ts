import { niceStep } from '../../format/niceTicks';

export interface Histogram { edges: number[]; counts: number[] }

/** Counts of the finite values in bins of a 1-2-5 width (about `target` bins); no bins when there are no finite values. */
export function histogramBins(values: ArrayLike<number>, target = 24): Histogram {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!Number.isFinite(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  if (!(hi >= lo)) return { edges: [], counts: [] };
  const width = hi > lo ? niceStep(hi - lo, target) : Math.max(1, Math.abs(lo) * 1e-3);
  const start = Math.floor(lo / width) * width;
  const bins = Math.max(1, Math.floor((hi - start) / width) + 1);
  const counts = new Array<number>(bins).fill(0);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!Number.isFinite(v)) continue;
    counts[Math.min(bins - 1, Math.floor((v - start) / width))]++;
  }
  return { edges: Array.from({ length: bins + 1 }, (_, i) => start + i * width), counts };
}

// Percentile of sorted values by linear interpolation between order statistics: position
// (n − 1)·p, Hyndman & Fan (1996, Am. Stat. 50:361–365) definition 7, the common default.

/** The p-quantile (p in [0, 1]) of ascending-sorted values, linearly interpolated; NaN for no values or p outside [0, 1]. */
export function percentile(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0 || !(p >= 0 && p <= 1)) return NaN;
  const position = (n - 1) * p;
  const below = Math.floor(position);
  const fraction = position - below;
  const low = sorted[below];
  if (fraction === 0 || below + 1 >= n) return low;
  return low + fraction * (sorted[below + 1] - low);
}

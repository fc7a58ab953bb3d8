// Elevation of a polyline at a given x, e.g. a regional beneath a projected run.

/** z (units) on the first segment of xs/zs that spans x (ends included); NaN when no segment spans x. */
export function interpolateZAt(xs: ArrayLike<number>, zs: ArrayLike<number>, x: number): number {
  const n = xs.length;
  if (n === 1 && xs[0] === x) return zs[0];
  for (let i = 1; i < n; i++) {
    const x0 = xs[i - 1];
    const x1 = xs[i];
    if ((x0 <= x && x <= x1) || (x1 <= x && x <= x0)) {
      if (x === x0) return zs[i - 1];
      if (x === x1) return zs[i];
      const t = (x - x0) / (x1 - x0);
      return zs[i - 1] + t * (zs[i] - zs[i - 1]);
    }
  }
  return Number.NaN;
}

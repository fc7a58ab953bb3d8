// Line integral of (z - zOrigin) dx along a polyline, by the trapezoid rule, which is exact
// for a piecewise-linear line. For a closed loop this equals minus the shoelace area.

/** ∫ (z − zOrigin) dx along xs/zs[from..to) in units² (signed: negative where x runs backwards); 0 for < 2 vertices. */
export function trapezoidIntegral(
  xs: ArrayLike<number>,
  zs: ArrayLike<number>,
  zOrigin = 0,
  from = 0,
  to = xs.length,
): number {
  let sum = 0;
  for (let i = from + 1; i < to; i++) {
    sum += (zs[i - 1] - zOrigin + (zs[i] - zOrigin)) * (xs[i] - xs[i - 1]);
  }
  return sum / 2;
}

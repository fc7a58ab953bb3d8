// Shoelace (Gauss) area of a closed ring. The first vertex is the local origin: map-scale
// coordinates (x ~ 1e6) would otherwise lose digits by cancellation (docs/method.md §Numerics).

/** Signed area (units²) of the closed ring xs/zs[from..to), counter-clockwise positive; 0 for fewer than 3 vertices. */
export function shoelaceArea(
  xs: ArrayLike<number>,
  zs: ArrayLike<number>,
  from = 0,
  to = xs.length,
): number {
  if (to - from < 3) return 0;
  const x0 = xs[from];
  const z0 = zs[from];
  let sum = 0;
  let px = 0;
  let pz = 0;
  for (let i = from + 1; i < to; i++) {
    const x = xs[i] - x0;
    const z = zs[i] - z0;
    sum += px * z - x * pz;
    px = x;
    pz = z;
  }
  // The closing edge back to the origin vertex (0, 0) contributes px*0 - 0*pz = 0.
  return sum / 2;
}

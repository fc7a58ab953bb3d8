// How much longer a polyline is than the x-span it covers, L − (x_last − x_first), summed per segment so
// that no long sums are subtracted: each segment adds len − |dx| = dz² / (len + |dx|) (exact algebra, no
// cancellation), and a segment that steps back in x adds 2|dx| (its |dx| counts once against the span and
// once more to return). Chamberlin's L − W is the difference of two such small sums instead of two long
// ones (docs/method.md §Chamberlin depth, §Numerics).

/** Returns L − (x_last − x_first) of the polyline (units, ≥ 0 up to rounding); 0 for fewer than two vertices. */
export function lengthBeyondSpan(xs: ArrayLike<number>, zs: ArrayLike<number>): number {
  let beyond = 0;
  const n = Math.min(xs.length, zs.length);
  for (let i = 1; i < n; i++) {
    const dx = xs[i] - xs[i - 1];
    const dz = zs[i] - zs[i - 1];
    const len = Math.sqrt(dx * dx + dz * dz);
    const adx = dx < 0 ? -dx : dx;
    if (len > 0) beyond += (dz * dz) / (len + adx);
    if (dx < 0) beyond += 2 * adx;
  }
  return beyond;
}

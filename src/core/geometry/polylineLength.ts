// Plain length of a polyline: the bed length L and the regional length W of docs/method.md §Lengths.

/** Length (units) of the open polyline xs/zs[from..to); 0 for fewer than 2 vertices. */
export function polylineLength(
  xs: ArrayLike<number>,
  zs: ArrayLike<number>,
  from = 0,
  to = xs.length,
): number {
  let sum = 0;
  for (let i = from + 1; i < to; i++) {
    // Differences of neighbouring vertices are local by construction, so no origin shift is needed.
    // sqrt, not Math.hypot: several times faster, and section coordinates cannot overflow a square.
    const dx = xs[i] - xs[i - 1];
    const dz = zs[i] - zs[i - 1];
    sum += Math.sqrt(dx * dx + dz * dz);
  }
  return sum;
}

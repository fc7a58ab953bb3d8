// Closed-segment intersection by orientation tests (common practice, e.g. Cormen et al.,
// Introduction to Algorithms, §33.1). Callers pass coordinates relative to a local origin.

function orient(ax: number, az: number, bx: number, bz: number, cx: number, cz: number): number {
  return (bx - ax) * (cz - az) - (bz - az) * (cx - ax);
}

function within(a: number, b: number, c: number): boolean {
  return Math.min(a, b) <= c && c <= Math.max(a, b);
}

/** True when closed segments ab and cd share at least one point (touching and collinear overlap count). */
export function segmentsIntersect(
  ax: number, az: number, bx: number, bz: number,
  cx: number, cz: number, dx: number, dz: number,
): boolean {
  const o1 = orient(ax, az, bx, bz, cx, cz);
  const o2 = orient(ax, az, bx, bz, dx, dz);
  const o3 = orient(cx, cz, dx, dz, ax, az);
  const o4 = orient(cx, cz, dx, dz, bx, bz);
  if (((o1 > 0 && o2 < 0) || (o1 < 0 && o2 > 0)) && ((o3 > 0 && o4 < 0) || (o3 < 0 && o4 > 0))) return true;
  // Collinear or touching cases: an endpoint lies on the other segment.
  if (o1 === 0 && within(ax, bx, cx) && within(az, bz, cz)) return true;
  if (o2 === 0 && within(ax, bx, dx) && within(az, bz, dz)) return true;
  if (o3 === 0 && within(cx, dx, ax) && within(cz, dz, az)) return true;
  if (o4 === 0 && within(cx, dx, bx) && within(cz, dz, bz)) return true;
  return false;
}

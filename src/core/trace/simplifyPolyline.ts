// Douglas & Peucker (1973, The Canadian Cartographer 10(2)): keep the vertex farthest from the chord
// while it lies farther than the tolerance, recursively (here with an explicit stack, so a traced
// stretch of thousands of pixels cannot overflow the call stack).

/**
 * Returns the points kept by Douglas–Peucker with tolerance `tol` (same units as the points): the first and last
 * always, and every vertex needed so that no dropped vertex lies farther than `tol` from the kept line. Lines of
 * two or fewer points come back as a copy.
 */
export function simplifyPolyline(points: readonly (readonly [number, number])[], tol: number): [number, number][] {
  const n = points.length;
  if (n <= 2) return points.map((p) => [p[0], p[1]]);
  const keep = new Uint8Array(n);
  keep[0] = 1;
  keep[n - 1] = 1;
  const stack: number[] = [0, n - 1];
  while (stack.length > 0) {
    const b = stack.pop() as number;
    const a = stack.pop() as number;
    const [ax, ay] = points[a];
    const dx = points[b][0] - ax;
    const dy = points[b][1] - ay;
    const len = Math.hypot(dx, dy);
    let worst = -1;
    let worstD = tol;
    for (let i = a + 1; i < b; i++) {
      const px = points[i][0] - ax;
      const py = points[i][1] - ay;
      // Distance to the chord's line, or to its start when the chord has no length (a closed loop).
      const d = len > 0 ? Math.abs(px * dy - py * dx) / len : Math.hypot(px, py);
      if (d > worstD) {
        worstD = d;
        worst = i;
      }
    }
    if (worst >= 0) {
      keep[worst] = 1;
      stack.push(a, worst, worst, b);
    }
  }
  const out: [number, number][] = [];
  for (let i = 0; i < n; i++) if (keep[i]) out.push([points[i][0], points[i][1]]);
  return out;
}

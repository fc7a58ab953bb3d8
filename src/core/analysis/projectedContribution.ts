import type { ClippedPolyline } from '../geometry/clipPolylineToPins';
import { trapezoidIntegral } from '../geometry/trapezoidIntegral';

// Area and length carried by the projected (eroded, interpreted) parts of a clipped horizon.
// For each maximal run of projected segments from x = a to x = b: the loop along the run, down
// to the regional at b, back along the regional to a and up again, i.e.
//   P_run = ∫_run z dx − ∫_a^b regional(x) dx   (signed like the excess area, above positive).
// The regional is read as z(x), as a regional should be single-valued in x.

/** Signed projected area P (units², Σ over runs) and projected length (units) of a clipped horizon; both 0 when nothing is projected. */
export function projectedContribution(line: ClippedPolyline, regional: ClippedPolyline): { area: number; length: number } {
  const segs = line.projected.length;
  const z0 = regional.zs[0];
  let area = 0;
  let length = 0;
  let s = 0;
  while (s < segs) {
    if (!line.projected[s]) { s++; continue; }
    let e = s;
    while (e < segs && line.projected[e]) e++;
    // Vertices s..e form the run.
    for (let k = s; k < e; k++) length += Math.hypot(line.xs[k + 1] - line.xs[k], line.zs[k + 1] - line.zs[k]);
    area += trapezoidIntegral(line.xs, line.zs, z0, s, e + 1) - regionalIntegral(regional, line.xs[s], line.xs[e], z0);
    s = e;
  }
  return { area, length };
}

/** ∫_a^b (regional(x) − z0) dx, exact for a polyline; each segment contributes over its overlap with [a, b]. */
function regionalIntegral(r: ClippedPolyline, a: number, b: number, z0: number): number {
  if (a === b) return 0;
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  let sum = 0;
  for (let i = 1; i < r.xs.length; i++) {
    const xa = r.xs[i - 1];
    const xb = r.xs[i];
    if (xa === xb) continue;
    const x0 = Math.max(lo, Math.min(xa, xb));
    const x1 = Math.min(hi, Math.max(xa, xb));
    if (x1 <= x0) continue;
    const slope = (r.zs[i] - r.zs[i - 1]) / (xb - xa);
    const zMid = r.zs[i - 1] - z0 + slope * ((x0 + x1) / 2 - xa);
    sum += zMid * (x1 - x0);
  }
  return b > a ? sum : -sum;
}

// A horizon's regional as offsets from its regional elevation, with zero mean over the pins.
import type { RegionalSpec } from './forwardSpec';

export interface RegionalProfile {
  /** Break points strictly inside the extent, increasing x. */
  breaks: number[];
  /** Offset of the regional from its regional elevation at x (section units). */
  offset: (x: number) => number;
}

/** Returns the regional's offset function and break points; the mean offset over the pins is zero (to rounding). */
export function regionalProfile(spec: RegionalSpec, pins: [number, number], extent: [number, number]): RegionalProfile {
  const [pL, pR] = pins;
  if (spec.kind === 'horizontal') return { breaks: [], offset: () => 0 };
  if (spec.kind === 'inclined') {
    // Pivot about the pins' midpoint so the mean over the pins is exactly the regional elevation.
    const mid = (pL + pR) / 2;
    return { breaks: [], offset: (x) => spec.slope * (x - mid) };
  }
  const pts = [...spec.points].sort((a, b) => a[0] - b[0]);
  if (pts.length < 2) throw new Error('curved regional needs at least 2 points');
  for (let i = 1; i < pts.length; i++) {
    if (!(pts[i][0] > pts[i - 1][0])) throw new Error('curved regional points need distinct x');
  }
  const raw = (x: number): number => interpolate(pts, x);
  // Mean over the pins of the piecewise-linear profile: trapezoids between pins and interior points.
  const xs = [pL, ...pts.map((p) => p[0]).filter((x) => x > pL && x < pR), pR];
  let integral = 0;
  for (let i = 0; i + 1 < xs.length; i++) integral += ((raw(xs[i]) + raw(xs[i + 1])) / 2) * (xs[i + 1] - xs[i]);
  const mean = integral / (pR - pL);
  const breaks = pts.map((p) => p[0]).filter((x) => x > extent[0] && x < extent[1]);
  return { breaks, offset: (x) => raw(x) - mean };
}

function interpolate(pts: [number, number][], x: number): number {
  if (x <= pts[0][0]) return pts[0][1];
  const last = pts[pts.length - 1];
  if (x >= last[0]) return last[1];
  let i = 1;
  while (pts[i][0] < x) i++;
  const [x0, z0] = pts[i - 1];
  const [x1, z1] = pts[i];
  return z0 + ((z1 - z0) * (x - x0)) / (x1 - x0);
}

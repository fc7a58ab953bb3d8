import { trapezoidIntegral } from './trapezoidIntegral';

// Regional elevation r = (1/W0) ∫ regional(x) dx over the pins (Epard & Groshong 1993; docs/method.md §Pins, regional and excess area).
// The integral is exact for a polyline; the first vertex's z is the local origin for accuracy.

/** Mean elevation (units) of a polyline over its x-span, (1/Δx) ∫ z dx; NaN when first and last x are equal. */
export function meanElevation(xs: ArrayLike<number>, zs: ArrayLike<number>): number {
  const n = xs.length;
  if (n < 2) return Number.NaN;
  const width = xs[n - 1] - xs[0];
  if (width === 0) return Number.NaN;
  const z0 = zs[0];
  return z0 + trapezoidIntegral(xs, zs, z0) / width;
}

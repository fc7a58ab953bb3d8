import { trapezoidIntegral } from './trapezoidIntegral';

// The excess-area loop of Epard & Groshong (1993): line `a` from its first to its last vertex,
// then line `b` back. Both lines must start at one x and end at one x (e.g. clipped to the
// pins), so the closing edges are vertical and add nothing to ∮ z dx. Working with the two
// integrals avoids building the loop. The loop's shoelace area is minus ∮ z dx, so this sign
// makes "a above b" positive; overturned parts of `a` are weighted by the loop's winding.

/** Signed area (units²) of the loop a-forward, b-back: positive where a lies above b; 0 if both are empty. */
export function areaBetweenPolylines(
  ax: ArrayLike<number>,
  az: ArrayLike<number>,
  bx: ArrayLike<number>,
  bz: ArrayLike<number>,
): number {
  // A local z origin keeps digits at map-scale elevations (docs/method.md §Numerics).
  const zOrigin = bz.length > 0 ? bz[0] : az.length > 0 ? az[0] : 0;
  return trapezoidIntegral(ax, az, zOrigin) - trapezoidIntegral(bx, bz, zOrigin);
}

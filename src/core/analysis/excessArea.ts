import { areaBetweenPolylines } from '../geometry/areaBetweenPolylines';
import { clipPolylineToPins } from '../geometry/clipPolylineToPins';
import { toCoordinateArrays } from '../geometry/toCoordinateArrays';
import type { XZ } from '../model/section';

// Excess area (Epard & Groshong 1993; docs/method.md §Pins, regional and excess area): the horizon from its left-pin crossing to its
// right-pin crossing, then the regional back; the loop's shoelace area, signed so that a horizon
// above its regional is positive. Overturned limbs are weighted by the loop's winding.

/** Signed excess area (units², above the regional positive) between the pins; NaN unless pins[0] < pins[1] and both lines cross each pin exactly once. */
export function excessArea(horizon: readonly XZ[], regional: readonly XZ[], pins: [number, number]): number {
  if (!(pins[0] < pins[1])) return Number.NaN;
  const h = toCoordinateArrays(horizon);
  const r = toCoordinateArrays(regional);
  const hc = clipPolylineToPins(h.xs, h.zs, pins[0], pins[1]).clipped;
  const rc = clipPolylineToPins(r.xs, r.zs, pins[0], pins[1]).clipped;
  if (!hc || !rc) return Number.NaN;
  return areaBetweenPolylines(hc.xs, hc.zs, rc.xs, rc.zs);
}

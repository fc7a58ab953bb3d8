// The outline of a horizon's excess-area fill, in section units: the loop between the horizon and its
// regional across the pins (docs/method.md §Pins, regional and excess area), and the half-planes above and
// below the regional that clip it, so lobes above the regional (added) and below it (subtracted) take
// different fills. The one construction for the canvas and the exported figure; each maps the points to
// its own space. The horizon's part is kept apart so a drag of the regional alone rebuilds only its side.
import type { XZ } from '../model/section';
import { clipPolylineToPins } from './clipPolylineToPins';

/** The horizon clipped to the pins (left to right) and its z range. */
export interface FillHorizonPart { xs: ArrayLike<number>; zs: ArrayLike<number>; zMin: number; zMax: number }

/** The regional's side: the loop's tail (regional, right pin → left pin) and the two clip regions. */
export interface FillRegionalPart { tail: XZ[]; above: XZ[]; below: XZ[] }

/** Returns the horizon clipped to the pins for the fill, or null when it does not cross each pin once. */
export function fillHorizonPart(xs: ArrayLike<number>, zs: ArrayLike<number>, pins: readonly [number, number]): FillHorizonPart | null {
  const lc = clipPolylineToPins(xs, zs, pins[0], pins[1]).clipped;
  return lc ? fillHorizonPartOf(lc) : null;
}

/** Returns the fill's horizon part of a line already clipped to the pins (clipPolylineToPins, as the analysis clips it). */
export function fillHorizonPartOf(lc: { xs: ArrayLike<number>; zs: ArrayLike<number> }): FillHorizonPart {
  let zMin = Infinity;
  let zMax = -Infinity;
  for (let i = 0; i < lc.zs.length; i++) {
    if (lc.zs[i] < zMin) zMin = lc.zs[i];
    if (lc.zs[i] > zMax) zMax = lc.zs[i];
  }
  return { xs: lc.xs, zs: lc.zs, zMin, zMax };
}

/**
 * Returns the regional's side of the fill for the clipped horizon, or null when the regional does not cross
 * each pin once. The clip regions run along the regional and close a margin (the z span plus the pin width)
 * beyond every point of the loop.
 */
export function fillRegionalPart(xs: ArrayLike<number>, zs: ArrayLike<number>, pins: readonly [number, number], horizon: FillHorizonPart): FillRegionalPart | null {
  const rc = clipPolylineToPins(xs, zs, pins[0], pins[1]).clipped;
  if (!rc) return null;
  let zMin = horizon.zMin;
  let zMax = horizon.zMax;
  const along: XZ[] = [];
  for (let i = 0; i < rc.xs.length; i++) {
    along.push([rc.xs[i], rc.zs[i]]);
    if (rc.zs[i] < zMin) zMin = rc.zs[i];
    if (rc.zs[i] > zMax) zMax = rc.zs[i];
  }
  const margin = zMax - zMin + (pins[1] - pins[0]);
  const tail = along.slice().reverse();
  const above: XZ[] = [...along, [pins[1], zMax + margin], [pins[0], zMax + margin]];
  const below: XZ[] = [...along, [pins[1], zMin - margin], [pins[0], zMin - margin]];
  return { tail, above, below };
}

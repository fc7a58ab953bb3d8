// Polygons for the translucent excess-area fills, in image pixels: the loop between a horizon and its
// regional across the pins (the construction of docs/method.md §Pins, regional and excess area), and the
// half-planes above and below the regional used as clip regions, so lobes above the regional and below it get different fills.
// The loop is the horizon's part (clippedHorizonPx, kept while only the regional moves) followed by the
// regional's part (excessFillSides), so a regional drag rebuilds only the regional's side.
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { imageToSection, sectionToImage } from '../core/calibration/mapPoints';
import { clipPolylineToPins } from '../core/geometry/clipPolylineToPins';
import type { ImagePx } from '../core/model/projectDoc';

export interface ExcessFillGeometry {
  /** Flat [u0, v0, u1, v1, …] of the closed loop horizon (left pin → right pin) then regional back. */
  loop: number[];
  above: number[];
  below: number[];
}

function flatPx(frame: FittedCalibration, xs: ArrayLike<number>, zs: ArrayLike<number>, reverse: boolean, out: number[]): void {
  const n = xs.length;
  for (let k = 0; k < n; k++) {
    const i = reverse ? n - 1 - k : k;
    const p = sectionToImage(frame, [xs[i], zs[i]]);
    out.push(p[0], p[1]);
  }
}

/** The horizon's part of the fill: its line clipped to the pins (image pixels, left to right) and its z range (section units). */
export interface ClippedHorizonPx { loopHead: number[]; zMin: number; zMax: number }

/** Returns the horizon clipped to the pins for the fill (reused while only its regional moves), or null when it does not cross both pins once. */
export function clippedHorizonPx(linePx: ImagePx[], pins: [number, number], frame: FittedCalibration): ClippedHorizonPx | null {
  const xs = new Float64Array(linePx.length);
  const zs = new Float64Array(linePx.length);
  linePx.forEach((p, i) => {
    const q = imageToSection(frame, p);
    xs[i] = q[0];
    zs[i] = q[1];
  });
  const lc = clipPolylineToPins(xs, zs, pins[0], pins[1]).clipped;
  if (!lc) return null;
  let zMin = Infinity;
  let zMax = -Infinity;
  for (const z of lc.zs) {
    zMin = Math.min(zMin, z);
    zMax = Math.max(zMax, z);
  }
  const loopHead: number[] = [];
  flatPx(frame, lc.xs, lc.zs, false, loopHead);
  return { loopHead, zMin, zMax };
}

/** The regional's part of the fill: the loop's tail (the regional, right pin → left pin) and the two clip regions. */
export interface ExcessFillSides { loopTail: number[]; above: number[]; below: number[] }

/** Returns the regional's side of the fill for the clipped horizon, or null when the regional does not cross both pins once. */
export function excessFillSides(regionalPx: ImagePx[], pins: [number, number], frame: FittedCalibration, horizon: ClippedHorizonPx): ExcessFillSides | null {
  const reg = regionalPx.map((p) => imageToSection(frame, p));
  const rc = clipPolylineToPins(reg.map((q) => q[0]), reg.map((q) => q[1]), pins[0], pins[1]).clipped;
  if (!rc) return null;
  let zMin = horizon.zMin;
  let zMax = horizon.zMax;
  for (const z of rc.zs) {
    zMin = Math.min(zMin, z);
    zMax = Math.max(zMax, z);
  }
  const margin = (zMax - zMin) + (pins[1] - pins[0]);
  const loopTail: number[] = [];
  flatPx(frame, rc.xs, rc.zs, true, loopTail);
  const above: number[] = [];
  flatPx(frame, rc.xs, rc.zs, false, above);
  flatPx(frame, [pins[1], pins[0]], [zMax + margin, zMax + margin], false, above);
  const below: number[] = [];
  flatPx(frame, rc.xs, rc.zs, false, below);
  flatPx(frame, [pins[1], pins[0]], [zMin - margin, zMin - margin], false, below);
  return { loopTail, above, below };
}

/** Returns the fill polygons for one horizon, or null when the horizon or regional does not cross both pins once. */
export function excessFillGeometry(linePx: ImagePx[], regionalPx: ImagePx[], pins: [number, number], frame: FittedCalibration,
  horizon: ClippedHorizonPx | null = clippedHorizonPx(linePx, pins, frame)): ExcessFillGeometry | null {
  const sides = horizon ? excessFillSides(regionalPx, pins, frame, horizon) : null;
  if (!horizon || !sides) return null;
  const loop = horizon.loopHead.slice();
  for (const c of sides.loopTail) loop.push(c);
  return { loop, above: sides.above, below: sides.below };
}

// Polygons for the translucent excess-area fills, in image pixels: the outline of
// src/core/geometry/excessFillOutline.ts (the one construction, shared with the exported figure) mapped
// through the calibration. The loop is the horizon's part (clippedHorizonPx, kept while only the regional
// moves) followed by the regional's part (excessFillSides), so a regional drag rebuilds only the regional's side.
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { imageToSection, sectionToImage } from '../core/calibration/mapPoints';
import { fillHorizonPart, fillHorizonPartOf, fillRegionalPart, type FillHorizonPart } from '../core/geometry/excessFillOutline';
import { lineToSection } from '../core/calibration/lineToSection';
import type { XZ } from '../core/model/section';
import type { ImagePx } from '../core/model/projectDoc';

export interface ExcessFillGeometry {
  /** Flat [u0, v0, u1, v1, …] of the closed loop horizon (left pin → right pin) then regional back. */
  loop: number[];
  above: number[];
  below: number[];
}

/** Appends the image pixels of (xs[i], zs[i]) to `out`: sectionToImage's arithmetic, written out so a line of 100,000 vertices makes no pair arrays. */
function flatPx(frame: FittedCalibration, xs: ArrayLike<number>, zs: ArrayLike<number>, out: number[]): void {
  const { a, b } = frame;
  const det = a[1] * b[2] - a[2] * b[1];
  const start = out.length;
  out.length = start + 2 * xs.length;
  for (let i = 0; i < xs.length; i++) {
    const dx = xs[i] - a[0];
    const dz = zs[i] - b[0];
    out[start + 2 * i] = (b[2] * dx - a[2] * dz) / det;
    out[start + 2 * i + 1] = (a[1] * dz - b[1] * dx) / det;
  }
}

function flatPoints(frame: FittedCalibration, points: readonly XZ[]): number[] {
  const out: number[] = [];
  for (const q of points) {
    const p = sectionToImage(frame, q);
    out.push(p[0], p[1]);
  }
  return out;
}

/** The horizon's part of the fill: its line clipped to the pins (image pixels, left to right) and its part in section units. */
export interface ClippedHorizonPx { loopHead: number[]; part: FillHorizonPart }

/**
 * Returns the horizon clipped to the pins for the fill (reused while only its regional moves), or null when it does
 * not cross both pins once. `clipped`: the same line already clipped to the same pins by the analysis (its
 * preparation), which is then not clipped again.
 */
export function clippedHorizonPx(linePx: ImagePx[], pins: [number, number], frame: FittedCalibration,
  clipped?: { xs: ArrayLike<number>; zs: ArrayLike<number> } | null): ClippedHorizonPx | null {
  let part: FillHorizonPart | null;
  if (clipped) part = fillHorizonPartOf(clipped);
  else {
    // The line in section units as the analysis converts it (kept per line): no pair array a vertex.
    const { xs, zs } = lineToSection(frame, linePx);
    part = fillHorizonPart(xs, zs, pins);
  }
  if (!part) return null;
  const loopHead: number[] = [];
  flatPx(frame, part.xs, part.zs, loopHead);
  return { loopHead, part };
}

/** The regional's part of the fill: the loop's tail (the regional, right pin → left pin) and the two clip regions. */
export interface ExcessFillSides { loopTail: number[]; above: number[]; below: number[] }

/** Returns the regional's side of the fill for the clipped horizon, or null when the regional does not cross both pins once. */
export function excessFillSides(regionalPx: ImagePx[], pins: [number, number], frame: FittedCalibration, horizon: ClippedHorizonPx): ExcessFillSides | null {
  const reg = regionalPx.map((p) => imageToSection(frame, p));
  const side = fillRegionalPart(reg.map((q) => q[0]), reg.map((q) => q[1]), pins, horizon.part);
  if (!side) return null;
  return { loopTail: flatPoints(frame, side.tail), above: flatPoints(frame, side.above), below: flatPoints(frame, side.below) };
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

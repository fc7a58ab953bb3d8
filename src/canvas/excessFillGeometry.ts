// Polygons for the translucent excess-area fills, in image pixels: the outline of
// src/core/geometry/excessFillOutline.ts (the one construction, shared with the exported figure) mapped
// through the calibration. The loop is the horizon's part (clippedHorizonPx, kept while only the regional
// moves) followed by the regional's part (excessFillSides), so a regional drag rebuilds only the regional's side.
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { imageToSection, sectionToImage } from '../core/calibration/mapPoints';
import { fillHorizonPart, fillRegionalPart, type FillHorizonPart } from '../core/geometry/excessFillOutline';
import type { XZ } from '../core/model/section';
import type { ImagePx } from '../core/model/projectDoc';

export interface ExcessFillGeometry {
  /** Flat [u0, v0, u1, v1, …] of the closed loop horizon (left pin → right pin) then regional back. */
  loop: number[];
  above: number[];
  below: number[];
}

function flatPx(frame: FittedCalibration, xs: ArrayLike<number>, zs: ArrayLike<number>, out: number[]): void {
  for (let i = 0; i < xs.length; i++) {
    const p = sectionToImage(frame, [xs[i], zs[i]]);
    out.push(p[0], p[1]);
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

/** Returns the horizon clipped to the pins for the fill (reused while only its regional moves), or null when it does not cross both pins once. */
export function clippedHorizonPx(linePx: ImagePx[], pins: [number, number], frame: FittedCalibration): ClippedHorizonPx | null {
  const xs = new Float64Array(linePx.length);
  const zs = new Float64Array(linePx.length);
  linePx.forEach((p, i) => {
    const q = imageToSection(frame, p);
    xs[i] = q[0];
    zs[i] = q[1];
  });
  const part = fillHorizonPart(xs, zs, pins);
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

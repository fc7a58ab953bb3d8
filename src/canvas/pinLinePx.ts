// A pin is the vertical section line x = const; on a rotated or skewed scan it is not a pixel column,
// so it is drawn by mapping (x, z) for the lowest and highest z the scan shows back to pixels.
import type { FittedCalibration } from '../core/calibration/fitCalibration';
import { imageToSection, sectionToImage } from '../core/calibration/mapPoints';
import type { ScanRef } from '../core/model/projectDoc';
import { minOf, maxOf } from '../core/stats/minMax';

/** Returns the flat [u0, v0, u1, v1] of the section line x across the scan (or ±5000 px about v = 0 without a scan). */
export function pinLinePx(frame: FittedCalibration, x: number, scan: ScanRef | null): number[] {
  const w = scan?.widthPx ?? 10000;
  const h = scan?.heightPx ?? 10000;
  const corners: [number, number][] = scan ? [[0, 0], [w, 0], [0, h], [w, h]] : [[0, -5000], [0, 5000]];
  const zs = corners.map((c) => imageToSection(frame, c)[1]);
  const a = sectionToImage(frame, [x, maxOf(zs)]);
  const b = sectionToImage(frame, [x, minOf(zs)]);
  return [a[0], a[1], b[0], b[1]];
}

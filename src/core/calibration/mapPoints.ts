import type { ImagePx, XZ } from '../model/projectDoc';
import type { FittedCalibration } from './fitCalibration';

/** Returns the section coordinate [x, z] of an image pixel position. */
export function imageToSection(fit: FittedCalibration, p: ImagePx): XZ {
  return [fit.a[0] + fit.a[1] * p[0] + fit.a[2] * p[1], fit.b[0] + fit.b[1] * p[0] + fit.b[2] * p[1]];
}

/** Returns the image pixel position of a section coordinate (the affine's exact inverse). */
export function sectionToImage(fit: FittedCalibration, q: XZ): ImagePx {
  const { a, b } = fit;
  const det = a[1] * b[2] - a[2] * b[1];
  const dx = q[0] - a[0];
  const dz = q[1] - b[0];
  return [(b[2] * dx - a[2] * dz) / det, (a[1] * dz - b[1] * dx) / det];
}

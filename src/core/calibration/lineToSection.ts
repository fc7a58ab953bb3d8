// A whole digitised line in section units, remembered per line: a big document's lines are a million vertices, and
// converting them again for every analysis (after each edit, each release of a drag) cost a tenth of a second and as
// much again in garbage collection. The document is never changed in place (every edit makes new arrays), so a line
// array and the calibration's coefficients decide the result; the result is shared and must not be changed either.
import type { ImagePx, XZ } from '../model/projectDoc';
import type { FittedCalibration } from './fitCalibration';
import { imageToSection } from './mapPoints';

const lines = new WeakMap<readonly ImagePx[], { a: readonly number[]; b: readonly number[]; xz: XZ[] }>();

/** Returns the line's vertices in section units (imageToSection of each; the same array again for the same line and calibration). */
export function lineToSection(fit: FittedCalibration, pointsPx: readonly ImagePx[]): XZ[] {
  const hit = lines.get(pointsPx);
  if (hit && sameCoefficients(hit.a, fit.a) && sameCoefficients(hit.b, fit.b)) return hit.xz;
  const xz = pointsPx.map((p) => imageToSection(fit, p));
  lines.set(pointsPx, { a: fit.a.slice(), b: fit.b.slice(), xz });
  return xz;
}

function sameCoefficients(u: readonly number[], v: readonly number[]): boolean {
  if (u.length !== v.length) return false;
  for (let i = 0; i < u.length; i++) if (!Object.is(u[i], v[i])) return false;
  return true;
}

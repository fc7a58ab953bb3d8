// A whole digitised line in section units, remembered per line: a big document's lines are a million vertices, and
// converting them again for every analysis (after each edit, each release of a drag) cost a tenth of a second and as
// much again in garbage collection. The line comes back as two coordinate arrays, not a pair array a vertex: a
// million small arrays made at once filled the young generation and cost collections of 100–500 ms. The document is
// never changed in place (every edit makes new arrays), so a line array and the calibration's coefficients decide
// the result; the result is shared and must not be changed either.
import type { ImagePx } from '../model/projectDoc';
import type { FlatLine } from '../model/section';
import type { FittedCalibration } from './fitCalibration';

const lines = new WeakMap<readonly ImagePx[], { a: readonly number[]; b: readonly number[]; line: FlatLine }>();

/** Returns the line's vertices in section units as coordinate arrays (imageToSection of each, to the last bit; the same arrays again for the same line and calibration). */
export function lineToSection(fit: FittedCalibration, pointsPx: readonly ImagePx[]): FlatLine {
  const hit = lines.get(pointsPx);
  if (hit && sameCoefficients(hit.a, fit.a) && sameCoefficients(hit.b, fit.b)) return hit.line;
  const line = convert(fit, pointsPx);
  lines.set(pointsPx, { a: fit.a.slice(), b: fit.b.slice(), line });
  return line;
}

/** imageToSection's arithmetic, in its order of operations, written out over the line. */
function convert(fit: FittedCalibration, pointsPx: readonly ImagePx[]): FlatLine {
  const [a0, a1, a2] = fit.a;
  const [b0, b1, b2] = fit.b;
  const n = pointsPx.length;
  const xs = new Float64Array(n);
  const zs = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const p = pointsPx[i];
    const u = p[0];
    const v = p[1];
    xs[i] = a0 + a1 * u + a2 * v;
    zs[i] = b0 + b1 * u + b2 * v;
  }
  return { xs, zs };
}

function sameCoefficients(u: readonly number[], v: readonly number[]): boolean {
  if (u.length !== v.length) return false;
  for (let i = 0; i < u.length; i++) if (!Object.is(u[i], v[i])) return false;
  return true;
}

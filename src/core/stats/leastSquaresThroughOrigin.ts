// Least squares for a line through the origin, y = b·x (Draper & Smith 1998, §3.3); r² is the
// uncentred one, 1 − SSE / Σy², as NIST StRD certifies it for no-intercept models (NoInt1).

import { neumaierSum } from './neumaierSum';

export interface OriginFit {
  n: number;
  /** Degrees of freedom n − 1. */
  df: number;
  slope: number;
  slopeSE: number;
  /** Residual standard error √(SSE / df); 0 when df = 0. */
  s: number;
  /** Uncentred r² = 1 − SSE / Σy²; NaN when all y are 0. */
  r2: number;
  /** y − slope·x, in input order. */
  residuals: number[];
}

/**
 * Least-squares line through the origin for (x, y); null when n < 1, a value is not finite or all x are 0;
 * at n = 1, s = 0 and slopeSE is NaN. Throws RangeError if lengths differ.
 */
export function leastSquaresThroughOrigin(x: ArrayLike<number>, y: ArrayLike<number>): OriginFit | null {
  const n = x.length;
  if (y.length !== n) throw new RangeError(`leastSquaresThroughOrigin: x has ${n} values, y has ${y.length}`);
  if (n < 1) return null;
  const xx = new Float64Array(n);
  const xy = new Float64Array(n);
  const yy = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(x[i]) || !Number.isFinite(y[i])) return null;
    xx[i] = x[i] * x[i];
    xy[i] = x[i] * y[i];
    yy[i] = y[i] * y[i];
  }
  const sumXX = neumaierSum(xx);
  if (sumXX === 0) return null;
  const sumYY = neumaierSum(yy);
  const slope = neumaierSum(xy) / sumXX;
  const residuals: number[] = new Array(n);
  for (let i = 0; i < n; i++) {
    residuals[i] = y[i] - slope * x[i];
    yy[i] = residuals[i] * residuals[i];
  }
  const sse = neumaierSum(yy);
  const df = n - 1;
  const s = df > 0 ? Math.sqrt(sse / df) : 0;
  const slopeSE = df > 0 ? s / Math.sqrt(sumXX) : NaN;
  const r2 = sumYY > 0 ? 1 - sse / sumYY : NaN;
  return { n, df, slope, slopeSE, s, r2, residuals };
}

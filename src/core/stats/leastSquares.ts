// Ordinary least squares for a straight line y = a + b·x, from centred sums (the two-pass form,
// accurate to ~1e-12 relative on NIST StRD "Norris"); standard errors as in Draper & Smith,
// Applied Regression Analysis (3rd ed., 1998), §1.4 and §3.1.

import { neumaierSum } from './neumaierSum';

export { leastSquaresThroughOrigin, type OriginFit } from './leastSquaresThroughOrigin';

export interface LineFit {
  n: number;
  /** Degrees of freedom n − 2. */
  df: number;
  slope: number;
  intercept: number;
  slopeSE: number;
  interceptSE: number;
  /** Residual standard error √(SSE / df); 0 when df = 0. */
  s: number;
  /** Coefficient of determination 1 − SSE / Syy; NaN when all y are equal. */
  r2: number;
  /** y − (intercept + slope·x), in input order; a view into the work buffers when they were given (valid until their next use). */
  residuals: readonly number[] | Float64Array;
  xMean: number;
  yMean: number;
  /** Σ (x − x̄)². */
  sxx: number;
}

/**
 * Buffers for leastSquares, owned by the caller (one per sweep, Monte Carlo run or worker), so a hot loop
 * allocates nothing per fit and two computations never share memory. Grown in place when a fit needs more.
 */
export interface LeastSquaresWork { deviations: Float64Array; xx: Float64Array; xy: Float64Array; yy: Float64Array; residuals: Float64Array }

/** Returns work buffers for fits of up to n points. */
export function createLeastSquaresWork(n: number): LeastSquaresWork {
  const m = Math.max(2, n);
  return { deviations: new Float64Array(m), xx: new Float64Array(m), xy: new Float64Array(m), yy: new Float64Array(m), residuals: new Float64Array(m) };
}

function ensure(work: LeastSquaresWork, n: number): void {
  if (work.xx.length >= n) return;
  Object.assign(work, createLeastSquaresWork(2 * n));
}

/** Mean with one correction pass, so that large offsets do not cost digits. */
function accurateMean(values: ArrayLike<number>, deviations: Float64Array): number {
  const n = values.length;
  const first = neumaierSum(values) / n;
  for (let i = 0; i < n; i++) deviations[i] = values[i] - first;
  return first + neumaierSum(deviations.subarray(0, n)) / n;
}

/**
 * Least-squares line through (x, y), in the inputs' units; null when n < 2, a value is not finite or all
 * x are equal; at n = 2, s = 0 and the standard errors are NaN. Throws RangeError if lengths differ.
 * With `work` nothing is allocated but the result, and its residuals are a view into work.residuals.
 */
export function leastSquares(x: ArrayLike<number>, y: ArrayLike<number>, work?: LeastSquaresWork): LineFit | null {
  const n = x.length;
  if (y.length !== n) throw new RangeError(`leastSquares: x has ${n} values, y has ${y.length}`);
  if (n < 2) return null;
  let allXEqual = true;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(x[i]) || !Number.isFinite(y[i])) return null;
    if (x[i] !== x[0]) allXEqual = false;
  }
  if (allXEqual) return null;
  const w = work ?? createLeastSquaresWork(n);
  ensure(w, n);
  const xMean = accurateMean(x, w.deviations);
  const yMean = accurateMean(y, w.deviations);
  const xx = w.xx.subarray(0, n);
  const xy = w.xy.subarray(0, n);
  const yy = w.yy.subarray(0, n);
  for (let i = 0; i < n; i++) {
    const dx = x[i] - xMean;
    const dy = y[i] - yMean;
    xx[i] = dx * dx;
    xy[i] = dx * dy;
    yy[i] = dy * dy;
  }
  const sxx = neumaierSum(xx);
  const syy = neumaierSum(yy);
  const slope = neumaierSum(xy) / sxx;
  const intercept = yMean - slope * xMean;
  const residuals = work ? w.residuals.subarray(0, n) : new Array<number>(n);
  for (let i = 0; i < n; i++) {
    residuals[i] = y[i] - yMean - slope * (x[i] - xMean); // centred form: no cancellation against the intercept
    yy[i] = residuals[i] * residuals[i];
  }
  const sse = neumaierSum(yy);
  const df = n - 2;
  const s = df > 0 ? Math.sqrt(sse / df) : 0;
  const slopeSE = df > 0 ? s / Math.sqrt(sxx) : NaN;
  const interceptSE = df > 0 ? s * Math.sqrt(1 / n + (xMean * xMean) / sxx) : NaN;
  const r2 = syy > 0 ? 1 - sse / syy : NaN;
  return { n, df, slope, intercept, slopeSE, interceptSE, s, r2, residuals, xMean, yMean, sxx };
}

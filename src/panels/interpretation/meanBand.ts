import { studentTQuantile } from '../../core/stats/studentTQuantile';

// The confidence band for the mean of a straight-line fit: ŷ(x) ± t(1 − α/2, n − 2) · s ·
// √(1/n + (x − x̄)²/Sxx) (Draper & Smith 1998, §1.4; the same quantity as in Fieller's
// inequality, docs/method.md §Fieller interval), so the band meets A = 0 exactly at the ends of the Fieller interval.

export interface LineSummary { n: number; df: number; slope: number; intercept: number; s: number; xMean: number; sxx: number }

export interface BandPoint { x: number; fit: number; lo: number; hi: number }

/** Band of the mean response at each x (y units); null when the fit has no degrees of freedom. */
export function meanBand(fit: LineSummary, xs: readonly number[], level = 0.95): BandPoint[] | null {
  if (!(fit.df >= 1) || !(fit.sxx > 0)) return null;
  const t = studentTQuantile(0.5 + level / 2, fit.df);
  return xs.map((x) => {
    const y = fit.intercept + fit.slope * x;
    const half = t * fit.s * Math.sqrt(1 / fit.n + ((x - fit.xMean) * (x - fit.xMean)) / fit.sxx);
    return { x, fit: y, lo: y - half, hi: y + half };
  });
}

/** n evenly spaced values from a to b inclusive (n ≥ 2). */
export function linspace(a: number, b: number, n: number): number[] {
  const m = Math.max(2, Math.floor(n));
  return Array.from({ length: m }, (_, i) => a + ((b - a) * i) / (m - 1));
}

// Fieller's interval for the x at which the mean response equals y0 (inverse prediction,
// calibration): all x with (a + b·x − y0)² ≤ t² s² (1/n + (x − x̄)²/Sxx). With g = t² s² / (b² Sxx)
// the set is a bounded interval only when g < 1 (Fieller 1954, JRSS B 16:175–185; Draper & Smith
// 1998, §3.2; docs/method.md §Fieller interval). Otherwise it is a pair of rays or the whole line: reported, never a number.

import type { LineFit } from './leastSquares';
import { studentTQuantile } from './studentTQuantile';

export type FiellerResult =
  | { kind: 'bounded'; estimate: number; lo: number; hi: number }
  /** g = t² s² / (b² Sxx) ≥ 1: the slope is not distinguishable from zero at this level. */
  | { kind: 'unbounded'; estimate: number; g: number; reason: string }
  | { kind: 'none'; estimate: number | null; reason: string };

/** Interval on x where the fitted mean equals y0, in x units, at the given level; 'none' when df < 1 or the slope is 0, 'unbounded' when g ≥ 1. */
export function fiellerInterval(fit: LineFit, y0: number, level = 0.95): FiellerResult {
  const { slope: b, xMean, yMean, sxx, s, n, df } = fit;
  if (!(b !== 0 && Number.isFinite(b))) {
    return { kind: 'none', estimate: null, reason: 'The fitted slope is zero, so no x reaches this value.' };
  }
  if (!Number.isFinite(y0)) {
    return { kind: 'none', estimate: null, reason: `The target value must be a finite number (got ${y0}).` };
  }
  const estimate = xMean + (y0 - yMean) / b; // centred form of (y0 − a)/b
  if (!(df >= 1)) {
    return { kind: 'none', estimate, reason: 'Two points leave no degrees of freedom: no interval can be given.' };
  }
  if (!(level > 0 && level < 1)) {
    return { kind: 'none', estimate, reason: `The confidence level must lie between 0 and 1 (got ${level}).` };
  }
  const t = studentTQuantile(0.5 + level / 2, df);
  const g = (t * t * s * s) / (b * b * sxx);
  if (!(g < 1)) {
    return {
      kind: 'unbounded',
      estimate,
      g,
      // g itself is data: src/format writes it where it is shown.
      reason: 'The slope is not distinguishable from zero at this level (g ≥ 1), so the interval is unbounded.',
    };
  }
  const offset = estimate - xMean;
  const halfWidth = ((t * s) / Math.abs(b)) * Math.sqrt((offset * offset) / sxx + (1 - g) / n);
  return {
    kind: 'bounded',
    estimate,
    lo: xMean + (offset - halfWidth) / (1 - g),
    hi: xMean + (offset + halfWidth) / (1 - g),
  };
}

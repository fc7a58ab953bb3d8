// Two-sided confidence interval on a fitted slope: b ± t(½ + level/2, n − 2)·SE(b)
// (Draper & Smith 1998, §1.4; docs/method.md §Slope interval).

import type { LineFit } from './leastSquares';
import { studentTQuantile } from './studentTQuantile';

/** [low, high] slope bounds at the given confidence level, in the slope's units; null when df < 1 or level is not in (0, 1). */
export function slopeInterval(fit: LineFit, level = 0.95): [number, number] | null {
  if (!(fit.df >= 1) || !(level > 0 && level < 1)) return null;
  const halfWidth = studentTQuantile(0.5 + level / 2, fit.df) * fit.slopeSE;
  if (!Number.isFinite(halfWidth)) return null;
  return [fit.slope - halfWidth, fit.slope + halfWidth];
}

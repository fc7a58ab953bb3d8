// ln B(a, b) without the cancellation of lgamma(a) + lgamma(b) − lgamma(a + b) for large arguments:
// the Stirling leading terms are combined analytically and only the small remainders are
// subtracted (the same grouping as Abramowitz & Stegun 6.1.41 applied to each gamma).

import { logGamma, stirlingCorrection } from './logGamma';

const HALF_LOG_TWO_PI = 0.5 * Math.log(2 * Math.PI);

/** ln B(a, b) = ln Γ(a) + ln Γ(b) − ln Γ(a + b) for a, b > 0; NaN for non-positive or NaN input. */
export function logBeta(a: number, b: number): number {
  if (!(a > 0) || !(b > 0)) return NaN;
  const p = Math.min(a, b);
  const q = Math.max(a, b);
  if (q === Infinity) return -Infinity;
  const pq = p + q;
  if (p >= 10) {
    const corr = stirlingCorrection(p) + stirlingCorrection(q) - stirlingCorrection(pq);
    return HALF_LOG_TWO_PI - 0.5 * Math.log(q) + corr + (p - 0.5) * Math.log(p / pq) + q * Math.log1p(-p / pq);
  }
  if (q >= 10) {
    const corr = stirlingCorrection(q) - stirlingCorrection(pq);
    return logGamma(p) + corr + p - p * Math.log(pq) + (q - 0.5) * Math.log1p(-p / pq);
  }
  return logGamma(p) + logGamma(q) - logGamma(pq);
}

// Student t tail areas from the incomplete beta (Abramowitz & Stegun 26.7.1 and 26.5.27):
// with u = t²/ν, P(T > t) = ½ I_{1/(1+u)}(ν/2, ½) and P(|T| < t) = I_{u/(1+u)}(½, ν/2).
// Both are returned so that either can be used where it is the small, accurate one.

import { logBeta } from './logBeta';
import { regularizedBetaPair } from './regularizedBeta';

export interface StudentTTails {
  /** P(T > t). */
  upper: number;
  /** P(|T| < t). */
  central: number;
  /** ln of the density at t. */
  logDensity: number;
}

/** Upper and central areas and log density of Student's t at t ≥ 0 with df > 0 (finite); NaN fields for bad input. */
export function studentTTails(t: number, df: number): StudentTTails {
  if (!(t >= 0) || !(df > 0) || !Number.isFinite(df)) return { upper: NaN, central: NaN, logDensity: NaN };
  if (t === Infinity) return { upper: 0, central: 1, logDensity: -Infinity };
  const r = t / Math.sqrt(df);
  // ln(1 + r²) without overflow of r² for huge t (heavy tails at small df reach t ~ 1e200).
  const log1pR2 = r > 1e150 ? 2 * Math.log(r) : Math.log1p(r * r);
  const logX = -log1pR2; // x = 1 / (1 + r²)
  const logY = r > 1e150 ? -Math.log1p(1 / (r * r)) : 2 * Math.log(r) - log1pR2; // y = r² / (1 + r²)
  const x = Math.exp(logX);
  const y = r > 1e150 ? 1 : Math.exp(logY);
  const [ix, iy] = regularizedBetaPair(x, df / 2, 0.5, y, logX, logY);
  const logDensity = -logBeta(df / 2, 0.5) - 0.5 * Math.log(df) - ((df + 1) / 2) * log1pR2;
  return { upper: 0.5 * ix, central: iy, logDensity };
}

// Student t cumulative distribution via the regularized incomplete beta (Abramowitz & Stegun 26.7.1).

import { LARGE_DF, largeDfShift } from './studentTLargeDf';
import { studentTTails } from './studentTTails';

/** P(T ≤ t) for Student's t with df > 0 degrees of freedom (finite, not necessarily integer); NaN for bad input. */
export function studentTCdf(t: number, df: number): number {
  if (Number.isNaN(t) || !(df > 0) || !Number.isFinite(df)) return NaN;
  if (t === 0) return 0.5;
  if (df > LARGE_DF && Number.isFinite(t)) return studentTCdf(t - largeDfShift(t, df), LARGE_DF);
  const upper = studentTTails(Math.abs(t), df).upper;
  return t > 0 ? 1 - upper : upper;
}

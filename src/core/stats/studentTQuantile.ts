// Student t quantile: a rough start (normal + Cornish–Fisher terms, A&S 26.2.23 and 26.7.5, or the
// power-law tail for small df), then Newton's method on ln(area) against ln t inside a bracket that
// falls back to bisection. Both ln(area) curves are near-straight in ln t in the heavy tail and near
// t = 0, so the iteration is fast everywhere, and the bracket makes it safe. The area solved for
// is the small one: the upper tail when p is far from ½, the central area 2|p − ½| near ½, so
// neither is formed as 1 − (something close to 1).

import { logBeta } from './logBeta';
import { cornishFisherQuantile, LARGE_DF, largeDfShift } from './studentTLargeDf';
import { studentTTails } from './studentTTails';

function startingGuess(upperArea: number, central: number, df: number, useTail: boolean): number {
  const logB = logBeta(df / 2, 0.5);
  if (!useTail) return central * 0.5 * Math.exp(logB + 0.5 * Math.log(df)); // area ≈ 2 f(0) t near 0
  if (df < 3) return Math.exp(((df / 2 - 1) * Math.log(df) - logB - Math.log(upperArea)) / df); // P(T > t) ~ C t^−df
  // Normal upper quantile, A&S 26.2.23 (|error| < 4.5e-4), then A&S 26.7.5 to order 1/df².
  const w = Math.sqrt(-2 * Math.log(upperArea));
  const z = w - (2.515517 + w * (0.802853 + w * 0.010328)) / (1 + w * (1.432788 + w * (0.189269 + w * 0.001308)));
  return cornishFisherQuantile(z, df);
}

/**
 * The t with P(T ≤ t) = p for Student's t with df > 0 (finite, real); ±Infinity at p = 0 or 1; NaN for
 * bad input. Relative error ~1e-14 for df ≤ 1e5, ~1e-12 beyond.
 */
export function studentTQuantile(p: number, df: number): number {
  if (!(p >= 0 && p <= 1) || !(df > 0) || !Number.isFinite(df)) return NaN;
  if (p === 0) return -Infinity;
  if (p === 1) return Infinity;
  if (p === 0.5) return 0;
  if (df > LARGE_DF) {
    // Fixed-point in t: the shift depends on t only through a normal-equivalent z, very weakly.
    const base = studentTQuantile(p, LARGE_DF);
    let t = base + largeDfShift(base, df);
    t = base + largeDfShift(t, df);
    return t;
  }
  const upperArea = p < 0.5 ? p : 1 - p; // 1 − p is exact for p ≥ ½ (Sterbenz lemma)
  const central = 2 * Math.abs(p - 0.5); // exact for p in [¼, 1]
  const useTail = upperArea < 0.25;
  const logTarget = Math.log(useTail ? upperArea : central);
  let t = startingGuess(upperArea, central, df, useTail);
  if (!(t > 0 && Number.isFinite(t))) t = 1;
  let lo = 0; // bracket on t: g(lo) < 0 < g(hi), g increasing in t
  let hi = Infinity;
  for (let i = 0; i < 400; i++) {
    const tails = studentTTails(t, df);
    // g = signed ln(area / target), increasing in t; dg/d(ln t) = t f(t) / area (times 2 for the central area).
    const logArea = Math.log(useTail ? tails.upper : tails.central);
    const g = useTail ? logTarget - logArea : logArea - logTarget;
    if (g === 0) break;
    if (g < 0) lo = t;
    else hi = t;
    const slope = Math.exp(Math.log(t) + tails.logDensity - logArea + (useTail ? 0 : Math.LN2));
    const step = -g / slope; // Newton step in ln t
    let next = t * Math.exp(step);
    if (!(next > lo && next < hi)) {
      if (lo > 0 && hi < Infinity) next = Math.exp(0.5 * (Math.log(lo) + Math.log(hi)));
      else next = g < 0 ? t * 16 : t / 16;
    } else if (Math.abs(step) < 1e-14) {
      t = next;
      break;
    }
    if (next === t) break;
    t = next;
  }
  return p < 0.5 ? -t : t;
}

// Regularized incomplete beta I_x(a, b) by its continued fraction, evaluated with the modified
// Lentz method (Abramowitz & Stegun 26.5.8; Press et al., Numerical Recipes, 3rd ed., §6.4).
// The fraction converges fast for x < (a + 1) / (a + b + 2); above that the symmetry
// I_x(a, b) = 1 − I_{1−x}(b, a) is used, and both halves are returned so callers never form 1 − I
// themselves when I is close to 1.

import { logBeta } from './logBeta';

const TINY = 1e-300;
const EPS = 1e-16;

function continuedFraction(x: number, a: number, b: number): number {
  const maxIterations = 200 + Math.ceil(20 * Math.sqrt(Math.max(a, b)));
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= maxIterations; m++) {
    const m2 = 2 * m;
    // Even step of the fraction.
    let aa = (m * (b - m) * x) / ((a - 1 + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    // Odd step.
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + 1 + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPS) break;
  }
  return h;
}

/**
 * [I_x(a, b), 1 − I_x(a, b)], each to near full relative precision, for a, b > 0 and x + y = 1;
 * y and the logarithms may be passed when the caller knows them more accurately than 1 − x.
 */
export function regularizedBetaPair(
  x: number,
  a: number,
  b: number,
  y: number = 1 - x,
  logX: number = x < 0.5 ? Math.log(x) : Math.log1p(-y),
  logY: number = y < 0.5 ? Math.log(y) : Math.log1p(-x),
): [number, number] {
  if (Number.isNaN(x) || Number.isNaN(y) || !(a > 0) || !(b > 0)) return [NaN, NaN];
  if (logX === -Infinity || x < 0) return [0, 1];
  if (logY === -Infinity || y < 0) return [1, 0];
  const front = Math.exp(a * logX + b * logY - logBeta(a, b));
  if (x < (a + 1) / (a + b + 2)) {
    const direct = (front * continuedFraction(x, a, b)) / a;
    return [direct, 1 - direct];
  }
  const mirrored = (front * continuedFraction(y, b, a)) / b;
  return [1 - mirrored, mirrored];
}

/** I_x(a, b), the regularized incomplete beta, for x in [0, 1] and a, b > 0; NaN for bad input. */
export function regularizedBeta(x: number, a: number, b: number): number {
  if (!(x >= 0 && x <= 1)) return NaN;
  return regularizedBetaPair(x, a, b)[0];
}

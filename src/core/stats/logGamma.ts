// Log-gamma by Stirling's series with an upward shift, so no fitted coefficients are needed
// (Abramowitz & Stegun 6.1.40; coefficients are B_2k / (2k (2k - 1)), Bernoulli numbers B_2k).

const HALF_LOG_TWO_PI = 0.5 * Math.log(2 * Math.PI);

/** Stirling-series remainder lgamma(x) − [(x − ½) ln x − x + ½ ln 2π] for x ≥ 10 (error < 1e-17 there). */
export function stirlingCorrection(x: number): number {
  const r = 1 / x;
  const r2 = r * r;
  // Horner form of 1/12 − 1/(360 x²) + 1/(1260 x⁴) − … − 3617/(122400 x¹⁴), times 1/x.
  return r * (1 / 12 + r2 * (-1 / 360 + r2 * (1 / 1260 + r2 * (-1 / 1680 + r2 * (1 / 1188
    + r2 * (-691 / 360360 + r2 * (1 / 156 + r2 * (-3617 / 122400))))))));
}

/** ln Γ(x) for x > 0 (absolute error a few 1e-15 for moderate x); NaN for x ≤ 0 or NaN; Infinity for x = Infinity. */
export function logGamma(x: number): number {
  if (!(x > 0)) return NaN;
  if (x === Infinity) return Infinity;
  // Shift up to x ≥ 10 with Γ(x) = Γ(x + k) / (x (x + 1) … (x + k − 1)).
  let shift = 1;
  let z = x;
  while (z < 10) {
    shift *= z;
    z += 1;
  }
  return (z - 0.5) * Math.log(z) - z + HALF_LOG_TWO_PI + stirlingCorrection(z) - Math.log(shift);
}

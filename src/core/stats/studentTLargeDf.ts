// Very large df: the incomplete-beta fraction runs with x = ν/(ν + t²) next to 1 and loses about
// 1e-16·ν relative, so beyond LARGE_DF both the cdf and the quantile are carried from LARGE_DF along
// the 1/ν series of the quantile at fixed probability, t(ν) = z + g₁(z)/ν + g₂(z)/ν² + …
// (Abramowitz & Stegun 26.7.5). Between LARGE_DF and ν the dropped g₃ terms are below g₃(z)·1e-18.

export const LARGE_DF = 1e6;

const g1 = (z: number): number => (z * (z * z + 1)) / 4;
const g2 = (z: number): number => (z * (3 + z * z * (16 + 5 * z * z))) / 96;

/** t(p, df) − t(p, LARGE_DF) for the probability p whose df-quantile is t (df ≥ LARGE_DF), in t units. */
export function largeDfShift(t: number, df: number): number {
  const z = t - g1(t) / df; // the normal-equivalent quantile to ~1e-12: plenty for a ~1e-6 shift
  return g1(z) * (1 / df - 1 / LARGE_DF) + g2(z) * (1 / (df * df) - 1 / (LARGE_DF * LARGE_DF));
}

/** Rough quantile from the normal one (for starting points), t ≈ z + g₁(z)/df + g₂(z)/df². */
export function cornishFisherQuantile(z: number, df: number): number {
  return z + g1(z) / df + g2(z) / (df * df);
}

// A small reproducible generator for Monte Carlo runs. Uniforms: a Weyl sequence (step 0x9e3779b9,
// the golden-ratio increment) passed through the 32-bit MurmurHash3 finaliser, as in the "SplitMix"
// family (Steele, Lea & Flood 2014, OOPSLA). Normals: Marsaglia's polar method (Marsaglia & Bray
// 1964, SIAM Review 6:260–264), which makes two normals per accepted pair; the second is kept.

export interface SeededRandom {
  /** Uniform in [0, 1), multiples of 2⁻³². */
  next(): number;
  /** Standard normal (mean 0, variance 1). */
  normal(): number;
}

/** A generator whose sequence depends only on the seed (reduced to a 32-bit unsigned integer; NaN acts as 0). */
export function seededRandom(seed: number): SeededRandom {
  let state = seed >>> 0;
  let spare = NaN;
  const next = (): number => {
    state = (state + 0x9e3779b9) >>> 0;
    let z = state;
    z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
    z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
    z ^= z >>> 16;
    return (z >>> 0) / 4294967296;
  };
  const normal = (): number => {
    if (!Number.isNaN(spare)) {
      const kept = spare;
      spare = NaN;
      return kept;
    }
    for (;;) {
      const u = 2 * next() - 1;
      const v = 2 * next() - 1;
      const s = u * u + v * v;
      if (s >= 1 || s === 0) continue;
      const factor = Math.sqrt((-2 * Math.log(s)) / s);
      spare = v * factor;
      return u * factor;
    }
  };
  return { next, normal };
}

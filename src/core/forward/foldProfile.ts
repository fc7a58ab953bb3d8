// Unit fold profiles: uplift b(s) over s in [0, 1], zero at both ends, 1 at the crest.
import type { FoldSpec } from './forwardSpec';

export interface FoldProfile {
  /** Fraction of the fold width, increasing from 0 to 1. */
  s: number[];
  /** Uplift as a fraction of the fold amplitude. */
  b: number[];
}

/** Returns the sampled unit profile of a fold shape (`segments` used for curved shapes; box is exact with 4 points). */
export function foldProfile(fold: FoldSpec, segments: number): FoldProfile {
  if (fold.shape === 'box') {
    // A trapezoid: straight limbs and a flat crest, exact with its four corners.
    const limb = fold.limb ?? 0.2;
    if (!(limb > 0 && limb < 0.5)) throw new Error(`box fold: limb must lie in (0, 0.5), got ${limb}`);
    return { s: [0, limb, 1 - limb, 1], b: [0, 1, 1, 0] };
  }
  if (fold.shape === 'rounded') {
    // The cosine bump sin²(πs) = (1 − cos 2πs)/2: smooth hinges and zero slope at both ends.
    const s: number[] = [];
    const b: number[] = [];
    for (let i = 0; i <= segments; i++) {
      const t = i / segments;
      s.push(t);
      b.push(Math.sin(Math.PI * t) ** 2);
    }
    return { s, b };
  }
  return asymmetricProfile(fold.crest ?? 0.6, segments);
}

/** Half-cosine limbs of different widths meeting at the crest p, which is sampled exactly. */
function asymmetricProfile(p: number, segments: number): FoldProfile {
  if (!(p > 0 && p < 1)) throw new Error(`fold crest must lie in (0, 1), got ${p}`);
  const nBack = Math.min(segments - 1, Math.max(1, Math.round(segments * p)));
  const nFore = Math.max(1, segments - nBack);
  const s: number[] = [];
  const b: number[] = [];
  for (let i = 0; i <= nBack; i++) {
    const t = (p * i) / nBack;
    s.push(t);
    b.push((1 - Math.cos((Math.PI * i) / nBack)) / 2);
  }
  for (let i = 1; i <= nFore; i++) {
    s.push(i === nFore ? 1 : p + ((1 - p) * i) / nFore);
    b.push((1 + Math.cos((Math.PI * i) / nFore)) / 2);
  }
  b[b.length - 1] = 0;
  return { s, b };
}

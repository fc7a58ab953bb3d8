// Scale and place one horizon's folds so that its excess area hits the target.
import type { FoldSpec } from './forwardSpec';
import type { FoldProfile } from './foldProfile';
import type { PlacedFold } from './horizonLine';

/** Returns the net area of the folds' unit profiles, Σ weight · ∫ b dx (units²), by trapezoids on the samples. */
export function unitFoldArea(folds: FoldSpec[], profiles: Map<FoldSpec, FoldProfile>): number {
  let area = 0;
  for (const f of folds) {
    const { s, b } = profiles.get(f)!;
    const w = f.to - f.from;
    let sum = 0;
    for (let j = 0; j + 1 < s.length; j++) sum += ((b[j] + b[j + 1]) / 2) * (w * s[j + 1] - w * s[j]);
    area += (f.weight ?? 1) * sum;
  }
  return area;
}

/** Returns the shear (x per unit uplift) that folds the steep limb back by `overturn` on a horizon with this amplitude scale. */
export function overturnShear(f: FoldSpec, profile: FoldProfile, scale: number): number {
  const weight = f.weight ?? 1;
  const w = f.to - f.from;
  // Steep side: the crest's far side for crest >= 0.5; a syncline (weight < 0) leans the other way.
  const lean = ((f.crest ?? 0.6) >= 0.5 ? 1 : -1) * Math.sign(weight);
  let steepest = 0;
  for (let j = 0; j + 1 < profile.s.length; j++) {
    const slope = (weight * (profile.b[j + 1] - profile.b[j])) / (profile.s[j + 1] - profile.s[j]);
    steepest = Math.max(steepest, -lean * slope);
  }
  // dx/ds of the sheared line is w + shear·scale·weight·db/ds; it turns negative when overturn > 1.
  return (lean * (f.overturn ?? 1.6) * w) / (scale * steepest);
}

/** Returns the horizon's folds with base positions shifted by shear · (regional − anchor) and uplift = scale · weight · b. */
export function placeFolds(folds: FoldSpec[], profiles: Map<FoldSpec, FoldProfile>, shears: Map<FoldSpec, number>,
  scale: number, rise: number): PlacedFold[] {
  const placed = folds.map((f) => {
    const { s, b } = profiles.get(f)!;
    const shear = shears.get(f) ?? 0;
    const w = f.to - f.from;
    const shift = shear * rise;
    const weight = f.weight ?? 1;
    return { xs: s.map((t) => f.from + shift + w * t), uplift: b.map((v) => scale * weight * v), shear };
  });
  return placed.sort((a, b) => a.xs[0] - b.xs[0]);
}

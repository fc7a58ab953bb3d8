// Assemble a horizon polyline from folds placed along its regional.
import type { XZ } from '../model/section';

/** A fold on one horizon: base positions (increasing x), uplift at each, and horizontal shift per unit uplift. */
export interface PlacedFold {
  xs: number[];
  uplift: number[];
  shear: number;
}

/**
 * Returns the horizon from extent[0] to extent[1]: on its regional `regionalAt(x)` outside the folds,
 * regional + uplift inside, with a vertex wherever the line passes a regional break (folds sorted, disjoint).
 */
export function horizonLine(folds: PlacedFold[], extent: [number, number], breaks: number[], regionalAt: (x: number) => number): XZ[] {
  // Points as [x, uplift]; a fold's x moves by shear · uplift (simple shear, which keeps area).
  const raw: [number, number][] = [[extent[0], 0]];
  for (const f of folds) {
    for (let j = 0; j < f.xs.length; j++) {
      const p: [number, number] = [f.xs[j] + f.shear * f.uplift[j], f.uplift[j]];
      const prev = raw[raw.length - 1];
      // Neighbouring folds that share an end point give it once.
      if (p[0] !== prev[0] || p[1] !== prev[1]) raw.push(p);
    }
  }
  raw.push([extent[1], 0]);
  const out: XZ[] = [[raw[0][0], regionalAt(raw[0][0])]];
  for (let i = 0; i + 1 < raw.length; i++) {
    const [xa, ua] = raw[i];
    const [xb, ub] = raw[i + 1];
    // Regional breaks crossed by this segment, in travel order: the regional is straight between breaks,
    // so the loop area is exactly the area under the uplift (the line integral of the regional cancels).
    const lo = Math.min(xa, xb);
    const hi = Math.max(xa, xb);
    const crossed = breaks.filter((x) => x > lo && x < hi);
    if (xb < xa) crossed.reverse();
    for (const x of crossed) {
      const u = ua + ((ub - ua) * (x - xa)) / (xb - xa);
      out.push([x, regionalAt(x) + u]);
    }
    out.push([xb, regionalAt(xb) + ub]);
  }
  return out;
}

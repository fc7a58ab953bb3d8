// The cost image of the live-wire search (Mortensen & Barrett 1995, "Intelligent scissors for image
// composition", SIGGRAPH): cheap where a line is drawn, dear on bare paper or inside a fill. Ink is cheap
// by its darkness, a boundary between coloured units by its colour edge; both terms add, so a path keeps
// to whichever the scan has. The path lies within a line's width; refineToCentre then finds its centre.
import type { PixelFeatures } from './pixelFeatures';

/** Weight of the edge term beside darkness (1): below 1 so the middle of an ink line stays cheaper than paper. */
export const EDGE_WEIGHT = 0.6;
/** Integer steps per unit of local cost (the search works on small integers). */
export const COST_STEPS = 20;
/** Largest integer cost of an orthogonal step: 1 + COST_STEPS · (1 + EDGE_WEIGHT). */
export const MAX_STEP_COST = 1 + Math.ceil(COST_STEPS * (1 + EDGE_WEIGHT));

/**
 * Returns the integer cost of stepping onto each pixel of the window (1 … MAX_STEP_COST, row-major):
 * 1 + round(COST_STEPS · ((1 − dark) + EDGE_WEIGHT · (1 − edge))). Never 0, so every step lengthens a path.
 */
export function traceCost(f: PixelFeatures): Uint8Array {
  const n = f.w * f.h;
  const cost = new Uint8Array(n);
  for (let k = 0; k < n; k++) {
    const c = 1 - f.dark[k] + EDGE_WEIGHT * (1 - f.edge[k]);
    cost[k] = 1 + Math.round(COST_STEPS * (c < 0 ? 0 : c));
  }
  return cost;
}

// The cost image of the live-wire search (Mortensen & Barrett 1995, "Intelligent scissors for image
// composition", SIGGRAPH): cheap where a line is drawn, dear on bare paper or inside a fill. Ink is cheap
// by its darkness, a boundary between coloured units by its colour edge. The path lies within a line's width;
// refineToCentre then finds its centre.
//
// Darkness counts in full from INK_FULL up: a heavier line (the land surface, a fault drawn bold) is then no
// cheaper per pixel than the thin horizon beside it, so a path cannot save by running along the heavier line
// and rejoining its own (Mortensen & Barrett's remedy is to train the cost on the edge being followed; a
// ceiling at the darkness every drawn line reaches does the same for ink of any weight). On ink the edge term
// fades with the darkness: the flanks of a wide line, where the colour changes fastest, are then no cheaper
// than its middle, and every ink pixel costs the same.
import type { PixelFeatures } from './pixelFeatures';

/** Weight of the edge term beside darkness (1): below 1 so the middle of an ink line stays cheaper than paper. */
export const EDGE_WEIGHT = 0.6;
/** Darkness (1 − luminance) from which a pixel counts as ink through and through: an anti-aliased line 1 px wide reaches it. */
export const INK_FULL = 0.6;
/** Darkness below which the cost is the plain sum of the two terms (paper, fills and their boundaries); it ramps to ink's between. */
export const INK_START = 0.4;
/** Integer steps per unit of local cost (the search works on small integers). */
export const COST_STEPS = 20;
/**
 * Integer cost of a step along ink, at least INK_FULL dark. Large enough that a diagonal step (× 181/128) costs
 * visibly more than a straight one on ink too (7 against 5), so a path keeps straight within a line's width.
 */
export const INK_STEP_COST = 5;
/** Largest integer cost of an orthogonal step: 1 + COST_STEPS · (1 + EDGE_WEIGHT). */
export const MAX_STEP_COST = 1 + Math.ceil(COST_STEPS * (1 + EDGE_WEIGHT));

/**
 * Returns the integer cost of stepping onto each pixel of the window (1 … MAX_STEP_COST, row-major):
 * 1 + round((1 − t) · COST_STEPS · ((1 − dark) + EDGE_WEIGHT · (1 − edge)) + t · (INK_STEP_COST − 1)), where t ramps
 * from 0 at INK_START darkness to 1 at INK_FULL: paper, fills and their boundaries cost the sum of the two terms, ink
 * at least INK_FULL dark costs INK_STEP_COST whatever its weight. Never 0, so every step lengthens a path.
 */
export function traceCost(f: PixelFeatures): Uint8Array {
  const n = f.w * f.h;
  const cost = new Uint8Array(n);
  const ramp = 1 / (INK_FULL - INK_START);
  for (let k = 0; k < n; k++) {
    const d = f.dark[k] < 0 ? 0 : f.dark[k] > 1 ? 1 : f.dark[k];
    // t: how far the pixel is into ink (0 up to INK_START, 1 from INK_FULL); the darkness term reaches 0 there and the edge term fades out.
    const t = d <= INK_START ? 0 : d >= INK_FULL ? 1 : (d - INK_START) * ramp;
    const c = (1 - d) + EDGE_WEIGHT * (1 - f.edge[k]);
    cost[k] = 1 + Math.round(COST_STEPS * c * (1 - t) + (INK_STEP_COST - 1) * t);
  }
  return cost;
}

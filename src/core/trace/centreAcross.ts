// Where the middle of a drawn line lies across it: the weighted centroid of a profile sampled along the
// normal (the usual sub-pixel line-centre estimate; for a symmetric profile it is the exact centre).
// An ink line is a ridge of darkness; a boundary between coloured units is a ridge of edge strength.
import type { PixelFeatures } from './pixelFeatures';
import { sampleBilinear } from './sampleBilinear';

/** Half-width of the profile, in image pixels: covers ink lines up to about twice this wide. */
export const PROFILE_HALF_PX = 4;
/** Darkness a ridge must rise above both ends of the profile to count as ink. */
export const INK_CONTRAST = 0.15;
/** Edge strength a ridge must rise above the lower end to count as a boundary. */
export const EDGE_CONTRAST = 0.15;
const STEP = 0.5;

/** The two profiles' buffers, held by the caller (a point is centred many times per preview; one pair serves a whole run). */
export interface ProfileScratch { dark: Float64Array; edge: Float64Array }

/** Returns profile buffers long enough for profiles of half-width `half` (image px). */
export function profileScratch(half = PROFILE_HALF_PX): ProfileScratch {
  const n = 2 * Math.round(half / STEP) + 1;
  return { dark: new Float64Array(n), edge: new Float64Array(n) };
}

/**
 * Returns the signed offset (image px, along the unit normal (nx, ny)) of the line centre from (x, y): the centroid of
 * the darkness above the profile's brighter end when the profile shows an ink ridge, else of the edge strength above
 * its minimum when it shows a boundary; NaN when it shows neither. The offset is at most PROFILE_HALF_PX either way.
 * `scratch` (profileScratch(half)) holds the profiles; without one, fresh buffers are made for this call.
 */
export function centreAcross(f: PixelFeatures, x: number, y: number, nx: number, ny: number, half = PROFILE_HALF_PX, scratch?: ProfileScratch): number {
  const m = Math.round(half / STEP);
  const n = 2 * m + 1;
  const { dark, edge } = scratch && scratch.dark.length >= n ? scratch : profileScratch(half);
  let peak = -Infinity;
  for (let s = -m; s <= m; s++) {
    const o = s * STEP;
    const d = sampleBilinear(f.dark, f, x + o * nx, y + o * ny);
    dark[s + m] = d;
    if (d > peak) peak = d;
  }
  const darkBase = Math.max(dark[0], dark[2 * m]);
  if (peak - darkBase >= INK_CONTRAST) return centroid(dark, darkBase, m);
  // No ink ridge: read the edge profile (only now, so a traced ink line costs one profile per point).
  let ePeak = -Infinity;
  let eMin = Infinity;
  for (let s = -m; s <= m; s++) {
    const o = s * STEP;
    const e = sampleBilinear(f.edge, f, x + o * nx, y + o * ny);
    edge[s + m] = e;
    if (e > ePeak) ePeak = e;
    if (e < eMin) eMin = e;
  }
  const edgeBase = Math.max(eMin, Math.min(edge[0], edge[2 * m]));
  if (ePeak - edgeBase >= EDGE_CONTRAST) return centroid(edge, edgeBase, m);
  return NaN;
}

function centroid(values: Float64Array, base: number, m: number): number {
  let sw = 0;
  let swo = 0;
  for (let s = -m; s <= m; s++) {
    const w = values[s + m] - base;
    if (w > 0) {
      sw += w;
      swo += w * s * STEP;
    }
  }
  return sw > 0 ? swo / sw : 0;
}

// Where the middle of a drawn line lies across it: the weighted centroid of a profile sampled along the
// normal (the usual sub-pixel line-centre estimate; for a symmetric profile it is the exact centre).
// An ink line is a ridge of darkness; a boundary between coloured units is a ridge of edge strength.
// Only the ridge the point lies on counts, bounded by the valleys either side of it: where another line
// runs within the profile's reach (the land surface beside a horizon that crops out), its ink is beyond a
// valley and does not pull the centre. The ridge's width is read too, so a caller can tell a line of its
// own weight from a wider blob where two inks have merged.
import type { PixelFeatures } from './pixelFeatures';
import { sampleBilinear } from './sampleBilinear';

/** Half-width of the profile, in image pixels: covers ink lines up to about twice this wide. */
export const PROFILE_HALF_PX = 4;
/** Darkness a ridge must rise above both ends of the profile to count as ink. */
export const INK_CONTRAST = 0.15;
/** Edge strength a ridge must rise above the lower end to count as a boundary. */
export const EDGE_CONTRAST = 0.15;
const STEP = 0.5;
/** What ridgeCentre returns for the shoulder of a wider blob: a ridge, but no line's centre. */
const SHOULDER = Infinity;

/** The two profiles' buffers, held by the caller (a point is centred many times per preview; one pair serves a whole run), and the width of the last ridge read. */
export interface ProfileScratch { dark: Float64Array; edge: Float64Array; widthPx: number }

/** Returns profile buffers long enough for profiles of half-width `half` (image px). */
export function profileScratch(half = PROFILE_HALF_PX): ProfileScratch {
  const n = 2 * Math.round(half / STEP) + 1;
  return { dark: new Float64Array(n), edge: new Float64Array(n), widthPx: NaN };
}

/**
 * Returns the signed offset (image px, along the unit normal (nx, ny)) of the line centre from (x, y): the centroid of
 * the darkness ridge nearest the point, above the higher of the valleys (or profile ends) that bound it, when that
 * ridge rises INK_CONTRAST above them; else the same over edge strength for a boundary; NaN when it shows neither, or
 * when the ridge comes down less than half-way on one side (a shoulder of merged inks, not a line).
 * The offset is at most `half` either way. `scratch` (profileScratch(half)) holds the profiles and receives the
 * ridge's width (its area over its height, image px; NaN with no ridge); without one, fresh buffers are made.
 */
export function centreAcross(f: PixelFeatures, x: number, y: number, nx: number, ny: number, half = PROFILE_HALF_PX, scratch?: ProfileScratch): number {
  const m = Math.round(half / STEP);
  const n = 2 * m + 1;
  const s = scratch && scratch.dark.length >= n ? scratch : profileScratch(half);
  sampleProfile(f.dark, f, x, y, nx, ny, m, s.dark);
  let o = ridgeCentre(s.dark, m, INK_CONTRAST, s);
  // Ink merged with other ink: no centre here, and the edges of the blob are no colour boundary either.
  if (o === SHOULDER) return NaN;
  if (!Number.isNaN(o)) return o;
  // No ink ridge: read the edge profile (only now, so a traced ink line costs one profile per point).
  sampleProfile(f.edge, f, x, y, nx, ny, m, s.edge);
  o = ridgeCentre(s.edge, m, EDGE_CONTRAST, s);
  return o === SHOULDER ? NaN : o;
}

function sampleProfile(values: Float32Array, f: PixelFeatures, x: number, y: number, nx: number, ny: number, m: number, out: Float64Array): void {
  for (let k = -m; k <= m; k++) out[k + m] = sampleBilinear(values, f, x + k * STEP * nx, y + k * STEP * ny);
}

/**
 * Index of the valley bounding the ridge at `top` on one side (`dir` ±1): the lowest sample before the profile climbs
 * again by more than `rise` and by half the depth of the valley below the top (a second line, not a speck or the
 * noise on one line's ink).
 */
function valley(p: Float64Array, top: number, dir: number, last: number, rise: number): number {
  let low = top;
  for (let i = top + dir; dir > 0 ? i <= last : i >= 0; i += dir) {
    if (p[i] < p[low]) low = i;
    else if (p[i] - p[low] > rise && p[i] - p[low] > 0.5 * (p[top] - p[low])) break;
  }
  return low;
}

/**
 * Returns the centroid offset (image px) of the ridge of profile `p` (2m + 1 samples) nearest its middle, above the
 * higher of its two bounding valleys, or NaN when the ridge rises less than `contrast` above them, or SHOULDER when it
 * rises that far above one valley but stays above half its height on the other side; writes its width.
 */
function ridgeCentre(p: Float64Array, m: number, contrast: number, out: ProfileScratch): number {
  const last = 2 * m;
  // Climb from the middle to the top of the ridge the point lies on (or beside).
  let top = m;
  for (;;) {
    const up = top < last && p[top + 1] > p[top] ? top + 1 : -1;
    const down = top > 0 && p[top - 1] > p[top] ? top - 1 : -1;
    const next = up >= 0 && (down < 0 || p[up] >= p[down]) ? up : down;
    if (next < 0) break;
    top = next;
  }
  const lo = valley(p, top, -1, last, contrast / 2);
  const hi = valley(p, top, 1, last, contrast / 2);
  const base = Math.max(p[lo], p[hi]);
  const floor = Math.min(p[lo], p[hi]);
  const height = p[top] - base;
  out.widthPx = NaN;
  // A ridge that comes down on one side only, to less than half its height, is the shoulder of a wider blob (two
  // inks merged where lines meet at a shallow angle): its centroid is neither line's centre.
  if (p[top] - floor >= contrast && base - floor > 0.5 * (p[top] - floor)) return SHOULDER;
  if (height < contrast) return NaN;
  let sw = 0;
  let swo = 0;
  for (let i = lo; i <= hi; i++) {
    const w = p[i] - base;
    if (w > 0) {
      sw += w;
      swo += w * (i - m) * STEP;
    }
  }
  out.widthPx = (sw * STEP) / height;
  return sw > 0 ? swo / sw : 0;
}

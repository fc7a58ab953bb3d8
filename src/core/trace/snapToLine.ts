// Moves a click onto the centre of the drawn line (or cross, or tick) it was meant for: mean shift
// (Fukunaga & Hostetler 1975; Comaniciu & Meer 2002) of the intensity-weighted centroid within a disc
// around the point. Across a line the centroid of a symmetric profile is its centre, along the line the
// disc stays balanced, and at a cross it settles where the arms meet. Without ink it uses colour edges,
// so a click on a boundary between coloured units lands on the boundary. Where ink lines meet, the click lands
// where their centres cross (junctionCentre).
import { EDGE_CONTRAST, INK_CONTRAST } from './centreAcross';
import { junctionCentre } from './junctionCentre';
import type { PixelFeatures } from './pixelFeatures';

const MAX_ITERATIONS = 30;
/** Movement (image px) below which the centroid has settled. */
const SETTLED_PX = 1e-3;
/** Radius (image px) of the circle on which the arms of a junction are read. */
const JUNCTION_RING_PX = 10;

/**
 * Returns the median and the largest of `values` over the disc. A measured hot path (a snap on each pointer move,
 * ~1,800 px at the largest radius): the disc's values go to a typed array, which sorts numerically without a comparator.
 */
function median(values: Float32Array, f: PixelFeatures, cx: number, cy: number, radius: number): { med: number; peak: number } {
  const i0 = Math.max(0, Math.floor(cx - radius - f.x0 - 0.5));
  const i1 = Math.min(f.w - 1, Math.ceil(cx + radius - f.x0 - 0.5));
  const j0 = Math.max(0, Math.floor(cy - radius - f.y0 - 0.5));
  const j1 = Math.min(f.h - 1, Math.ceil(cy + radius - f.y0 - 0.5));
  const list = new Float32Array(Math.max(0, (i1 - i0 + 1) * (j1 - j0 + 1)));
  const r2 = radius * radius;
  let n = 0;
  for (let j = j0; j <= j1; j++) {
    const dy = f.y0 + j + 0.5 - cy;
    for (let i = i0; i <= i1; i++) {
      const dx = f.x0 + i + 0.5 - cx;
      if (dx * dx + dy * dy <= r2) list[n++] = values[j * f.w + i];
    }
  }
  if (n === 0) return { med: 0, peak: 0 };
  const inDisc = list.subarray(0, n).sort();
  return { med: inDisc[n >> 1], peak: inDisc[n - 1] };
}

/**
 * Returns the line centre nearest (x, y) within `radiusPx` image pixels, at sub-pixel precision: the settled
 * mean shift of darkness above the disc's median (or, with no ink there, of edge strength above its median), with an
 * Epanechnikov weight 1 − (r / radius)². Returns null when the disc holds neither ink nor an edge, or the centroid
 * wanders farther than `radiusPx` from the click; the features must cover the disc around the click.
 */
export function snapToLine(f: PixelFeatures, x: number, y: number, radiusPx: number): [number, number] | null {
  if (!(radiusPx > 0)) return null;
  let values = f.dark;
  let stats = median(f.dark, f, x, y, radiusPx);
  if (stats.peak - stats.med < INK_CONTRAST) {
    values = f.edge;
    stats = median(f.edge, f, x, y, radiusPx);
    if (stats.peak - stats.med < EDGE_CONTRAST) return null;
  }
  const base = stats.med;
  let cx = x;
  let cy = y;
  const r2 = radiusPx * radiusPx;
  for (let it = 0; it < MAX_ITERATIONS; it++) {
    // The weighted centroid over the disc (a measured hot path: up to 30 passes over ~1,800 px on each pointer move;
    // the loop is written out rather than run through a callback per pixel).
    let sw = 0;
    let sx = 0;
    let sy = 0;
    const i0 = Math.max(0, Math.floor(cx - radiusPx - f.x0 - 0.5));
    const i1 = Math.min(f.w - 1, Math.ceil(cx + radiusPx - f.x0 - 0.5));
    const j0 = Math.max(0, Math.floor(cy - radiusPx - f.y0 - 0.5));
    const j1 = Math.min(f.h - 1, Math.ceil(cy + radiusPx - f.y0 - 0.5));
    for (let j = j0; j <= j1; j++) {
      const dy = f.y0 + j + 0.5 - cy;
      const row = j * f.w;
      for (let i = i0; i <= i1; i++) {
        const dx = f.x0 + i + 0.5 - cx;
        const d2 = dx * dx + dy * dy;
        if (d2 > r2) continue;
        const v = values[row + i] - base;
        if (v <= 0) continue;
        const w = v * (1 - d2 / r2);
        sw += w;
        sx += w * dx;
        sy += w * dy;
      }
    }
    if (!(sw > 0)) return null;
    const mx = sx / sw;
    const my = sy / sw;
    cx += mx;
    cy += my;
    if (Math.hypot(cx - x, cy - y) > radiusPx) return null;
    if (Math.hypot(mx, my) < SETTLED_PX) break;
  }
  // Where lines meet, the centroid sits inside the blob of their inks: the crossing of their centres is the point.
  if (values === f.dark) {
    const j = junctionCentre(f, cx, cy, Math.min(radiusPx, JUNCTION_RING_PX));
    if (j && Math.hypot(j[0] - x, j[1] - y) <= radiusPx) return j;
  }
  return [cx, cy];
}

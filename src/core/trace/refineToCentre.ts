// Moves each pixel of a traced path onto the centre of the line it follows, across the path's local
// direction, so the vertices sit at sub-pixel precision on the ink (or on a colour boundary) rather than on
// the pixel grid the search works on.
import { centreAcross, profileScratch, PROFILE_HALF_PX } from './centreAcross';
import type { PixelFeatures } from './pixelFeatures';
import { rasterCentre, type Raster } from './raster';

/** Pixels either side along the path that set its local direction. */
const DIRECTION_SPAN = 3;

/**
 * Centres already found, by path pixel and the pixel DIRECTION_SPAN ahead of it (the one behind is fixed by the
 * tree): paths to nearby pointer positions share all but their last pixels, so a preview re-centres only those.
 * The key is the pixel index times 64 plus the step to the pixel ahead (at most DIRECTION_SPAN each way, 49 codes),
 * a small integer for windows up to 16 MP, which a Map looks up faster than a large number (a window narrower than
 * the 7 codes across keeps the pixel index times the window's size plus the index ahead).
 */
export type CentreCache = Map<number, { point: [number, number]; widthPx: number } | null>;

/**
 * Returns the image points of a path of window pixel indices (`path`, over window `r`), each moved along the
 * normal of the path's local direction to the line centre found in `f` (centreAcross), and the fraction of them that
 * found a line there (the others keep their pixel centre). A path of one pixel comes back as that pixel's centre
 * (fraction 1); an empty path as no points (fraction 0). `found` flags, per point, whether it was centred on a line;
 * `widthPx` holds the width of the line read there (NaN where none was found).
 */
export function refineToCentre(path: readonly number[], r: Raster, f: PixelFeatures, cache?: CentreCache): { points: [number, number][]; onLine: number; found: Uint8Array; widthPx: Float32Array } {
  const pts = path.map((k) => rasterCentre(r, k));
  const n = pts.length;
  const on = new Uint8Array(n);
  const widthPx = new Float32Array(n).fill(NaN);
  if (n < 2) return { points: pts, onLine: n, found: on.fill(1), widthPx };
  let found = 0;
  const out: [number, number][] = [];
  const side = 2 * DIRECTION_SPAN + 1;
  // This call's own profile buffers: nothing shared between calls, so two runs cannot overwrite each other's.
  const profiles = profileScratch();
  for (let i = 0; i < n; i++) {
    const ahead = Math.min(n - 1, i + DIRECTION_SPAN);
    const step = path[ahead] - path[i];
    const dy = Math.round(step / r.w);
    const key = r.w >= side ? path[i] * 64 + (dy + DIRECTION_SPAN) * side + (step - dy * r.w + DIRECTION_SPAN) : path[i] * r.w * r.h + path[ahead];
    const known = cache?.get(key);
    if (known !== undefined) {
      if (known) {
        found++;
        on[i] = 1;
        widthPx[i] = known.widthPx;
        out.push(known.point);
      } else out.push(pts[i]);
      continue;
    }
    const a = pts[Math.max(0, i - DIRECTION_SPAN)];
    const b = pts[ahead];
    const tx = b[0] - a[0];
    const ty = b[1] - a[1];
    const len = Math.hypot(tx, ty);
    if (!(len > 0)) {
      out.push(pts[i]);
      continue;
    }
    const nx = -ty / len;
    const ny = tx / len;
    const o = centreAcross(f, pts[i][0], pts[i][1], nx, ny, PROFILE_HALF_PX, profiles);
    if (Number.isNaN(o)) {
      cache?.set(key, null);
      out.push(pts[i]);
      continue;
    }
    found++;
    on[i] = 1;
    widthPx[i] = profiles.widthPx;
    const q: [number, number] = [pts[i][0] + o * nx, pts[i][1] + o * ny];
    cache?.set(key, { point: q, widthPx: profiles.widthPx });
    out.push(q);
  }
  return { points: out, onLine: found / n, found: on, widthPx };
}

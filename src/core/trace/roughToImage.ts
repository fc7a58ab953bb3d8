// The rough first preview is traced over a window read at reduced resolution; its path comes back in reduced
// pixels and is shown on the scan until the full-resolution one replaces it.
import type { Raster } from './raster';

/**
 * Returns the rough path `points` (reduced px of window `win`, `sx` × `sy` image px per reduced pixel) in image px,
 * with its first point at `from` and its last at `to` (the anchor and the pointer); an empty path gives [from, to].
 */
export function roughToImage(points: readonly (readonly [number, number])[], win: Raster, sx: number, sy: number, from: readonly [number, number], to: readonly [number, number]): [number, number][] {
  if (points.length < 2) return [[from[0], from[1]], [to[0], to[1]]];
  const out: [number, number][] = points.map(([u, v]) => [win.x0 + u * sx, win.y0 + v * sy]);
  out[0] = [from[0], from[1]];
  out[out.length - 1] = [to[0], to[1]];
  return out;
}

// Reads a per-pixel value of a window between pixel centres.
import type { Raster } from './raster';

/** Returns `values` (row-major over the window `r`) interpolated bilinearly at image point (x, y), clamped to the window's edge pixels. */
export function sampleBilinear(values: Float32Array, r: Raster, x: number, y: number): number {
  let u = x - r.x0 - 0.5;
  let v = y - r.y0 - 0.5;
  u = u < 0 ? 0 : u > r.w - 1 ? r.w - 1 : u;
  v = v < 0 ? 0 : v > r.h - 1 ? r.h - 1 : v;
  const i = Math.min(Math.floor(u), Math.max(0, r.w - 2));
  const j = Math.min(Math.floor(v), Math.max(0, r.h - 2));
  const fu = u - i;
  const fv = v - j;
  const k = j * r.w + i;
  const i1 = r.w > 1 ? 1 : 0;
  const j1 = r.h > 1 ? r.w : 0;
  const top = values[k] * (1 - fu) + values[k + i1] * fu;
  const bottom = values[k + j1] * (1 - fu) + values[k + j1 + i1] * fu;
  return top * (1 - fv) + bottom * fv;
}

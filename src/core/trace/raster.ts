// A window of the scan in image pixels: pixel (i, j) of the window covers image [x0 + i, x0 + i + 1) ×
// [y0 + j, y0 + j + 1), so its centre is at (x0 + i + 0.5, y0 + j + 0.5).

/** Where a window of w × h pixels sits in the image (integer image-pixel origin). */
export interface Raster { x0: number; y0: number; w: number; h: number }

/** Returns the image-pixel centre of window pixel index k (row-major). */
export function rasterCentre(r: Raster, k: number): [number, number] {
  const j = Math.floor(k / r.w);
  return [r.x0 + (k - j * r.w) + 0.5, r.y0 + j + 0.5];
}

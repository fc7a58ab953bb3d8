// Copies the features of a search window out of the tiles that hold them.
import type { PixelFeatures } from './pixelFeatures';
import type { Raster } from './raster';

/**
 * Returns the features of window `win`, copied row by row from `tiles` (each covering its own image rectangle);
 * pixels no tile covers read as paper (dark 0, edge 0).
 */
export function assembleFeatures(win: Raster, tiles: readonly PixelFeatures[]): PixelFeatures {
  const n = win.w * win.h;
  const dark = new Float32Array(n);
  const edge = new Float32Array(n);
  for (const t of tiles) {
    const x0 = Math.max(win.x0, t.x0);
    const x1 = Math.min(win.x0 + win.w, t.x0 + t.w);
    const y0 = Math.max(win.y0, t.y0);
    const y1 = Math.min(win.y0 + win.h, t.y0 + t.h);
    if (x1 <= x0 || y1 <= y0) continue;
    for (let y = y0; y < y1; y++) {
      const src = (y - t.y0) * t.w + (x0 - t.x0);
      const dst = (y - win.y0) * win.w + (x0 - win.x0);
      dark.set(t.dark.subarray(src, src + (x1 - x0)), dst);
      edge.set(t.edge.subarray(src, src + (x1 - x0)), dst);
    }
  }
  return { ...win, dark, edge };
}

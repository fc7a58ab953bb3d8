// A window of the scan read at reduced resolution for the rough first preview: each reduced pixel is the mean of
// the image pixels it covers (a box filter, weighted by the fraction of each pixel inside it). The app asks the
// browser's resampler for the same reduction of a large scan; this one serves the benchmark and the tests.
import type { Raster } from './raster';

/**
 * Returns the RGBA pixels (cw × ch, row-major) of window `win` of an image of `w` px across (`rgba`), each the
 * area-weighted mean of the image pixels under it. An empty window or target gives an empty array.
 */
export function reduceRgba(rgba: ArrayLike<number>, w: number, win: Raster, cw: number, ch: number): Uint8ClampedArray {
  const out = new Uint8ClampedArray(Math.max(0, cw) * Math.max(0, ch) * 4);
  if (win.w <= 0 || win.h <= 0 || cw <= 0 || ch <= 0) return out;
  const sx = win.w / cw;
  const sy = win.h / ch;
  const acc = [0, 0, 0, 0];
  for (let j = 0; j < ch; j++) {
    const v0 = win.y0 + j * sy;
    const v1 = v0 + sy;
    for (let i = 0; i < cw; i++) {
      const u0 = win.x0 + i * sx;
      const u1 = u0 + sx;
      acc.fill(0);
      let area = 0;
      for (let y = Math.floor(v0); y < v1; y++) {
        const wy = Math.min(v1, y + 1) - Math.max(v0, y);
        for (let x = Math.floor(u0); x < u1; x++) {
          const a = wy * (Math.min(u1, x + 1) - Math.max(u0, x));
          const k = (y * w + x) * 4;
          for (let c = 0; c < 4; c++) acc[c] += a * rgba[k + c];
          area += a;
        }
      }
      const o = (j * cw + i) * 4;
      for (let c = 0; c < 4; c++) out[o + c] = Math.round(acc[c] / area);
    }
  }
  return out;
}

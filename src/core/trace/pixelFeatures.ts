// What the tracer sees in a scan window: how dark each pixel is (ink) and how strongly the colour
// changes there (edges, including boundaries between coloured units drawn without an ink line).
import type { Raster } from './raster';

/** Per-pixel darkness and edge strength of a window, both in [0, 1]. */
export interface PixelFeatures extends Raster {
  /** 1 − luminance (Rec. 601 weights): 0 for white paper, near 1 for black ink. */
  dark: Float32Array;
  /** Colour gradient magnitude g (Sobel over R, G and B, in levels per pixel), mapped to g / (g + EDGE_HALF). */
  edge: Float32Array;
}

/** Gradient (levels per pixel) at which the edge strength is one half: well above scan noise, below a fill boundary. */
export const EDGE_HALF = 20;

/**
 * Returns darkness and edge strength for the `inner` part of an RGBA buffer of `bw` × `bh` pixels whose pixel (0, 0)
 * is image pixel (`bx0`, `by0`). Neighbours for the gradient are read from the buffer around `inner` (a one-pixel
 * border when the caller has one), clamped at the buffer's edges. Alpha is ignored. An empty `inner` gives empty arrays.
 */
export function pixelFeatures(rgba: ArrayLike<number>, bw: number, bh: number, bx0: number, by0: number, inner: Raster = { x0: bx0, y0: by0, w: bw, h: bh }): PixelFeatures {
  const { w, h } = inner;
  const n = Math.max(0, w) * Math.max(0, h);
  const dark = new Float32Array(n);
  const edge = new Float32Array(n);
  const ox = inner.x0 - bx0;
  const oy = inner.y0 - by0;
  for (let j = 0; j < h; j++) {
    const y = oy + j;
    const ym = (y > 0 ? y - 1 : 0) * bw;
    const yc = y * bw;
    const yp = (y < bh - 1 ? y + 1 : bh - 1) * bw;
    for (let i = 0; i < w; i++) {
      const x = ox + i;
      const xm = x > 0 ? x - 1 : 0;
      const xp = x < bw - 1 ? x + 1 : bw - 1;
      const c = (yc + x) * 4;
      dark[j * w + i] = 1 - (0.299 * rgba[c] + 0.587 * rgba[c + 1] + 0.114 * rgba[c + 2]) / 255;
      let g2 = 0;
      for (let ch = 0; ch < 3; ch++) {
        // Sobel kernels, divided by 8 so a ramp of s levels per pixel reads s.
        const a = rgba[(ym + xm) * 4 + ch], b = rgba[(ym + x) * 4 + ch], cc = rgba[(ym + xp) * 4 + ch];
        const d = rgba[(yc + xm) * 4 + ch], f = rgba[(yc + xp) * 4 + ch];
        const g = rgba[(yp + xm) * 4 + ch], hh = rgba[(yp + x) * 4 + ch], k = rgba[(yp + xp) * 4 + ch];
        const gx = (cc + 2 * f + k - a - 2 * d - g) / 8;
        const gy = (g + 2 * hh + k - a - 2 * b - cc) / 8;
        g2 += gx * gx + gy * gy;
      }
      const gm = Math.sqrt(g2);
      edge[j * w + i] = gm / (gm + EDGE_HALF);
    }
  }
  return { x0: inner.x0, y0: inner.y0, w: Math.max(0, w), h: Math.max(0, h), dark, edge };
}

// The rough first preview reads its window reduced. A resampler that averages would fade a thin line towards
// the paper, and one that samples (what a browser's fast resize may do) misses it in whole columns; keeping the
// darkest pixel of each block keeps every drawn line as dark as it was drawn, with its colour, so the reduced
// window still shows the lines (and the fills either side of a boundary) the rough search is to follow.
/** Rec. 601 luminance weights, as pixelFeatures reads darkness. */
const LUMA = [0.299, 0.587, 0.114];

/**
 * Returns the RGBA pixels of `rgba` (w × h, row-major) reduced by blocks of k × k: each reduced pixel is the pixel of
 * its block with the lowest luminance (the first such). The result is ⌈w / k⌉ × ⌈h / k⌉ (blocks at the right and
 * bottom edges cover fewer pixels); k ≤ 1 gives a copy; an empty image gives an empty array.
 */
export function poolDarkest(rgba: ArrayLike<number>, w: number, h: number, k: number): { rgba: Uint8ClampedArray; w: number; h: number } {
  const b = k > 1 ? Math.floor(k) : 1;
  const cw = w > 0 ? Math.ceil(w / b) : 0;
  const ch = h > 0 ? Math.ceil(h / b) : 0;
  const out = new Uint8ClampedArray(cw * ch * 4);
  const best = new Float32Array(cw * ch).fill(Infinity);
  for (let y = 0; y < h; y++) {
    const row = ((y / b) | 0) * cw;
    for (let x = 0; x < w; x++) {
      const s = (y * w + x) * 4;
      const l = LUMA[0] * rgba[s] + LUMA[1] * rgba[s + 1] + LUMA[2] * rgba[s + 2];
      const c = row + ((x / b) | 0);
      if (l < best[c]) {
        best[c] = l;
        const o = c * 4;
        out[o] = rgba[s];
        out[o + 1] = rgba[s + 1];
        out[o + 2] = rgba[s + 2];
        out[o + 3] = rgba[s + 3];
      }
    }
  }
  return { rgba: out, w: cw, h: ch };
}

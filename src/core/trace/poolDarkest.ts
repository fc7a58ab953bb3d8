// The rough first preview reads its window reduced. A resampler that averages would fade a thin line towards
// the paper, and one that samples (what a browser's fast resize may do) misses it in whole columns; keeping the
// darkest pixel of each block keeps every drawn line as dark as it was drawn, with its colour, so the reduced
// window still shows the lines (and the fills either side of a boundary) the rough search is to follow.
// A measured hot path (a 3,000 px stretch's window is 1.4 MP, read on every first preview): integer luminance,
// one pass along each row, each block's darkest pixel copied as one 32-bit word once its block row is read.

/** Rec. 601 luminance weights (0.299, 0.587, 0.114) in 1/256ths, as pixelFeatures reads darkness. */
const LUMA_R = 77;
const LUMA_G = 150;
const LUMA_B = 29;

/**
 * Returns the RGBA pixels of `rgba` (w × h, row-major) reduced by blocks of k × k: each reduced pixel is the pixel of
 * its block with the lowest luminance (the first such in row order). The result is ⌈w / k⌉ × ⌈h / k⌉ (blocks at the right and
 * bottom edges cover fewer pixels); k ≤ 1 gives a copy; an empty image gives an empty array.
 */
export function poolDarkest(rgba: Uint8ClampedArray, w: number, h: number, k: number): { rgba: Uint8ClampedArray; w: number; h: number } {
  const b = k > 1 ? Math.floor(k) : 1;
  const cw = w > 0 ? Math.ceil(w / b) : 0;
  const ch = h > 0 ? Math.ceil(h / b) : 0;
  const out = new Uint8ClampedArray(cw * ch * 4);
  if (cw === 0 || ch === 0) return { rgba: out, w: cw, h: ch };
  // Per block of the current block row: the lowest luminance so far and the pixel holding it.
  const best = new Int32Array(cw);
  const at = new Int32Array(cw);
  const src = new Uint32Array(rgba.buffer, rgba.byteOffset, w * h);
  const dst = new Uint32Array(out.buffer);
  for (let by = 0; by < ch; by++) {
    best.fill(0x7fffffff);
    const yEnd = Math.min(h, (by + 1) * b);
    for (let y = by * b; y < yEnd; y++) {
      // Along the row, the block index steps every b pixels (no division per pixel).
      let s = y * w * 4;
      let bx = 0;
      let left = b;
      for (let x = 0; x < w; x++, s += 4) {
        const l = LUMA_R * rgba[s] + LUMA_G * rgba[s + 1] + LUMA_B * rgba[s + 2];
        if (l < best[bx]) {
          best[bx] = l;
          at[bx] = y * w + x;
        }
        if (--left === 0) {
          left = b;
          bx++;
        }
      }
    }
    for (let i = 0; i < cw; i++) dst[by * cw + i] = src[at[i]];
  }
  return { rgba: out, w: cw, h: ch };
}

// How the rough first preview reads its window: reduced by the browser by a power of two (a halving is the mean of
// each 2 × 2 block, which keeps a line 2 px wide at half its darkness or better, one of 1 px at a quarter) until it
// is at most the read budget, then by whole blocks keeping the darkest pixel (poolDarkest) to about the pixel budget
// of the rough search. Reading the window of a 3,000 px stretch whole (1.4 MP) cost the page 13 ms to cut and the worker 20 ms
// to read on a loaded machine; halved, a quarter of that.

/**
 * The read size (px), the browser's reduction (`scale`: image px per read px, a power of two), the block (read px a
 * side), the reduced grid (blocks) of a rough window, and the image px per reduced pixel across (`sx`) and down
 * (`sy`), with which its path is mapped back (roughToImage).
 */
export interface RoughReduction { readW: number; readH: number; scale: number; pool: number; cw: number; ch: number; sx: number; sy: number }

/**
 * Returns how to reduce a window of `w` × `h` image px: read at full size up to `readPixels`, else at 1/2, 1/4, …
 * of its side, the first that fits (`scale`: image px per read px); then blocks of the smallest integer side (at
 * least 2) that bring it to about `maxPixels`; the grid is ⌈read / block⌉ each way. An empty window gives a grid of
 * one block.
 */
export function roughReduction(w: number, h: number, maxPixels: number, readPixels: number): RoughReduction {
  let scale = 1;
  while ((w / scale) * (h / scale) > readPixels) scale *= 2;
  const readW = Math.max(1, Math.round(w / scale));
  const readH = Math.max(1, Math.round(h / scale));
  const pool = Math.max(2, Math.ceil(Math.sqrt((readW * readH) / maxPixels)));
  return { readW, readH, scale, pool, cw: Math.ceil(readW / pool), ch: Math.ceil(readH / pool), sx: (Math.max(1, w) / readW) * pool, sy: (Math.max(1, h) / readH) * pool };
}

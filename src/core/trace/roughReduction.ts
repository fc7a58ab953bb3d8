// How the rough first preview reads its window: whole, at full resolution while that stays small enough to read
// at once, else reduced by the browser to about that size first; then reduced by whole blocks (poolDarkest) to
// about the pixel budget of the rough search.

/**
 * The read size (px), the block (read px a side), the reduced grid (blocks) of a rough window, and the image px per
 * reduced pixel across (`sx`) and down (`sy`), with which its path is mapped back (roughToImage).
 */
export interface RoughReduction { readW: number; readH: number; pool: number; cw: number; ch: number; sx: number; sy: number }

/**
 * Returns how to reduce a window of `w` × `h` image px: read at full size up to `readPixels` (else scaled by one factor
 * to about that), then blocks of the smallest integer side (at least 2) that bring it to about `maxPixels`; the grid is
 * ⌈read / block⌉ each way. An empty window gives a grid of one block.
 */
export function roughReduction(w: number, h: number, maxPixels: number, readPixels: number): RoughReduction {
  const n = Math.max(1, w * h);
  const pre = n > readPixels ? Math.sqrt(n / readPixels) : 1;
  const readW = Math.max(1, Math.round(w / pre));
  const readH = Math.max(1, Math.round(h / pre));
  const pool = Math.max(2, Math.ceil(Math.sqrt((readW * readH) / maxPixels)));
  return { readW, readH, pool, cw: Math.ceil(readW / pool), ch: Math.ceil(readH / pool), sx: (Math.max(1, w) / readW) * pool, sy: (Math.max(1, h) / readH) * pool };
}

// Which part of the scan a traced stretch searches: a window around its anchor and the pointer, with a
// margin across the stretch (a line bends away from the chord) and room ahead of the pointer (it usually
// keeps going the same way), so that the next moves are read from the same tree. The window is cut into
// square tiles whose features are computed once and kept while the user traces.
import type { Raster } from './raster';

/** Edge of a feature tile, in image px. */
export const TRACE_TILE_PX = 256;
/** Margin around the anchor and the pointer, in image px, before growth with the stretch's length. */
const BASE_MARGIN_PX = 48;

/**
 * Returns the image-pixel window to search for a stretch from `from` to `to` in an image of `imageW` × `imageH`:
 * their bounding box grown by 48 px + 5 % of the stretch across it, and by 64 px + 30 % of the stretch ahead of `to`
 * along the stretch's main axis; clipped to the image (empty when both points lie outside).
 */
export function traceWindow(from: readonly [number, number], to: readonly [number, number], imageW: number, imageH: number): Raster {
  const dx = to[0] - from[0];
  const dy = to[1] - from[1];
  const span = Math.max(Math.abs(dx), Math.abs(dy));
  const side = BASE_MARGIN_PX + 0.05 * span;
  const ahead = 64 + 0.3 * span;
  let x0 = Math.min(from[0], to[0]) - side;
  let x1 = Math.max(from[0], to[0]) + side;
  let y0 = Math.min(from[1], to[1]) - side;
  let y1 = Math.max(from[1], to[1]) + side;
  if (Math.abs(dx) >= Math.abs(dy)) {
    if (dx >= 0) x1 = Math.max(x1, to[0] + ahead);
    else x0 = Math.min(x0, to[0] - ahead);
  } else if (dy >= 0) y1 = Math.max(y1, to[1] + ahead);
  else y0 = Math.min(y0, to[1] - ahead);
  const ix0 = Math.max(0, Math.floor(x0));
  const iy0 = Math.max(0, Math.floor(y0));
  const ix1 = Math.min(imageW, Math.ceil(x1));
  const iy1 = Math.min(imageH, Math.ceil(y1));
  return { x0: ix0, y0: iy0, w: Math.max(0, ix1 - ix0), h: Math.max(0, iy1 - iy0) };
}

/**
 * Returns true when image point p lies inside the window at least `insetPx` from each edge that is not the image's own
 * edge (an image of `imageW` × `imageH`): a window clipped at the image's edge covers the pixels along it.
 */
export function windowCovers(win: Raster, p: readonly [number, number], imageW = Infinity, imageH = Infinity, insetPx = 2): boolean {
  const left = win.x0 > 0 ? insetPx : 0;
  const top = win.y0 > 0 ? insetPx : 0;
  const right = win.x0 + win.w < imageW ? insetPx : 0;
  const bottom = win.y0 + win.h < imageH ? insetPx : 0;
  return p[0] >= win.x0 + left && p[1] >= win.y0 + top && p[0] <= win.x0 + win.w - right && p[1] <= win.y0 + win.h - bottom;
}

/** A tile of the image: its column and row and the image pixels it covers (clipped to the image). */
export interface TileRect extends Raster { col: number; row: number; key: string }

/** Returns the tiles of `tilePx` that overlap the window, row by row; none for an empty window. */
export function tilesOver(win: Raster, imageW: number, imageH: number, tilePx = TRACE_TILE_PX): TileRect[] {
  const out: TileRect[] = [];
  if (win.w <= 0 || win.h <= 0) return out;
  const c0 = Math.floor(win.x0 / tilePx);
  const c1 = Math.floor((win.x0 + win.w - 1) / tilePx);
  const r0 = Math.floor(win.y0 / tilePx);
  const r1 = Math.floor((win.y0 + win.h - 1) / tilePx);
  for (let row = r0; row <= r1; row++) {
    for (let col = c0; col <= c1; col++) {
      const x0 = col * tilePx;
      const y0 = row * tilePx;
      out.push({ col, row, key: `${col}/${row}`, x0, y0, w: Math.min(tilePx, imageW - x0), h: Math.min(tilePx, imageH - y0) });
    }
  }
  return out;
}

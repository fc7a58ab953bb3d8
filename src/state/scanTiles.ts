// Which scan tiles to draw: pure arithmetic on the camera, the viewport and the image size, so the
// selection is tested without a browser. Level k holds the image at 1/2^k of its resolution, cut into
// square tiles of TILE_PX level pixels (a tile at level k covers TILE_PX·2^k image pixels).

/** Edge of a tile in its own level's pixels. */
export const TILE_PX = 1024;

export interface TileLevel {
  level: number;
  /** Image pixels per level pixel (2^level). */
  factor: number;
  cols: number;
  rows: number;
  /** Size of the whole image at this level, in level pixels. */
  widthPx: number;
  heightPx: number;
}

export interface TileRef { level: number; col: number; row: number; key: string }

export interface CameraLike { scale: number; x: number; y: number }

/** Returns the pyramid's levels, from full resolution down to the first level that fits in one tile; [] for an empty image. */
export function tileLevels(imageW: number, imageH: number, tilePx = TILE_PX): TileLevel[] {
  if (!(imageW > 0 && imageH > 0)) return [];
  const levels: TileLevel[] = [];
  for (let level = 0; ; level++) {
    const factor = 2 ** level;
    const widthPx = Math.ceil(imageW / factor);
    const heightPx = Math.ceil(imageH / factor);
    levels.push({ level, factor, cols: Math.ceil(widthPx / tilePx), rows: Math.ceil(heightPx / tilePx), widthPx, heightPx });
    if (widthPx <= tilePx && heightPx <= tilePx) return levels;
  }
}

/**
 * Returns whether a pyramid of `levelCount` levels holds level `level` as tiles of its own. Level 0 is the decoded
 * scan itself (drawn and read in place, never copied into tiles). Level 1 would cost a quarter of the scan's memory
 * again for zooms between 1/2 and 1/4, so it is held only when it is the coarsest level (a scan under 2048 px a
 * side); those zooms draw level 0 or level 2, whichever is nearer (chooseLevel). Levels 2 and beyond add 1/12.
 */
export function levelHeld(level: number, levelCount: number): boolean {
  if (level < 0 || level >= levelCount) return false;
  return level !== 1 || levelCount === 2;
}

/**
 * Returns the level to draw: the coarsest whose pixels are still no larger than a device pixel (0 when zoomed in
 * past 1:1) when that level is held (levelHeld), else the held level nearest to it in scale: between 1/2 and 1/4,
 * level 0 reduced at most 2× (above 1/2) or level 2 enlarged at most 2× (below), never thinned beyond a 2 × 2 box.
 */
export function chooseLevel(scale: number, pixelRatio: number, levelCount: number): number {
  if (levelCount <= 0) return 0;
  const devicePerImage = scale * pixelRatio;
  if (!(devicePerImage > 0)) return levelCount - 1;
  // Level k is sharp enough while 2^k image pixels span at least one device pixel: k <= log2(1 / devicePerImage).
  const exact = Math.log2(1 / devicePerImage);
  const k = Math.min(levelCount - 1, Math.max(0, Math.floor(exact + 1e-9)));
  if (levelHeld(k, levelCount)) return k;
  let best = 0;
  for (let j = 0; j < levelCount; j++) if (levelHeld(j, levelCount) && Math.abs(j - exact) < Math.abs(best - exact)) best = j;
  return best;
}

/** Returns the image-pixel rectangle a tile covers (clipped to the image). */
export function tileImageRect(level: TileLevel, col: number, row: number, imageW: number, imageH: number, tilePx = TILE_PX) {
  const span = tilePx * level.factor;
  const x = col * span;
  const y = row * span;
  return { x, y, width: Math.min(span, imageW - x), height: Math.min(span, imageH - y) };
}

/** Returns the image-pixel rectangle visible in the viewport (may extend beyond the image). */
export function visibleImageRect(camera: CameraLike, viewW: number, viewH: number) {
  return { x0: -camera.x / camera.scale, y0: -camera.y / camera.scale, x1: (viewW - camera.x) / camera.scale, y1: (viewH - camera.y) / camera.scale };
}

/**
 * Returns the level to draw and the tiles of that level that overlap the viewport (grown by
 * `marginPx` screen pixels), row by row; no tiles when the image is off screen or empty.
 */
export function visibleTiles(
  camera: CameraLike,
  viewW: number,
  viewH: number,
  imageW: number,
  imageH: number,
  pixelRatio = 1,
  marginPx = 0,
  tilePx = TILE_PX,
): { level: number; tiles: TileRef[] } {
  const levels = tileLevels(imageW, imageH, tilePx);
  if (levels.length === 0 || !(camera.scale > 0)) return { level: 0, tiles: [] };
  const level = chooseLevel(camera.scale, pixelRatio, levels.length);
  const lv = levels[level];
  const r = visibleImageRect(camera, viewW, viewH);
  if (r.x0 >= imageW || r.y0 >= imageH || r.x1 <= 0 || r.y1 <= 0) return { level, tiles: [] };
  const m = marginPx / camera.scale;
  const span = tilePx * lv.factor;
  const c0 = Math.max(0, Math.floor((r.x0 - m) / span));
  const c1 = Math.min(lv.cols - 1, Math.ceil((r.x1 + m) / span) - 1);
  const r0 = Math.max(0, Math.floor((r.y0 - m) / span));
  const r1 = Math.min(lv.rows - 1, Math.ceil((r.y1 + m) / span) - 1);
  const tiles: TileRef[] = [];
  for (let row = r0; row <= r1; row++) {
    for (let col = c0; col <= c1; col++) tiles.push({ level, col, row, key: `${level}/${col}/${row}` });
  }
  return { level, tiles };
}

// Cuts a decoded scan into tiles with a few half-resolution levels, so that drawing a 200-megapixel scan
// touches only the handful of tiles on screen. Kept beside the scan cache, keyed by scan id; a few recent
// pyramids are kept (undo can bring an earlier scan back) and older ones are closed.
import { TILE_PX, tileLevels, type TileLevel } from './scanTiles';

export interface TilePyramid {
  widthPx: number;
  heightPx: number;
  levels: TileLevel[];
  /** tiles[level][row * cols + col] */
  tiles: ImageBitmap[][];
}

const KEEP = 3;

/** Longest stretch of tile drawing before the page gets a turn (ms): opening a big scan keeps the page and its progress live. */
const SLICE_MS = 40;
let sliceStart = 0;

/** Yields to the page when the current stretch of work has run SLICE_MS. */
async function yieldSometimes(): Promise<void> {
  if (performance.now() - sliceStart < SLICE_MS) return;
  await new Promise((resolve) => setTimeout(resolve, 0));
  sliceStart = performance.now();
}
const pyramids = new Map<string, TilePyramid>();
const pending = new Map<string, Promise<TilePyramid>>();

async function halveLevel(prev: ImageBitmap[], pl: TileLevel, lv: TileLevel): Promise<ImageBitmap[]> {
  const out: ImageBitmap[] = [];
  for (let row = 0; row < lv.rows; row++) {
    for (let col = 0; col < lv.cols; col++) {
      const w = Math.min(TILE_PX, lv.widthPx - col * TILE_PX);
      const h = Math.min(TILE_PX, lv.heightPx - row * TILE_PX);
      await yieldSometimes();
      const canvas = new OffscreenCanvas(w, h);
      const ctx = canvas.getContext('2d')!;
      // Exactly half size: bilinear sampling at the centre of each 2 × 2 block is their average (a box filter).
      ctx.imageSmoothingQuality = 'low';
      // Each tile of this level is made of up to 2 × 2 tiles of the level above, drawn at half size.
      for (let dr = 0; dr < 2; dr++) {
        for (let dc = 0; dc < 2; dc++) {
          const pc = col * 2 + dc;
          const pr = row * 2 + dr;
          if (pc >= pl.cols || pr >= pl.rows) continue;
          const src = prev[pr * pl.cols + pc];
          ctx.drawImage(src, (dc * TILE_PX) / 2, (dr * TILE_PX) / 2, src.width / 2, src.height / 2);
        }
      }
      out.push(canvas.transferToImageBitmap());
    }
  }
  return out;
}

/** Returns the tile pyramid of a bitmap; `onProgress` receives the share done (0..1). */
export async function buildTilePyramid(bitmap: ImageBitmap, onProgress?: (done: number) => void): Promise<TilePyramid> {
  const levels = tileLevels(bitmap.width, bitmap.height);
  const total = levels.reduce((n, l) => n + l.cols * l.rows, 0);
  let done = 0;
  sliceStart = performance.now();
  const base: ImageBitmap[] = [];
  const l0 = levels[0];
  for (let row = 0; row < l0.rows; row++) {
    for (let col = 0; col < l0.cols; col++) {
      const x = col * TILE_PX;
      const y = row * TILE_PX;
      base.push(await createImageBitmap(bitmap, x, y, Math.min(TILE_PX, bitmap.width - x), Math.min(TILE_PX, bitmap.height - y)));
      onProgress?.(++done / total);
    }
  }
  const tiles = [base];
  for (let k = 1; k < levels.length; k++) {
    tiles.push(await halveLevel(tiles[k - 1], levels[k - 1], levels[k]));
    done += levels[k].cols * levels[k].rows;
    onProgress?.(done / total);
  }
  return { widthPx: bitmap.width, heightPx: bitmap.height, levels, tiles };
}

function remember(id: string, p: TilePyramid): void {
  pyramids.delete(id);
  pyramids.set(id, p);
  while (pyramids.size > KEEP) {
    const [oldId, old] = pyramids.entries().next().value as [string, TilePyramid];
    pyramids.delete(oldId);
    old.tiles.forEach((lv) => lv.forEach((b) => b.close()));
  }
}

/** Closes every tile of the scan's pyramid and forgets it (a build under way is left to finish, then kept). */
export function releaseTilePyramid(id: string): void {
  const p = pyramids.get(id);
  if (!p) return;
  pyramids.delete(id);
  p.tiles.forEach((lv) => lv.forEach((b) => b.close()));
}

/** The ids whose pyramids are held, for tests and the memory benchmark. */
export function heldPyramidIds(): string[] {
  return [...pyramids.keys()];
}

/** Returns the scan's pyramid if it is ready (and marks it recently used), else undefined. */
export function getTilePyramid(id: string): TilePyramid | undefined {
  const p = pyramids.get(id);
  if (p) remember(id, p);
  return p;
}

/** Returns the scan's pyramid, building it once (concurrent callers share the same build). */
export function ensureTilePyramid(id: string, bitmap: ImageBitmap, onProgress?: (done: number) => void): Promise<TilePyramid> {
  const ready = getTilePyramid(id);
  if (ready) return Promise.resolve(ready);
  let job = pending.get(id);
  if (!job) {
    job = buildTilePyramid(bitmap, onProgress).then((p) => {
      pending.delete(id);
      remember(id, p);
      return p;
    }, (e: unknown) => {
      pending.delete(id);
      throw e;
    });
    pending.set(id, job);
  }
  return job;
}

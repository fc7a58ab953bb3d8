// The reduced views of a decoded scan, so that drawing a 200-megapixel scan zoomed out touches a handful of small
// tiles. Level 0 is the decoded bitmap itself: it is drawn and read in place (cropped per tile by the canvas), never
// copied, so a scan costs its RGBA size plus about a twelfth (levelHeld: level 1 is not kept, levels 2 and beyond
// are). The scan is shown as soon as it is decoded; the reduced levels are made afterwards in short slices of main-
// thread work (the canvas calls that read a bitmap must run where the bitmap is, and handing the bitmap to a worker
// would take it away from the view and the tracer meanwhile), finest first, each from the one before, and the view
// swaps each in as it comes (until then it draws the full bitmap). Kept by scan id beside the scan cache, which starts and releases them (scanCache).
import { TILE_PX, levelHeld, tileLevels, type TileLevel } from './scanTiles';

export interface TilePyramid {
  widthPx: number;
  heightPx: number;
  levels: TileLevel[];
  /** The decoded scan at full resolution: level 0. Owned by the scan cache, which closes it. */
  full: ImageBitmap;
  /** tiles[level][row * cols + col] for each held level once it is made; null for level 0 (the full bitmap), a level not held, or one not made yet. */
  tiles: (ImageBitmap[] | null)[];
  /** Resolves when every held level is made (or the pyramid was released first). */
  ready: Promise<void>;
}

interface Building { pyramid: TilePyramid; released: boolean; made: boolean }

/** Longest stretch of tile making before the page gets a turn (ms): the view, its progress and input stay live. */
const SLICE_MS = 30;

const pyramids = new Map<string, Building>();
const listeners = new Set<() => void>();
let version = 0;

function notify(): void {
  version += 1;
  listeners.forEach((l) => l());
}

/** Returns a counter that changes whenever a pyramid starts, gains a level or is released (for useSyncExternalStore). */
export function pyramidsVersion(): number {
  return version;
}

/** Subscribes to pyramids starting, gaining a level or being released; returns the unsubscribe function. */
export function subscribePyramids(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

function canvas2d(w: number, h: number): OffscreenCanvasRenderingContext2D {
  const ctx = new OffscreenCanvas(w, h).getContext('2d');
  if (!ctx) throw new Error('This browser cannot draw the scan’s reduced views.');
  // Exactly half size: bilinear sampling at the centre of each 2 × 2 block is their average (a box filter).
  ctx.imageSmoothingQuality = 'low';
  return ctx;
}

/**
 * Draws the pyramid's level `level` rectangle [x, x + w) × [y, y + h) (level pixels) into `ctx` at (0, 0), one
 * target pixel per level pixel. A held level is drawn from its tiles (or the full bitmap); a level not held (or not
 * made yet) from the finer level halved, through a scratch canvas, so every reduction is an exact 2 × 2 box.
 */
function drawLevelRegion(ctx: OffscreenCanvasRenderingContext2D, p: TilePyramid, level: number, x: number, y: number, w: number, h: number): void {
  const lv = p.levels[level];
  if (level === 0) {
    const sw = Math.min(w, p.widthPx - x);
    const sh = Math.min(h, p.heightPx - y);
    if (sw > 0 && sh > 0) ctx.drawImage(p.full, x, y, sw, sh, 0, 0, sw, sh);
    return;
  }
  const tiles = p.tiles[level];
  if (tiles) {
    for (let row = Math.floor(y / TILE_PX); row <= Math.min(lv.rows - 1, Math.floor((y + h - 1) / TILE_PX)); row++) {
      for (let col = Math.floor(x / TILE_PX); col <= Math.min(lv.cols - 1, Math.floor((x + w - 1) / TILE_PX)); col++) {
        ctx.drawImage(tiles[row * lv.cols + col], col * TILE_PX - x, row * TILE_PX - y);
      }
    }
    return;
  }
  if (level === 1) {
    // Straight from the full bitmap, halved.
    const sw = Math.min(2 * w, p.widthPx - 2 * x);
    const sh = Math.min(2 * h, p.heightPx - 2 * y);
    if (sw > 0 && sh > 0) ctx.drawImage(p.full, 2 * x, 2 * y, sw, sh, 0, 0, sw / 2, sh / 2);
    return;
  }
  const finer = scratch(level, 2 * w, 2 * h);
  drawLevelRegion(finer, p, level - 1, 2 * x, 2 * y, 2 * w, 2 * h);
  ctx.drawImage(finer.canvas, 0, 0, 2 * w, 2 * h, 0, 0, w, h);
}

/**
 * One reused scratch canvas per level drawn through (a level not made yet, or not held), cleared over the part asked
 * for. They hold up to 2 × TILE_PX a side each (16 MB at 2048 px), so they are let go when the work that needed them
 * ends (releaseScratches), not kept for the session.
 */
const scratches = new Map<number, OffscreenCanvasRenderingContext2D>();
/** How many builds and region reads are drawing through the scratch canvases now. */
let scratchUsers = 0;

/** Gives back the scratch canvases' pixels once no build or region read is using them (a 0 × 0 canvas holds none). */
function releaseScratches(): void {
  if (scratchUsers > 0) return;
  for (const ctx of scratches.values()) {
    ctx.canvas.width = 0;
    ctx.canvas.height = 0;
  }
  scratches.clear();
}

/** Runs `work` with the scratch canvases in use, and lets them go when it and every other user are done. */
async function withScratches<T>(work: () => Promise<T>): Promise<T> {
  scratchUsers += 1;
  try {
    return await work();
  } finally {
    scratchUsers -= 1;
    releaseScratches();
  }
}

/** The scratch canvases held now (their count and RGBA bytes), for tests and the memory benchmark. */
export function scratchesHeld(): { canvases: number; bytes: number } {
  let bytes = 0;
  for (const ctx of scratches.values()) bytes += ctx.canvas.width * ctx.canvas.height * 4;
  return { canvases: scratches.size, bytes };
}

function scratch(level: number, w: number, h: number): OffscreenCanvasRenderingContext2D {
  let ctx = scratches.get(level);
  if (!ctx || ctx.canvas.width < w || ctx.canvas.height < h) {
    ctx = canvas2d(Math.max(w, ctx?.canvas.width ?? 0), Math.max(h, ctx?.canvas.height ?? 0));
    scratches.set(level, ctx);
  }
  ctx.clearRect(0, 0, w, h);
  return ctx;
}

/** Makes level `level`'s tiles, yielding to the page between slices; stops early (closing what it made) once released. */
async function makeLevel(b: Building, level: number, sliceStart: { t: number }): Promise<ImageBitmap[] | null> {
  const p = b.pyramid;
  const lv = p.levels[level];
  const out: ImageBitmap[] = [];
  for (let row = 0; row < lv.rows; row++) {
    for (let col = 0; col < lv.cols; col++) {
      if (performance.now() - sliceStart.t > SLICE_MS) {
        await new Promise((resolve) => setTimeout(resolve, 0));
        sliceStart.t = performance.now();
      }
      if (b.released) {
        out.forEach((t) => t.close());
        return null;
      }
      const w = Math.min(TILE_PX, lv.widthPx - col * TILE_PX);
      const h = Math.min(TILE_PX, lv.heightPx - row * TILE_PX);
      const ctx = canvas2d(w, h);
      // The level is not in `tiles` yet, so this draws it from the finer level halved.
      drawLevelRegion(ctx, p, level, col * TILE_PX, row * TILE_PX, w, h);
      out.push(ctx.canvas.transferToImageBitmap());
    }
  }
  return out;
}

/** The builds waiting for their scan's first frame on screen, by the scan's bitmap: each one's start. */
const waitingToBeShown = new Map<ImageBitmap, () => void>();
/** Longest a build waits for its scan to be shown before it starts anyway (no view is drawing the scan) (ms). */
const SHOWN_WAIT_MS = 1000;

/** The user-timing mark noteScanShown sets (read by the benchmark); its detail is the scan's file name. */
export const SCAN_SHOWN_MARK = 'foldroot-scan-shown';

/**
 * Says that the frame drawing `bitmap` on screen is done (the scan layer calls it a task after its first drawing of a
 * new scan): sets SCAN_SHOWN_MARK, and a build waiting for that starts now.
 */
export function noteScanShown(bitmap: ImageBitmap, name: string): void {
  performance.mark(SCAN_SHOWN_MARK, { detail: name });
  waitingToBeShown.get(bitmap)?.();
}

/**
 * Resolves a task after the scan is shown (noteScanShown), or after SHOWN_WAIT_MS when nothing shows it; at once
 * (a task later) where there is no screen. The reduced levels are not needed for the first picture (the full bitmap
 * stands in), so their first slice must not delay it: opening a scan is decode, one frame, then the rest.
 */
function afterShown(bitmap: ImageBitmap): Promise<void> {
  const turn = () => new Promise<void>((resolve) => setTimeout(resolve, 0));
  if (typeof requestAnimationFrame === 'undefined') return turn();
  return new Promise<void>((resolve) => {
    const start = () => {
      clearTimeout(timer);
      if (waitingToBeShown.get(bitmap) === start) waitingToBeShown.delete(bitmap);
      // A task more: whatever else the page set for the moment after that frame goes first.
      void turn().then(resolve);
    };
    const timer = setTimeout(start, SHOWN_WAIT_MS);
    waitingToBeShown.set(bitmap, start);
  });
}

/** Makes every held level from finest to coarsest (each from the one before), announcing each as it is ready. */
async function makeLevels(b: Building): Promise<void> {
  const p = b.pyramid;
  // The scan is drawn from its full bitmap first; the levels are made after that frame.
  await afterShown(p.full);
  const sliceStart = { t: performance.now() };
  for (let k = 1; k < p.levels.length; k++) {
    if (!levelHeld(k, p.levels.length)) continue;
    const tiles = await makeLevel(b, k, sliceStart);
    if (!tiles) return;
    p.tiles[k] = tiles;
    notify();
  }
}

/**
 * Starts the reduced levels of a decoded scan under its id (replacing any other bitmap's under that id) and returns
 * the pyramid, drawable at once from its full bitmap. Without OffscreenCanvas (outside a browser) it holds level 0 only.
 */
export function startTilePyramid(id: string, bitmap: ImageBitmap): TilePyramid {
  const held = pyramids.get(id);
  if (held && held.pyramid.full === bitmap) return held.pyramid;
  releaseTilePyramid(id);
  const levels = tileLevels(bitmap.width, bitmap.height);
  const pyramid: TilePyramid = { widthPx: bitmap.width, heightPx: bitmap.height, levels, full: bitmap, tiles: levels.map(() => null), ready: Promise.resolve() };
  const b: Building = { pyramid, released: false, made: levels.length <= 1 };
  if (typeof OffscreenCanvas !== 'undefined' && levels.length > 1) {
    pyramid.ready = withScratches(() => makeLevels(b)).catch((e: unknown) => {
      // Without reduced levels the scan is still drawn (from its full bitmap), only less smoothly zoomed out.
      console.warn(`The scan's reduced views could not be made: ${e instanceof Error ? e.message : String(e)}`);
    }).finally(() => {
      b.made = true;
      notify();
    });
  } else b.made = true;
  pyramids.set(id, b);
  notify();
  return pyramid;
}

/** Forgets the scan's pyramid and stops its build; returns the function that closes its tiles (the full bitmap is the scan cache's to close). */
export function detachTilePyramid(id: string): () => void {
  const b = pyramids.get(id);
  if (!b) return () => undefined;
  pyramids.delete(id);
  b.released = true;
  notify();
  return () => {
    b.pyramid.tiles.forEach((lv) => lv?.forEach((t) => t.close()));
    b.pyramid.tiles = b.pyramid.tiles.map(() => null);
  };
}

/** Closes every tile of the scan's pyramid and forgets it (the full bitmap is the scan cache's to close); a build under way stops. */
export function releaseTilePyramid(id: string): void {
  detachTilePyramid(id)();
}

/** The ids whose pyramids are held, for tests and the memory benchmark. */
export function heldPyramidIds(): string[] {
  return [...pyramids.keys()];
}

/**
 * What the pyramids hold: their reduced-level tiles, the bytes of those tiles (RGBA), whether a build is under way,
 * and the bytes of the scratch canvases builds and region reads draw through (none once they are done).
 */
export function pyramidsHeld(): { tiles: number; bytes: number; building: boolean; scratchBytes: number } {
  let tiles = 0;
  let bytes = 0;
  let building = false;
  for (const b of pyramids.values()) {
    building ||= !b.made;
    for (const lv of b.pyramid.tiles) for (const t of lv ?? []) {
      tiles += 1;
      bytes += t.width * t.height * 4;
    }
  }
  return { tiles, bytes, building, scratchBytes: scratchesHeld().bytes };
}

/** Returns the scan's pyramid (its levels made so far), else undefined. */
export function getTilePyramid(id: string | undefined | null): TilePyramid | undefined {
  return id ? pyramids.get(id)?.pyramid : undefined;
}

/**
 * Returns level `level`'s rectangle [x0, x1) × [y0, y1) (level pixels, 2^level image pixels each) of the pyramid as a
 * new ImageBitmap the caller owns (it may transfer it to a worker and must close it), made from the held level at or
 * finer than `level` by exact halvings, one 1024-pixel block at a time with a turn for the page after each. For
 * a figure: choose the coarsest level whose pixels are no larger than the output's, and read just the region shown.
 */
export function pyramidRegion(p: TilePyramid, level: number, x0: number, y0: number, x1: number, y1: number): Promise<ImageBitmap> {
  return withScratches(() => readRegion(p, level, x0, y0, x1, y1));
}

async function readRegion(p: TilePyramid, level: number, x0: number, y0: number, x1: number, y1: number): Promise<ImageBitmap> {
  const lv = p.levels[Math.min(Math.max(0, level), p.levels.length - 1)];
  const [ax, ay] = [Math.max(0, Math.floor(x0)), Math.max(0, Math.floor(y0))];
  const [bx, by] = [Math.min(lv.widthPx, Math.ceil(x1)), Math.min(lv.heightPx, Math.ceil(y1))];
  const w = Math.max(1, bx - ax);
  const h = Math.max(1, by - ay);
  const out = new OffscreenCanvas(w, h);
  const ctx = out.getContext('2d')!;
  const block = canvas2d(Math.min(w, TILE_PX), Math.min(h, TILE_PX));
  for (let by0 = 0; by0 < h; by0 += TILE_PX) {
    for (let bx0 = 0; bx0 < w; bx0 += TILE_PX) {
      const [bw, bh] = [Math.min(TILE_PX, w - bx0), Math.min(TILE_PX, h - by0)];
      block.clearRect(0, 0, bw, bh);
      drawLevelRegion(block, p, lv.level, ax + bx0, ay + by0, bw, bh);
      ctx.drawImage(block.canvas, 0, 0, bw, bh, bx0, by0, bw, bh);
      await new Promise((resolve) => setTimeout(resolve, 0));
    }
  }
  // The block's pixels go now rather than at the next collection.
  block.canvas.width = 0;
  block.canvas.height = 0;
  return out.transferToImageBitmap();
}

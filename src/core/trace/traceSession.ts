// The tracer's working memory, without the messaging around it: feature tiles computed once and kept
// (least recently used go first past a cap), and the shortest-path trees of the latest anchors. The app
// runs one in a worker, which builds the trees and hands each to the page (handedTree), and one on the page,
// which holds the handed trees and reads paths from them; the benchmark runs one directly.
import { assembleFeatures } from './assembleFeatures';
import { pixelFeatures, type PixelFeatures } from './pixelFeatures';
import { poolDarkest } from './poolDarkest';
import type { Raster } from './raster';
import { shortestPathTree } from './shortestPathTree';
import { traceCost } from './traceCost';
import { handTree, keptTree, type HandedTree, type KeptTree } from './handedTree';
import { pixelIndexAt, traceStretch, TRACE_TOLERANCE_PX } from './traceStretch';

/** Trees kept (the latest anchors): enough for the stretch being previewed and the ones still being filled in. */
export const TREES_KEPT = 4;
/** Side of the made-up window the warm-up traces. */
const WARM_SIDE_PX = 160;

export class TraceSession {
  private tiles = new Map<string, PixelFeatures>();
  private trees: KeptTree[] = [];

  /** Stores the features of a tile from its RGBA pixels (`crop`: where the buffer lies in the image, one pixel wider than the tile where the image allows). */
  putTile(key: string, tile: Raster, rgba: ArrayLike<number>, crop: Raster): void {
    this.tiles.delete(key);
    this.tiles.set(key, pixelFeatures(rgba, crop.w, crop.h, crop.x0, crop.y0, tile));
  }

  /**
   * Stores a rough window (`rgba`, w × h px as read) reduced by blocks of `pool` px (the darkest pixel of each) as one
   * tile covering the reduced grid from (0, 0); returns the grid's size.
   */
  putPooledTile(key: string, rgba: Uint8ClampedArray, w: number, h: number, pool: number): { w: number; h: number } {
    const r = poolDarkest(rgba, w, h, pool);
    const grid = { x0: 0, y0: 0, w: r.w, h: r.h };
    this.putTile(key, grid, r.rgba, grid);
    return { w: r.w, h: r.h };
  }

  /** Forgets tiles (the caller keeps the least-recently-used order and the cap). */
  dropTiles(keys: readonly string[]): void {
    for (const k of keys) this.tiles.delete(k);
  }

  /** Builds the tree of anchor `from` over window `win` from the tiles held (pixels no tile covers read as paper). */
  buildTree(id: number, from: [number, number], win: Raster, tileKeys: readonly string[]): void {
    const features = this.windowFeatures(win, tileKeys);
    const tree = shortestPathTree(traceCost(features), win.w, win.h, pixelIndexAt(features, from[0], from[1]));
    this.trees.push({ id, from, win, tree, features, centres: new Map() });
    while (this.trees.length > TREES_KEPT) this.trees.shift();
  }

  /**
   * Returns tree `id` as handed data with the buffers to transfer, and forgets it (its arrays move with it); null
   * when that tree is not kept.
   */
  takeTree(id: number): { handed: HandedTree; transfer: ArrayBuffer[] } | null {
    const t = this.trees.find((k) => k.id === id);
    if (!t) return null;
    this.trees = this.trees.filter((k) => k !== t);
    return handTree(t);
  }

  /** Keeps a tree handed over by another session (the oldest goes past TREES_KEPT). */
  putTree(h: HandedTree): void {
    this.trees.push(keptTree(h));
    while (this.trees.length > TREES_KEPT) this.trees.shift();
  }

  /** Returns the features of a kept tree's window that holds image rectangle [x0, x1) × [y0, y1) whole, or null (newest first). */
  featuresOver(x0: number, y0: number, x1: number, y1: number): PixelFeatures | null {
    for (let i = this.trees.length - 1; i >= 0; i--) {
      const f = this.trees[i].features;
      if (x0 >= f.x0 && y0 >= f.y0 && x1 <= f.x0 + f.w && y1 <= f.y0 + f.h) return f;
    }
    return null;
  }

  /** Returns whether tree `id` is kept. */
  hasTree(id: number): boolean {
    return this.trees.some((k) => k.id === id);
  }

  /** Returns the traced stretch from `from` to `to` over window `win` by a search that stops at `to` (no tree kept): for a stretch already placed. */
  traceOnce(from: [number, number], to: [number, number], win: Raster, tileKeys: readonly string[]): [number, number][] {
    const features = this.windowFeatures(win, tileKeys);
    const tree = shortestPathTree(traceCost(features), win.w, win.h, pixelIndexAt(features, from[0], from[1]), pixelIndexAt(features, to[0], to[1]));
    return traceStretch(tree, features, from, to) ?? [from, to];
  }

  private windowFeatures(win: Raster, tileKeys: readonly string[]): PixelFeatures {
    const held: PixelFeatures[] = [];
    for (const k of tileKeys) {
      const t = this.tiles.get(k);
      if (t) held.push(t);
    }
    return assembleFeatures(win, held);
  }

  /** Returns the traced stretch from tree `id`'s anchor to `to`; a straight one when `to` is out of reach; null when the tree is no longer kept. */
  path(id: number, to: [number, number]): [number, number][] | null {
    const t = this.trees.find((k) => k.id === id);
    if (!t) return null;
    return traceStretch(t.tree, t.features, t.from, to, TRACE_TOLERANCE_PX, t.centres) ?? [t.from, to];
  }

  /**
   * Runs the rough reduction, tile features, a tree and a path three times over a small made-up window (a dark
   * diagonal on paper) and forgets them: the engine then compiles the hot loops before the first real preview needs them.
   */
  warmUp(): void {
    const side = WARM_SIDE_PX;
    const rgba = new Uint8ClampedArray(side * side * 4).fill(235);
    for (let i = 0; i < side; i++) {
      for (let d = -1; d <= 1; d++) {
        const j = Math.min(side - 1, Math.max(0, Math.round(i * 0.6) + d + 20));
        rgba.fill(30, (j * side + i) * 4, (j * side + i) * 4 + 3);
      }
    }
    const win = { x0: 0, y0: 0, w: side, h: side };
    const key = 'warm-up';
    for (let k = 0; k < 3; k++) {
      // The rough window's reduction too: cold, it took longer over a 3,000 px stretch's window than all the rest.
      this.putPooledTile(key, rgba, side, side, 2);
      this.putTile(key, win, rgba, win);
      this.buildTree(-1 - k, [0.5, 20.5], win, [key]);
      this.path(-1 - k, [side - 0.5, Math.round((side - 1) * 0.6) + 20.5]);
    }
    this.dropTiles([key]);
    this.trees = this.trees.filter((t) => t.id >= 0);
  }

  /** Returns the bytes held by tiles and trees. */
  bytesHeld(): number {
    let b = 0;
    for (const t of this.tiles.values()) b += t.dark.byteLength + t.edge.byteLength;
    for (const t of this.trees) b += t.tree.dist.byteLength + t.tree.pred.byteLength + t.features.dark.byteLength + t.features.edge.byteLength + t.centres.size * 80;
    return b;
  }
}

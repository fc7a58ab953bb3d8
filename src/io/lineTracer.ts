// The scan's line tracer for the drawing tools: snapping reads a few pixels on the main thread; traced
// stretches are computed in a worker (feature tiles, one shortest-path tree per anchor, the path read
// back per pointer position), so a large scan never stalls the page. Answers are synchronous — ready or
// not yet — and `onReady` is called whenever something asked for has arrived.
import type { ImagePx } from '../core/model/projectDoc';
import { pixelFeatures } from '../core/trace/pixelFeatures';
import type { Raster } from '../core/trace/raster';
import { snapToLine } from '../core/trace/snapToLine';
import { tilesOver, traceWindow, windowCovers } from '../core/trace/traceWindow';
import type { TraceWorkerReply, TraceWorkerRequest } from './workers/traceLine.worker';

/** Feature tiles the worker keeps (least recently used go first): 96 tiles of 256² px, about 50 MB. */
export const TILES_KEPT = 96;
/** Largest snap radius, in image px, however far the view is zoomed out. */
export const MAX_SNAP_RADIUS_PX = 24;
/** Stretches kept once traced (the committed ones are asked again until the line is finished). */
const PATHS_KEPT = 256;
/** Trees the worker keeps; the same number as its session keeps. */
const TREES_KEPT = 4;

interface TreeRef { id: number; from: ImagePx; win: Raster }

const keyOf = (from: ImagePx, to: ImagePx) => `${from[0]},${from[1]}|${to[0]},${to[1]}`;

export class ScanLineTracer {
  private worker: Worker;
  private trees: TreeRef[] = [];
  private nextId = 1;
  /** The tree asked for while another is being built: only the latest is kept. */
  private wanted: { from: ImagePx; win: Raster } | null = null;
  private building = false;
  private chain: Promise<void> = Promise.resolve();
  private tiles = new Map<string, true>();
  private paths = new Map<string, ImagePx[]>();
  private asked = new Set<string>();
  private snapCanvas: OffscreenCanvas | null = null;
  private closed = false;
  /** Bytes the worker reported holding after its latest tree. */
  bytesHeld = 0;

  constructor(private bitmap: ImageBitmap, private onReady: () => void) {
    this.worker = new Worker(new URL('./workers/traceLine.worker.ts', import.meta.url), { type: 'module' });
    this.worker.onmessage = (e: MessageEvent<TraceWorkerReply>) => this.receive(e.data);
  }

  /** Stops the worker; later questions get no answers. */
  close(): void {
    this.closed = true;
    this.worker.terminate();
  }

  /** Returns the line centre within `radiusPx` (at most MAX_SNAP_RADIUS_PX) of p, or null where no line is drawn. */
  snap(p: ImagePx, radiusPx: number): ImagePx | null {
    const r = Math.min(radiusPx, MAX_SNAP_RADIUS_PX);
    const x0 = Math.max(0, Math.floor(p[0] - r - 3));
    const y0 = Math.max(0, Math.floor(p[1] - r - 3));
    const x1 = Math.min(this.bitmap.width, Math.ceil(p[0] + r + 3));
    const y1 = Math.min(this.bitmap.height, Math.ceil(p[1] + r + 3));
    if (x1 - x0 < 3 || y1 - y0 < 3) return null;
    const w = x1 - x0;
    const h = y1 - y0;
    if (!this.snapCanvas) this.snapCanvas = new OffscreenCanvas(2 * MAX_SNAP_RADIUS_PX + 8, 2 * MAX_SNAP_RADIUS_PX + 8);
    const ctx = this.snapCanvas.getContext('2d', { willReadFrequently: true }) as OffscreenCanvasRenderingContext2D;
    ctx.clearRect(0, 0, w, h);
    ctx.drawImage(this.bitmap, x0, y0, w, h, 0, 0, w, h);
    const rgba = ctx.getImageData(0, 0, w, h).data;
    const q = snapToLine(pixelFeatures(rgba, w, h, x0, y0), p[0], p[1], r);
    return q ? [q[0], q[1]] : null;
  }

  /**
   * Returns the traced stretch from `from` to `to` when ready (first point `from`, last `to`), else null and starts it:
   * a placed stretch (`placed`) by a search that stops at `to`; a preview by the anchor's tree, which then answers
   * later pointer positions at once.
   */
  stretch(from: ImagePx, to: ImagePx, placed = false): ImagePx[] | null {
    const key = keyOf(from, to);
    const done = this.paths.get(key);
    if (done) return done;
    const W = this.bitmap.width;
    const H = this.bitmap.height;
    const inside = (p: ImagePx) => p[0] >= 0 && p[1] >= 0 && p[0] <= W && p[1] <= H;
    // Off the scan, or no length to follow: a straight stretch.
    if (!inside(from) || !inside(to) || Math.hypot(to[0] - from[0], to[1] - from[1]) < 1.5) return [from, to];
    if (this.closed) return [from, to];
    if (this.asked.has(key)) return null;
    const tree = [...this.trees].reverse().find((t) => t.from[0] === from[0] && t.from[1] === from[1] && windowCovers(t.win, to, W, H));
    if (tree) {
      this.asked.add(key);
      this.post({ type: 'path', id: tree.id, key, to: [to[0], to[1]] });
      return null;
    }
    const win = traceWindow(from, to, W, H);
    if (placed) {
      this.asked.add(key);
      this.enqueue(async () => {
        const tileKeys = await this.sendTiles(win);
        this.post({ type: 'once', key, from: [from[0], from[1]], to: [to[0], to[1]], win, tileKeys });
      });
      return null;
    }
    this.wanted = { from, win };
    this.pumpTree();
    return null;
  }

  private post(m: TraceWorkerRequest, transfer: Transferable[] = []): void {
    this.worker.postMessage(m, transfer);
  }

  /** Runs sends one after another, so the worker gets every tile before the request that needs it. */
  private enqueue(job: () => Promise<void>): void {
    this.chain = this.chain.then(job).catch((err: unknown) => console.error(`Line tracing: ${err instanceof Error ? err.message : String(err)}`));
  }

  /** Sends the window's tiles the worker lacks (each one pixel wider where the image allows); returns the window's tile keys. */
  private async sendTiles(win: Raster): Promise<string[]> {
    const W = this.bitmap.width;
    const H = this.bitmap.height;
    const tiles = tilesOver(win, W, H);
    for (const t of tiles) {
      if (this.tiles.has(t.key)) {
        this.tiles.delete(t.key);
        this.tiles.set(t.key, true);
        continue;
      }
      const cx0 = Math.max(0, t.x0 - 1);
      const cy0 = Math.max(0, t.y0 - 1);
      const crop = { x0: cx0, y0: cy0, w: Math.min(W, t.x0 + t.w + 1) - cx0, h: Math.min(H, t.y0 + t.h + 1) - cy0 };
      const bitmap = await createImageBitmap(this.bitmap, crop.x0, crop.y0, crop.w, crop.h);
      if (this.closed) return [];
      this.post({ type: 'tile', key: t.key, tile: { x0: t.x0, y0: t.y0, w: t.w, h: t.h }, crop, bitmap }, [bitmap]);
      this.tiles.set(t.key, true);
    }
    // Past the cap, forget the least recently used tiles that this window does not need.
    const need = new Set(tiles.map((t) => t.key));
    const drop: string[] = [];
    for (const k of this.tiles.keys()) {
      if (this.tiles.size - drop.length <= TILES_KEPT) break;
      if (!need.has(k)) drop.push(k);
    }
    if (drop.length > 0) {
      for (const k of drop) this.tiles.delete(k);
      this.post({ type: 'drop', keys: drop });
    }
    return tiles.map((t) => t.key);
  }

  /** Sends the wanted tree when no other is being built (only the latest wanted is kept). */
  private pumpTree(): void {
    if (this.building || !this.wanted || this.closed) return;
    const { from, win } = this.wanted;
    this.wanted = null;
    this.building = true;
    this.enqueue(async () => {
      try {
        const tileKeys = await this.sendTiles(win);
        if (this.closed) return;
        const id = this.nextId++;
        this.trees.push({ id, from, win });
        while (this.trees.length > TREES_KEPT) this.trees.shift();
        this.post({ type: 'tree', id, from: [from[0], from[1]], win, tileKeys });
      } catch (err) {
        this.building = false;
        throw err;
      }
    });
  }

  private receive(m: TraceWorkerReply): void {
    if (this.closed) return;
    if (m.type === 'treeDone') {
      this.building = false;
      this.bytesHeld = m.bytesHeld;
      this.pumpTree();
    } else if (m.type === 'path') {
      this.asked.delete(m.key);
      if (m.points) {
        this.paths.set(m.key, m.points);
        while (this.paths.size > PATHS_KEPT) this.paths.delete(this.paths.keys().next().value as string);
      } else {
        // That tree is no longer kept: the next ask builds another.
        this.trees = this.trees.filter((t) => t.id !== m.id);
      }
    } else {
      // A tile or path the worker could not handle: say so; the stretch stays straight.
      console.error(`Line tracing: ${m.message}`);
    }
    this.onReady();
  }
}

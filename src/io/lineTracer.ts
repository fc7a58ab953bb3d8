// The scan's line tracer for the drawing tools: snapping reads a few pixels on the main thread; traced
// stretches are computed in a worker (feature tiles, one shortest-path tree per anchor, the path read
// back per pointer position), so a large scan never stalls the page. Answers are synchronous — ready or
// not yet — and `onReady` is called whenever something asked for has arrived.
// The first preview from an anchor is progressive: at once a straight segment; while the full-resolution tiles and
// tree are computed, a second worker searches the same window reduced to about COARSE_PIXELS pixels (so a few
// milliseconds however long the stretch: the tree is sent with the pointer position and answers it at once), and
// its path, mapped back to the image, is shown until the full one is ready. The window is read halved by the browser
// until it fits ROUGH_READ_PIXELS (a smoothing halving keeps a line 2 px wide at half its darkness or better, one of
// 1 px at a quarter) and the worker keeps the darkest pixel of each block (core/trace/poolDarkest): the browser's own
// resize straight to the rough size sampled a 3 px line away in whole columns, and the rough path ran straight. Both
// workers are warmed up when the tracer starts. As soon as an anchor is placed, the tree around it is built ahead,
// towards where the line was heading, so the next preview usually finds its tree waiting.
import type { ImagePx } from '../core/model/projectDoc';
import { pixelFeatures } from '../core/trace/pixelFeatures';
import type { Raster } from '../core/trace/raster';
import { roughReduction } from '../core/trace/roughReduction';
import { roughToImage } from '../core/trace/roughToImage';
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
/** The rough search reduces the window to about this many pixels (and by at least 2 in each direction). */
export const COARSE_PIXELS = 16_000;
/**
 * A rough window is read at full resolution up to this many pixels, a larger one halved by the browser until it fits
 * (a 3,000 px stretch's window, 1.4 MP, is read halved).
 */
export const ROUGH_READ_PIXELS = 400_000;

/** Longest run of tile cuts on the page before it yields (ms). */
const CUT_SLICE_MS = 6;

/** Resolves in a later task, so input and drawing waiting on the page go first. */
function yieldToPage(): Promise<void> {
  const scheduler = (globalThis as { scheduler?: { yield?: () => Promise<void> } }).scheduler;
  if (scheduler?.yield) return scheduler.yield();
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => resolve();
    channel.port2.postMessage(null);
  });
}

/** A rough tree: its anchor and window (image px), and the window's image px per reduced pixel across and down. */
interface CoarseRef { id: number; from: ImagePx; win: Raster; sx: number; sy: number }

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
  /** The second worker, for the rough first previews (made when first needed). */
  private coarseWorker: Worker | null = null;
  private coarseTrees: CoarseRef[] = [];
  private coarseWanted: { from: ImagePx; win: Raster } | null = null;
  private coarseBuilding = false;
  private coarsePaths = new Map<string, ImagePx[]>();
  private coarseAsked = new Set<string>();
  /** Placed stretches whose look-ahead trees were started. */
  private aheadOf = new Set<string>();
  /** The pointer position the wanted rough tree answers once built. */
  private coarseFor: { key: string; to: ImagePx } | null = null;
  /** The latest snap asked and its answer. */
  private lastSnap: { x: number; y: number; r: number; q: ImagePx | null } | null = null;
  /** Bytes the worker reported holding after its latest tree. */
  bytesHeld = 0;

  constructor(private bitmap: ImageBitmap, private onReady: () => void) {
    this.worker = new Worker(new URL('./workers/traceLine.worker.ts', import.meta.url), { type: 'module' });
    this.worker.onmessage = (e: MessageEvent<TraceWorkerReply>) => this.receive(e.data);
    this.post({ type: 'warm' });
    // The rough worker is started at once, so that the first preview does not wait for it to load.
    this.coarse().postMessage({ type: 'warm' } satisfies TraceWorkerRequest);
  }

  /** Stops the worker; later questions get no answers. */
  close(): void {
    this.closed = true;
    this.worker.terminate();
    this.coarseWorker?.terminate();
  }

  /** Returns the line centre within `radiusPx` (at most MAX_SNAP_RADIUS_PX) of p, or null where no line is drawn. */
  snap(p: ImagePx, radiusPx: number): ImagePx | null {
    const r = Math.min(radiusPx, MAX_SNAP_RADIUS_PX);
    // The preview asks again for the same pointer each time a traced stretch arrives: a snap took ~10 ms of the page.
    const last = this.lastSnap;
    if (last && last.x === p[0] && last.y === p[1] && last.r === r) return last.q ? [last.q[0], last.q[1]] : null;
    const q = this.snapAt(p, r);
    this.lastSnap = { x: p[0], y: p[1], r, q };
    return q;
  }

  private snapAt(p: ImagePx, r: number): ImagePx | null {
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
    // A placed anchor starts the trees around it, ahead of the pointer, whichever way its own stretch is found.
    if (placed && !this.aheadOf.has(key)) {
      this.aheadOf.add(key);
      this.buildAhead(from, to);
    }
    if (this.asked.has(key)) return placed ? null : this.roughStretch(from, to, key);
    const tree = [...this.trees].reverse().find((t) => t.from[0] === from[0] && t.from[1] === from[1] && windowCovers(t.win, to, W, H));
    if (tree) {
      this.asked.add(key);
      this.post({ type: 'path', id: tree.id, key, to: [to[0], to[1]] });
      return placed ? null : this.roughStretch(from, to, key);
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
    // The rough tree first: the full-resolution one waits until it is built (see pumpTree).
    const rough = this.roughStretch(from, to, key);
    this.pumpTree();
    return rough;
  }

  /** Builds the trees of a just-placed anchor `to` ahead of the pointer: over the window of a stretch as long as the last, going on the same way. */
  private buildAhead(from: ImagePx, to: ImagePx): void {
    const W = this.bitmap.width;
    const H = this.bitmap.height;
    const next: ImagePx = [Math.min(W, Math.max(0, 2 * to[0] - from[0])), Math.min(H, Math.max(0, 2 * to[1] - from[1]))];
    const win = traceWindow(to, next, W, H);
    if (win.w <= 0 || win.h <= 0) return;
    this.wanted = { from: to, win };
    this.coarseWanted = { from: to, win };
    this.coarseFor = null;
    this.pumpCoarse();
    this.pumpTree();
  }

  /** Returns the rough preview from `from` to `to` when its reduced-resolution search has it, else null and starts it. */
  private roughStretch(from: ImagePx, to: ImagePx, key: string): ImagePx[] | null {
    const done = this.coarsePaths.get(key);
    if (done) return done;
    if (this.closed || this.coarseAsked.has(key)) return null;
    const W = this.bitmap.width;
    const H = this.bitmap.height;
    const tree = [...this.coarseTrees].reverse().find((t) => t.from[0] === from[0] && t.from[1] === from[1] && windowCovers(t.win, to, W, H, 2 * Math.max(t.sx, t.sy)));
    if (tree) {
      this.coarseAsked.add(key);
      const c: [number, number] = [(to[0] - tree.win.x0) / tree.sx, (to[1] - tree.win.y0) / tree.sy];
      this.coarse().postMessage({ type: 'path', id: tree.id, key, to: c } satisfies TraceWorkerRequest);
      return null;
    }
    this.coarseWanted = { from, win: traceWindow(from, to, W, H) };
    this.coarseFor = { key, to };
    this.pumpCoarse();
    return null;
  }

  private coarse(): Worker {
    if (!this.coarseWorker) {
      this.coarseWorker = new Worker(new URL('./workers/traceLine.worker.ts', import.meta.url), { type: 'module' });
      this.coarseWorker.onmessage = (e: MessageEvent<TraceWorkerReply>) => this.receiveCoarse(e.data);
    }
    return this.coarseWorker;
  }

  /** Sends the wanted rough tree when no other is being built: the window read halved (roughReduction), reduced by blocks in the worker, as one tile. */
  private pumpCoarse(): void {
    if (this.coarseBuilding || !this.coarseWanted || this.closed) return;
    const { from, win } = this.coarseWanted;
    const answer = this.coarseFor;
    this.coarseWanted = null;
    this.coarseFor = null;
    const { readW, readH, scale, pool, cw, ch, sx, sy } = roughReduction(win.w, win.h, COARSE_PIXELS, ROUGH_READ_PIXELS);
    this.coarseBuilding = true;
    const id = this.nextId++;
    const key = `coarse-${id}`;
    const resize = scale > 1 ? { resizeWidth: readW, resizeHeight: readH, resizeQuality: 'medium' as const } : {};
    createImageBitmap(this.bitmap, win.x0, win.y0, win.w, win.h, resize).then((bitmap) => {
      if (this.closed) return;
      const worker = this.coarse();
      const whole = { x0: 0, y0: 0, w: cw, h: ch };
      worker.postMessage({ type: 'tile', key, tile: whole, crop: whole, bitmap, pool } satisfies TraceWorkerRequest, [bitmap]);
      const c: [number, number] = [(from[0] - win.x0) / sx, (from[1] - win.y0) / sy];
      // The pointer position that asked is answered with the tree, in the same turn of the worker.
      let path: { key: string; to: [number, number] } | undefined;
      if (answer && windowCovers(win, answer.to, this.bitmap.width, this.bitmap.height, 2 * Math.max(sx, sy))) {
        path = { key: answer.key, to: [(answer.to[0] - win.x0) / sx, (answer.to[1] - win.y0) / sy] };
        this.coarseAsked.add(answer.key);
      }
      worker.postMessage({ type: 'tree', id, from: c, win: whole, tileKeys: [key], path } satisfies TraceWorkerRequest);
      // The tile served only this tree: the worker keeps the tree's own copy of its features.
      worker.postMessage({ type: 'drop', keys: [key] } satisfies TraceWorkerRequest);
      this.coarseTrees.push({ id, from, win, sx, sy });
      while (this.coarseTrees.length > TREES_KEPT) this.coarseTrees.shift();
    }).catch((err: unknown) => {
      this.coarseBuilding = false;
      this.pumpTree();
      console.error(`Line tracing: ${err instanceof Error ? err.message : String(err)}`);
    });
  }

  private receiveCoarse(m: TraceWorkerReply): void {
    if (this.closed) return;
    if (m.type === 'treeDone') {
      this.coarseBuilding = false;
      // The full-resolution tree held back for this one starts first, so a pointer asking new windows all the time
      // cannot keep it waiting.
      this.pumpTree();
      this.pumpCoarse();
    } else if (m.type === 'path') {
      this.coarseAsked.delete(m.key);
      const tree = this.coarseTrees.find((t) => t.id === m.id);
      if (m.points && tree) {
        // Back to image pixels, with the ends exactly at the anchor and the pointer.
        const [a, b] = m.key.split('|').map((t) => t.split(',').map(Number) as ImagePx);
        this.coarsePaths.set(m.key, roughToImage(m.points, tree.win, tree.sx, tree.sy, a, b));
        while (this.coarsePaths.size > PATHS_KEPT) this.coarsePaths.delete(this.coarsePaths.keys().next().value as string);
      } else {
        this.coarseTrees = this.coarseTrees.filter((t) => t.id !== m.id);
      }
    } else {
      console.error(`Line tracing: ${m.message}`);
    }
    this.onReady();
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
    let since = performance.now();
    for (const t of tiles) {
      // Cutting a tile from the scan runs on the page (about 1.3 ms each): a window's thirty ran as one 40 ms task and
      // held up the preview drawn meanwhile. Past CUT_SLICE_MS the page gets its turn.
      if (performance.now() - since > CUT_SLICE_MS) {
        await yieldToPage();
        if (this.closed) return [];
        since = performance.now();
      }
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

  /**
   * Sends the wanted tree when no other is being built (only the latest wanted is kept), nor a rough one: on a busy
   * machine the two workers shared the cores and the rough first preview, a few milliseconds of work, came after
   * hundreds; the full-resolution tree, which takes far longer, waits that long for it.
   */
  private pumpTree(): void {
    if (this.building || this.coarseBuilding || !this.wanted || this.closed) return;
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

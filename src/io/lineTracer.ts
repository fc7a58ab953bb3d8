// The scan's line tracer for the drawing tools: snapping reads a few pixels on the main thread; the cost of a
// traced stretch is computed in a worker (feature tiles, one shortest-path tree per anchor), and each tree, once
// built, is handed to the page (core/trace/handedTree: transferred, not copied), which reads the path to every
// pointer position from it in the move's own task: a preview follows the pointer in the frame the move arrives in,
// with no round trip to a worker. Answers are synchronous — ready or not yet — and `onReady` is called whenever
// something asked for has arrived.
// The first preview from an anchor is progressive: at once a straight segment; while the full-resolution tiles and
// tree are computed, a second worker searches the same window reduced to about COARSE_PIXELS pixels (so a few
// milliseconds however long the stretch), and its path, mapped back to the image, is shown until the full one is
// ready. The window is read halved by the browser until it fits ROUGH_READ_PIXELS (a smoothing halving keeps a line
// 2 px wide at half its darkness or better, one of 1 px at a quarter) and the worker keeps the darkest pixel of each
// block (core/trace/poolDarkest): the browser's own resize straight to the rough size sampled a 3 px line away in
// whole columns, and the rough path ran straight. Both workers are warmed up when the tracer starts. As soon as an
// anchor is placed, the tree around it is built ahead, towards where the line was heading, so the next preview
// usually finds its tree waiting.
import type { ImagePx } from '../core/model/projectDoc';
import { pixelFeatures } from '../core/trace/pixelFeatures';
import type { Raster } from '../core/trace/raster';
import { roughReduction } from '../core/trace/roughReduction';
import { roughToImage } from '../core/trace/roughToImage';
import { snapToLine } from '../core/trace/snapToLine';
import { TraceSession } from '../core/trace/traceSession';
import { tilesOver, traceWindow, windowCovers } from '../core/trace/traceWindow';
import type { TraceWorkerReply, TraceWorkerRequest } from './workers/traceLine.worker';

/** Feature tiles the worker keeps (least recently used go first): 96 tiles of 256² px, about 50 MB. */
export const TILES_KEPT = 96;
/** Largest snap radius, in image px, however far the view is zoomed out. */
export const MAX_SNAP_RADIUS_PX = 24;
/** Stretches kept once traced (the committed ones are asked again until the line is finished). */
const PATHS_KEPT = 256;
/** Trees the page keeps; the same number as its session keeps. */
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
const sameAnchor = (a: ImagePx, b: ImagePx) => a[0] === b[0] && a[1] === b[1];

export class ScanLineTracer {
  private worker: Worker;
  /** The trees handed over by the workers, full-resolution and rough: the paths to the pointer are read here. */
  private held = new TraceSession();
  private heldRough = new TraceSession();
  /** The full-resolution trees held (oldest first, as `held` keeps them). */
  private trees: TreeRef[] = [];
  /** The pointer position last asked, towards which the next tree centres its path before handing it over. */
  private toward: ImagePx | null = null;
  private nextId = 1;
  /** The tree asked for while another is being built: only the latest is kept. */
  private wanted: { from: ImagePx; win: Raster } | null = null;
  private building = false;
  /** The tree being built, while `building`. */
  private buildingFor: { from: ImagePx; win: Raster } | null = null;
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
  /** The rough tree being built, while `coarseBuilding`. */
  private coarseBuildingFor: { from: ImagePx; win: Raster } | null = null;
  private coarsePaths = new Map<string, ImagePx[]>();
  /** Placed stretches whose look-ahead trees were started. */
  private aheadOf = new Set<string>();
  /** The latest snap asked and its answer. */
  private lastSnap: { x: number; y: number; r: number; q: ImagePx | null } | null = null;
  /** The rough paths handed out, so a preview can say it shows a stand-in. */
  private roughPaths = new WeakSet<readonly ImagePx[]>();
  /** Bytes the worker reported holding after its latest tree. */
  private workerBytes = 0;

  constructor(private bitmap: ImageBitmap, private onReady: () => void) {
    this.worker = new Worker(new URL('./workers/traceLine.worker.ts', import.meta.url), { type: 'module' });
    this.worker.onmessage = (e: MessageEvent<TraceWorkerReply>) => this.receive(e.data);
    this.post({ type: 'warm' });
    // The rough worker is started at once, so that the first preview does not wait for it to load.
    this.coarse().postMessage({ type: 'warm' } satisfies TraceWorkerRequest);
    // The page reads paths too: its own warm-up compiles that code before the first preview needs it.
    setTimeout(() => new TraceSession().warmUp(), 0);
  }

  /** Bytes held by tracing: the worker's tiles and the trees held on the page. */
  get bytesHeld(): number {
    return this.workerBytes + this.held.bytesHeld() + this.heldRough.bytesHeld();
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
    // Near a line being traced the features are held here already (a tree's window): no pixels to read.
    const held = this.held.featuresOver(x0, y0, x1, y1);
    if (held) {
      const q = snapToLine(held, p[0], p[1], r);
      return q ? [q[0], q[1]] : null;
    }
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
    if (!placed) this.toward = to;
    // A tree held here answers at once: the path is read in this task.
    const read = this.readHeld(from, to);
    if (read) {
      this.keepPath(key, read);
      return read;
    }
    if (this.asked.has(key)) return placed ? null : this.roughStretch(from, to, key);
    const win = traceWindow(from, to, W, H);
    if (placed) {
      this.asked.add(key);
      this.enqueue(async () => {
        const tileKeys = await this.sendTiles(win);
        this.post({ type: 'once', key, from: [from[0], from[1]], to: [to[0], to[1]], win, tileKeys });
      });
      return null;
    }
    // A tree being built for this anchor and covering the pointer answers when it arrives.
    const coming = this.building && this.buildingFor && sameAnchor(this.buildingFor.from, from) && windowCovers(this.buildingFor.win, to, W, H);
    if (!coming) this.wanted = { from, win };
    // The rough tree first: the full-resolution one waits until it is built (see pumpTree).
    const rough = this.roughStretch(from, to, key);
    this.pumpTree();
    return rough;
  }

  /** Returns the path from `from` to `to` read from a full-resolution tree held here, or null when none covers it. */
  private readHeld(from: ImagePx, to: ImagePx): ImagePx[] | null {
    const W = this.bitmap.width;
    const H = this.bitmap.height;
    for (let i = this.trees.length - 1; i >= 0; i--) {
      const t = this.trees[i];
      if (!sameAnchor(t.from, from) || !windowCovers(t.win, to, W, H)) continue;
      const points = this.held.path(t.id, [to[0], to[1]]);
      if (points) return points;
      // That tree is no longer held.
      this.trees.splice(i, 1);
    }
    return null;
  }

  private keepPath(key: string, points: ImagePx[]): void {
    this.paths.set(key, points);
    while (this.paths.size > PATHS_KEPT) this.paths.delete(this.paths.keys().next().value as string);
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
    this.pumpCoarse();
    this.pumpTree();
  }

  /** Returns the rough preview from `from` to `to` when its reduced-resolution tree is held here, else null and starts it. */
  private roughStretch(from: ImagePx, to: ImagePx, key: string): ImagePx[] | null {
    const done = this.coarsePaths.get(key);
    if (done) return done;
    if (this.closed) return null;
    const W = this.bitmap.width;
    const H = this.bitmap.height;
    for (let i = this.coarseTrees.length - 1; i >= 0; i--) {
      const t = this.coarseTrees[i];
      if (!sameAnchor(t.from, from) || !windowCovers(t.win, to, W, H, 2 * Math.max(t.sx, t.sy))) continue;
      const c: [number, number] = [(to[0] - t.win.x0) / t.sx, (to[1] - t.win.y0) / t.sy];
      const reduced = this.heldRough.path(t.id, c);
      if (!reduced) {
        this.coarseTrees.splice(i, 1);
        continue;
      }
      // Back to image pixels, with the ends exactly at the anchor and the pointer.
      const points = roughToImage(reduced, t.win, t.sx, t.sy, from, to);
      this.roughPaths.add(points);
      this.coarsePaths.set(key, points);
      while (this.coarsePaths.size > PATHS_KEPT) this.coarsePaths.delete(this.coarsePaths.keys().next().value as string);
      return points;
    }
    const pending = this.coarseBuilding && this.coarseBuildingFor && sameAnchor(this.coarseBuildingFor.from, from) && windowCovers(this.coarseBuildingFor.win, to, W, H);
    if (!pending) {
      this.coarseWanted = { from, win: traceWindow(from, to, W, H) };
      this.pumpCoarse();
    }
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
    this.coarseWanted = null;
    const { readW, readH, scale, pool, cw, ch, sx, sy } = roughReduction(win.w, win.h, COARSE_PIXELS, ROUGH_READ_PIXELS);
    this.coarseBuilding = true;
    this.coarseBuildingFor = { from, win };
    const id = this.nextId++;
    const key = `coarse-${id}`;
    const resize = scale > 1 ? { resizeWidth: readW, resizeHeight: readH, resizeQuality: 'medium' as const } : {};
    createImageBitmap(this.bitmap, win.x0, win.y0, win.w, win.h, resize).then((bitmap) => {
      if (this.closed) return;
      const worker = this.coarse();
      const whole = { x0: 0, y0: 0, w: cw, h: ch };
      worker.postMessage({ type: 'tile', key, tile: whole, crop: whole, bitmap, pool } satisfies TraceWorkerRequest, [bitmap]);
      const c: [number, number] = [(from[0] - win.x0) / sx, (from[1] - win.y0) / sy];
      // Centred towards the pointer as it is now, so the first rough path read here finds its centres done.
      const p = this.toward;
      const toward: [number, number] | undefined = p && windowCovers(win, p, this.bitmap.width, this.bitmap.height) ? [(p[0] - win.x0) / sx, (p[1] - win.y0) / sy] : undefined;
      worker.postMessage({ type: 'tree', id, from: c, win: whole, tileKeys: [key], toward } satisfies TraceWorkerRequest);
      // The tile served only this tree.
      worker.postMessage({ type: 'drop', keys: [key] } satisfies TraceWorkerRequest);
      this.coarseTrees.push({ id, from, win, sx, sy });
      while (this.coarseTrees.length > TREES_KEPT) this.coarseTrees.shift();
    }).catch((err: unknown) => {
      this.coarseBuilding = false;
      this.coarseBuildingFor = null;
      this.pumpTree();
      console.error(`Line tracing: ${err instanceof Error ? err.message : String(err)}`);
    });
  }

  private receiveCoarse(m: TraceWorkerReply): void {
    if (this.closed) return;
    if (m.type === 'treeDone') {
      this.coarseBuilding = false;
      this.coarseBuildingFor = null;
      if (m.tree) this.heldRough.putTree(m.tree);
      else this.coarseTrees = this.coarseTrees.filter((t) => t.id !== m.id);
      // The full-resolution tree held back for this one starts first, so a pointer asking new windows all the time
      // cannot keep it waiting.
      this.pumpTree();
      this.pumpCoarse();
    } else if (m.type === 'error') {
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
    this.buildingFor = { from, win };
    this.enqueue(async () => {
      try {
        const tileKeys = await this.sendTiles(win);
        if (this.closed) return;
        const id = this.nextId++;
        // Centred towards the pointer as it is now, so the first path read here finds its centres done.
        const p = this.toward;
        const toward: [number, number] | undefined = p && windowCovers(win, p, this.bitmap.width, this.bitmap.height) ? [p[0], p[1]] : undefined;
        this.post({ type: 'tree', id, from: [from[0], from[1]], win, tileKeys, toward });
      } catch (err) {
        this.building = false;
        this.buildingFor = null;
        throw err;
      }
    });
  }

  private receive(m: TraceWorkerReply): void {
    if (this.closed) return;
    if (m.type === 'treeDone') {
      const made = this.buildingFor;
      this.building = false;
      this.buildingFor = null;
      this.workerBytes = m.bytesHeld;
      if (m.tree && made) {
        this.held.putTree(m.tree);
        this.trees.push({ id: m.id, from: made.from, win: made.win });
        while (this.trees.length > TREES_KEPT) this.trees.shift();
      }
      this.pumpTree();
    } else if (m.type === 'path') {
      this.asked.delete(m.key);
      if (m.points) this.keepPath(m.key, m.points);
    } else {
      // A tile or path the worker could not handle: say so; the stretch stays straight.
      console.error(`Line tracing: ${m.message}`);
    }
    this.onReady();
  }
}

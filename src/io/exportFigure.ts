// The annotated section as SVG or PNG, drawn from renderSectionSvg. The SVG inlines the scan once as a
// data: URL, written into the file piece by piece. The PNG is drawn in a worker from the same figure markup (io/paintFigureSvg), in three layers:
// the figure below the scan, the scan region the panel shows, taken from the scan's tile pyramid at about the
// PNG's resolution and drawn through the calibration's matrix (the scan's file never passes through a string),
// and the figure above it; then encoded there. The worker paints the figure while the page takes the scan region,
// and stays for the next export. The figure of the open project is put together in state/currentFigureSvg.
import { FIGURE_HEIGHT, FIGURE_WIDTH, scanImageOpen, type SectionSvgParts } from './renderSectionSvg';
import { figureScanRegion } from './figureScanRegion';
import { base64Pieces } from './base64Pieces';
import type { FigurePngPrepare, FigurePngReply, FigurePngRequest, FigurePngScan, FigureScanRegion, PngStep } from './figurePngProtocol';

export type { PngStep } from './figurePngProtocol';

/** PNG sizes offered; the last is A3 landscape at 300 dpi (420 × 297 mm). */
export const PNG_SIZES = [
  { id: 'screen', label: 'Screen (1400 × 990 px)', width: 1400, height: 990 },
  { id: 'a4-150', label: 'A4 at 150 dpi (1754 × 1240 px)', width: 1754, height: 1240 },
  { id: 'a4-300', label: 'A4 at 300 dpi (3508 × 2480 px)', width: 3508, height: 2480 },
  { id: 'a3-300', label: 'A3 at 300 dpi (4961 × 3508 px)', width: 4961, height: 3508 },
] as const;

/**
 * Returns a scan of the given MIME type as the parts of a data: URL the SVG can embed (joined, they are the URL),
 * each piece of its base64 a Blob of its own: its original bytes for PNG, JPEG and WebP, else its decoded bitmap
 * re-encoded as PNG (the browser cannot show TIFF or PDF in an SVG). Read and encoded a piece at a time
 * (io/base64Pieces), so a scan file of hundreds of megabytes never becomes one string, nor all its pieces strings
 * at once, and no task of the page encodes more than one piece.
 */
export async function scanDataUrlParts(type: string, scan: { bitmap: ImageBitmap; bytes: Blob }): Promise<Blob[]> {
  let bytes: Blob;
  let mime = type;
  if (/^image\/(png|jpeg|webp)$/.test(type)) bytes = scan.bytes;
  else {
    const canvas = new OffscreenCanvas(scan.bitmap.width, scan.bitmap.height);
    canvas.getContext('2d')?.drawImage(scan.bitmap, 0, 0);
    bytes = await canvas.convertToBlob({ type: 'image/png' });
    canvas.width = canvas.height = 0;
    mime = 'image/png';
  }
  const parts = [new Blob([`data:${mime};base64,`])];
  for await (const piece of base64Pieces(bytes)) parts.push(new Blob([piece]));
  return parts;
}

/** Returns the figure as an SVG file: its parts with the scan embedded once from the data: URL's parts (none: drawn without it). Base64 needs no XML escaping. */
export function sectionSvgBlob(parts: SectionSvgParts, scanUrlParts: Blob[] | null): Blob {
  const image = parts.scan && scanUrlParts ? [scanImageOpen(parts.scan), ...scanUrlParts, '"/>'] : [];
  return new Blob([parts.head, parts.under, parts.panelOpen, ...image, parts.over, '</svg>'], { type: 'image/svg+xml' });
}

/**
 * The decoded scan to draw a PNG from: its bitmap and, when it has one, its tile pyramid (state/scanTilesPyramid):
 * the sizes of its levels and `region`, which returns a level's rectangle [x0, x1) × [y0, y1) (level pixels) as a new
 * bitmap of its own (the worker takes and closes it), made from the tiles without a second full copy of the scan.
 */
export interface FigureScanSource {
  bitmap: ImageBitmap;
  pyramid: {
    levels: { factor: number; widthPx: number; heightPx: number }[];
    region: (level: number, x0: number, y0: number, x1: number, y1: number) => Promise<ImageBitmap>;
    /** A level's tiles once made (row by row, `cols` a row, each `tilePx` level pixels a side but at the edges), else null. */
    heldTiles?: (level: number) => { tiles: ImageBitmap[]; cols: number; tilePx: number } | null;
  } | null;
}

/**
 * The tiles of a made level that overlap [x0, x1) × [y0, y1) (level pixels), each as a new bitmap of the same
 * pixels (the browser shares them: no copy is drawn on this page), placed at its offset from the region's corner;
 * the worker puts them together. Null when the level is not made.
 */
async function heldRegionTiles(py: NonNullable<FigureScanSource['pyramid']>, level: number, x0: number, y0: number, x1: number, y1: number): Promise<FigureScanRegion['tiles'] | null> {
  const held = py.heldTiles?.(level);
  if (!held) return null;
  const { tiles, cols, tilePx } = held;
  const wanted: Promise<{ bitmap: ImageBitmap; x: number; y: number }>[] = [];
  for (let row = Math.floor(y0 / tilePx); row * tilePx < y1; row++) {
    for (let col = Math.floor(x0 / tilePx); col * tilePx < x1; col++) {
      const tile = tiles[row * cols + col];
      if (!tile) continue;
      wanted.push(createImageBitmap(tile).then((bitmap) => ({ bitmap, x: col * tilePx - x0, y: row * tilePx - y0 })));
    }
  }
  return Promise.all(wanted);
}

/** The outcome of a PNG export. */
export type FigurePngResult = { ok: true; blob: Blob } | { ok: false; cancelled: boolean; message: string };

/** A PNG export under way: its outcome, and a cancel that stops the work at once. */
export interface FigurePngJob { done: Promise<FigurePngResult>; cancel: () => void }

/**
 * Returns the pieces of the scan region the figure shows, at about its resolution, as bitmaps of their own
 * (the worker takes and closes them; the scan and its tiles stay as they are); null when none shows.
 */
async function scanRegion(parts: SectionSvgParts, source: FigureScanSource, width: number, height: number, stopped: () => boolean): Promise<FigureScanRegion | null> {
  const place = parts.scan;
  if (!place) return null;
  const py = source.pyramid;
  const levels = py?.levels ?? [{ factor: 1, widthPx: place.widthPx, heightPx: place.heightPx, cols: 1, rows: 1 }];
  const choice = figureScanRegion(place, place.matrix, parts.panel, width / FIGURE_WIDTH, height / FIGURE_HEIGHT, levels);
  if (!choice) return null;
  const base = { matrix: place.matrix, opacity: place.opacity, regionW: choice.x1 - choice.x0, regionH: choice.y1 - choice.y0 };
  const tiles: FigureScanRegion['tiles'] = [];
  if (!py) {
    // No pyramid yet: the region cropped and reduced from the bitmap itself (by the browser, off this task).
    const [sx, sy, sw, sh] = [choice.x0, choice.y0, choice.x1 - choice.x0, choice.y1 - choice.y0];
    const along = Math.max(Math.hypot(place.matrix[0], place.matrix[1]), Math.hypot(place.matrix[2], place.matrix[3])) * (width / FIGURE_WIDTH);
    const k = Math.min(1, Math.max(along, 1e-6));
    const [rw, rh] = [Math.max(1, Math.ceil(sw * k)), Math.max(1, Math.ceil(sh * k))];
    const bitmap = await createImageBitmap(source.bitmap, sx, sy, sw, sh, { resizeWidth: rw, resizeHeight: rh, resizeQuality: 'high' });
    return { ...base, regionW: rw, regionH: rh, tiles: [{ bitmap, x: 0, y: 0 }], originPx: [sx, sy], pxPerRegionPx: [sw / rw, sh / rh] };
  }
  if (!stopped()) {
    // Full resolution: one crop of the bitmap (a copy made by the browser in one call); a reduced level that is made
    // goes as its tiles, which the worker puts together (putting them together here cost this page 20-50 ms at a
    // screen-sized PNG); one not made yet is halved from the finer level, in blocks.
    const [sw, sh] = [choice.x1 - choice.x0, choice.y1 - choice.y0];
    const held = choice.level === 0 ? null : await heldRegionTiles(py, choice.level, choice.x0, choice.y0, choice.x1, choice.y1);
    if (held) for (const t of held) tiles.push(t);
    else {
      const bitmap = choice.level === 0 ? await createImageBitmap(source.bitmap, choice.x0, choice.y0, sw, sh) : await py.region(choice.level, choice.x0, choice.y0, choice.x1, choice.y1);
      tiles.push({ bitmap, x: 0, y: 0 });
    }
  }
  return { ...base, tiles, originPx: [choice.x0 * choice.factor, choice.y0 * choice.factor], pxPerRegionPx: [choice.factor, choice.factor] };
}

/**
 * The user-timing mark set at each step of a PNG export, the step in its `detail`: 'asked' (the menu's click),
 * 'start', 'posted' (the figure handed to the worker), 'scan-region', 'region-posted', each step the worker reports
 * (PngStep), 'done' and 'handed' (the file given to the browser's download); read by the benchmark (scripts/benchUi.ts) for its breakdown.
 */
export const PNG_STEP_MARK = 'foldroot-png-step';
/** Sets the PNG export's step mark (PNG_STEP_MARK). */
export const markPngStep = (step: string): void => void performance.mark(PNG_STEP_MARK, { detail: step });

/** The worker free for the next export: started ahead (prepareFigurePng) or kept from the last export. */
let idle: Worker | null = null;
const newWorker = () => new Worker(new URL('./workers/figurePng.worker.ts', import.meta.url), { type: 'module' });

/**
 * Starts the PNG worker ahead of an export (e.g. when the export menu opens), so that its script is loaded and
 * compiled by then; one is kept at most. With the figure's parts, the worker also parses their markup meanwhile, so an
 * export of the same figure starts painting at once.
 */
export function prepareFigurePng(parts?: SectionSvgParts): void {
  // Outside a browser (the unit tests) there is no worker to start.
  if (typeof Worker === 'undefined') return;
  idle ??= newWorker();
  if (!parts) return;
  const ahead: FigurePngPrepare = { kind: 'prepare', ...figureDocuments(parts) };
  idle.postMessage(ahead);
}

/** The figure's part below the scan and its part above, each a whole SVG document (as the worker paints them). */
function figureDocuments(parts: SectionSvgParts): { under: string; over: string } {
  return { under: `${parts.head}${parts.under}</svg>`, over: `${parts.head}${parts.panelOpen}${parts.over}</svg>` };
}

/**
 * Starts a PNG of the figure at width × height pixels, drawn and encoded in a worker (io/workers/figurePng.worker.ts):
 * its part below the scan, the scan region it shows through the figure's matrix (clipped to the panel) when there is
 * a scan, and its part above. The worker paints the figure while this page takes the scan region. `onStep` hears each
 * step as it starts. `cancel` ends the worker: the outcome is then `{ ok: false, cancelled: true }` and nothing else
 * is touched. A worker that finished is kept for the next export.
 */
export function startFigurePng(parts: SectionSvgParts, scan: FigureScanSource | null, width: number, height: number,
  onStep: (step: PngStep) => void = () => undefined): FigurePngJob {
  let worker: Worker | null = idle ?? newWorker();
  idle = null;
  let stopped = false;
  let finish: (r: FigurePngResult) => void = () => undefined;
  const done = new Promise<FigurePngResult>((resolve) => { finish = resolve; });
  const settle = (r: FigurePngResult, keepWorker: boolean) => {
    stopped = true;
    if (worker) {
      worker.onmessage = worker.onerror = null;
      if (keepWorker && !idle) idle = worker;
      else worker.terminate();
    }
    worker = null;
    finish(r);
  };
  const cancel = () => {
    if (!stopped) settle({ ok: false, cancelled: true, message: 'Export cancelled.' }, false);
  };
  const w = worker;
  w.onmessage = (e: MessageEvent<FigurePngReply>) => {
    const m = e.data;
    if (stopped) return;
    if (m.kind === 'step') {
      markPngStep(m.step);
      onStep(m.step);
    } else {
      markPngStep('done');
      settle(m.kind === 'done' ? { ok: true, blob: m.blob } : { ok: false, cancelled: false, message: m.message }, true);
    }
  };
  w.onerror = (e) => {
    if (!stopped) settle({ ok: false, cancelled: false, message: e.message || 'The figure could not be drawn.' }, false);
  };
  void (async () => {
    try {
      markPngStep('start');
      const showsScan = Boolean(scan && parts.scan);
      const req: FigurePngRequest = {
        kind: 'figure', ...figureDocuments(parts),
        figure: { width: FIGURE_WIDTH, height: FIGURE_HEIGHT }, panel: parts.panel, width, height, scanFollows: showsScan,
      };
      w.postMessage(req);
      markPngStep('posted');
      if (!scan || !showsScan) return;
      markPngStep('scan-region');
      onStep('scan-region');
      const region = await scanRegion(parts, scan, width, height, () => stopped);
      if (stopped) {
        region?.tiles.forEach((t) => t.bitmap.close());
        return;
      }
      const next: FigurePngScan = { kind: 'scan', scan: region };
      w.postMessage(next, region ? region.tiles.map((t) => t.bitmap) : []);
      markPngStep('region-posted');
    } catch (e) {
      if (!stopped) settle({ ok: false, cancelled: false, message: e instanceof Error ? e.message : String(e) }, false);
    }
  })();
  return { done, cancel };
}

export { FIGURE_WIDTH, FIGURE_HEIGHT };

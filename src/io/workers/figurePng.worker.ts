// Draws the section figure as a PNG off the main thread: the figure's part below the scan, the scan region
// it shows (tiles already at about the figure's resolution, put together without seams, then drawn through the
// figure's matrix and clipped to the panel), the part above, and the PNG encoding. Both parts are the figure's
// own SVG markup (io/renderSectionSvg), painted by io/paintFigureSvg. Reports each step as it starts; the page
// cancels by ending the worker. The figure comes first and is painted while the page takes the scan region, which
// follows in a second message (io/figurePngProtocol); the worker then stays for the next export. The figure's parts
// may come ahead of the export (when the export menu opens): parsed then, an export of the same markup paints from them.
import { paintFigureSvg, parseFigureSvg, type SvgNode } from '../paintFigureSvg';
import type { FigurePngMessage, FigurePngReply, FigurePngRequest, FigureScanRegion } from '../figurePngProtocol';

type Ctx = OffscreenCanvasRenderingContext2D;

const post = (reply: FigurePngReply) => (self as unknown as Worker).postMessage(reply);

function drawScan(ctx: Ctx, req: FigurePngRequest, scan: FigureScanRegion): void {
  // One piece is drawn as it is; several are put together in one canvas first: tiles drawn one by one through a
  // scaling matrix would each be smoothed to their own edges and leave faint seams.
  let image: ImageBitmap | OffscreenCanvas;
  if (scan.tiles.length === 1 && scan.tiles[0].x === 0 && scan.tiles[0].y === 0) image = scan.tiles[0].bitmap;
  else {
    const region = new OffscreenCanvas(scan.regionW, scan.regionH);
    const rctx = region.getContext('2d');
    if (!rctx) throw new Error('This browser cannot draw the scan region off the page.');
    for (const t of scan.tiles) {
      rctx.drawImage(t.bitmap, t.x, t.y);
      t.bitmap.close();
    }
    image = region;
  }
  const { panel, figure } = req;
  ctx.save();
  ctx.scale(req.width / figure.width, req.height / figure.height);
  ctx.beginPath();
  ctx.rect(panel.x, panel.y, panel.w, panel.h);
  ctx.clip();
  const [a, b, c, d, e, f] = scan.matrix;
  ctx.transform(a, b, c, d, e, f);
  // Region pixels → scan pixels: its origin and the pyramid level's size.
  ctx.translate(scan.originPx[0], scan.originPx[1]);
  ctx.scale(scan.pxPerRegionPx[0], scan.pxPerRegionPx[1]);
  ctx.globalAlpha = scan.opacity;
  ctx.imageSmoothingEnabled = true;
  ctx.imageSmoothingQuality = 'high';
  ctx.drawImage(image, 0, 0);
  ctx.restore();
  if (image instanceof ImageBitmap) image.close();
  else image.width = image.height = 0;
}

/** The parts last sent ahead (FigurePngPrepare), with their trees; the next export reuses a tree whose markup is the same. */
let prepared: { under: string; over: string; underTree: SvgNode; overTree: SvgNode } | null = null;

const parsedUnder = (markup: string) => (prepared && prepared.under === markup ? prepared.underTree : parseFigureSvg(markup));
const parsedOver = (markup: string) => (prepared && prepared.over === markup ? prepared.overTree : parseFigureSvg(markup));

/** The export under way: its canvas with the figure's lower part painted, the upper part parsed, waiting for the scan. */
let pending: { req: FigurePngRequest; canvas: OffscreenCanvas; ctx: Ctx; over: SvgNode } | null = null;

function begin(req: FigurePngRequest): void {
  const canvas = new OffscreenCanvas(req.width, req.height);
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('This browser cannot draw a canvas of that size; choose a smaller PNG size.');
  post({ kind: 'step', step: 'figure' });
  ctx.fillStyle = '#ffffff';
  ctx.fillRect(0, 0, req.width, req.height);
  paintFigureSvg(ctx, parsedUnder(req.under), req.width, req.height);
  pending = { req, canvas, ctx, over: parsedOver(req.over) };
}

async function finish(scan: FigureScanRegion | null): Promise<Blob> {
  if (!pending) throw new Error('The figure was not started.');
  const { req, canvas, ctx, over } = pending;
  pending = null;
  if (scan) {
    post({ kind: 'step', step: 'scan' });
    drawScan(ctx, req, scan);
  }
  post({ kind: 'step', step: 'labels' });
  paintFigureSvg(ctx, over, req.width, req.height);
  post({ kind: 'step', step: 'encoding' });
  const blob = await canvas.convertToBlob({ type: 'image/png' });
  // The worker stays for the next export: its pixels go now, not at the next collection.
  canvas.width = canvas.height = 0;
  return blob;
}

function failed(err: unknown): void {
  pending = null;
  post({ kind: 'failed', message: err instanceof Error ? err.message : String(err) });
}

self.onmessage = (e: MessageEvent<FigurePngMessage>) => {
  const m = e.data;
  if (m.kind === 'prepare') {
    try {
      prepared = { under: m.under, over: m.over, underTree: parseFigureSvg(m.under), overTree: parseFigureSvg(m.over) };
    } catch {
      // Markup that does not parse is reported by the export that paints it.
      prepared = null;
    }
    return;
  }
  try {
    if (m.kind === 'figure') {
      begin(m);
      if (m.scanFollows) return;
    } else if (!pending) {
      m.scan?.tiles.forEach((t) => t.bitmap.close());
      return;
    }
    finish(m.kind === 'scan' ? m.scan : null).then((blob) => post({ kind: 'done', blob }), failed);
  } catch (err) {
    failed(err);
  }
};

// Draws the section figure as a PNG off the main thread: the figure's part below the scan, the scan region
// it shows (tiles already at about the figure's resolution, put together without seams, then drawn through the
// figure's matrix and clipped to the panel), the part above, and the PNG encoding. Both parts are the figure's
// own SVG markup (io/renderSectionSvg), painted by io/paintFigureSvg. Reports each step as it starts; the page
// cancels by ending the worker.
import { paintFigureSvg, parseFigureSvg } from '../paintFigureSvg';
import type { FigurePngReply, FigurePngRequest } from '../figurePngProtocol';

type Ctx = OffscreenCanvasRenderingContext2D;

const post = (reply: FigurePngReply) => (self as unknown as Worker).postMessage(reply);

function drawScan(ctx: Ctx, req: FigurePngRequest): void {
  const scan = req.scan;
  if (!scan) return;
  // The region in one canvas first: tiles drawn one by one through a scaling matrix would each be smoothed
  // to their own edges and leave faint seams.
  const region = new OffscreenCanvas(scan.regionW, scan.regionH);
  const rctx = region.getContext('2d');
  if (!rctx) throw new Error('This browser cannot draw the scan region off the page.');
  for (const t of scan.tiles) {
    rctx.drawImage(t.bitmap, t.x, t.y);
    t.bitmap.close();
  }
  const { panel, figure } = req;
  ctx.save();
  ctx.scale(req.width / figure.width, req.height / figure.height);
  ctx.beginPath();
  ctx.rect(panel.x, panel.y, panel.w, panel.h);
  ctx.clip();
  ctx.transform(...scan.matrix);
  // Region pixels → scan pixels: its origin and the pyramid level's size.
  ctx.translate(scan.originPx[0], scan.originPx[1]);
  ctx.scale(scan.pxPerRegionPx[0], scan.pxPerRegionPx[1]);
  ctx.globalAlpha = scan.opacity;
  ctx.imageSmoothingEnabled = true;
  ctx.imageSmoothingQuality = 'high';
  ctx.drawImage(region, 0, 0);
  ctx.restore();
  region.width = region.height = 0;
}

async function render(req: FigurePngRequest): Promise<Blob> {
  const canvas = new OffscreenCanvas(req.width, req.height);
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('This browser cannot draw a canvas of that size; choose a smaller PNG size.');
  post({ kind: 'step', step: 'figure' });
  ctx.fillStyle = '#ffffff';
  ctx.fillRect(0, 0, req.width, req.height);
  paintFigureSvg(ctx, parseFigureSvg(req.under), req.width, req.height);
  if (req.scan) {
    post({ kind: 'step', step: 'scan' });
    drawScan(ctx, req);
  }
  post({ kind: 'step', step: 'labels' });
  paintFigureSvg(ctx, parseFigureSvg(req.over), req.width, req.height);
  post({ kind: 'step', step: 'encoding' });
  return canvas.convertToBlob({ type: 'image/png' });
}

self.onmessage = (e: MessageEvent<FigurePngRequest>) => {
  render(e.data).then(
    (blob) => post({ kind: 'done', blob }),
    (err: unknown) => post({ kind: 'failed', message: err instanceof Error ? err.message : String(err) }),
  );
};

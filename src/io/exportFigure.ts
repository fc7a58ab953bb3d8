// The annotated section as SVG or PNG, drawn from renderSectionSvg. The SVG inlines the scan once as a
// data: URL. The PNG is drawn on a canvas at the chosen size in three layers: the figure below the scan,
// the decoded scan itself through the calibration's matrix (clipped to the panel, sampled at the PNG's
// resolution: the scan's file never passes through a string), and the figure above it.
// The figure of the open project is put together in state/currentFigureSvg.
import { FIGURE_HEIGHT, FIGURE_WIDTH, type SectionSvgParts } from './renderSectionSvg';

/** PNG sizes offered; the last is A3 landscape at 300 dpi (420 × 297 mm). */
export const PNG_SIZES = [
  { id: 'screen', label: 'Screen (1400 × 990 px)', width: 1400, height: 990 },
  { id: 'a4-150', label: 'A4 at 150 dpi (1754 × 1240 px)', width: 1754, height: 1240 },
  { id: 'a4-300', label: 'A4 at 300 dpi (3508 × 2480 px)', width: 3508, height: 2480 },
  { id: 'a3-300', label: 'A3 at 300 dpi (4961 × 3508 px)', width: 4961, height: 3508 },
] as const;

function blobToDataUrl(blob: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const r = new FileReader();
    r.onload = () => resolve(String(r.result));
    r.onerror = () => reject(r.error);
    r.readAsDataURL(blob);
  });
}

/**
 * Returns a scan of the given MIME type as a data: URL the SVG can embed: its original bytes for PNG, JPEG and
 * WebP, else its decoded bitmap re-encoded as PNG (the browser cannot show TIFF or PDF in an SVG).
 */
export async function scanDataUrl(type: string, scan: { bitmap: ImageBitmap; bytes: Blob }): Promise<string> {
  if (/^image\/(png|jpeg|webp)$/.test(type)) return blobToDataUrl(new Blob([scan.bytes], { type }));
  const canvas = document.createElement('canvas');
  canvas.width = scan.bitmap.width;
  canvas.height = scan.bitmap.height;
  canvas.getContext('2d')?.drawImage(scan.bitmap, 0, 0);
  return canvas.toDataURL('image/png');
}

function loadImage(url: string): Promise<HTMLImageElement> {
  return new Promise((resolve, reject) => {
    const img = new Image();
    img.onload = () => resolve(img);
    img.onerror = () => reject(new Error('The figure could not be drawn as an image.'));
    img.src = url;
  });
}

/** The steps of a PNG export, for its progress message. */
export type PngStep = 'figure' | 'scan' | 'labels' | 'encoding';

/** Draws a standalone SVG document over the whole canvas (an SVG drawn as an image loads nothing else). */
async function drawSvg(ctx: CanvasRenderingContext2D, svg: string, width: number, height: number): Promise<void> {
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  try {
    ctx.drawImage(await loadImage(url), 0, 0, width, height);
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** Lets the page draw a frame (the progress message) between the export's steps. */
const nextFrame = () => new Promise<void>((resolve) => requestAnimationFrame(() => setTimeout(resolve, 0)));

/**
 * Returns a PNG of the figure at width × height pixels: its part below the scan, the decoded scan through the
 * figure's matrix (clipped to the panel) when there is one, and its part above; or a message (e.g. when the
 * browser cannot make a canvas that large). `onStep` hears each step as it starts.
 */
export async function figureToPng(parts: SectionSvgParts, scan: ImageBitmap | null, width: number, height: number,
  onStep: (step: PngStep) => void = () => undefined): Promise<{ ok: true; blob: Blob } | { ok: false; message: string }> {
  try {
    const canvas = document.createElement('canvas');
    canvas.width = width;
    canvas.height = height;
    const ctx = canvas.getContext('2d');
    if (!ctx) return { ok: false, message: 'This browser cannot draw a canvas of that size; choose a smaller PNG size.' };
    onStep('figure');
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, width, height);
    await drawSvg(ctx, `${parts.head}${parts.under}</svg>`, width, height);
    if (scan && parts.scan) {
      onStep('scan');
      await nextFrame();
      const { panel, scan: place } = parts;
      ctx.save();
      ctx.scale(width / FIGURE_WIDTH, height / FIGURE_HEIGHT);
      ctx.beginPath();
      ctx.rect(panel.x, panel.y, panel.w, panel.h);
      ctx.clip();
      ctx.transform(...place.matrix);
      ctx.globalAlpha = place.opacity;
      ctx.imageSmoothingEnabled = true;
      ctx.drawImage(scan, 0, 0, place.widthPx, place.heightPx);
      ctx.restore();
    }
    onStep('labels');
    await nextFrame();
    await drawSvg(ctx, `${parts.head}${parts.panelOpen}${parts.over}</svg>`, width, height);
    onStep('encoding');
    await nextFrame();
    const blob = await new Promise<Blob | null>((resolve, reject) => {
      try {
        canvas.toBlob(resolve, 'image/png');
      } catch (e) {
        reject(e);
      }
    });
    if (!blob) return { ok: false, message: 'The browser could not encode a PNG of that size; choose a smaller size.' };
    return { ok: true, blob };
  } catch (e) {
    if ((e as { name?: string }).name === 'SecurityError') {
      return { ok: false, message: 'The browser refused to read back the drawn figure (a cross-origin image made the canvas unreadable). Export as SVG instead.' };
    }
    return { ok: false, message: e instanceof Error ? e.message : String(e) };
  }
}

export { FIGURE_WIDTH, FIGURE_HEIGHT };

// Renders one page of a PDF (a figure in a report) to a bitmap. The PDF library, its worker and its
// standard font data are bundled with the app and loaded only when a PDF is opened; nothing is fetched
// from elsewhere.
import type { AskScanChoice } from './decodeScanChoice';
import { PDF_STANDARD_FONTS_PATH } from './pdfStandardFonts';
import { formatMegapixels } from '../format/formatQuantity';

export type PdfDecodeResult =
  | { ok: true; bitmap: ImageBitmap; page: number; dpi: number; pageCount: number }
  | { ok: false; message: string; cancelled?: boolean };

/** Resolutions offered for rendering a page, dots per inch. */
export const PDF_DPI_CHOICES = [72, 150, 200, 300, 400, 600];
export const PDF_DEFAULT_DPI = 300;
/** Longest side a browser canvas reliably renders, pixels. */
export const PDF_MAX_SIDE_PX = 32767;

/** Returns the pixel size of a page of the given size in points at `dpi`. */
export function pdfPagePixels(widthPt: number, heightPt: number, dpi: number): { widthPx: number; heightPx: number } {
  return { widthPx: Math.round((widthPt * dpi) / 72), heightPx: Math.round((heightPt * dpi) / 72) };
}

/**
 * Returns the scale (pixels per point) at which a page of widthPt × heightPt points renders to widthPx × heightPx
 * pixels once each side is rounded as pdfPagePixels rounds it: the middle of the scales that give both, so a page
 * reopens at the size it was first rendered at; when no scale gives both (or no height is given), the one that gives the width.
 */
export function pdfScaleForPixels(widthPt: number, heightPt: number, widthPx: number, heightPx?: number): number {
  if (heightPx === undefined) return widthPx / widthPt;
  // round(w·s) = W exactly when (W − ½)/w ≤ s < (W + ½)/w; the same for the height; both hold where the ranges overlap.
  const lo = Math.max((widthPx - 0.5) / widthPt, (heightPx - 0.5) / heightPt);
  const hi = Math.min((widthPx + 0.5) / widthPt, (heightPx + 0.5) / heightPt);
  return lo < hi ? (lo + hi) / 2 : widthPx / widthPt;
}

async function loadPdfjs() {
  const [pdfjs, worker] = await Promise.all([import('pdfjs-dist'), import('pdfjs-dist/build/pdf.worker.min.mjs?url')]);
  pdfjs.GlobalWorkerOptions.workerSrc = worker.default;
  return pdfjs;
}

/**
 * Returns the chosen page rendered on white, or a message. With `saved` (reopening a saved project: the page, 0-based,
 * and the pixel size it was rendered at) no question is asked and the page is rendered at that size
 * (pdfScaleForPixels); otherwise `choose` asks for the page and resolution.
 */
export async function decodePdf(file: Blob, name: string, maxPixels: number, choose: AskScanChoice, saved?: { page: number; widthPx: number; heightPx?: number }): Promise<PdfDecodeResult> {
  const pdfjs = await loadPdfjs();
  let doc: Awaited<ReturnType<typeof pdfjs.getDocument>['promise']>;
  try {
    doc = await pdfjs.getDocument({
      data: new Uint8Array(await file.arrayBuffer()),
      verbosity: 0,
      // Text in a standard font that the PDF does not embed is drawn from pdf.js's own font data, served by
      // the app (same origin), never from the fonts of this machine: the page is a scan that lines are
      // digitised on, so a project must re-render it the same on every computer.
      standardFontDataUrl: new URL(PDF_STANDARD_FONTS_PATH, document.baseURI).href,
      useSystemFonts: false,
    }).promise;
  } catch (e) {
    const locked = e instanceof Error && e.name === 'PasswordException';
    return { ok: false, message: locked ? `${name} is protected by a password; save the page as an image first.` : `${name} looks like a PDF but could not be read: it may be damaged or truncated.` };
  }
  try {
    const pageSize = async (n: number) => {
      const vp = (await doc.getPage(n)).getViewport({ scale: 1 });
      return { widthPt: vp.width, heightPt: vp.height };
    };
    let pageNo = (saved?.page ?? 0) + 1;
    let dpi = PDF_DEFAULT_DPI;
    if (!saved) {
      const choice = await choose({ kind: 'pdf', fileName: name, pageCount: doc.numPages, pageSize });
      if (!choice) return { ok: false, message: `Opening ${name} was cancelled.`, cancelled: true };
      pageNo = choice.page + 1;
      dpi = choice.dpi ?? PDF_DEFAULT_DPI;
    }
    if (pageNo < 1 || pageNo > doc.numPages) return { ok: false, message: `${name} has no page ${pageNo}.` };
    const pdfPage = await doc.getPage(pageNo);
    const base = pdfPage.getViewport({ scale: 1 });
    const scale = saved ? pdfScaleForPixels(base.width, base.height, saved.widthPx, saved.heightPx) : dpi / 72;
    const viewport = pdfPage.getViewport({ scale });
    const w = Math.round(viewport.width);
    const h = Math.round(viewport.height);
    if (w * h > maxPixels || Math.max(w, h) > PDF_MAX_SIDE_PX) {
      return { ok: false, message: `Page ${pageNo} of ${name} at ${Math.round(scale * 72)} dpi would be ${formatMegapixels(w * h)} megapixels; choose a lower resolution (the largest scan Foldroot opens is ${formatMegapixels(maxPixels)} megapixels).` };
    }
    const canvas = document.createElement('canvas');
    canvas.width = w;
    canvas.height = h;
    try {
      await pdfPage.render({ canvas, viewport, background: '#ffffff' }).promise;
      const bitmap = await createImageBitmap(canvas);
      return { ok: true, bitmap, page: pageNo - 1, dpi: Math.round(scale * 72), pageCount: doc.numPages };
    } finally {
      canvas.width = 0;
      canvas.height = 0;
    }
  } catch {
    return { ok: false, message: `A page of ${name} could not be rendered: the PDF may be damaged.` };
  } finally {
    void doc.loadingTask.destroy();
  }
}

// Decodes a scan file into an ImageBitmap off the main thread where the browser allows (createImageBitmap
// for PNG, JPEG and WebP; a Web Worker for TIFF; the PDF library's own worker for PDF), with clear messages.
import { sniffImageType, type ImageKind } from './sniffImageType';
import { decodeImageSize } from './decodeImageSize';
import { decodeTiff } from './decodeTiff';
import { decodePdf } from './decodePdf';
import { formatMegapixels } from '../format/formatQuantity';
import type { AskScanChoice } from './decodeScanChoice';

/** Largest scan accepted, in megapixels. */
export const MAX_SCAN_MEGAPIXELS = 200;
const MAX_PIXELS = MAX_SCAN_MEGAPIXELS * 1e6;

export type DecodeResult =
  | {
      ok: true;
      bitmap: ImageBitmap;
      kind: ImageKind;
      widthPx: number;
      heightPx: number;
      mime: string;
      /** Page opened in a multi-page file (0-based), and how many it has. */
      page?: number;
      pageCount?: number;
      /** Resolution a PDF page was rendered at. */
      dpi?: number;
    }
  | { ok: false; message: string; cancelled?: boolean };

/**
 * Reopening a saved scan: the page it was opened at (0-based) and its pixel size. With `widthPx` given nothing is
 * asked: a multi-page file opens at `page` (or its default page when none is saved) and a PDF page is rendered at
 * the saved size; the caller compares the decoded size with the saved one (reopenScan).
 */
export interface DecodeOptions { page?: number; widthPx?: number; heightPx?: number }

const MIME: Record<string, string> = { png: 'image/png', jpeg: 'image/jpeg', webp: 'image/webp', tiff: 'image/tiff', pdf: 'application/pdf' };
/** Leading bytes read to find the pixel size (a JPEG's frame header can follow a long metadata block). */
const HEAD_BYTES = 256 * 1024;

/** Longest side, in pixels, that Chromium and Firefox decode an image at (common practice: 32,767 for canvases and bitmaps). */
const BROWSER_MAX_SIDE = 32_767;

/** Returns the message for a scan over the size limit: "… is too large (4096 megapixels, 64000 × 64000 px; the limit is 200 megapixels)". */
export function scanTooLargeMessage(name: string, w: number, h: number): string {
  return `${name} is too large to open (${formatMegapixels(w * h)} megapixels, ${w} × ${h} px; the largest scan Foldroot opens is ${MAX_SCAN_MEGAPIXELS} megapixels).`;
}
const tooLarge = scanTooLargeMessage;

async function decodeBrowserImage(file: Blob, head: Uint8Array, name: string, kind: ImageKind): Promise<DecodeResult> {
  // The size is in the header; a JPEG may put it after a metadata block longer than the head read first.
  const size = decodeImageSize(head, kind)
    ?? (file.size > HEAD_BYTES ? decodeImageSize(new Uint8Array(await file.arrayBuffer()), kind) : null);
  if (size && size.widthPx * size.heightPx > MAX_PIXELS) return { ok: false, message: tooLarge(name, size.widthPx, size.heightPx) };
  let bitmap: ImageBitmap;
  try {
    bitmap = await createImageBitmap(new Blob([file], { type: MIME[kind] }));
  } catch {
    // A size the browser will not decode is said as such, not called damage.
    if (size && (size.widthPx > BROWSER_MAX_SIDE || size.heightPx > BROWSER_MAX_SIDE)) {
      return { ok: false, message: `${name} is too large to open (${size.widthPx} × ${size.heightPx} px; the largest side a browser decodes is ${BROWSER_MAX_SIDE} px, and the largest scan Foldroot opens is ${MAX_SCAN_MEGAPIXELS} megapixels).` };
    }
    return { ok: false, message: `${name} looks like a ${kind.toUpperCase()} file but could not be decoded: it may be damaged or truncated.` };
  }
  return { ok: true, bitmap, kind, widthPx: bitmap.width, heightPx: bitmap.height, mime: MIME[kind] };
}

/**
 * Returns the decoded scan, or a message saying why the file cannot be opened (cancelled: the user said no).
 * `choose` asks which page of a multi-page TIFF, or which page of a PDF and at what resolution, unless `options`
 * give the saved size (reopening: never asked).
 */
export async function decodeScan(file: Blob & { name?: string }, choose: AskScanChoice, options: DecodeOptions = {}): Promise<DecodeResult> {
  const name = file.name || 'the file';
  if (file.size === 0) return { ok: false, message: `${name} is empty.` };
  // One read of the head serves the type and the pixel size: every read of a file is a round trip to the browser.
  const head = new Uint8Array(await file.slice(0, HEAD_BYTES).arrayBuffer());
  const kind = sniffImageType(head.subarray(0, 16));
  if (kind === 'unknown') {
    return { ok: false, message: `${name} is not a PNG, JPEG, WebP, TIFF or PDF image. Choose a scanned section image.` };
  }
  let result: DecodeResult;
  if (kind === 'tiff') {
    const r = await decodeTiff(file, name, MAX_PIXELS, choose, options.page, options.widthPx === undefined);
    result = r.ok ? { ok: true, bitmap: r.bitmap, kind, widthPx: r.bitmap.width, heightPx: r.bitmap.height, mime: MIME.tiff, page: r.page, pageCount: r.pageCount } : r;
  } else if (kind === 'pdf') {
    const saved = options.widthPx === undefined ? undefined : { page: options.page ?? 0, widthPx: options.widthPx, heightPx: options.heightPx };
    const r = await decodePdf(file, name, MAX_PIXELS, choose, saved);
    result = r.ok ? { ok: true, bitmap: r.bitmap, kind, widthPx: r.bitmap.width, heightPx: r.bitmap.height, mime: MIME.pdf, page: r.page, pageCount: r.pageCount, dpi: r.dpi } : r;
  } else {
    result = await decodeBrowserImage(file, head, name, kind);
  }
  // The header check cannot see every file's size (and a PDF page's size depends on the resolution).
  if (result.ok && result.widthPx * result.heightPx > MAX_PIXELS) {
    result.bitmap.close();
    return { ok: false, message: tooLarge(name, result.widthPx, result.heightPx) };
  }
  return result;
}

// Opens a TIFF or GeoTIFF scan in a Web Worker: 8/16/32-bit, greyscale, RGB, palette; a multi-page file
// asks which page to open. GeoTIFF georeferencing is not used: calibrate the scan as any other.
import type { TiffWorkerReply, TiffWorkerRequest } from './workers/decodeTiff.worker';
import type { TiffPageInfo } from './decodeTiffPixels';
import type { AskScanChoice } from './decodeScanChoice';

export type TiffDecodeResult =
  | { ok: true; bitmap: ImageBitmap; page: number; pageCount: number }
  | { ok: false; message: string; cancelled?: boolean };

function ask(worker: Worker, msg: TiffWorkerRequest, transfer: Transferable[] = []): Promise<TiffWorkerReply> {
  return new Promise((resolve) => {
    worker.onmessage = (e: MessageEvent<TiffWorkerReply>) => resolve(e.data);
    worker.onerror = (e) => {
      e.preventDefault();
      resolve({ type: 'error', message: 'could not be decoded (the decoder stopped)' });
    };
    worker.postMessage(msg, transfer);
  });
}

/** Returns the first full-resolution page (previews are marked reduced), else the largest. */
export function defaultTiffPage(pages: TiffPageInfo[]): TiffPageInfo {
  const full = pages.filter((p) => !p.reduced);
  const pool = full.length > 0 ? full : pages;
  return full.length > 0 ? pool[0] : pool.reduce((a, b) => (b.widthPx * b.heightPx > a.widthPx * a.heightPx ? b : a));
}

/**
 * Returns the chosen page of the TIFF as a bitmap, or a message: `page` when given, else the default page, except that
 * `choose` asks which among several when `mayAsk` (false when reopening a saved scan).
 */
export async function decodeTiff(file: Blob, name: string, maxPixels: number, choose: AskScanChoice, page?: number, mayAsk = true): Promise<TiffDecodeResult> {
  const worker = new Worker(new URL('./workers/decodeTiff.worker.ts', import.meta.url), { type: 'module' });
  try {
    const buffer = await file.arrayBuffer();
    const opened = await ask(worker, { type: 'open', buffer, maxPixels }, [buffer]);
    if (opened.type === 'error') return { ok: false, message: `${name} ${opened.message}.` };
    if (opened.type !== 'pages') return { ok: false, message: `${name} could not be read.` };
    const { pages } = opened;
    let index = page ?? defaultTiffPage(pages).index;
    if (page === undefined && mayAsk && pages.length > 1) {
      const choice = await choose({ kind: 'tiff', fileName: name, pages });
      if (!choice) return { ok: false, message: `Opening ${name} was cancelled.`, cancelled: true };
      index = choice.page;
    }
    const decoded = await ask(worker, { type: 'decode', page: index });
    if (decoded.type === 'error') return { ok: false, message: `${name} ${decoded.message}.` };
    if (decoded.type !== 'bitmap') return { ok: false, message: `${name} could not be read.` };
    return { ok: true, bitmap: decoded.bitmap, page: index, pageCount: pages.length };
  } finally {
    worker.terminate();
  }
}

// Decodes TIFF pages off the main thread. Protocol: 'open' (the file's bytes) answers with the pages'
// sizes; 'decode' (a page index) answers with an ImageBitmap of that page, transferred, not copied.
import * as UTIF from 'utif2';
import { decodeTiffLayout } from '../decodeTiffLayout';
import { formatMegapixels } from '../../format/formatQuantity';
import { tiffTruncation } from '../tiffTruncation';
import { tiffPageInfo, tiffToRgba, type TiffIfd, type TiffPageInfo } from '../decodeTiffPixels';

export type TiffWorkerRequest = { type: 'open'; buffer: ArrayBuffer; maxPixels: number } | { type: 'decode'; page: number };
export type TiffWorkerReply =
  | { type: 'pages'; pages: TiffPageInfo[] }
  | { type: 'bitmap'; bitmap: ImageBitmap; page: number }
  | { type: 'error'; message: string };

let buffer: ArrayBuffer | null = null;
let ifds: TiffIfd[] = [];
let maxPixels = Infinity;

function reply(msg: TiffWorkerReply, transfer: Transferable[] = []): void {
  (self as unknown as { postMessage(m: unknown, t: Transferable[]): void }).postMessage(msg, transfer);
}

async function decodePage(page: number): Promise<void> {
  const ifd = ifds[page];
  if (!buffer || !ifd) return reply({ type: 'error', message: 'has no such page' });
  const info = tiffPageInfo(ifd, page);
  if (info.widthPx * info.heightPx > maxPixels) return reply({ type: 'error', message: `(page ${page + 1}) is ${formatMegapixels(info.widthPx * info.heightPx)} megapixels; the largest scan Foldroot opens is ${formatMegapixels(maxPixels)} megapixels` });
  const cut = tiffTruncation(ifd, buffer.byteLength, page);
  if (cut) return reply({ type: 'error', message: cut });
  (UTIF.decodeImage as (b: ArrayBuffer, i: TiffIfd, all: TiffIfd[]) => void)(buffer, ifd, ifds);
  if (!ifd.data || ifd.data.length === 0) return reply({ type: 'error', message: 'uses a TIFF compression this build cannot read' });
  const rgba = tiffToRgba(ifd, info);
  ifd.data = new Uint8Array(0);
  const bitmap = await createImageBitmap(new ImageData(rgba as Uint8ClampedArray<ArrayBuffer>, info.widthPx, info.heightPx));
  reply({ type: 'bitmap', bitmap, page }, [bitmap]);
}

self.onmessage = async (e: MessageEvent<TiffWorkerRequest>) => {
  try {
    if (e.data.type === 'open') {
      buffer = e.data.buffer;
      maxPixels = e.data.maxPixels;
      const layout = decodeTiffLayout(new Uint8Array(buffer));
      if (!layout.ok) return reply({ type: 'error', message: layout.message });
      ifds = UTIF.decode(buffer) as TiffIfd[];
      const pages = ifds.map((ifd, i) => tiffPageInfo(ifd, i)).filter((p) => p.widthPx > 0 && p.heightPx > 0);
      if (pages.length === 0) return reply({ type: 'error', message: 'holds no image' });
      return reply({ type: 'pages', pages });
    }
    await decodePage(e.data.page);
  } catch (err) {
    const detail = typeof err === 'string' ? '' : err instanceof Error && err.message ? ` (${err.message})` : '';
    reply({ type: 'error', message: `could not be decoded: it may be damaged, truncated or use an unusual layout${detail}` });
  }
};

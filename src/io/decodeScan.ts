// Decodes a scan file into an ImageBitmap off the main thread (createImageBitmap), with clear messages.
import { sniffImageType, type ImageKind } from './sniffImageType';

/** Largest scan accepted, in megapixels. */
export const MAX_SCAN_MEGAPIXELS = 200;

export type DecodeResult =
  | { ok: true; bitmap: ImageBitmap; kind: ImageKind; widthPx: number; heightPx: number; mime: string }
  | { ok: false; message: string };

const MIME: Record<string, string> = { png: 'image/png', jpeg: 'image/jpeg', webp: 'image/webp' };

/** Returns the decoded scan, or a message saying why the file cannot be opened. */
export async function decodeScan(file: Blob & { name?: string }): Promise<DecodeResult> {
  const name = file.name ?? 'the file';
  if (file.size === 0) return { ok: false, message: `${name} is empty.` };
  const head = new Uint8Array(await file.slice(0, 16).arrayBuffer());
  const kind = sniffImageType(head);
  if (kind === 'unknown') {
    return { ok: false, message: `${name} is not a PNG, JPEG, WebP, TIFF or PDF image. Choose a scanned section image.` };
  }
  if (kind === 'tiff' || kind === 'pdf') {
    return { ok: false, message: `${name} is a ${kind.toUpperCase()} file; this build opens PNG, JPEG and WebP scans.` };
  }
  let bitmap: ImageBitmap;
  try {
    bitmap = await createImageBitmap(new Blob([file], { type: MIME[kind] }));
  } catch {
    return { ok: false, message: `${name} looks like a ${kind.toUpperCase()} file but could not be decoded: it may be damaged or truncated.` };
  }
  const mp = (bitmap.width * bitmap.height) / 1e6;
  if (mp > MAX_SCAN_MEGAPIXELS) {
    bitmap.close();
    return { ok: false, message: `${name} is ${mp.toFixed(0)} megapixels; the largest scan Foldroot opens is ${MAX_SCAN_MEGAPIXELS} megapixels.` };
  }
  return { ok: true, bitmap, kind, widthPx: bitmap.width, heightPx: bitmap.height, mime: MIME[kind] };
}

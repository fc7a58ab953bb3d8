// Walks a TIFF's chain of image directories before handing the file to the decoder: a truncated or
// looping chain (a damaged file) would otherwise stall the decoder rather than fail.

export type TiffLayout = { ok: true; littleEndian: boolean; pageCount: number } | { ok: false; message: string };

/** Most pages accepted in one TIFF (scans rarely have more than a few; a damaged chain can claim millions). */
const MAX_PAGES = 4096;

/** Returns the byte order and number of pages of a classic TIFF, or why the file cannot be read. */
export function decodeTiffLayout(bytes: Uint8Array): TiffLayout {
  if (bytes.length < 8) return { ok: false, message: 'is too short to be a TIFF image' };
  const le = bytes[0] === 0x49;
  const dv = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const version = dv.getUint16(2, le);
  if (version === 43) return { ok: false, message: 'is a BigTIFF (a TIFF over 4 GB); save the scan as a classic TIFF, PNG or JPEG' };
  if (version !== 42) return { ok: false, message: 'has a damaged TIFF header' };
  const seen = new Set<number>();
  let offset = dv.getUint32(4, le);
  while (offset !== 0) {
    if (offset + 2 > bytes.length || seen.has(offset)) return { ok: false, message: 'has a damaged or truncated TIFF directory' };
    seen.add(offset);
    const count = dv.getUint16(offset, le);
    const next = offset + 2 + count * 12;
    if (count === 0 || next + 4 > bytes.length) return { ok: false, message: 'has a damaged or truncated TIFF directory' };
    if (seen.size > MAX_PAGES) return { ok: false, message: `has more than ${MAX_PAGES} pages` };
    offset = dv.getUint32(next, le);
  }
  if (seen.size === 0) return { ok: false, message: 'holds no image' };
  return { ok: true, littleEndian: le, pageCount: seen.size };
}

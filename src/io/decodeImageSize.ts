// Reads a PNG, JPEG or WebP image's pixel size from its header, so an oversized scan is refused before
// the browser spends seconds and gigabytes decoding it.
import type { ImageKind } from './sniffImageType';

function u16be(b: Uint8Array, i: number): number {
  return (b[i] << 8) | b[i + 1];
}

function u32be(b: Uint8Array, i: number): number {
  return ((b[i] << 24) >>> 0) + (b[i + 1] << 16) + (b[i + 2] << 8) + b[i + 3];
}

function jpegSize(b: Uint8Array): { widthPx: number; heightPx: number } | null {
  let i = 2;
  while (i + 9 < b.length) {
    if (b[i] !== 0xff) return null;
    const marker = b[i + 1];
    if (marker === 0xff) {
      i += 1;
      continue;
    }
    // SOF0..SOF15 carry the frame size; C4 (Huffman), C8 (reserved) and CC (arithmetic) are not frames.
    if (marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc) {
      return { heightPx: u16be(b, i + 5), widthPx: u16be(b, i + 7) };
    }
    if (marker === 0xd8 || (marker >= 0xd0 && marker <= 0xd7) || marker === 0x01) {
      i += 2;
      continue;
    }
    i += 2 + u16be(b, i + 2);
  }
  return null;
}

function webpSize(b: Uint8Array): { widthPx: number; heightPx: number } | null {
  if (b.length < 30) return null;
  const chunk = String.fromCharCode(b[12], b[13], b[14], b[15]);
  if (chunk === 'VP8 ') return { widthPx: ((b[27] << 8) | b[26]) & 0x3fff, heightPx: ((b[29] << 8) | b[28]) & 0x3fff };
  if (chunk === 'VP8L') {
    return { widthPx: 1 + (b[21] | ((b[22] & 0x3f) << 8)), heightPx: 1 + ((b[22] >> 6) | (b[23] << 2) | ((b[24] & 0x0f) << 10)) };
  }
  if (chunk === 'VP8X') return { widthPx: 1 + (b[24] | (b[25] << 8) | (b[26] << 16)), heightPx: 1 + (b[27] | (b[28] << 8) | (b[29] << 16)) };
  return null;
}

/** Returns the image's size in pixels from its leading bytes, or null when the header cannot be read. */
export function decodeImageSize(head: Uint8Array, kind: ImageKind): { widthPx: number; heightPx: number } | null {
  if (kind === 'png') return head.length >= 24 ? { widthPx: u32be(head, 16), heightPx: u32be(head, 20) } : null;
  if (kind === 'jpeg') return jpegSize(head);
  if (kind === 'webp') return webpSize(head);
  return null;
}

import * as UTIF from 'utif2';
import { describe, expect, it } from 'vitest';
import type { TiffIfd } from '../../src/io/decodeTiffPixels';
import { tiffTruncation } from '../../src/io/tiffTruncation';
import { writeTiff } from '../fixtures/scans/writeTiff';

// A TIFF page whose strip runs past the end of the file (TIFF 6.0: StripOffsets 273, StripByteCounts 279)
// is called truncated, with how much is missing, instead of opening with the missing part black.
function grey(w: number, h: number): Uint8Array {
  return Uint8Array.from({ length: w * h }, (_, i) => i % 251);
}

/** The file with its page's strip moved towards the end so that the last `cut` bytes of pixels lie past it (the directory stays whole). */
function cutShort(cut: number): { bytes: Uint8Array; ifd: TiffIfd } {
  const bytes = writeTiff([{ width: 64, height: 32, bitsPerSample: 8, samplesPerPixel: 1, photometric: 1, data: grey(64, 32) }]);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const dir = view.getUint32(4, true);
  for (let k = 0; k < view.getUint16(dir, true); k++) {
    const at = dir + 2 + 12 * k;
    if (view.getUint16(at, true) === 273) view.setUint32(at + 8, bytes.length - 64 * 32 + cut, true);
  }
  const ifd = (UTIF.decode(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer) as TiffIfd[])[0];
  return { bytes, ifd };
}

describe('tiffTruncation', () => {
  it('says a page whose pixel data runs past the end of the file is truncated, with how much is missing', () => {
    const { bytes, ifd } = cutShort(1024);
    const message = tiffTruncation(ifd, bytes.length, 0);
    expect(message).toContain('(page 1) is truncated');
    // 1,024 of the 2,048 pixel bytes lie past the end: half the image.
    expect(message).toContain('about 50 % of the image is missing');
  });

  it('finds nothing wrong with a complete file', () => {
    const bytes = writeTiff([{ width: 64, height: 32, bitsPerSample: 8, samplesPerPixel: 1, photometric: 1, data: grey(64, 32) }]);
    const ifd = (UTIF.decode(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer) as TiffIfd[])[0];
    expect(tiffTruncation(ifd, bytes.length, 0)).toBeNull();
  });
});

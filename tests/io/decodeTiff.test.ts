// TIFF pages written by our own writer (tests/fixtures/scans/writeTiff.ts, TIFF 6.0 baseline layout)
// and read back through the registry decoder (utif2) and our conversion to 8-bit RGBA.
import { describe, expect, it } from 'vitest';
import * as UTIF from 'utif2';
import { decodeTiffLayout } from '../../src/io/decodeTiffLayout';
import { tiffPageInfo, tiffToRgba, type TiffIfd } from '../../src/io/decodeTiffPixels';
import { samples16, samplesF32, writeTiff } from '../fixtures/scans/writeTiff';

function decodeAll(bytes: Uint8Array) {
  const buf = bytes.slice().buffer;
  const ifds = UTIF.decode(buf) as TiffIfd[];
  return ifds.map((ifd, i) => {
    (UTIF.decodeImage as (b: ArrayBuffer, i: TiffIfd, a: TiffIfd[]) => void)(buf, ifd, ifds);
    const info = tiffPageInfo(ifd, i);
    return { info, rgba: tiffToRgba(ifd, info) };
  });
}

const px = (rgba: Uint8ClampedArray, i: number) => Array.from(rgba.subarray(i * 4, i * 4 + 4));

describe('TIFF decoding', () => {
  it('an 8-bit RGB page decodes to its own colours', () => {
    const data = new Uint8Array([255, 0, 0, 0, 255, 0, 0, 0, 255, 10, 20, 30]);
    const [{ info, rgba }] = decodeAll(writeTiff([{ width: 2, height: 2, bitsPerSample: 8, samplesPerPixel: 3, photometric: 2, data }]));
    expect(info).toMatchObject({ widthPx: 2, heightPx: 2, colour: 'rgb', bitsPerSample: 8 });
    expect(px(rgba, 0)).toEqual([255, 0, 0, 255]);
    expect(px(rgba, 3)).toEqual([10, 20, 30, 255]);
  });
  it('a 16-bit greyscale page maps 0..65535 to 0..255, in either byte order', () => {
    for (const bigEndian of [false, true]) {
      const data = samples16([0, 65535, 32896, 257], bigEndian);
      const [{ info, rgba }] = decodeAll(writeTiff([{ width: 4, height: 1, bitsPerSample: 16, samplesPerPixel: 1, photometric: 1, data }], bigEndian));
      expect(info.bitsPerSample).toBe(16);
      // 32896 = 128 × 257 and 257 = 1 × 257: full-range scaling divides by 257.
      expect([0, 1, 2, 3].map((i) => px(rgba, i)[0])).toEqual([0, 255, 128, 1]);
    }
  });
  it('a 16-bit RGB page keeps its channels apart', () => {
    const data = samples16([65535, 0, 0, 0, 0, 65535]);
    const [{ rgba }] = decodeAll(writeTiff([{ width: 2, height: 1, bitsPerSample: 16, samplesPerPixel: 3, photometric: 2, data }]));
    expect(px(rgba, 0)).toEqual([255, 0, 0, 255]);
    expect(px(rgba, 1)).toEqual([0, 0, 255, 255]);
  });
  it('a palette page looks its colours up in the colour map (16-bit entries, reds then greens then blues)', () => {
    const map = new Array(3 * 256).fill(0);
    map[1] = 65535; // index 1: red
    map[256 + 2] = 65535; // index 2: green
    const [{ info, rgba }] = decodeAll(writeTiff([{ width: 3, height: 1, bitsPerSample: 8, samplesPerPixel: 1, photometric: 3, data: new Uint8Array([0, 1, 2]), colorMap: map }]));
    expect(info.colour).toBe('palette');
    expect(px(rgba, 0).slice(0, 3)).toEqual([0, 0, 0]);
    expect(px(rgba, 1).slice(0, 3)).toEqual([255, 0, 0]);
    expect(px(rgba, 2).slice(0, 3)).toEqual([0, 255, 0]);
  });
  it('a floating-point GeoTIFF raster is stretched over its finite range and flagged as GeoTIFF', () => {
    const data = samplesF32([-120.5, 0, NaN, 879.5]);
    const [{ info, rgba }] = decodeAll(writeTiff([{ width: 2, height: 2, bitsPerSample: 32, samplesPerPixel: 1, photometric: 1, data, sampleFormat: 3, geo: true }]));
    expect(info.geo).toBe(true);
    expect([0, 1, 2, 3].map((i) => px(rgba, i)[0])).toEqual([0, 31, 0, 255]);
  });
  it('a multi-page file lists every page with its size, and marks previews', () => {
    const page = (w: number, reduced = false) => ({ width: w, height: 2, bitsPerSample: 8, samplesPerPixel: 1, photometric: 1, data: new Uint8Array(w * 2).fill(200), reduced });
    const bytes = writeTiff([page(4, true), page(6), page(3)]);
    const layout = decodeTiffLayout(bytes);
    expect(layout).toEqual({ ok: true, littleEndian: true, pageCount: 3 });
    const pages = decodeAll(bytes).map((p) => p.info);
    expect(pages.map((p) => [p.widthPx, p.reduced])).toEqual([[4, true], [6, false], [3, false]]);
  });
});

describe('decodeTiffLayout', () => {
  const good = writeTiff([{ width: 2, height: 2, bitsPerSample: 8, samplesPerPixel: 1, photometric: 1, data: new Uint8Array(4) }]);
  it('decodeTiffLayout refuses a file cut short inside its directory', () => {
    const r = decodeTiffLayout(good.subarray(0, good.length - 20));
    expect(r.ok).toBe(false);
  });
  it('decodeTiffLayout refuses a directory chain that loops back on itself', () => {
    const looped = good.slice();
    const dv = new DataView(looped.buffer);
    const first = dv.getUint32(4, true);
    const count = dv.getUint16(first, true);
    dv.setUint32(first + 2 + count * 12, first, true);
    expect(decodeTiffLayout(looped)).toMatchObject({ ok: false, message: expect.stringContaining('damaged') });
  });
  it('decodeTiffLayout names BigTIFF files', () => {
    const big = new Uint8Array([0x49, 0x49, 0x2b, 0, 8, 0, 0, 0, 16, 0, 0, 0, 0, 0, 0, 0]);
    expect(decodeTiffLayout(big)).toMatchObject({ ok: false, message: expect.stringContaining('BigTIFF') });
  });
});

import { describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import { decodeImageSize } from '../../src/io/decodeImageSize';
import { sniffImageType } from '../../src/io/sniffImageType';
import { writeTiff } from '../fixtures/scans/writeTiff';
import { rectanglePdf } from '../fixtures/scans/onePagePdf';

describe('decodeImageSize', () => {
  it('decodeImageSize reads a PNG header written by pngjs (registry encoder)', () => {
    const png = new PNG({ width: 321, height: 123 });
    const bytes = new Uint8Array(PNG.sync.write(png));
    expect(sniffImageType(bytes)).toBe('png');
    expect(decodeImageSize(bytes, 'png')).toEqual({ widthPx: 321, heightPx: 123 });
  });
  it('decodeImageSize finds a JPEG frame header after an APP segment (JPEG, ITU T.81 B.2.2 marker layout)', () => {
    // SOI, APP0 (length 16), SOF0 (length 17: precision 8, height 0x0BB8 = 3000, width 0x1F40 = 8000).
    const head = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0, 16, ...new Array(14).fill(0), 0xff, 0xc0, 0, 17, 8, 0x0b, 0xb8, 0x1f, 0x40, 3, 1, 0x22, 0, 2, 0x11, 1, 3, 0x11, 1]);
    expect(sniffImageType(head)).toBe('jpeg');
    expect(decodeImageSize(head, 'jpeg')).toEqual({ widthPx: 8000, heightPx: 3000 });
  });
  it('decodeImageSize reads the canvas size of an extended WebP (VP8X: 24-bit width−1 and height−1)', () => {
    const head = new Uint8Array(30);
    head.set([0x52, 0x49, 0x46, 0x46, 0, 0, 0, 0, 0x57, 0x45, 0x42, 0x50, 0x56, 0x50, 0x38, 0x58]);
    head.set([0x0f, 0x27, 0x00, 0x1f, 0x4e, 0x00], 24); // 9999 + 1, 19999 + 1
    expect(sniffImageType(head)).toBe('webp');
    expect(decodeImageSize(head, 'webp')).toEqual({ widthPx: 10000, heightPx: 20000 });
  });
  it('decodeImageSize returns null for a truncated header', () => {
    expect(decodeImageSize(new Uint8Array([0x89, 0x50]), 'png')).toBeNull();
  });
});

describe('scan fixtures', () => {
  it('the fixture TIFF and PDF are recognised by their leading bytes', () => {
    expect(sniffImageType(writeTiff([{ width: 1, height: 1, bitsPerSample: 8, samplesPerPixel: 1, photometric: 1, data: new Uint8Array(1) }]))).toBe('tiff');
    expect(sniffImageType(writeTiff([{ width: 1, height: 1, bitsPerSample: 8, samplesPerPixel: 1, photometric: 1, data: new Uint8Array(1) }], true))).toBe('tiff');
    expect(sniffImageType(rectanglePdf([{ widthPt: 200, heightPt: 100, rgb: [1, 0, 0] }]))).toBe('pdf');
  });
});

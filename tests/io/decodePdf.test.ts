// The scale a saved PDF page is rendered at again: the page must come back at the pixel size its lines were
// digitised on. Checked against the rounding of the size at first opening (pdfPagePixels: round(points × dpi / 72),
// 72 points to the inch by the PDF coordinate system's default unit, ISO 32000-1 §8.3.2.3 — section number recalled
// from memory).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PDF_DPI_CHOICES, pdfPagePixels, pdfScaleForPixels } from '../../src/io/decodePdf';

/** The pixel size a page renders to at a scale, each side rounded as the renderer's canvas size is. */
const rendered = (widthPt: number, heightPt: number, scale: number) => [Math.round(widthPt * scale), Math.round(heightPt * scale)];

describe('pdfScaleForPixels(widthPt, heightPt, widthPx, heightPx)', () => {
  it('gives back an A4 page at 300 dpi as 2480 × 3508 px, where scaling by the width alone gives 3507 px high', () => {
    // ISO 216 A4 is 210 × 297 mm; at 72 pt per inch and 25.4 mm per inch that is 595.28 × 841.89 pt (rounded to 0.01 pt).
    const [wPt, hPt] = [(210 / 25.4) * 72, (297 / 25.4) * 72];
    expect([wPt, hPt].map((v) => Number(v.toFixed(2)))).toEqual([595.28, 841.89]);
    const a4 = { w: 595.28, h: 841.89 };
    const saved = pdfPagePixels(a4.w, a4.h, 300);
    // 595.28 × 300 / 72 = 2480.33 → 2480; 841.89 × 300 / 72 = 3507.875 → 3508.
    expect(saved).toEqual({ widthPx: 2480, heightPx: 3508 });
    // The width's own scale, 2480 / 595.28, makes the height 841.89 × 2480 / 595.28 = 3507.36 → 3507: one row short.
    expect(rendered(a4.w, a4.h, saved.widthPx / a4.w)).toEqual([2480, 3507]);
    expect(rendered(a4.w, a4.h, pdfScaleForPixels(a4.w, a4.h, saved.widthPx, saved.heightPx))).toEqual([2480, 3508]);
  });

  it('renders any page, opened at any offered resolution, at the size it was opened at', () => {
    // Page sides from 3 to 14400 units: the limits of a PDF page (ISO 32000-1 Annex C, recalled from memory).
    const side = fc.double({ min: 3, max: 14400, noNaN: true });
    fc.assert(fc.property(side, side, fc.constantFrom(...PDF_DPI_CHOICES), (wPt, hPt, dpi) => {
      const { widthPx, heightPx } = pdfPagePixels(wPt, hPt, dpi);
      expect(rendered(wPt, hPt, pdfScaleForPixels(wPt, hPt, widthPx, heightPx))).toEqual([widthPx, heightPx]);
    }));
  });

  it('falls back on the width when no scale gives both sides (a size not made from this page) or no height is known', () => {
    // 100 × 100 pt cannot render to 200 × 300 px at one scale; the width's scale, 2, is used.
    expect(pdfScaleForPixels(100, 100, 200, 300)).toBe(2);
    expect(pdfScaleForPixels(100, 50, 250)).toBe(2.5);
  });
});

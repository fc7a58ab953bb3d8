import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseHorizonsCsv, writeHorizonsCsv } from '../../src/io/csvHorizons';
import { decodeImageSize } from '../../src/io/decodeImageSize';
import { decodeTiffLayout } from '../../src/io/decodeTiffLayout';
import { parseHorizonsGeoJson, writeHorizonsGeoJson } from '../../src/io/geojsonHorizons';
import { parseProjectText, serializeProject } from '../../src/io/projectFile';
import { sniffImageType } from '../../src/io/sniffImageType';
import { readSvgLines } from '../../src/io/svgHorizons';
import { writeTiff } from '../fixtures/scans/writeTiff';
import { sampleDoc, SAMPLE_SECTION } from './sampleDoc';
import { mulberry32, mutateBytes, mutateText as mutate } from '../fixtures/fuzz/mutate';

// Generated corrupt and oversized files, 1,000 per input, through the real import functions: each returns a
// result or a message and never throws. The importers are pure (they take text or bytes and return data), so
// a failure cannot touch the open project; the sample document is also checked unchanged after the run.
// A seeded generator (mulberry32, a public-domain PRNG) makes every run the same cases.
const CASES = 1000;

const NASTY = ['', '\u0000', '"', '[', '{', ']', '}', ',', '1e308', '-1e308', 'NaN', '1e-320', '\ufeff', '=HYPERLINK("x")', '<svg>', '</svg>', '<path d="M0 0 A1 1 0 0 0 ', '&lt;', '\r\n', '9'.repeat(400), '['.repeat(200), 'null', 'true', '"format":"x"'];
const mutateText = (text: string, rnd: () => number) => mutate(text, rnd, NASTY, 50);

/** Runs `read` on CASES mutations; every call must return without throwing, with a result or a non-empty message. */
function fuzz<T>(seed: number, make: (rnd: () => number) => T, read: (input: T) => { ok: boolean; message?: string } | null): { tried: number; refused: number } {
  const rnd = mulberry32(seed);
  let refused = 0;
  for (let i = 0; i < CASES; i++) {
    const input = make(rnd);
    let r: { ok: boolean; message?: string } | null = null;
    expect(() => { r = read(input); }, `case ${i} of seed ${seed}`).not.toThrow();
    const got = r as { ok: boolean; message?: string } | null;
    if (got && !got.ok) {
      refused += 1;
      expect(typeof got.message === 'string' && got.message.length > 0).toBe(true);
    }
  }
  return { tried: CASES, refused };
}

const root = join(import.meta.dirname, '..', '..');
const sectionText = readFileSync(join(root, 'tests', 'fixtures', 'sections', 'method-example.json'), 'utf8');
const doc = sampleDoc();
const before = JSON.stringify(doc);
const projectText = serializeProject(doc, null);
const lines = SAMPLE_SECTION.horizons.map((h) => ({ name: h.name, line: ('line' in h && h.line) || [] }));
const csvText = writeHorizonsCsv(lines, 'm');
const geojsonText = writeHorizonsGeoJson(lines, 'm');
const svgText = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 100 50"><path id="Top" d="M0 10 L50 20 L100 10"/><polyline id="Base" points="0,40 50,45 100,40"/><path d="M0 0 A5 5 0 0 1 10 10"/></svg>';
const tiff = writeTiff([{ width: 16, height: 8, bitsPerSample: 8, samplesPerPixel: 1, photometric: 1, data: new Uint8Array(128) }]);
const png = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 0, 0, 0, 16, 0, 0, 0, 8, 8, 2, 0, 0, 0]);

describe('generated corrupt and oversized files never throw, and always get a result or a message', () => {
  it('section and project files (parseProjectText, the app\'s opener), 1,000 each', () => {
    // Most mutations break the file; every one that does must be refused with a message.
    expect(fuzz(1, (r) => mutateText(sectionText, r), (t) => parseProjectText(t, 'fuzz.json')).refused).toBeGreaterThan(CASES / 2);
    expect(fuzz(2, (r) => mutateText(projectText, r), (t) => parseProjectText(t, 'fuzz.foldroot.json')).refused).toBeGreaterThan(CASES / 2);
    expect(JSON.stringify(doc)).toBe(before);
  });

  it('CSV, GeoJSON and SVG imports, 1,000 each', () => {
    expect(fuzz(3, (r) => mutateText(csvText, r), parseHorizonsCsv).refused).toBeGreaterThan(0);
    expect(fuzz(4, (r) => mutateText(geojsonText, r), parseHorizonsGeoJson).refused).toBeGreaterThan(CASES / 2);
    expect(fuzz(5, (r) => mutateText(svgText, r), readSvgLines).refused).toBeGreaterThan(0);
  });

  it('images: TIFF layout, PNG/JPEG/WebP size and type sniffing, 1,000 each', () => {
    expect(fuzz(6, (r) => mutateBytes(tiff, r), (b) => decodeTiffLayout(b)).refused).toBeGreaterThan(0);
    fuzz(7, (r) => mutateBytes(png, r), (b) => {
      decodeImageSize(b, sniffImageType(b) === 'unknown' ? 'png' : sniffImageType(b) as 'png');
      return null;
    });
  });
});

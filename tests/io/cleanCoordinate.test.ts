// Exported coordinates carry no float noise, and files written then read give the same values.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cleanCoordinate } from '../../src/io/cleanCoordinate';
import { parseHorizonsCsv, writeHorizonsCsv } from '../../src/io/csvHorizons';
import { parseHorizonsGeoJson, writeHorizonsGeoJson } from '../../src/io/geojsonHorizons';

// A coordinate as a user would type or a file would hold it: up to 6 decimals.
const typed = fc.integer({ min: -2_000_000_000_000, max: 2_000_000_000_000 }).map((n) => n / 1e6);

describe('cleanCoordinate', () => {
  it('drops the calibration tails seen in exports (17000.000000000004, -9.79e-13) and writes −0 as 0', () => {
    expect(cleanCoordinate(17000.000000000004)).toBe(17000);
    expect(String(cleanCoordinate(-9.79e-13))).toBe('0');
    expect(String(cleanCoordinate(2.27e-13))).toBe('0');
    expect(Object.is(cleanCoordinate(-0), 0)).toBe(true);
    expect(Object.is(cleanCoordinate(-4e-7), 0)).toBe(true);
    expect(cleanCoordinate(990.3471234)).toBe(990.347123);
    expect(cleanCoordinate(Number.NaN)).toBeNaN();
  });

  it('keeps every value of at most 6 decimals exactly, and moves any value by at most half the resolution', () => {
    fc.assert(fc.property(typed, (v) => cleanCoordinate(v) === v));
    fc.assert(fc.property(fc.double({ min: -1e8, max: 1e8, noNaN: true }), (v) => Math.abs(cleanCoordinate(v) - v) <= 0.5e-6 + 1e-15 * Math.abs(v)));
  });

  it('map-scale values beyond 1e9 keep 15 significant digits', () => {
    expect(cleanCoordinate(1234567890123.457)).toBe(1234567890123.46);
  });
});

describe('horizon files round trip through their writers and readers', () => {
  const noisy = [{ name: 'Top', line: [[17000.000000000004, -9.79e-13], [0.1 + 0.2, -0], [250.5, 2.27e-13]] as [number, number][] }];

  it('CSV: no exponent tails, no -0, and the values read back are the cleaned ones', () => {
    const text = writeHorizonsCsv(noisy, 'm');
    expect(text).toContain('Top,17000,0\r\n');
    expect(text).toContain('Top,0.3,0\r\n');
    expect(text).not.toMatch(/e-1\d|-0[,\r]/);
    const r = parseHorizonsCsv(text);
    expect(r.ok && r.horizons[0].line).toEqual([[17000, 0], [0.3, 0], [250.5, 0]]);
  });

  it('GeoJSON: the same', () => {
    const text = writeHorizonsGeoJson(noisy, 'm');
    expect(text).not.toMatch(/e-1\d|-0[,\s\]]/);
    const r = parseHorizonsGeoJson(text);
    expect(r.ok && r.horizons[0].line).toEqual([[17000, 0], [0.3, 0], [250.5, 0]]);
  });

  it('any typed coordinates survive CSV and GeoJSON exactly (property)', () => {
    const line = fc.array(fc.tuple(typed, typed), { minLength: 2, maxLength: 8 });
    fc.assert(fc.property(line, (pts) => {
      const hs = [{ name: 'H', line: pts as [number, number][] }];
      const want = pts.map(([x, z]) => [x || 0, z || 0]);
      const a = parseHorizonsCsv(writeHorizonsCsv(hs, 'ft'));
      const b = parseHorizonsGeoJson(writeHorizonsGeoJson(hs, 'ft'));
      return a.ok && b.ok && JSON.stringify(a.horizons[0].line) === JSON.stringify(want) && JSON.stringify(b.horizons[0].line) === JSON.stringify(want);
    }));
  });
});

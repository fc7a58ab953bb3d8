// Imports past the limits of src/core/model/limits.ts are refused with the shared words, early and
// without exhausting the stack; imports just inside them succeed. Expected values follow from the
// generated files (row and arc counts) and the declared limits.
import { describe, expect, it } from 'vitest';
import { parseHorizonsCsv } from '../../src/io/csvHorizons';
import { parseHorizonsGeoJson } from '../../src/io/geojsonHorizons';
import { readSvgLines } from '../../src/io/svgHorizons';
import { LIMITS } from '../../src/core/model/limits';

function csvRows(n: number, horizons = 1): string {
  const rows: string[] = ['horizon,x_m,z_m'];
  for (let i = 0; i < n; i++) rows.push(`H${i % horizons},${i},${(i % 7) * 3}`);
  return rows.join('\n');
}

function svgArcs(n: number): string {
  // One path of n half circles of radius 5 along the x axis.
  const parts: string[] = ['M0 0'];
  for (let i = 0; i < n; i++) parts.push('a5 5 0 0 1 10 0');
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 100 100"><path id="Arcs" d="${parts.join(' ')}"/></svg>`;
}

// Room for a loaded machine to build and parse files of a million rows; not a check on speed.
const BIG = 120_000;

describe('import limits', () => {
  it('imports a CSV of 150,000 rows as one horizon of 150,000 vertices', () => {
    const r = parseHorizonsCsv(csvRows(150_000));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.horizons[0].line).toHaveLength(150_000);
  }, BIG);

  it('refuses a CSV of 1,000,000 rows in one horizon with the count and the limit', () => {
    const r = parseHorizonsCsv(csvRows(1_000_000));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('too many vertices in one line for the app (1000000; the limit is 200000)');
  }, BIG);

  it('refuses more horizons than the limit, and more vertices in all than the limit', () => {
    const many = parseHorizonsCsv(csvRows(2 * (LIMITS.horizons + 1), LIMITS.horizons + 1));
    expect(many.ok).toBe(false);
    if (!many.ok) expect(many.message).toContain('too many horizons for the app (2001; the limit is 2000)');
    const features = Array.from({ length: 11 }, (_, k) => ({
      type: 'Feature', properties: { name: `L${k}` },
      geometry: { type: 'LineString', coordinates: Array.from({ length: 190_000 }, (_, i) => [i, k]) },
    }));
    const total = parseHorizonsGeoJson(JSON.stringify({ type: 'FeatureCollection', features }));
    expect(total.ok).toBe(false);
    if (!total.ok) expect(total.message).toContain('too many vertices for the app (2090000; the limit is 2000000)');
  }, BIG);

  it('refuses an SVG path of 20,000 or 300,000 arcs with a message, and imports one of 100 arcs', () => {
    for (const n of [20_000, 300_000]) {
      const r = readSvgLines(svgArcs(n));
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.message).toMatch(/too many (vertices|for the app)/);
    }
    const small = readSvgLines(svgArcs(100));
    expect(small.ok).toBe(true);
  }, BIG);
});

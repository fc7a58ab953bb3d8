import { describe, expect, it } from 'vitest';
import { parseHorizonsGeoJson, writeHorizonsGeoJson } from '../../src/io/geojsonHorizons';
import { SECTION_CAUTION } from '../../src/core/analysis/caution';

describe('parseHorizonsGeoJson', () => {
  it('round-trips horizons through a FeatureCollection of LineStrings (written with @turf/helpers)', () => {
    const horizons = [{ name: 'Top', line: [[0, 5], [10, 7], [20, 5]] as [number, number][] }, { name: '<b>Base</b>', line: [[0, -1], [20, -2]] as [number, number][] }];
    const text = writeHorizonsGeoJson(horizons, 'ft');
    const parsed = JSON.parse(text);
    expect(parsed.type).toBe('FeatureCollection');
    expect(parsed.features[0].geometry.type).toBe('LineString');
    const r = parseHorizonsGeoJson(text);
    expect(r.ok && r.units).toBe('ft');
    expect(r.ok && r.horizons).toEqual(horizons);
  });

  it('splits a MultiLineString into numbered horizons and lists unusable features', () => {
    const fc = {
      type: 'FeatureCollection',
      features: [
        { type: 'Feature', properties: { name: 'Split', units: 'm' }, geometry: { type: 'MultiLineString', coordinates: [[[0, 0], [1, 1]], [[2, 2], [3, 3, 99]]] } },
        { type: 'Feature', properties: { name: 'Dot' }, geometry: { type: 'Point', coordinates: [0, 0] } },
        { type: 'Feature', properties: { name: 'Short' }, geometry: { type: 'LineString', coordinates: [[0, 0]] } },
        { type: 'Feature', properties: { name: 'Bad' }, geometry: { type: 'LineString', coordinates: [[0, 0], [1, 'x']] } },
      ],
    };
    const r = parseHorizonsGeoJson(JSON.stringify(fc));
    expect(r.ok && r.horizons.map((h) => h.name)).toEqual(['Split 1', 'Split 2']);
    expect(r.ok && r.horizons[1].line).toEqual([[2, 2], [3, 3]]);
    expect(r.problems.map((p) => p.where)).toEqual(['feature 2 ("Dot")', 'feature 3 ("Short")', 'feature 4 ("Bad")']);
  });

  it('refuses non-JSON and files without line features', () => {
    expect(parseHorizonsGeoJson('{"type": "Feature').ok).toBe(false);
    expect(parseHorizonsGeoJson('{"type":"FeatureCollection","features":[]}').ok).toBe(false);
  });

  it('writeHorizonsGeoJson carries the caution as a top-level "caution" member; reading ignores it', () => {
    const horizons = [{ name: 'Top', line: [[0, 5], [10, 7]] as [number, number][] }];
    const text = writeHorizonsGeoJson(horizons, 'm');
    const parsed = JSON.parse(text);
    expect(parsed.caution).toBe(SECTION_CAUTION);
    expect(parsed.features[0].properties).toEqual({ name: 'Top', units: 'm' });
    const r = parseHorizonsGeoJson(text);
    expect(r.ok && r.horizons).toEqual(horizons);
    expect(r.problems).toEqual([]);
  });
});

import { describe, expect, it } from 'vitest';
import { parseHorizonsGeoJson } from '../../src/io/geojsonHorizons';

// GeoJSON positions are longitude, latitude by default (RFC 7946 §4); a file in degrees, or one that declares a
// geographic CRS (the "crs" member of the 2008 GeoJSON specification, e.g. urn:ogc:def:crs:OGC:1.3:CRS84 or
// EPSG:4326), is imported only after a warning. The coordinates below are invented.
const line = (coords: number[][], crs?: string) => JSON.stringify({
  type: 'FeatureCollection',
  ...(crs ? { crs: { type: 'name', properties: { name: crs } } } : {}),
  features: [{ type: 'Feature', properties: { name: 'Marker' }, geometry: { type: 'LineString', coordinates: coords } }],
});

describe('parseHorizonsGeoJson warns about geographic coordinates', () => {
  it('warns when every coordinate fits longitude/latitude within a few degrees', () => {
    const r = parseHorizonsGeoJson(line([[7.41, 46.12], [7.45, 46.15], [7.52, 46.11]]));
    expect(r.ok && r.warning).toContain('looks like a map in degrees');
  });

  it('warns when a geographic CRS is declared, whatever the numbers', () => {
    for (const crs of ['urn:ogc:def:crs:OGC:1.3:CRS84', 'EPSG:4326', 'urn:ogc:def:crs:EPSG::4326']) {
      const r = parseHorizonsGeoJson(line([[0, -500], [2500, -800]], crs));
      expect(r.ok && r.warning).toContain('declares a geographic coordinate system');
    }
  });

  it('says nothing for a section in metres', () => {
    const r = parseHorizonsGeoJson(line([[0, -500], [1200, -650], [2500, -800]]));
    expect(r.ok).toBe(true);
    expect(r.ok && r.warning).toBeUndefined();
  });
});

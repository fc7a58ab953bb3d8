import type { ImportedHorizon } from '../core/model/commands/importHorizons';

// GeoJSON's own coordinates are longitude and latitude (RFC 7946 §4); Foldroot reads them as section [x, z].
// A file made by a map program is easily imported by mistake, so a declared geographic CRS, or coordinates that
// all fit longitude and latitude within a few degrees, get a warning before anything is imported.

/** Largest span, in coordinate units, below which lon/lat-looking coordinates are taken for degrees (no section is a few metres wide). */
const DEGREES_SPAN = 10;

/** Returns a warning when the GeoJSON declares a geographic CRS or its coordinates look like longitude/latitude, else null. */
export function geographicHint(raw: Record<string, unknown>, horizons: ImportedHorizon[]): string | null {
  const crs = raw.crs as { properties?: { name?: unknown } } | undefined;
  const name = typeof crs?.properties?.name === 'string' ? crs.properties.name : '';
  if (/CRS84|EPSG:+(4326|4269|4258|4283|4617)\b|WGS\s?84(?!.*UTM)/i.test(name)) {
    return `The file declares a geographic coordinate system (${name.slice(0, 80)}): its coordinates are longitude and latitude, not section x and z. Import a section drawn in section units (e.g. exported from the section, not a map).`;
  }
  let minX = Infinity, maxX = -Infinity, minZ = Infinity, maxZ = -Infinity;
  for (const h of horizons) {
    for (const [x, z] of h.line) {
      if (x < minX) minX = x;
      if (x > maxX) maxX = x;
      if (z < minZ) minZ = z;
      if (z > maxZ) maxZ = z;
    }
  }
  const inRange = minX >= -180 && maxX <= 180 && minZ >= -90 && maxZ <= 90;
  if (inRange && maxX - minX <= DEGREES_SPAN && maxZ - minZ <= DEGREES_SPAN) {
    return `Every coordinate lies within longitude/latitude ranges and spans at most ${DEGREES_SPAN} units: this looks like a map in degrees (GeoJSON's default), not a section in metres or feet. Check the file before importing.`;
  }
  return null;
}

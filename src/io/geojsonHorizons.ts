// Horizons as GeoJSON: LineString / MultiLineString features whose coordinates are section
// [x, z] (not longitude/latitude), with the unit in a "units" property (feature or collection).
import { featureCollection, lineString, multiLineString } from '@turf/helpers';
import type { LineString, MultiLineString } from 'geojson';
import { SECTION_CAUTION } from '../core/analysis/caution';
import type { ImportedFault, ImportedHorizon } from '../core/model/commands/importHorizons';
import type { LengthUnit, XZ } from '../core/model/section';
import { cleanPoint } from './cleanCoordinate';
import { countLines, fileTooLargeMessage, lineCountProblem, LIMITS } from '../core/model/limits';
import { jsonDepthProblem } from '../core/model/jsonDepthProblem';
import { geographicHint } from './geographicHint';
import { MAX_IMPORT_BYTES, pushProblem, readUnit, type HorizonImport, type RowProblem } from './importTypes';

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function readLine(v: unknown): XZ[] | string {
  if (!Array.isArray(v)) return 'coordinates are not an array of positions';
  if (v.length > 1_000_000) return 'more than a million positions';
  const out: XZ[] = [];
  for (let i = 0; i < v.length; i++) {
    const p = v[i];
    if (!Array.isArray(p) || p.length < 2 || typeof p[0] !== 'number' || typeof p[1] !== 'number' || !Number.isFinite(p[0]) || !Number.isFinite(p[1])) {
      return `position ${i} is not a pair of finite numbers [x, z]`;
    }
    out.push([p[0], p[1]]);
  }
  if (out.length < 2) return 'fewer than two positions';
  return out;
}

/** Returns the horizons in a GeoJSON text (section units), each bad feature listed; never throws. */
export function parseHorizonsGeoJson(text: string): HorizonImport {
  const problems: RowProblem[] = [];
  if (text.length > MAX_IMPORT_BYTES) return { ok: false, message: `The GeoJSON file cannot be imported: ${fileTooLargeMessage(text.length, MAX_IMPORT_BYTES)}.`, problems };
  const deep = jsonDepthProblem(text);
  if (deep) return { ok: false, message: `The GeoJSON file cannot be imported: ${deep}.`, problems };
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { ok: false, message: 'The GeoJSON file is not valid JSON — it may be truncated or damaged.', problems };
  }
  if (!isObject(raw)) return { ok: false, message: 'The GeoJSON file must hold an object (a FeatureCollection, Feature or geometry).', problems };
  const features: unknown[] = raw.type === 'FeatureCollection' && Array.isArray(raw.features) ? raw.features
    : raw.type === 'Feature' ? [raw]
    : typeof raw.type === 'string' && 'coordinates' in raw ? [{ type: 'Feature', properties: {}, geometry: raw }]
    : [];
  if (features.length === 0) return { ok: false, message: 'The GeoJSON file holds no features.', problems };
  let units = readUnit(raw.units) ?? (isObject(raw.properties) ? readUnit(raw.properties.units) : null);
  const horizons: ImportedHorizon[] = [];
  const faults: ImportedFault[] = [];
  const counter = { n: 0 };
  features.forEach((f, i) => {
    const where = `feature ${i + 1}`;
    if (!isObject(f) || !isObject(f.geometry)) { pushProblem(problems, { where, message: 'has no geometry' }, counter); return; }
    const props = isObject(f.properties) ? f.properties : {};
    const rawName = props.name ?? props.horizon ?? f.id;
    const name = (typeof rawName === 'string' || typeof rawName === 'number' ? String(rawName) : `Horizon ${i + 1}`).trim().slice(0, LIMITS.nameLength) || `Horizon ${i + 1}`;
    const fu = readUnit(props.units);
    if (fu && units && fu !== units) { pushProblem(problems, { where, message: `is in ${fu} while others are in ${units}; convert it` }, counter); return; }
    units = units ?? fu;
    const g = f.geometry;
    const parts = g.type === 'LineString' ? [g.coordinates] : g.type === 'MultiLineString' && Array.isArray(g.coordinates) ? g.coordinates : null;
    if (!parts) { pushProblem(problems, { where: `${where} ("${name}")`, message: `is a ${String(g.type).slice(0, 40)}; only LineString and MultiLineString are horizons` }, counter); return; }
    // A fault (kind "fault") is a LineString; a horizon cut by faults (kind "horizon") a MultiLineString of its pieces in order.
    if (props.kind === 'fault' || (props.kind === 'horizon' && parts.length > 1)) {
      const lines = parts.map(readLine);
      const bad = lines.findIndex((l: XZ[] | string) => typeof l === 'string');
      if (bad >= 0) { pushProblem(problems, { where: `${where} ("${name}")`, message: `${parts.length > 1 ? `part ${bad + 1}: ` : ''}${lines[bad] as string}` }, counter); return; }
      const ok = lines as XZ[][];
      if (props.kind === 'fault') {
        if (ok.length > 1) { pushProblem(problems, { where: `${where} ("${name}")`, message: 'is a fault of several parts; a fault is one LineString' }, counter); return; }
        faults.push({ name, line: ok[0] });
      } else horizons.push({ name, line: ok.flat(), pieces: ok });
      return;
    }
    parts.forEach((part: unknown, k: number) => {
      const line = readLine(part);
      const partName = parts.length > 1 ? `${name} ${k + 1}` : name;
      if (typeof line === 'string') pushProblem(problems, { where: `${where} ("${partName}")`, message: line }, counter);
      else horizons.push({ name: partName, line });
    });
  });
  if (horizons.length === 0 && faults.length === 0) return { ok: false, message: 'The GeoJSON file holds no usable LineString horizon.', problems };
  const tooMany = lineCountProblem({ horizons: horizons.length, ...countLines(horizons.map((h) => h.line.length)) });
  if (tooMany) return { ok: false, message: `The GeoJSON file holds ${tooMany}; thin the vertices or import the file in parts. Nothing was imported.`, problems };
  const warning = geographicHint(raw, horizons);
  return { ok: true, horizons, units, problems, ...(warning ? { warning } : {}), ...(faults.length ? { faults } : {}) };
}

/**
 * Returns horizons and faults (section units) as a GeoJSON FeatureCollection text: a horizon a LineString, one cut
 * by faults a MultiLineString of its pieces in order (kind "horizon"; an unmarked MultiLineString reads as separate horizons), a fault a LineString with kind "fault"; name
 * and units properties, and the caution as a top-level "caution" member; coordinates rounded to 1e-6 unit (cleanCoordinate).
 */
export function writeHorizonsGeoJson(horizons: ImportedHorizon[], units: LengthUnit, faults: ImportedFault[] = []): string {
  const fc = featureCollection<LineString | MultiLineString, { name: string; units: LengthUnit; kind?: string }>([
    ...horizons.map((h) => (h.pieces && h.pieces.length > 1
      ? multiLineString(h.pieces.map((p) => p.map(cleanPoint)), { name: h.name, units, kind: 'horizon' })
      : lineString(h.line.map(cleanPoint), { name: h.name, units }))),
    ...faults.map((f) => lineString(f.line.map(cleanPoint), { name: f.name, units, kind: 'fault' })),
  ]);
  // "caution" and "units" are foreign members, which GeoJSON readers keep or ignore (RFC 7946 §6.1).
  return JSON.stringify({ ...fc, units, caution: SECTION_CAUTION }, null, 1);
}

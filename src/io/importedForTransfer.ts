// A horizon file (CSV, GeoJSON or SVG) read for the import preview, in the form that crosses from the reading worker
// (workers/readImport.worker.ts) to the page: the parsers are the same ones (csvHorizons, geojsonHorizons,
// svgHorizons), run in the worker; what scales with the rows (the coordinate range check, each line's extent for
// the preview) is measured there too, and every line's vertices cross packed in a Float64Array whose buffer is
// transferred. The page unpacks them a few lines a task (unpackImportRead).
import type { ImportedFault, ImportedHorizon } from '../core/model/commands/importHorizons';
import { importedCoordinateProblem } from '../core/model/importedCoordinateProblem';
import type { XZ } from '../core/model/section';
import { parseHorizonsCsv } from './csvHorizons';
import { parseHorizonsGeoJson } from './geojsonHorizons';
import type { HorizonImport } from './importTypes';
import { packPoints, unpackPoints } from './packedDoc';
import { readSvgLines, type SvgLine, type SvgRead } from './svgHorizons';

export type ImportKind = 'csv' | 'geojson' | 'svg';

/** A line's extent: [min x, max x, min z, max z] (section units; for SVG, the drawing's root user units, y down). */
export type LineBox = [number, number, number, number];

/**
 * The file read: the parser's result; the extent of each horizon (CSV, GeoJSON) or drawn line (SVG), in order;
 * and for CSV and GeoJSON the first coordinate outside the range a section may hold (importedCoordinateProblem), or null.
 */
export type ImportRead =
  | { kind: 'csv' | 'geojson'; result: HorizonImport; boxes: LineBox[]; rangeProblem: string | null }
  | { kind: 'svg'; result: SvgRead; boxes: LineBox[] };

/** Returns the extent of a line's vertices (Infinity/-Infinity bounds for an empty line). */
export function lineBox(points: readonly XZ[]): LineBox {
  let x0 = Infinity, x1 = -Infinity, z0 = Infinity, z1 = -Infinity;
  for (let i = 0; i < points.length; i++) {
    const [x, z] = points[i];
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (z < z0) z0 = z;
    if (z > z1) z1 = z;
  }
  return [x0, x1, z0, z1];
}

/** Returns the text of a horizon file read by the importer of `kind`, with what the preview measures; never throws. */
export function readImportText(kind: ImportKind, text: string): ImportRead {
  if (kind === 'svg') {
    const result = readSvgLines(text);
    return { kind, result, boxes: result.ok ? result.lines.map((l) => lineBox(l.points)) : [] };
  }
  const result = kind === 'csv' ? parseHorizonsCsv(text) : parseHorizonsGeoJson(text);
  if (!result.ok) return { kind, result, boxes: [], rangeProblem: null };
  const rangeProblem = importedCoordinateProblem(result.horizons) ?? importedCoordinateProblem(result.faults ?? [], 'Fault');
  return { kind, result, boxes: result.horizons.map((h) => lineBox(h.line)), rangeProblem };
}

type Packed<T> = { [K in keyof T]: T[K] extends XZ[] ? Float64Array : T[K] extends XZ[][] | undefined ? Float64Array[] | undefined : T[K] };
type PackedHorizon = Packed<ImportedHorizon>;
type PackedFault = Packed<ImportedFault>;
type PackedSvgLine = Packed<SvgLine>;

/** ImportRead with every line's vertices packed (packPoints). */
export type PackedImportRead =
  | { kind: 'csv' | 'geojson'; boxes: LineBox[]; rangeProblem: string | null; result: Exclude<HorizonImport, { ok: true }> | (Omit<Extract<HorizonImport, { ok: true }>, 'horizons' | 'faults'> & { horizons: PackedHorizon[]; faults?: PackedFault[] }) }
  | { kind: 'svg'; boxes: LineBox[]; result: Exclude<SvgRead, { ok: true }> | (Omit<Extract<SvgRead, { ok: true }>, 'lines'> & { lines: PackedSvgLine[] }) };

/** Returns the read file with its lines packed, and the buffers to transfer. */
export function importReadForTransfer(read: ImportRead): { packed: PackedImportRead; transfer: ArrayBuffer[] } {
  // A set: a buffer listed twice cannot be transferred (packPoints gives the same array for the same line).
  const buffers = new Set<ArrayBuffer>();
  const transfer: ArrayBuffer[] = [];
  const pack = (points: readonly XZ[]) => {
    const flat = packPoints(points);
    if (!buffers.has(flat.buffer as ArrayBuffer)) transfer.push(flat.buffer as ArrayBuffer);
    buffers.add(flat.buffer as ArrayBuffer);
    return flat;
  };
  if (read.kind === 'svg') {
    if (!read.result.ok) return { packed: { kind: read.kind, boxes: read.boxes, result: read.result }, transfer };
    const lines = read.result.lines.map((l) => ({ name: l.name, points: pack(l.points) }));
    return { packed: { kind: read.kind, boxes: read.boxes, result: { ...read.result, lines } }, transfer };
  }
  const r = read.result;
  if (!r.ok) return { packed: { ...read, result: r }, transfer };
  const horizons = r.horizons.map((h): PackedHorizon => ({ name: h.name, line: pack(h.line), ...(h.pieces ? { pieces: h.pieces.map(pack) } : {}) }));
  const faults = r.faults?.map((f): PackedFault => ({ name: f.name, line: pack(f.line) }));
  return { packed: { ...read, result: { ...r, horizons, faults } }, transfer };
}

/** Vertices unpacked between two yields to the page: a few milliseconds of work. */
const VERTICES_PER_STEP = 150_000;

/**
 * Returns the ImportRead that readImportText gave in the worker, its lines unpacked about 150,000 vertices a task;
 * `step(done, total)` (vertices) is awaited between, where the caller yields to the page and shows progress.
 */
export async function unpackImportRead(packed: PackedImportRead, step: (done: number, total: number) => Promise<void>): Promise<ImportRead> {
  const flats: Float64Array[] = [];
  if (packed.kind === 'svg' && packed.result.ok) for (const l of packed.result.lines) flats.push(l.points);
  if (packed.kind !== 'svg' && packed.result.ok) {
    for (const h of packed.result.horizons) {
      flats.push(h.line);
      for (const piece of h.pieces ?? []) flats.push(piece);
    }
    for (const f of packed.result.faults ?? []) flats.push(f.line);
  }
  let total = 0;
  for (const f of flats) total += f.length >> 1;
  const lines = new Map<Float64Array, XZ[]>();
  let done = 0, sinceStep = 0;
  for (const f of flats) {
    lines.set(f, unpackPoints(f));
    done += f.length >> 1;
    sinceStep += f.length >> 1;
    if (sinceStep >= VERTICES_PER_STEP) {
      sinceStep = 0;
      await step(done, total);
    }
  }
  const line = (f: Float64Array) => lines.get(f)!;
  if (packed.kind === 'svg') {
    if (!packed.result.ok) return { kind: packed.kind, boxes: packed.boxes, result: packed.result };
    return { kind: packed.kind, boxes: packed.boxes, result: { ...packed.result, lines: packed.result.lines.map((l) => ({ name: l.name, points: line(l.points) })) } };
  }
  const r = packed.result;
  if (!r.ok) return { ...packed, result: r };
  const horizons = r.horizons.map((h): ImportedHorizon => ({ name: h.name, line: line(h.line), ...(h.pieces ? { pieces: h.pieces.map(line) } : {}) }));
  const faults = r.faults?.map((f): ImportedFault => ({ name: f.name, line: line(f.line) }));
  return { ...packed, result: { ...r, horizons, faults } };
}

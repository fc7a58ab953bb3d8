// Reads a chosen file into a horizon import preview (CSV, GeoJSON or SVG); never throws.
import { parseHorizonsCsv } from '../../io/csvHorizons';
import { parseHorizonsGeoJson } from '../../io/geojsonHorizons';
import { MAX_IMPORT_BYTES, type HorizonImport } from '../../io/importTypes';
import { fileTooLargeMessage } from '../../core/model/limits';
import { readSvgLines, type SvgRead } from '../../io/svgHorizons';

export type ImportKind = 'csv' | 'geojson' | 'svg';

export type PendingImport =
  | { kind: 'csv' | 'geojson'; fileName: string; result: HorizonImport }
  | { kind: 'svg'; fileName: string; result: SvgRead };

/** Returns the preview of the file's horizons, or a failed result with the reason. */
export async function readImport(kind: ImportKind, file: File): Promise<PendingImport> {
  const fail = (message: string) => ({ ok: false as const, message, problems: [] });
  if (file.size > MAX_IMPORT_BYTES) {
    // Refused before a byte is read, in the words of every size limit (limits.ts).
    const message = `${file.name} cannot be imported: ${fileTooLargeMessage(file.size, MAX_IMPORT_BYTES)}.`;
    return kind === 'svg' ? { kind, fileName: file.name, result: fail(message) } : { kind, fileName: file.name, result: fail(message) };
  }
  let text = '';
  try {
    text = await file.text();
  } catch {
    return kind === 'svg' ? { kind, fileName: file.name, result: fail('The file could not be read.') } : { kind, fileName: file.name, result: fail('The file could not be read.') };
  }
  if (kind === 'svg') return { kind, fileName: file.name, result: readSvgLines(text) };
  return { kind, fileName: file.name, result: kind === 'csv' ? parseHorizonsCsv(text) : parseHorizonsGeoJson(text) };
}

// Reads a chosen file into a horizon import preview (CSV, GeoJSON or SVG) off the main thread (io/readImportFile);
// never throws.
import { MAX_IMPORT_BYTES } from '../../io/importTypes';
import { fileTooLargeMessage } from '../../core/model/limits';
import type { ImportKind, ImportRead } from '../../io/importedForTransfer';
import { readImportFile, type ImportProgress } from '../../io/readImportFile';

export type { ImportKind };

/** The file read for the preview, with its name for the dialog's messages. */
export type PendingImport = ImportRead & { fileName: string };

/** Returns the preview of the file's horizons, or a failed result with the reason; null when `signal` cancelled the read. */
export async function readImport(kind: ImportKind, file: File, progress?: (p: ImportProgress) => void, signal?: AbortSignal): Promise<PendingImport | null> {
  const fail = (message: string): PendingImport => (kind === 'svg'
    ? { kind, fileName: file.name, boxes: [], result: { ok: false, message, problems: [] } }
    : { kind, fileName: file.name, boxes: [], rangeProblem: null, result: { ok: false, message, problems: [] } });
  // Refused before a byte is read, in the words of every size limit (limits.ts).
  if (file.size > MAX_IMPORT_BYTES) return fail(`${file.name} cannot be imported: ${fileTooLargeMessage(file.size, MAX_IMPORT_BYTES)}.`);
  const read = await readImportFile(file, kind, progress, signal);
  if (read === 'cancelled') return null;
  if (read === 'unreadable') return fail('The file could not be read.');
  return { ...read, fileName: file.name };
}

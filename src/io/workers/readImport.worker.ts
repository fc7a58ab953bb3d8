// Reads a horizon file (CSV, GeoJSON or SVG) for the import preview off the main thread (io/importedForTransfer.ts):
// reading the text, the parse, the range check and each line's extent took seconds of one main-thread task for a
// file of a million rows. The lines come back packed in transferred buffers; the page unpacks them a few a task.
import { importReadForTransfer, readImportText, type ImportKind, type PackedImportRead } from '../importedForTransfer';
import { serveFiles } from '../fileWorker';

serveFiles<{ kind: ImportKind }, PackedImportRead>((text, { kind }) => {
  const { packed, transfer } = importReadForTransfer(readImportText(kind, text));
  return { value: packed, transfer };
});

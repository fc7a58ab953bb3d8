// Reads a horizon file (CSV, GeoJSON or SVG) for the import preview off the main thread (io/importedForTransfer.ts):
// reading the text, the parse, the range check and each line's extent took seconds of one main-thread task for a
// file of a million rows. The lines come back packed in transferred buffers; the page unpacks them a few a task.
import { importReadForTransfer, readImportText, type ImportKind, type PackedImportRead } from '../importedForTransfer';

/** What the page asks: the file chosen and the importer to read it with. */
export interface ImportWorkerRequest { file: File; kind: ImportKind }
/** The worker's messages: the file is read (the parse starts), it is parsed, or the disk refused it. */
export type ImportWorkerReply = { type: 'read' } | { type: 'parsed'; packed: PackedImportRead } | { type: 'unreadable' };

function reply(msg: ImportWorkerReply, transfer: Transferable[] = []): void {
  (self as unknown as { postMessage(m: unknown, t: Transferable[]): void }).postMessage(msg, transfer);
}

self.onmessage = async (e: MessageEvent<ImportWorkerRequest>) => {
  const { file, kind } = e.data;
  let text: string;
  try {
    text = await file.text();
  } catch {
    return reply({ type: 'unreadable' });
  }
  reply({ type: 'read' });
  const { packed, transfer } = importReadForTransfer(readImportText(kind, text));
  reply({ type: 'parsed', packed }, transfer);
};

// Reads, checks and converts a project or section file off the main thread (io/readProjectFile.ts): reading
// the text, the nesting check, JSON.parse, the schema check, the migration and the conversion of a section
// file to scan pixels took seconds of one main-thread task for a document of a million vertices. The
// document comes back with its lines packed (io/packedDoc.ts) in transferred buffers, and the scan's bytes
// transferred too; the page unpacks the lines a few at a time.
import { openedForTransfer, type PackedOpened } from '../openedForTransfer';
import { serveFiles } from '../fileWorker';

serveFiles<{ name: string }, PackedOpened>((text, { name }) => {
  const { opened, transfer } = openedForTransfer(text, name);
  return { value: opened, transfer };
});

// Reads a horizon file for the import preview without holding the page: the file is read and parsed, its range
// checked and each line measured in a worker (workers/readImport.worker.ts, the same parsers), and its lines come
// back packed and are unpacked a few a task, so the page stays live and shows progress while a file of a million
// rows is read. Where workers are missing (the unit tests under Node) the same steps run here, one after the other.
import { importReadForTransfer, readImportText, unpackImportRead, type ImportKind, type ImportRead, type PackedImportRead } from './importedForTransfer';
import { askFileWorker, convertFileHere, yieldToPage } from './fileWorker';

/** How far reading has got, for the busy message: reading the file, parsing and checking it, or unpacking its lines (fraction 0–1). */
export type ImportProgress = { stage: 'reading' } | { stage: 'checking' } | { stage: 'lines'; fraction: number };

/**
 * Returns the file read as readImportText reads its text (the same horizons, problems and messages), 'unreadable'
 * when the disk refused the file, or 'cancelled' when `signal` aborted the read; `progress` hears each stage.
 */
export async function readImportFile(file: File, kind: ImportKind, progress: (p: ImportProgress) => void = () => undefined, signal?: AbortSignal): Promise<ImportRead | 'unreadable' | 'cancelled'> {
  progress({ stage: 'reading' });
  const checking = () => progress({ stage: 'checking' });
  const makeWorker = () => new Worker(new URL('./workers/readImport.worker.ts', import.meta.url), { type: 'module' });
  let packed = typeof Worker === 'undefined' ? 'no-worker' : await askFileWorker<{ kind: ImportKind }, PackedImportRead>(makeWorker, { file, kind }, checking, signal);
  if (packed === 'no-worker') packed = await convertFileHere(file, checking, (text) => importReadForTransfer(readImportText(kind, text)).packed);
  if (packed === 'unreadable' || packed === 'cancelled') return packed;
  const read = await unpackImportRead(packed, async (done, total) => {
    progress({ stage: 'lines', fraction: total > 0 ? done / total : 1 });
    await yieldToPage();
  });
  return signal?.aborted ? 'cancelled' : read;
}

// Reads a horizon file for the import preview without holding the page: the file is read and parsed, its range
// checked and each line measured in a worker (workers/readImport.worker.ts, the same parsers), and its lines come
// back packed and are unpacked a few a task, so the page stays live and shows progress while a file of a million
// rows is read. Where workers are missing (the unit tests under Node) the same steps run here, one after the other.
import { importReadForTransfer, readImportText, unpackImportRead, type ImportKind, type ImportRead, type PackedImportRead } from './importedForTransfer';
import type { ImportWorkerReply, ImportWorkerRequest } from './workers/readImport.worker';

/** How far reading has got, for the busy message: reading the file, parsing and checking it, or unpacking its lines (fraction 0–1). */
export type ImportProgress = { stage: 'reading' } | { stage: 'checking' } | { stage: 'lines'; fraction: number };

/** A macrotask boundary: the page draws and handles input before the next step. */
const yieldToPage = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

function inWorker(file: File, kind: ImportKind, progress: (p: ImportProgress) => void, signal?: AbortSignal): Promise<PackedImportRead | 'unreadable' | 'no-worker' | 'cancelled'> {
  let worker: Worker;
  try {
    worker = new Worker(new URL('./workers/readImport.worker.ts', import.meta.url), { type: 'module' });
  } catch {
    return Promise.resolve('no-worker');
  }
  return new Promise((resolve) => {
    const finish = (v: PackedImportRead | 'unreadable' | 'no-worker' | 'cancelled') => {
      worker.terminate();
      signal?.removeEventListener('abort', cancel);
      resolve(v);
    };
    const cancel = () => finish('cancelled');
    signal?.addEventListener('abort', cancel);
    worker.onmessage = (e: MessageEvent<ImportWorkerReply>) => {
      if (e.data.type === 'read') progress({ stage: 'checking' });
      else if (e.data.type === 'unreadable') finish('unreadable');
      else finish(e.data.packed);
    };
    // A worker that cannot start (or dies) leaves the work to this thread.
    worker.onerror = () => finish('no-worker');
    worker.postMessage({ file, kind } satisfies ImportWorkerRequest);
  });
}

async function inThisThread(file: File, kind: ImportKind, progress: (p: ImportProgress) => void): Promise<PackedImportRead | 'unreadable'> {
  let text: string;
  try {
    text = await file.text();
  } catch {
    return 'unreadable';
  }
  progress({ stage: 'checking' });
  return importReadForTransfer(readImportText(kind, text)).packed;
}

/**
 * Returns the file read as readImportText reads its text (the same horizons, problems and messages), 'unreadable'
 * when the disk refused the file, or 'cancelled' when `signal` aborted the read; `progress` hears each stage.
 */
export async function readImportFile(file: File, kind: ImportKind, progress: (p: ImportProgress) => void = () => undefined, signal?: AbortSignal): Promise<ImportRead | 'unreadable' | 'cancelled'> {
  progress({ stage: 'reading' });
  let packed = typeof Worker === 'undefined' ? 'no-worker' : await inWorker(file, kind, progress, signal);
  if (packed === 'no-worker') packed = await inThisThread(file, kind, progress);
  if (packed === 'unreadable' || packed === 'cancelled') return packed;
  const read = await unpackImportRead(packed, async (done, total) => {
    progress({ stage: 'lines', fraction: total > 0 ? done / total : 1 });
    await yieldToPage();
  });
  return signal?.aborted ? 'cancelled' : read;
}

// Opens a project or section file without holding the page: the file is read, checked and converted in a
// worker (workers/openProject.worker.ts) and its lines come back packed and are unpacked a few a task, so
// the page stays live and shows progress while a document of a million vertices opens. Where workers are
// missing (the unit tests under Node) the same steps run here, one after the other.
import type { OpenWorkerReply, OpenWorkerRequest, PackedOpened } from './openedForTransfer';
import { openedForTransfer, unpackOpened } from './openedForTransfer';
import type { OpenedProject } from './projectFile';

/** How far opening has got, for the busy message: reading and checking the file, or unpacking its lines (fraction 0–1). */
export type OpenProgress = { stage: 'reading' } | { stage: 'checking' } | { stage: 'lines'; fraction: number };

/** A macrotask boundary: the page draws and handles input before the next step. */
const yieldToPage = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

function inWorker(file: File, name: string, progress: (p: OpenProgress) => void): Promise<PackedOpened | 'unreadable' | 'no-worker'> {
  let worker: Worker;
  try {
    worker = new Worker(new URL('./workers/openProject.worker.ts', import.meta.url), { type: 'module' });
  } catch {
    return Promise.resolve('no-worker');
  }
  return new Promise((resolve) => {
    const finish = (v: PackedOpened | 'unreadable' | 'no-worker') => {
      worker.terminate();
      resolve(v);
    };
    worker.onmessage = (e: MessageEvent<OpenWorkerReply>) => {
      if (e.data.type === 'read') progress({ stage: 'checking' });
      else if (e.data.type === 'unreadable') finish('unreadable');
      else finish(e.data.opened);
    };
    // A worker that cannot start (or dies) leaves the work to this thread.
    worker.onerror = () => finish('no-worker');
    worker.postMessage({ file, name } satisfies OpenWorkerRequest);
  });
}

async function inThisThread(file: File, name: string, progress: (p: OpenProgress) => void): Promise<PackedOpened | 'unreadable'> {
  let text: string;
  try {
    text = await file.text();
  } catch {
    return 'unreadable';
  }
  progress({ stage: 'checking' });
  return openedForTransfer(text, name).opened;
}

/**
 * Returns the file opened as parseProjectText opens its text (the same document, scan bytes, notes or message),
 * or 'unreadable' when the disk refused the file; `progress` hears each stage.
 */
export async function readProjectFile(file: File, name: string, progress: (p: OpenProgress) => void = () => undefined): Promise<OpenedProject | 'unreadable'> {
  progress({ stage: 'reading' });
  let packed = typeof Worker === 'undefined' ? 'no-worker' : await inWorker(file, name, progress);
  if (packed === 'no-worker') packed = await inThisThread(file, name, progress);
  if (packed === 'unreadable') return packed;
  return unpackOpened(packed, async (done, total) => {
    progress({ stage: 'lines', fraction: total > 0 ? done / total : 1 });
    await yieldToPage();
  });
}

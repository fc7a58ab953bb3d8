// Opens a project or section file without holding the page: the file is read, checked and converted in a
// worker (workers/openProject.worker.ts) and its lines come back packed and are unpacked a few a task, so
// the page stays live and shows progress while a document of a million vertices opens. Where workers are
// missing (the unit tests under Node) the same steps run here, one after the other.
import type { PackedOpened } from './openedForTransfer';
import { askFileWorker, convertFileHere, fileWorkers, yieldToPage } from './fileWorker';
import { openedForTransfer, unpackOpened } from './openedForTransfer';
import type { OpenedProject } from './projectFile';

/** Files up to this size leave their worker kept for the next (about 250,000 vertices; fileWorkers). */
const KEEP_WORKER_BYTES = 10 * 1024 * 1024;

const openWorkers = fileWorkers(() => new Worker(new URL('./workers/openProject.worker.ts', import.meta.url), { type: 'module' }), KEEP_WORKER_BYTES);

/** Starts the opening worker ahead, when the page is next idle, so the first file opened does not wait for it. */
export function startOpeningWorker(): void {
  openWorkers.startAhead();
}

/** How far opening has got, for the busy message: reading and checking the file, or unpacking its lines (fraction 0–1). */
export type OpenProgress = { stage: 'reading' } | { stage: 'checking' } | { stage: 'lines'; fraction: number };

/**
 * Returns the file opened as parseProjectText opens its text (the same document, scan bytes, notes or message),
 * or 'unreadable' when the disk refused the file; `progress` hears each stage.
 */
export async function readProjectFile(file: File, name: string, progress: (p: OpenProgress) => void = () => undefined): Promise<OpenedProject | 'unreadable'> {
  progress({ stage: 'reading' });
  const checking = () => progress({ stage: 'checking' });
  let packed = typeof Worker === 'undefined' ? 'no-worker' : await askFileWorker<{ name: string }, PackedOpened>(openWorkers, { file, name }, checking);
  if (packed === 'no-worker') packed = await convertFileHere(file, checking, (text) => openedForTransfer(text, name).opened);
  // Nothing aborts an open (no signal is given), so 'cancelled' never comes; it is answered as a refused read.
  if (packed === 'unreadable' || packed === 'cancelled') return 'unreadable';
  return unpackOpened(packed, async (done, total) => {
    progress({ stage: 'lines', fraction: total > 0 ? done / total : 1 });
    await yieldToPage();
  });
}

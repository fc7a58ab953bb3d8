// The kept work of a big document written off the main thread (autosaveWrite.worker.ts): the page packs the lines
// (io/packedDoc.ts, once per line) and sends the worker only those it does not hold yet; the worker's IndexedDB
// write then serialises the record on its own thread. Where there is no worker (tests in Node) or it fails, the
// page writes the snapshot itself, as it writes a small document.
import type { ProjectDoc } from '../core/model/projectDoc';
import { createLineSender, packDoc, packedDelta, type LineSender } from '../io/packedDoc';
import type { SnapshotMeta, StoredScan } from './autosaveDb';
import type { KeptWriteReply, KeptWriteRequest } from './autosaveWrite.worker';

let worker: Worker | null = null;
let sender: LineSender = createLineSender();
let nextId = 1;
const waiting = new Map<number, { resolve: () => void; reject: (e: Error) => void }>();

/** Ends the worker and forgets what it held: every line is sent again to the next one. */
function dropWorker(why: Error): void {
  worker?.terminate();
  worker = null;
  sender = createLineSender();
  for (const w of waiting.values()) w.reject(why);
  waiting.clear();
}

function startWorker(): Worker | null {
  if (worker) return worker;
  if (typeof Worker === 'undefined') return null;
  try {
    worker = new Worker(new URL('./autosaveWrite.worker.ts', import.meta.url), { type: 'module' });
  } catch {
    return null;
  }
  worker.onmessage = (e: MessageEvent<KeptWriteReply>) => {
    const r = e.data;
    const w = waiting.get(r.id);
    waiting.delete(r.id);
    if (!w) return;
    if (r.ok) w.resolve();
    else w.reject(Object.assign(new Error(r.message), { name: r.name, fromStore: r.store }));
  };
  worker.onerror = () => dropWorker(new Error('the autosave worker stopped'));
  worker.onmessageerror = () => dropWorker(new Error('the autosave worker could not read a message'));
  return worker;
}

/**
 * Writes the snapshot from the worker; resolves once its transaction has committed, rejects with the browser's
 * error (isQuotaError reads its name). `onPage` writes it on the page instead, used when no worker can take it.
 */
export async function writeSnapshotOffPage(meta: SnapshotMeta, doc: ProjectDoc, scan: StoredScan | null, writeScanBytes: boolean,
  onPage: () => Promise<void>): Promise<void> {
  const w = startWorker();
  if (!w) return onPage();
  const id = nextId++;
  const delta = packedDelta(sender, packDoc(doc));
  const done = new Promise<void>((resolve, reject) => waiting.set(id, { resolve, reject }));
  const request: KeptWriteRequest = { id, meta, delta, scan, writeScanBytes };
  w.postMessage(request, delta.lines.map(([, line]) => line.buffer as ArrayBuffer));
  try {
    await done;
  } catch (e) {
    // The store's own refusal (a full quota) is the caller's to report (the worker still holds this document's
    // lines); a worker that failed is replaced, and the page writes this snapshot.
    if ((e as { fromStore?: boolean }).fromStore) throw e;
    dropWorker(e as Error);
    return onPage();
  }
}

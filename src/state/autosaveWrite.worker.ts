// Writes the kept work of a big document to IndexedDB off the main thread (state/autosaveWriter.ts): the browser's
// copy of the record (its structured serialisation) took a task of 50–130 ms on the page for 12 lines of 100,000
// vertices. The page sends each line once, packed (io/packedDoc.ts packedDelta); this worker keeps the lines of the
// last document and puts the record together from them, so an edit sends only the lines it changed.
import { receivePackedDelta, type PackedDelta } from '../io/packedDoc';
import { openAutosaveDb, writePackedSnapshot, type SnapshotMeta, type StoredScan } from './autosaveDb';

/** A write the page asks for: the record's fields, the document as a delta, the scan and whether its bytes are written. */
export interface KeptWriteRequest { id: number; meta: SnapshotMeta; delta: PackedDelta; scan: StoredScan | null; writeScanBytes: boolean }
/** The answer: written, or why not: the store's error (its name, so the page can tell a full quota), or the worker's own. */
export type KeptWriteReply = { id: number; ok: true } | { id: number; ok: false; store: boolean; name: string; message: string };

const held = new Map<number, Float64Array>();
let db: Promise<IDBDatabase> | null = null;

function reply(msg: KeptWriteReply): void {
  (self as unknown as { postMessage(m: unknown): void }).postMessage(msg);
}

self.onmessage = async (e: MessageEvent<KeptWriteRequest>) => {
  const { id, meta, delta, scan, writeScanBytes } = e.data;
  const failed = (store: boolean, err: unknown) => {
    const { name, message } = err instanceof Error || err instanceof DOMException ? err : { name: 'Error', message: String(err) };
    reply({ id, ok: false, store, name, message });
  };
  let doc;
  try {
    // Put together now, in the order the page sent them: the next request's delta counts on these lines.
    doc = receivePackedDelta(held, delta);
  } catch (err) {
    return failed(false, err);
  }
  try {
    db ??= openAutosaveDb();
    await writePackedSnapshot(await db, { ...meta, doc }, scan, writeScanBytes);
    reply({ id, ok: true });
  } catch (err) {
    failed(true, err);
  }
};

// The autosave store in IndexedDB: the latest document (and whether it was saved to a file) under
// one key, and the scan's original bytes under its scan id, written only when the scan changes.
// The factory is a parameter so tests run against fake-indexeddb.
import { checkProjectDoc } from '../core/model/projectSchema';
import type { ProjectDoc } from '../core/model/projectDoc';
import { packDoc, unpackDoc } from './autosavePack';

const DB_NAME = 'foldroot-autosave';
const DB_VERSION = 1;
const STATE = 'state';
const SCANS = 'scans';
const CURRENT = 'current';

export interface StoredScan { id: string; type: string; name: string; bytes: ArrayBuffer }
export interface AutosaveSnapshot { savedAt: string; doc: ProjectDoc; dirty: boolean; scan: StoredScan | null }

/** True when the error means the browser's storage quota is used up. */
export function isQuotaError(e: unknown): boolean {
  const name = (e as { name?: string } | null)?.name;
  return name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED';
}

function request<T>(r: IDBRequest<T>): Promise<T> {
  return new Promise((resolve, reject) => {
    r.onsuccess = () => resolve(r.result);
    r.onerror = () => reject(r.error);
  });
}

function done(tx: IDBTransaction): Promise<void> {
  return new Promise((resolve, reject) => {
    tx.oncomplete = () => resolve();
    tx.onerror = () => reject(tx.error);
    tx.onabort = () => reject(tx.error ?? new DOMException('Transaction aborted', 'AbortError'));
  });
}

/** Opens (creating on first use) the autosave database. */
export function openAutosaveDb(factory: IDBFactory = indexedDB): Promise<IDBDatabase> {
  return new Promise((resolve, reject) => {
    const r = factory.open(DB_NAME, DB_VERSION);
    r.onupgradeneeded = () => {
      const db = r.result;
      if (!db.objectStoreNames.contains(STATE)) db.createObjectStore(STATE);
      if (!db.objectStoreNames.contains(SCANS)) db.createObjectStore(SCANS);
    };
    r.onsuccess = () => resolve(r.result);
    r.onerror = () => reject(r.error);
  });
}

/** Writes the snapshot in one transaction; the scan's bytes are written only when `writeScanBytes` (other scans are dropped). Rejects with the browser's error (see isQuotaError). */
export async function writeSnapshot(db: IDBDatabase, snap: { savedAt: string; doc: ProjectDoc; dirty: boolean }, scan: StoredScan | null, writeScanBytes: boolean): Promise<void> {
  const tx = db.transaction([STATE, SCANS], 'readwrite');
  const finished = done(tx);
  // Lines packed into typed arrays (autosavePack): the browser copies each as one block.
  tx.objectStore(STATE).put({ savedAt: snap.savedAt, doc: packDoc(snap.doc), dirty: snap.dirty, scanId: scan?.id ?? null }, CURRENT);
  if (writeScanBytes || !scan) {
    const scans = tx.objectStore(SCANS);
    scans.clear();
    if (scan) scans.put(scan, scan.id);
  }
  await finished;
}

/** Returns the last snapshot, or null when there is none or it no longer passes the schema. */
export async function readSnapshot(db: IDBDatabase): Promise<AutosaveSnapshot | null> {
  const tx = db.transaction([STATE, SCANS], 'readonly');
  const state = (await request(tx.objectStore(STATE).get(CURRENT))) as { savedAt?: unknown; doc?: unknown; dirty?: unknown; scanId?: unknown } | undefined;
  if (!state) return null;
  // Packed lines are unpacked first; a snapshot kept before packing has plain lines and passes as it is.
  const checked = checkProjectDoc(unpackDoc(state.doc));
  if (!checked.ok) return null;
  let scan: StoredScan | null = null;
  if (typeof state.scanId === 'string') {
    const s = (await request(tx.objectStore(SCANS).get(state.scanId))) as StoredScan | undefined;
    if (s && s.bytes instanceof ArrayBuffer) scan = s;
  }
  return { savedAt: typeof state.savedAt === 'string' ? state.savedAt : '', doc: checked.doc, dirty: state.dirty === true, scan };
}

/** Deletes the snapshot and stored scans ("Start fresh"). */
export async function clearSnapshot(db: IDBDatabase): Promise<void> {
  const tx = db.transaction([STATE, SCANS], 'readwrite');
  const finished = done(tx);
  tx.objectStore(STATE).clear();
  tx.objectStore(SCANS).clear();
  await finished;
}

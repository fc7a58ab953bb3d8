// The autosave store in IndexedDB: the latest document (and whether it was saved to a file) under
// one key, and the scan's original bytes under its scan id, written only when the scan changes.
// The factory is a parameter so tests run against fake-indexeddb. A kept document comes back through
// the project files' migration (migrateKeptDoc), so work kept by an older version is not lost.
import { migrateKeptDoc } from '../core/model/migrations/migrateKeptDoc';
import type { ProjectDoc } from '../core/model/projectDoc';
import { packDoc, unpackDoc, type PackedDoc } from '../io/packedDoc';

const DB_NAME = 'foldroot-autosave';
const DB_VERSION = 1;
const STATE = 'state';
const SCANS = 'scans';
const CURRENT = 'current';
/** Where kept work that this build cannot read (e.g. kept by a newer build) is moved instead of being overwritten. */
const SET_ASIDE = 'set-aside';

/**
 * A kept scan: its original file as a Blob. The browser keeps a Blob's bytes itself (on disk for IndexedDB), so
 * neither writing nor reading a scan copies the file into the page's memory. Records written before kept an
 * ArrayBuffer; they are read back as a Blob too (storedScanOf).
 */
export interface StoredScan { id: string; type: string; name: string; bytes: Blob }

/** The record as a StoredScan (an older record's ArrayBuffer wrapped as a Blob), or null when it holds no bytes. */
function storedScanOf(record: unknown): StoredScan | null {
  const s = record as { id?: unknown; type?: unknown; name?: unknown; bytes?: unknown } | undefined;
  if (!s || typeof s.id !== 'string' || typeof s.type !== 'string' || typeof s.name !== 'string') return null;
  if (s.bytes instanceof Blob) return { id: s.id, type: s.type, name: s.name, bytes: s.bytes };
  if (s.bytes instanceof ArrayBuffer) return { id: s.id, type: s.type, name: s.name, bytes: new Blob([s.bytes], { type: s.type }) };
  return null;
}
export interface AutosaveSnapshot {
  savedAt: string; doc: ProjectDoc; dirty: boolean; scan: StoredScan | null;
  /** When it was kept (autosaveJournal's nextStamp; for records written before stamps, the time of savedAt): the newer of this and the journal comes back. */
  stamp: number;
  /** The schema version the document was kept at when it was older than this build's (it was migrated), else null. */
  migratedFrom: number | null;
  /** True when it came from the set-aside record (kept by a build that could read it, moved aside by one that could not). */
  fromSetAside: boolean;
}

/** What the browser holds: nothing, kept work this build can restore, or kept work it cannot read (with why). */
export type KeptRead = { kind: 'none' } | { kind: 'kept'; snap: AutosaveSnapshot } | { kind: 'unreadable'; message: string };

type StateRecord = { savedAt?: unknown; doc?: unknown; dirty?: unknown; scanId?: unknown; stamp?: unknown };

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

/** Writes the snapshot in one transaction; the scan's bytes are written only when `writeScanBytes` (other scans are dropped, but a set-aside record's). Rejects with the browser's error (see isQuotaError). */
export async function writeSnapshot(db: IDBDatabase, snap: { savedAt: string; doc: ProjectDoc; dirty: boolean; stamp?: number }, scan: StoredScan | null, writeScanBytes: boolean): Promise<void> {
  // Lines packed into typed arrays (io/packedDoc): the browser copies each as one block.
  return writePackedSnapshot(db, { ...snap, doc: packDoc(snap.doc) }, scan, writeScanBytes);
}

/** The kept record's fields besides the document. */
export interface SnapshotMeta { savedAt: string; dirty: boolean; stamp?: number }

/** As writeSnapshot, with the document already packed (packDoc): the autosave's worker writes what the page packed. */
export async function writePackedSnapshot(db: IDBDatabase, snap: SnapshotMeta & { doc: PackedDoc }, scan: StoredScan | null, writeScanBytes: boolean): Promise<void> {
  // 'strict': the write is on disk when the transaction completes, not only in the browser's memory (Chromium's
  // default), so a browser killed after "Saved" still has the edit.
  const tx = db.transaction([STATE, SCANS], 'readwrite', { durability: 'strict' });
  const finished = done(tx);
  tx.objectStore(STATE).put({ savedAt: snap.savedAt, stamp: snap.stamp ?? Date.parse(snap.savedAt), doc: snap.doc, dirty: snap.dirty, scanId: scan?.id ?? null }, CURRENT);
  if (writeScanBytes || !scan) {
    // Other scans are dropped, except the one of a set-aside record (setAsideKept).
    const scans = tx.objectStore(SCANS);
    const aside = (await request(tx.objectStore(STATE).get(SET_ASIDE))) as StateRecord | undefined;
    const keep = typeof aside?.scanId === 'string' ? aside.scanId : null;
    for (const key of await request(scans.getAllKeys())) if (key !== keep) scans.delete(key);
    if (scan) scans.put(scan, scan.id);
  }
  // Committed as soon as the last request is made, not when the task and its microtasks (the page's render after
  // an edit) have run: the browser starts writing sooner, which shortens the time an edit is at risk.
  if (typeof tx.commit === 'function') tx.commit();
  await finished;
}

/** Reads the kept work (the current record, else a set-aside one this build can read), migrated to the current version. */
export async function readKept(db: IDBDatabase): Promise<KeptRead> {
  const tx = db.transaction([STATE, SCANS], 'readonly');
  const current = (await request(tx.objectStore(STATE).get(CURRENT))) as StateRecord | undefined;
  const aside = (await request(tx.objectStore(STATE).get(SET_ASIDE))) as StateRecord | undefined;
  const record = async (state: StateRecord, fromSetAside: boolean): Promise<KeptRead> => {
    const checked = migrateKeptDoc(unpackDoc(state.doc));
    if (!checked.ok) return { kind: 'unreadable', message: checked.message };
    let scan: StoredScan | null = null;
    if (typeof state.scanId === 'string') {
      scan = storedScanOf(await request(tx.objectStore(SCANS).get(state.scanId)));
    }
    const savedAt = typeof state.savedAt === 'string' ? state.savedAt : '';
    const stamp = typeof state.stamp === 'number' ? state.stamp : Date.parse(savedAt) || 0;
    return { kind: 'kept', snap: { savedAt, stamp, doc: checked.doc, dirty: state.dirty === true, scan, migratedFrom: checked.migratedFrom, fromSetAside } };
  };
  const first = current ? await record(current, false) : ({ kind: 'none' } as const);
  if (first.kind === 'kept' || !aside) return first;
  const second = await record(aside, true);
  return second.kind === 'kept' ? second : first;
}

/** Returns the stored bytes of the scan with this id, or null. */
export async function readStoredScan(db: IDBDatabase, id: string): Promise<StoredScan | null> {
  return storedScanOf(await request(db.transaction([SCANS], 'readonly').objectStore(SCANS).get(id)));
}

/** Returns the kept snapshot this build can restore, or null when there is none or it cannot be read. */
export async function readSnapshot(db: IDBDatabase): Promise<AutosaveSnapshot | null> {
  const r = await readKept(db);
  return r.kind === 'kept' ? r.snap : null;
}

/** Moves the current record (which this build cannot read) to the set-aside key, so that new work does not overwrite it. */
export async function setAsideKept(db: IDBDatabase): Promise<void> {
  const tx = db.transaction([STATE], 'readwrite');
  const finished = done(tx);
  const store = tx.objectStore(STATE);
  const current = await request(store.get(CURRENT));
  const earlier = (await request(store.get(SET_ASIDE))) as StateRecord | undefined;
  if (current !== undefined) {
    // A copy already set aside is not overwritten either: it moves to a key of its own.
    if (earlier !== undefined) store.put(earlier, `${SET_ASIDE}-${typeof earlier.savedAt === 'string' ? earlier.savedAt : Date.now()}`);
    store.put(current, SET_ASIDE);
    store.delete(CURRENT);
  }
  await finished;
}

/** Returns the document of the set-aside record as it was kept (unchecked, lines unpacked), with when it was kept, or null when nothing is set aside. */
export async function readSetAside(db: IDBDatabase): Promise<{ savedAt: string; doc: unknown } | null> {
  const tx = db.transaction([STATE], 'readonly');
  const aside = (await request(tx.objectStore(STATE).get(SET_ASIDE))) as StateRecord | undefined;
  if (aside === undefined) return null;
  return { savedAt: typeof aside.savedAt === 'string' ? aside.savedAt : '', doc: unpackDoc(aside.doc) };
}

/** Deletes every set-aside record (the user chose to discard it, after being offered the download); the current record stays. */
export async function discardSetAside(db: IDBDatabase): Promise<void> {
  const tx = db.transaction([STATE], 'readwrite');
  const finished = done(tx);
  const store = tx.objectStore(STATE);
  const keys = await request(store.getAllKeys());
  for (const k of keys) if (typeof k === 'string' && (k === SET_ASIDE || k.startsWith(`${SET_ASIDE}-`))) store.delete(k);
  await finished;
}

/** Moves a set-aside record back to be the current one, once this build has restored its work. */
export async function unsetAsideKept(db: IDBDatabase): Promise<void> {
  const tx = db.transaction([STATE], 'readwrite');
  const finished = done(tx);
  const store = tx.objectStore(STATE);
  const aside = await request(store.get(SET_ASIDE));
  if (aside !== undefined) {
    store.put(aside, CURRENT);
    store.delete(SET_ASIDE);
  }
  await finished;
}

/** Deletes the snapshot and stored scans ("Start fresh"). */
export async function clearSnapshot(db: IDBDatabase): Promise<void> {
  const tx = db.transaction([STATE, SCANS], 'readwrite');
  const finished = done(tx);
  tx.objectStore(STATE).clear();
  tx.objectStore(SCANS).clear();
  await finished;
}

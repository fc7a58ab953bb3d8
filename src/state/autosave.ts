// Keeps the open project in this browser: after every change (debounced) the document and the
// scan's bytes go to IndexedDB; on the next visit the last state comes back (with "Start fresh").
// Closing the tab with changes not saved to a file asks first (beforeunload).
import { docLimitProblem } from '../core/model/docLimitProblem';
import { emptyProjectDoc, type ProjectDoc } from '../core/model/projectDoc';
import { SECTION_CAUTION } from '../core/analysis/caution';
import { PROJECT_FILE_VERSION, PROJECT_FORMAT } from '../core/model/migrations/projectFileFormat';
import { downloadFile } from '../io/downloadFile';
import { discardSetAside, readSetAside, readStoredScan, unsetAsideKept, clearSnapshot, isQuotaError, openAutosaveDb, readKept, setAsideKept, writeSnapshot, type KeptRead, type StoredScan } from './autosaveDb';
import { clearJournal, nextStamp, readJournal, writeJournal } from './autosaveJournal';
import { migrateKeptDoc } from '../core/model/migrations/migrateKeptDoc';
import { announceKept, useTabStore } from './tabLock';
import { useAutosaveStatus } from './autosaveStatus';
import { writeSnapshotOffPage } from './autosaveWriter';
import { useDocStore } from './docStore';
import { fitViewToDoc, reopenSavedScan, SCAN_NOT_SHOWN_WORDS } from './projectActions';
import { getScan, putScan } from './scanCache';
import { useSessionStore } from './sessionStore';

/** Wait after the last change before writing a large document, in milliseconds (a small one is written at once, after its journal entry). */
export const AUTOSAVE_DELAY_MS = 500;
/** Vertices up to which a document is written to IndexedDB as soon as it changes. */
const WRITE_AT_ONCE_VERTICES = 100_000;

/** The scan id of the start-up demo and prefix of the examples' (src/state/openDemo.ts): an untouched demo is not work to bring back. */
const DEMO_SCAN_ID = 'scan-demo';

let dbPromise: Promise<IDBDatabase> | null = null;
/** The database once open: a write then starts in the edit's own task, with no await before its request. */
let dbOpen: IDBDatabase | null = null;
function db(): Promise<IDBDatabase> {
  dbPromise ??= openAutosaveDb().then((d) => (dbOpen = d));
  return dbPromise;
}

let writtenScanId: string | null = null;

/** Writes the current document now; reports quota problems through the status store. */
export async function autosaveNow(): Promise<void> {
  // A read-only tab (another tab edits) never writes over the kept work.
  if (useTabStore.getState().role === 'read-only') return;
  const { doc, revision, savedRevision } = useDocStore.getState();
  // Work the restore would refuse is not written over a copy it can restore (the same limits as the schema).
  const over = docLimitProblem(doc);
  if (over) {
    useAutosaveStatus.setState({ failure: `The latest changes are not kept in this browser: ${over}. The copy kept before is left as it was.` });
    return;
  }
  try {
    const cached = getScan(doc.scan?.id);
    let scan: StoredScan | null = null;
    const fresh = Boolean(doc.scan && cached && writtenScanId !== doc.scan.id);
    if (doc.scan && cached) {
      // The Blob itself: the browser copies its bytes into the database without the page reading them.
      scan = { id: doc.scan.id, type: doc.scan.type, name: doc.scan.name, bytes: fresh ? cached.bytes : new Blob([]) };
    }
    const stamp = nextStamp();
    const meta = { savedAt: new Date(stamp).toISOString(), stamp, dirty: revision !== savedRevision };
    const onPage = async () => writeSnapshot(dbOpen ?? (await db()), { ...meta, doc }, scan, fresh);
    // A big document (written after a pause anyway) is serialised by the worker; a small one in the edit's own task.
    await (vertexCount(doc) > WRITE_AT_ONCE_VERTICES ? writeSnapshotOffPage(meta, doc, scan, fresh, onPage) : onPage());
    if (fresh) writtenScanId = doc.scan?.id ?? null;
    if (!doc.scan) writtenScanId = null;
    useAutosaveStatus.setState({ lastSavedAt: new Date().toISOString(), keptRevision: revision, quotaFull: false });
    announceKept();
  } catch (e) {
    if (isQuotaError(e)) useAutosaveStatus.setState({ quotaFull: true });
    else useAutosaveStatus.setState({ failure: `Could not keep the project in this browser: ${e instanceof Error ? e.message : String(e)}` });
  }
}

async function setAsideQuietly(): Promise<void> {
  try {
    await setAsideKept(await db());
  } catch {
    // Could not move it; the message still says why it was not restored.
  }
}

/** The journal entry as kept work when it is newer than what IndexedDB holds and this build can read it, else null. */
async function journalIfNewer(kept: KeptRead): Promise<KeptRead | null> {
  const entry = readJournal();
  if (!entry || (kept.kind === 'kept' && kept.snap.stamp >= entry.stamp)) return null;
  const checked = migrateKeptDoc(entry.doc);
  if (!checked.ok) return null;
  const doc = checked.doc;
  let scan: StoredScan | null = kept.kind === 'kept' && kept.snap.scan?.id === doc.scan?.id ? kept.snap.scan : null;
  if (!scan && doc.scan) scan = await readStoredScan(await db(), doc.scan.id).catch(() => null);
  return { kind: 'kept', snap: { savedAt: entry.savedAt, stamp: entry.stamp, doc, dirty: entry.dirty, scan, migratedFrom: checked.migratedFrom, fromSetAside: false } };
}

/** Puts the kept scan of `doc` into the scan cache (decoded when it can be); returns why it is not shown, or null. */
async function bringBackScan(doc: ProjectDoc, stored: StoredScan | null): Promise<string | null> {
  if (!doc.scan || !stored || stored.id !== doc.scan.id || stored.bytes.size === 0) return null;
  let notShown: string | null = null;
  const blob = new Blob([stored.bytes], { type: stored.type });
  // At the saved page and size, nothing asked (reopenSavedScan). A scan that cannot be shown keeps its bytes in
  // the cache, not shown: the next write must not drop the browser's only copy of it.
  const reopened = await reopenSavedScan(blob, doc.scan);
  if (reopened.ok) {
    putScan(doc.scan.id, reopened.cached);
    notShown = reopened.notShown;
  } else {
    notShown = `The scan "${doc.scan.name}" kept in this browser cannot be shown (${reopened.message}). ${SCAN_NOT_SHOWN_WORDS}`;
    putScan(doc.scan.id, { bitmap: null, bytes: blob, notShown: reopened.message });
  }
  writtenScanId = doc.scan.id;
  return notShown;
}

let following = false;
let followAgain = false;

/**
 * In a read-only tab: reads the work the editing tab has just kept and shows it (its scan too, when that changed),
 * so this tab never shows an older state as if it were current. Calls that arrive while one runs are run once after it.
 */
export async function followKeptWork(): Promise<void> {
  if (following) {
    followAgain = true;
    return;
  }
  following = true;
  try {
    do {
      followAgain = false;
      await showKeptWork();
    } while (followAgain && useTabStore.getState().role === 'read-only');
  } finally {
    following = false;
  }
}

async function showKeptWork(): Promise<void> {
  if (useTabStore.getState().role !== 'read-only') return;
  let kept: KeptRead;
  try {
    kept = await readKept(await db());
  } catch {
    return;
  }
  kept = (await journalIfNewer(kept)) ?? kept;
  if (kept.kind !== 'kept' || useTabStore.getState().role !== 'read-only') return;
  const { doc, dirty, savedAt } = kept.snap;
  const shown = useDocStore.getState().doc;
  const newScan = doc.scan?.id !== shown.scan?.id;
  const notShown = newScan && !getScan(doc.scan?.id) ? await bringBackScan(doc, kept.snap.scan) : null;
  useDocStore.getState().replace(doc);
  if (dirty) useDocStore.setState({ savedRevision: useDocStore.getState().revision - 1 });
  if (newScan) fitViewToDoc(doc);
  useTabStore.setState({ shownKeptAt: savedAt || new Date().toISOString() });
  if (notShown) useSessionStore.getState().showMessage('error', notShown);
}

/** Brings back the last autosaved state if there is one worth restoring; returns true when it did. Work still set aside is announced at every start-up. */
export async function restoreAutosave(): Promise<boolean> {
  const restored = await restoreKept();
  await announceSetAside();
  return restored;
}

/**
 * Says at start-up that work this build could not restore is still set aside (moved there at an earlier start-up),
 * so that it is offered for download every time until the user downloads or discards it, not only the first time.
 */
async function announceSetAside(): Promise<void> {
  if (useAutosaveStatus.getState().keptAside) return;
  let aside: Awaited<ReturnType<typeof readSetAside>>;
  try {
    aside = await readSetAside(await db());
  } catch {
    return;
  }
  if (!aside) return;
  const when = aside.savedAt ? ` (kept ${new Date(aside.savedAt).toLocaleString()})` : '';
  useAutosaveStatus.setState({ keptAside: `Earlier work that this build could not restore${when} is still set aside in this browser, not deleted.` });
}

/** Deletes the work set aside, once the user has chosen to (the banner asks first); does nothing in a read-only tab. */
export async function discardKeptAside(): Promise<void> {
  if (useTabStore.getState().role === 'read-only') return;
  await discardSetAside(await db());
  useAutosaveStatus.setState({ keptAside: null });
}

async function restoreKept(): Promise<boolean> {
  let kept: KeptRead;
  try {
    kept = await readKept(await db());
  } catch {
    return false;
  }
  // The write-ahead journal holds the last edit when the page went away before IndexedDB had it.
  const journal = await journalIfNewer(kept);
  if (journal) {
    if (kept.kind === 'unreadable') await setAsideQuietly();
    kept = journal;
  }
  if (kept.kind === 'unreadable') {
    // Not replaced by the demo's autosave: moved aside, and the user is told why it did not come back.
    await setAsideQuietly();
    const words = `${kept.message} It is kept aside in this browser, not deleted; the demo opened instead.`;
    useSessionStore.getState().showMessage('error', words);
    useAutosaveStatus.setState({ keptAside: words });
    return false;
  }
  if (kept.kind === 'none') return false;
  const snap = kept.snap;
  const empty = emptyProjectDoc();
  const { doc } = snap;
  if (!doc.scan && doc.horizons.length === 0 && doc.calibration === null && doc.title === empty.title) return false;
  // The untouched start-up demo is not work to bring back.
  if (!snap.dirty && doc.scan?.id.startsWith(DEMO_SCAN_ID)) return false;
  let notShown = await bringBackScan(doc, snap.scan);
  // The journal holds the document, not the scan's bytes (too large for it): when the page went away before
  // IndexedDB had them, the scan cannot come back from here, and the user is told to open it again.
  if (doc.scan && !notShown && !getScan(doc.scan.id)) {
    notShown = `The scan "${doc.scan.name}" was not yet kept in this browser when the page closed, so it cannot be shown. ${SCAN_NOT_SHOWN_WORDS}`;
  }
  useDocStore.getState().replace(doc);
  // The camera is session state, not kept: frame the restored scan (or drawing) in the current viewport.
  fitViewToDoc(doc);
  // A restored session that had not been saved to a file is still unsaved.
  if (snap.dirty) useDocStore.setState({ savedRevision: useDocStore.getState().revision - 1 });
  useAutosaveStatus.setState({ restoredFrom: snap.savedAt || new Date().toISOString() });
  if (snap.fromSetAside) {
    try {
      await unsetAsideKept(await db());
    } catch {
      // Left aside: restored again next time while nothing current is kept.
    }
  }
  const migrated = snap.migratedFrom === null ? null : `The work kept in this browser was kept at version ${snap.migratedFrom} and has been brought up to this version.`;
  if (notShown) useSessionStore.getState().showMessage('error', migrated ? `${migrated} ${notShown}` : notShown);
  else if (migrated) useSessionStore.getState().showMessage('info', migrated);
  return true;
}

/** Downloads the work set aside at start-up as a project file as it was kept (not checked: it may be opened after fixing by hand); false when none is set aside. */
export async function downloadKeptAside(): Promise<boolean> {
  const aside = await readSetAside(await db());
  if (!aside) return false;
  const text = JSON.stringify({ format: PROJECT_FORMAT, version: PROJECT_FILE_VERSION, savedAt: aside.savedAt, caution: SECTION_CAUTION, doc: aside.doc, scan: null });
  downloadFile(new Blob([text], { type: 'application/json' }), 'kept-copy-set-aside.foldroot.json');
  return true;
}

/** Forgets the kept state and opens an empty project; does nothing in a read-only tab (the kept work is another tab's). */
export async function startFresh(): Promise<void> {
  if (useTabStore.getState().role === 'read-only') return;
  useDocStore.getState().replace(emptyProjectDoc());
  useAutosaveStatus.setState({ restoredFrom: null });
  writtenScanId = null;
  clearJournal();
  try {
    await clearSnapshot(await db());
  } catch {
    // Nothing kept to clear.
  }
}

function vertexCount(doc: ProjectDoc): number {
  let n = 0;
  for (const h of doc.horizons) n += h.pointsPx.length;
  return n;
}

function onBeforeUnload(e: BeforeUnloadEvent): void {
  const { revision, savedRevision } = useDocStore.getState();
  if (revision !== savedRevision) {
    e.preventDefault();
    e.returnValue = '';
  }
}

/** Starts autosaving after every document change and the close warning; returns the stop function. */
export function startAutosave(): () => void {
  let timer: number | undefined;
  let writing = false;
  let again = false;
  // One write at a time; changes made while one is under way are written by the next, straight after it.
  const run = () => {
    timer = undefined;
    if (writing) {
      again = true;
      return;
    }
    writing = true;
    void autosaveNow().finally(() => {
      writing = false;
      if (again) {
        again = false;
        run();
      }
    });
  };
  // The journal first, synchronously: when this returns the edit survives a reload or navigation.
  const journal = () => {
    const { doc, revision, savedRevision, gestureStart } = useDocStore.getState();
    if (gestureStart || useTabStore.getState().role === 'read-only' || docLimitProblem(doc)) return false;
    return writeJournal(doc, revision !== savedRevision, nextStamp());
  };
  const keep = (withJournal: boolean) => {
    const { doc, gestureStart } = useDocStore.getState();
    // While a drag is under way the document changes every frame: it is kept when the gesture ends.
    if (gestureStart) return;
    const small = (withJournal && journal()) || vertexCount(doc) <= WRITE_AT_ONCE_VERTICES;
    window.clearTimeout(timer);
    timer = undefined;
    // A small document goes to IndexedDB in this very task, before the page renders the edit: the journal in
    // localStorage survives a reload, but after a killed browser it has come back only for edits some time old
    // (Chromium writes it to disk later), so there IndexedDB brings the edit back (benchKeepWork measures the window).
    if (small) run();
    else timer = window.setTimeout(run, AUTOSAVE_DELAY_MS);
  };
  let keepOpened: number | undefined;
  const unsubscribe = useDocStore.subscribe((s, prev) => {
    const gestureEnded = prev.gestureStart !== null && s.gestureStart === null;
    if (s.revision === prev.revision && s.savedRevision === prev.savedRevision && !gestureEnded) return;
    window.clearTimeout(keepOpened);
    keepOpened = undefined;
    // A document just opened or made new holds no edit yet and is on the disk already: it goes to IndexedDB in the
    // next task, after the one that renders it, and not to the journal (writing its text to localStorage was the
    // longest part of that task: tens of milliseconds for 24,000 vertices). The journal is cleared, so an older
    // entry cannot come back over it; a reload before the write commits brings back the work kept before the open.
    // An edit before then is kept at once, journal and all, as any edit.
    if (s.opened !== prev.opened) {
      clearJournal();
      keepOpened = window.setTimeout(() => {
        keepOpened = undefined;
        keep(false);
      }, 0);
    } else keep(true);
  });
  // Leaving the page with a write still waiting: the journal now, and the write started (it may not finish).
  const flush = () => {
    if (keepOpened === undefined) journal();
    else {
      window.clearTimeout(keepOpened);
      keepOpened = undefined;
      keep(true);
    }
    if (timer === undefined) return;
    window.clearTimeout(timer);
    run();
  };
  const onHidden = () => document.visibilityState === 'hidden' && flush();
  window.addEventListener('beforeunload', onBeforeUnload);
  window.addEventListener('pagehide', flush);
  document.addEventListener('visibilitychange', onHidden);
  return () => {
    unsubscribe();
    window.clearTimeout(timer);
    window.clearTimeout(keepOpened);
    window.removeEventListener('beforeunload', onBeforeUnload);
    window.removeEventListener('pagehide', flush);
    document.removeEventListener('visibilitychange', onHidden);
  };
}

// Restoring the work kept in the browser: the scan comes back at its saved page and size without a question,
// and a scan that cannot be shown (another size, or not decodable) is kept, not dropped by the next write.
import { IDBFactory } from 'fake-indexeddb';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setProjectInfo } from '../../src/core/model/commands/setProjectInfo';
import type { DecodeResult } from '../../src/io/decodeScan';
import { clearSnapshot, openAutosaveDb, readKept, readSnapshot, writeSnapshot } from '../../src/state/autosaveDb';
import { readFileSync } from 'node:fs';
import { migrateProjectFile } from '../../src/core/model/migrations/migrateProjectFile';
import { SCHEMA_VERSION } from '../../src/core/model/projectDoc';
import { useDocStore } from '../../src/state/docStore';
import { sampleDoc } from '../io/sampleDoc';

// Decoding needs a browser (createImageBitmap, workers, pdf.js); here it answers as the test says.
const decodeScan = vi.hoisted(() => vi.fn(async (..._args: unknown[]): Promise<unknown> => ({ ok: false, message: 'cannot decode in tests' })));
vi.mock('../../src/io/decodeScan', () => ({ decodeScan }));
const { autosaveNow, restoreAutosave } = await import('../../src/state/autosave');
const { getScan, putScan } = await import('../../src/state/scanCache');
const { useSessionStore } = await import('../../src/state/sessionStore');

const factory = new IDBFactory();
const scanRef = { id: 'scan-kept', name: 'sheet.tif', widthPx: 500, heightPx: 250, type: 'image/tiff', page: 1 };
const bytes = Uint8Array.from([73, 73, 42, 0, 8, 0]);

function decodedAt(widthPx: number, heightPx: number): DecodeResult {
  const bitmap = { width: widthPx, height: heightPx, close: vi.fn() } as unknown as ImageBitmap;
  return { ok: true, bitmap, kind: 'tiff', widthPx, heightPx, mime: 'image/tiff', page: 1, pageCount: 3 };
}

/** Keeps a project with the scan in the (fake) browser database, as the last session left it. */
async function keep(): Promise<void> {
  const db = await openAutosaveDb(factory);
  const doc = { ...sampleDoc(), scan: scanRef };
  await writeSnapshot(db, { savedAt: '2026-01-01T00:00:00.000Z', doc, dirty: true }, { id: scanRef.id, type: scanRef.type, name: scanRef.name, bytes: new Blob([bytes], { type: scanRef.type }) }, true);
}

async function keptScanBytes(): Promise<Uint8Array | null> {
  const snap = await readSnapshot(await openAutosaveDb(factory));
  return snap?.scan ? new Uint8Array(await snap.scan.bytes.arrayBuffer()) : null;
}

describe('restoreAutosave with a kept scan', () => {
  beforeEach(async () => {
    vi.stubGlobal('indexedDB', factory);
    useSessionStore.getState().clearMessage();
    await keep();
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    decodeScan.mockReset();
  });

  it('decodes it at the saved page and size, asking nothing', async () => {
    decodeScan.mockResolvedValue(decodedAt(500, 250));
    expect(await restoreAutosave()).toBe(true);
    expect(decodeScan.mock.calls[0][2]).toEqual({ page: 1, widthPx: 500, heightPx: 250 });
    expect(getScan(scanRef.id)?.bitmap).not.toBeNull();
    expect(useSessionStore.getState().message).toBeNull();
  });

  it('restores the work with the scan not shown when it decodes to another size, says so, and keeps its bytes', async () => {
    decodeScan.mockResolvedValue(decodedAt(320, 160));
    expect(await restoreAutosave()).toBe(true);
    expect(useDocStore.getState().doc.scan).toEqual(scanRef);
    expect(getScan(scanRef.id)?.bitmap).toBeNull();
    const message = useSessionStore.getState().message!;
    expect(message.kind).toBe('error');
    expect(message.text).toContain('The scan "sheet.tif" (page 2) now opens at 320 × 160 px, but the lines were digitised on it at 500 × 250 px, so they would not line up with it.');
    // The next write after an edit keeps the scan's bytes in the browser.
    useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Edited after the restore' }));
    await autosaveNow();
    expect(await keptScanBytes()).toEqual(bytes);
  });

  it('brings back a scan an earlier build kept as an ArrayBuffer', async () => {
    const db = await openAutosaveDb(factory);
    await new Promise<void>((resolve, reject) => {
      const tx = db.transaction(['scans'], 'readwrite');
      tx.objectStore('scans').put({ id: scanRef.id, type: scanRef.type, name: scanRef.name, bytes: bytes.slice().buffer }, scanRef.id);
      tx.oncomplete = () => resolve();
      tx.onerror = () => reject(tx.error);
    });
    decodeScan.mockResolvedValue(decodedAt(500, 250));
    expect(await restoreAutosave()).toBe(true);
    const given = decodeScan.mock.calls[0][0] as Blob;
    expect(given.type).toBe('image/tiff');
    expect(new Uint8Array(await given.arrayBuffer())).toEqual(bytes);
    expect(new Uint8Array(await getScan(scanRef.id)!.bytes.arrayBuffer())).toEqual(bytes);
  });

  it('keeps a newly opened scan as its Blob, without reading its bytes into the page', async () => {
    decodeScan.mockResolvedValue(decodedAt(500, 250));
    expect(await restoreAutosave()).toBe(true);
    const other = { ...scanRef, id: 'scan-new', name: 'new.tif' };
    const file = new Blob([Uint8Array.from([73, 73, 42, 0, 9, 9, 9])], { type: 'image/tiff' });
    const read = vi.spyOn(file, 'arrayBuffer');
    putScan(other.id, { bitmap: { width: 500, height: 250, close: vi.fn() } as unknown as ImageBitmap, bytes: file });
    useDocStore.getState().apply((d) => ({ ...d, scan: other }));
    await autosaveNow();
    expect(read).not.toHaveBeenCalled();
    const record = await new Promise<{ bytes: unknown }>((resolve, reject) => {
      void openAutosaveDb(factory).then((db) => {
        const r = db.transaction(['scans'], 'readonly').objectStore('scans').get(other.id);
        r.onsuccess = () => resolve(r.result as { bytes: unknown });
        r.onerror = () => reject(r.error);
      });
    });
    expect(record.bytes).toBeInstanceOf(Blob);
    expect(new Uint8Array(await (record.bytes as Blob).arrayBuffer())).toEqual(Uint8Array.from([73, 73, 42, 0, 9, 9, 9]));
  });

  it('keeps the bytes of a scan that cannot be decoded at all, and says so', async () => {
    decodeScan.mockResolvedValue({ ok: false, message: 'sheet.tif could not be decoded' });
    expect(await restoreAutosave()).toBe(true);
    expect(getScan(scanRef.id)?.bitmap).toBeNull();
    expect(useSessionStore.getState().message?.text).toContain('The scan "sheet.tif" kept in this browser cannot be shown (sheet.tif could not be decoded).');
    useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Edited after the restore' }));
    await autosaveNow();
    expect(await keptScanBytes()).toEqual(bytes);
  });
});

/** Puts a state record into the kept-work store as an earlier build would have left it. */
async function keepRecord(doc: unknown, key = 'current'): Promise<void> {
  const db = await openAutosaveDb(factory);
  await new Promise<void>((resolve, reject) => {
    const tx = db.transaction(['state'], 'readwrite');
    tx.objectStore('state').put({ savedAt: '2025-06-01T00:00:00.000Z', doc, dirty: true, scanId: null }, key);
    tx.oncomplete = () => resolve();
    tx.onerror = () => reject(tx.error);
  });
}

const fixture = (name: string) => JSON.parse(readFileSync(new URL(`../fixtures/projects/${name}`, import.meta.url), 'utf8'));

describe('restoreAutosave of work kept by an earlier or a newer version', () => {
  beforeEach(async () => {
    vi.stubGlobal('indexedDB', factory);
    useSessionStore.getState().clearMessage();
    await clearSnapshot(await openAutosaveDb(factory));
  });
  afterEach(() => vi.unstubAllGlobals());

  it('brings back a version-0 kept document through the project files\' migration, and says so', async () => {
    const { format: _f, version: _v, ...content } = fixture('v0-two-horizons.json');
    await keepRecord(content);
    expect(await restoreAutosave()).toBe(true);
    const doc = useDocStore.getState().doc;
    expect(doc.schemaVersion).toBe(SCHEMA_VERSION);
    expect(doc.title).toBe('Version-0 sample (invented)');
    expect(doc.horizons.map((h) => h.name)).toEqual(['Upper marker', 'Lower marker']);
    expect(useSessionStore.getState().message?.text).toContain('kept at version 0 and has been brought up to this version');
  });

  it('brings back a version-1 kept document unchanged', async () => {
    const file = fixture('v1-two-horizons.json');
    await keepRecord(file.doc);
    expect(await restoreAutosave()).toBe(true);
    const opened = migrateProjectFile(file);
    if (!opened.ok) throw new Error(opened.message);
    expect(useDocStore.getState().doc).toEqual(opened.file.doc);
    expect(useDocStore.getState().doc.faults).toEqual([]);
    expect(useDocStore.getState().doc.title).toBe('Version-1 sample (invented)');
  });

  it('sets aside work kept by a newer build instead of letting new work overwrite it, and says why', async () => {
    const newer = { ...fixture('v1-two-horizons.json').doc, schemaVersion: SCHEMA_VERSION + 1 };
    await keepRecord(newer);
    useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Work of this session' }));
    expect(await restoreAutosave()).toBe(false);
    const message = useSessionStore.getState().message!;
    expect(message.kind).toBe('error');
    expect(message.text).toContain(`version ${SCHEMA_VERSION + 1}, made by a newer Foldroot`);
    expect(message.text).toContain('kept aside in this browser, not deleted');
    // This session's work is kept as usual; the newer record is still there, aside.
    await autosaveNow();
    const db = await openAutosaveDb(factory);
    const aside = await new Promise<unknown>((resolve) => {
      const r = db.transaction(['state']).objectStore('state').get('set-aside');
      r.onsuccess = () => resolve(r.result);
    });
    expect((aside as { doc: { schemaVersion: number } }).doc.schemaVersion).toBe(SCHEMA_VERSION + 1);
    expect((await readSnapshot(db))?.doc.title).toBe('Work of this session');
  });

  it('falls back to a set-aside record this build can read when nothing current is kept', async () => {
    await keepRecord(fixture('v1-two-horizons.json').doc, 'set-aside');
    const read = await readKept(await openAutosaveDb(factory));
    expect(read.kind === 'kept' && read.snap.fromSetAside).toBe(true);
    expect(await restoreAutosave()).toBe(true);
    expect(useDocStore.getState().doc.title).toBe('Version-1 sample (invented)');
    // It is the current record again, so it is not lost if the page closes before the next write.
    const again = await readKept(await openAutosaveDb(factory));
    expect(again.kind === 'kept' && !again.snap.fromSetAside && again.snap.doc.title).toBe('Version-1 sample (invented)');
  });
});

describe('a kept copy is never overwritten by work the restore would refuse', () => {
  beforeEach(async () => {
    vi.stubGlobal('indexedDB', factory);
    useSessionStore.getState().clearMessage();
    await clearSnapshot(await openAutosaveDb(factory));
  });
  afterEach(() => vi.unstubAllGlobals());

  it('a document over a limit (a 501-character name) is not written over the last good copy, and the status says why', async () => {
    const { useAutosaveStatus } = await import('../../src/state/autosaveStatus');
    useDocStore.getState().replace(sampleDoc());
    useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Good copy' }));
    await autosaveNow();
    useDocStore.getState().apply((d) => ({ ...d, horizons: d.horizons.map((h, i) => (i === 0 ? { ...h, name: 'N'.repeat(501) } : h)) }));
    await autosaveNow();
    expect(useAutosaveStatus.getState().failure).toContain('the horizon name is too long (501 characters; the limit is 500)');
    const kept = await readSnapshot(await openAutosaveDb(factory));
    expect(kept?.doc.title).toBe('Good copy');
    expect(kept?.doc.horizons[0].name).toBe('Upper marker');
    useAutosaveStatus.setState({ failure: null });
  });

  it('a second unreadable copy does not overwrite the first set aside; both are kept, and the banner offers the download', async () => {
    const { useAutosaveStatus } = await import('../../src/state/autosaveStatus');
    const { downloadKeptAside } = await import('../../src/state/autosave');
    const newer = (title: string) => ({ ...fixture('v1-two-horizons.json').doc, title, schemaVersion: SCHEMA_VERSION + 1 });
    await keepRecord(newer('First newer'));
    expect(await restoreAutosave()).toBe(false);
    await keepRecord(newer('Second newer'));
    expect(await restoreAutosave()).toBe(false);
    expect(useAutosaveStatus.getState().keptAside).toContain('kept aside in this browser, not deleted');
    const db = await openAutosaveDb(factory);
    const all = await new Promise<unknown[]>((resolve) => {
      const r = db.transaction(['state']).objectStore('state').getAll();
      r.onsuccess = () => resolve(r.result);
    });
    expect(all.map((r) => (r as { doc: { title: string } }).doc.title).sort()).toEqual(['First newer', 'Second newer']);
    // The download is the set-aside document as it was kept, in a project file's frame.
    const blobs: Blob[] = [];
    const clicked: string[] = [];
    vi.stubGlobal('URL', { createObjectURL: (b: Blob) => (blobs.push(b), 'blob:kept'), revokeObjectURL: () => undefined });
    vi.stubGlobal('document', { createElement: () => ({ click() { clicked.push(this.download); }, remove() {}, download: '' }), body: { appendChild: () => undefined } });
    vi.stubGlobal('window', { setTimeout: () => 0 });
    expect(await downloadKeptAside()).toBe(true);
    expect(clicked).toEqual(['kept-copy-set-aside.foldroot.json']);
    const file = JSON.parse(await blobs[0].text());
    expect(file.format).toBe('foldroot-project');
    expect(file.doc.title).toBe('Second newer');
    useAutosaveStatus.setState({ keptAside: null });
  });
});

describe('work set aside is offered at every start-up until downloaded or deleted', () => {
  beforeEach(async () => {
    vi.stubGlobal('indexedDB', factory);
    useSessionStore.getState().clearMessage();
    await clearSnapshot(await openAutosaveDb(factory));
  });
  afterEach(() => vi.unstubAllGlobals());

  it('a later start-up that restores newer work still says a copy is set aside; deleting it ends that', async () => {
    const { useAutosaveStatus } = await import('../../src/state/autosaveStatus');
    const { discardKeptAside } = await import('../../src/state/autosave');
    // A copy this build cannot restore (a 501-character name, as an earlier build allowed) is set aside at start-up.
    const bad = { ...fixture('v1-two-horizons.json').doc, title: 'N'.repeat(501) };
    await keepRecord(bad);
    expect(await restoreAutosave()).toBe(false);
    expect(useAutosaveStatus.getState().keptAside).toContain('kept aside in this browser, not deleted');
    // The user works on and the page is opened again: that work comes back, and the set-aside copy is still offered.
    useAutosaveStatus.setState({ keptAside: null });
    useDocStore.getState().replace(sampleDoc());
    useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Work after the set-aside' }));
    await autosaveNow();
    expect(await restoreAutosave()).toBe(true);
    expect(useDocStore.getState().doc.title).toBe('Work after the set-aside');
    expect(useAutosaveStatus.getState().keptAside).toContain('is still set aside in this browser, not deleted');
    // Deleted when the user chooses: the current work stays, and the next start-up says nothing of it.
    await discardKeptAside();
    expect(useAutosaveStatus.getState().keptAside).toBeNull();
    expect(await restoreAutosave()).toBe(true);
    expect(useAutosaveStatus.getState().keptAside).toBeNull();
    expect((await readSnapshot(await openAutosaveDb(factory)))?.doc.title).toBe('Work after the set-aside');
  });
});

describe('the write-ahead journal', () => {
  const store = new Map<string, string>();
  const localStorageStub = { getItem: (k: string) => store.get(k) ?? null, setItem: (k: string, v: string) => void store.set(k, v), removeItem: (k: string) => void store.delete(k) };
  beforeEach(async () => {
    vi.stubGlobal('indexedDB', factory);
    vi.stubGlobal('localStorage', localStorageStub);
    store.clear();
    useSessionStore.getState().clearMessage();
    await clearSnapshot(await openAutosaveDb(factory));
  });
  afterEach(() => vi.unstubAllGlobals());

  it('brings back the journal\'s edit when the page went away before IndexedDB had it, and IndexedDB\'s when it is newer', async () => {
    const { writeJournal, nextStamp } = await import('../../src/state/autosaveJournal');
    const db = await openAutosaveDb(factory);
    const older = nextStamp();
    await writeSnapshot(db, { savedAt: new Date(older).toISOString(), stamp: older, doc: setProjectInfo(sampleDoc(), { title: 'In IndexedDB' }), dirty: true }, null, true);
    expect(writeJournal(setProjectInfo(sampleDoc(), { title: 'Only in the journal' }), true, nextStamp())).toBe(true);
    expect(await restoreAutosave()).toBe(true);
    expect(useDocStore.getState().doc.title).toBe('Only in the journal');
    // A later IndexedDB copy wins over an older journal entry.
    const later = nextStamp();
    await writeSnapshot(db, { savedAt: new Date(later).toISOString(), stamp: later, doc: setProjectInfo(sampleDoc(), { title: 'Later in IndexedDB' }), dirty: true }, null, true);
    expect(await restoreAutosave()).toBe(true);
    expect(useDocStore.getState().doc.title).toBe('Later in IndexedDB');
  });

  it('a journal entry whose scan never reached IndexedDB comes back with the lines, and says to open the scan again', async () => {
    const { writeJournal, nextStamp } = await import('../../src/state/autosaveJournal');
    // The page went away straight after a scan was opened and an edit made: only the journal has the document.
    const doc = setProjectInfo({ ...sampleDoc(), scan: { ...scanRef, id: 'scan-not-kept' } }, { title: 'Scan opened just before' });
    expect(writeJournal(doc, true, nextStamp())).toBe(true);
    expect(await restoreAutosave()).toBe(true);
    expect(useDocStore.getState().doc.title).toBe('Scan opened just before');
    expect(useDocStore.getState().doc.scan?.id).toBe('scan-not-kept');
    const message = useSessionStore.getState().message;
    expect(message?.kind).toBe('error');
    expect(message?.text).toContain('The scan "sheet.tif" was not yet kept in this browser');
    expect(message?.text).toContain('open the image they were digitised on again (Open scan…)');
  });

  it('a journal entry newer than IndexedDB brings back the scan IndexedDB kept for it', async () => {
    const { writeJournal, nextStamp } = await import('../../src/state/autosaveJournal');
    decodeScan.mockResolvedValue(decodedAt(500, 250));
    await keep();
    expect(writeJournal(setProjectInfo({ ...sampleDoc(), scan: scanRef }, { title: 'Edited after the scan was kept' }), true, nextStamp())).toBe(true);
    expect(await restoreAutosave()).toBe(true);
    expect(useDocStore.getState().doc.title).toBe('Edited after the scan was kept');
    expect(getScan(scanRef.id)?.bitmap).not.toBeNull();
    expect(useSessionStore.getState().message).toBeNull();
  });

  it('a document too large for the journal clears it, so an old entry cannot win', async () => {
    const { writeJournal, readJournal, nextStamp, JOURNAL_MAX_CHARS } = await import('../../src/state/autosaveJournal');
    expect(writeJournal(sampleDoc(), true, nextStamp())).toBe(true);
    const big = sampleDoc();
    big.horizons[0].pointsPx = Array.from({ length: Math.ceil(JOURNAL_MAX_CHARS / 12) + 1 }, (_, i) => [i, i]);
    expect(writeJournal(big, true, nextStamp())).toBe(false);
    expect(readJournal()).toBeNull();
  });
});

describe('an edit is handed to IndexedDB in its own task', () => {
  const store = new Map<string, string>();
  const listeners = { addEventListener: () => undefined, removeEventListener: () => undefined };
  beforeEach(async () => {
    vi.stubGlobal('indexedDB', factory);
    vi.stubGlobal('localStorage', { getItem: (k: string) => store.get(k) ?? null, setItem: (k: string, v: string) => void store.set(k, v), removeItem: (k: string) => void store.delete(k) });
    vi.stubGlobal('window', { ...listeners, setTimeout, clearTimeout });
    vi.stubGlobal('document', { ...listeners, visibilityState: 'visible' });
    store.clear();
    await clearSnapshot(await openAutosaveDb(factory));
  });
  afterEach(() => {
    vi.restoreAllMocks();
    vi.unstubAllGlobals();
  });

  // The journal (localStorage) brings an edit back after a reload, but a killed browser loses what localStorage had
  // not yet written to disk: the IndexedDB write must start at once, not a task later behind the page's render.
  it('makes the write request before the edit returns, and the edit is then kept', async () => {
    const { IDBObjectStore } = await import('fake-indexeddb');
    const { startAutosave } = await import('../../src/state/autosave');
    const db = await openAutosaveDb(factory);
    useDocStore.getState().replace(sampleDoc());
    const stop = startAutosave();
    try {
      // A first edit opens the database (if no earlier write has), and is kept.
      useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'First edit' }));
      await vi.waitFor(async () => expect((await readSnapshot(db))?.doc.title).toBe('First edit'));
      const put = vi.spyOn(IDBObjectStore.prototype, 'put');
      useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Second edit' }));
      expect(put).toHaveBeenCalledTimes(1);
      expect((put.mock.calls[0][0] as { doc: { title: string } }).doc.title).toBe('Second edit');
      await vi.waitFor(async () => expect((await readSnapshot(db))?.doc.title).toBe('Second edit'));
    } finally {
      stop();
    }
  });

  // An opened document is on the disk already; its kept copy waits for the task after the one that shows it.
  it('keeps an opened document in IndexedDB a task later, clearing the journal, and journals the next edit at once', async () => {
    const { IDBObjectStore } = await import('fake-indexeddb');
    const { startAutosave } = await import('../../src/state/autosave');
    const { readJournal } = await import('../../src/state/autosaveJournal');
    const db = await openAutosaveDb(factory);
    useDocStore.getState().replace(sampleDoc());
    const stop = startAutosave();
    try {
      useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Before the open' }));
      expect((readJournal()?.doc as { title: string }).title).toBe('Before the open');
      await vi.waitFor(async () => expect((await readSnapshot(db))?.doc.title).toBe('Before the open'));
      const put = vi.spyOn(IDBObjectStore.prototype, 'put');
      useDocStore.getState().replace({ ...sampleDoc(), title: 'Opened from a file' });
      expect(readJournal()).toBeNull();
      expect(put).not.toHaveBeenCalled();
      await vi.waitFor(async () => expect((await readSnapshot(db))?.doc.title).toBe('Opened from a file'));
      expect(readJournal()).toBeNull();
      useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Edited after the open' }));
      expect((readJournal()?.doc as { title: string }).title).toBe('Edited after the open');
    } finally {
      stop();
    }
  });
});

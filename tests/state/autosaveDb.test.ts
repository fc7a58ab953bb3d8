import { IDBFactory } from 'fake-indexeddb';
import { describe, expect, it } from 'vitest';
import { clearSnapshot, isQuotaError, openAutosaveDb, readSnapshot, writeSnapshot } from '../../src/state/autosaveDb';
import { sampleDoc } from '../io/sampleDoc';

describe('autosave database (fake-indexeddb)', () => {
  it('returns null before anything is kept', async () => {
    const db = await openAutosaveDb(new IDBFactory());
    expect(await readSnapshot(db)).toBeNull();
  });

  it('keeps the document and the scan bytes, rewriting the bytes only when asked', async () => {
    const db = await openAutosaveDb(new IDBFactory());
    const doc = { ...sampleDoc(), scan: { id: 's1', name: 'a.png', widthPx: 2, heightPx: 2, type: 'image/png' } };
    const bytes = new Blob([Uint8Array.from([1, 2, 3, 4, 5])], { type: 'image/png' });
    await writeSnapshot(db, { savedAt: 't1', doc, dirty: true }, { id: 's1', type: 'image/png', name: 'a.png', bytes }, true);
    const edited = { ...doc, title: 'edited' };
    await writeSnapshot(db, { savedAt: 't2', doc: edited, dirty: false }, { id: 's1', type: 'image/png', name: 'a.png', bytes: new Blob([]) }, false);
    const snap = await readSnapshot(db);
    expect(snap?.doc).toEqual(edited);
    expect(snap?.dirty).toBe(false);
    expect(snap?.savedAt).toBe('t2');
    // Kept as a Blob (the browser holds its bytes, not the page).
    expect(snap!.scan!.bytes).toBeInstanceOf(Blob);
    expect(new Uint8Array(await snap!.scan!.bytes.arrayBuffer())).toEqual(Uint8Array.from([1, 2, 3, 4, 5]));
  });

  it('drops the scan when the document no longer has one, and clears on "Start fresh"', async () => {
    const db = await openAutosaveDb(new IDBFactory());
    const doc = { ...sampleDoc(), scan: { id: 's1', name: 'a.png', widthPx: 2, heightPx: 2, type: 'image/png' } };
    await writeSnapshot(db, { savedAt: 't', doc, dirty: true }, { id: 's1', type: 'image/png', name: 'a.png', bytes: new Blob([new Uint8Array(3)]) }, true);
    await writeSnapshot(db, { savedAt: 't', doc: sampleDoc(), dirty: true }, null, false);
    expect((await readSnapshot(db))?.scan).toBeNull();
    await clearSnapshot(db);
    expect(await readSnapshot(db)).toBeNull();
  });

  it('ignores a kept document that no longer passes the schema', async () => {
    const db = await openAutosaveDb(new IDBFactory());
    const broken = { ...sampleDoc(), horizons: 'nope' } as unknown as ReturnType<typeof sampleDoc>;
    await writeSnapshot(db, { savedAt: 't', doc: broken, dirty: true }, null, false);
    expect(await readSnapshot(db)).toBeNull();
  });

  it('recognises the quota error by its DOMException name', () => {
    expect(isQuotaError(new DOMException('full', 'QuotaExceededError'))).toBe(true);
    expect(isQuotaError(new Error('other'))).toBe(false);
  });
});

describe('autosave database: lines kept packed', () => {
  it('stores every line as one Float64Array and reads back the same document, vertex for vertex', async () => {
    const factory = new IDBFactory();
    const db = await openAutosaveDb(factory);
    const base = sampleDoc();
    // A long traced line (an invented wave of 50,000 vertices) beside the sample's own.
    const long: [number, number][] = Array.from({ length: 50_000 }, (_, i) => [i * 0.1, 200 + 30 * Math.sin(i / 700) + 1e-9 * i]);
    const doc = { ...base, horizons: [...base.horizons, { ...base.horizons[0], id: 'long', name: 'Long', pointsPx: long }] };
    await writeSnapshot(db, { savedAt: 't', doc, dirty: true }, null, false);
    expect((await readSnapshot(db))?.doc).toEqual(doc);
    // What is stored: flat typed arrays, u then v for each vertex.
    const stored = await new Promise<{ doc: { horizons: { pointsPx: unknown }[] } }>((resolve, reject) => {
      const r = db.transaction('state', 'readonly').objectStore('state').get('current');
      r.onsuccess = () => resolve(r.result);
      r.onerror = () => reject(r.error);
    });
    const flat = stored.doc.horizons[stored.doc.horizons.length - 1].pointsPx as Float64Array;
    expect(flat).toBeInstanceOf(Float64Array);
    expect([flat.length, flat[2 * 12345], flat[2 * 12345 + 1]]).toEqual([100_000, long[12345][0], long[12345][1]]);
  });

  it('still reads a document kept before lines were packed', async () => {
    const db = await openAutosaveDb(new IDBFactory());
    const doc = sampleDoc();
    await new Promise<void>((resolve, reject) => {
      const tx = db.transaction(['state', 'scans'], 'readwrite');
      tx.objectStore('state').put({ savedAt: 'then', doc, dirty: true, scanId: null }, 'current');
      tx.oncomplete = () => resolve();
      tx.onerror = () => reject(tx.error);
    });
    expect((await readSnapshot(db))?.doc).toEqual(doc);
  });
});

// Opening a file over unsaved changes asks first, as New does; "Cancel" changes nothing. A saved scan reopens at
// its saved page and size without a question, and one that decodes to another size is kept but not shown.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setProjectInfo } from '../../src/core/model/commands/setProjectInfo';
import type { DecodeResult } from '../../src/io/decodeScan';
import type { AskScanChoice } from '../../src/io/decodeScanChoice';
import { serializeProject } from '../../src/io/projectFile';
import { useDocStore } from '../../src/state/docStore';
import { SAMPLE_SECTION, sampleDoc } from '../io/sampleDoc';

// Decoding needs a browser (createImageBitmap, workers, pdf.js); here it answers as the test says.
const decodeScan = vi.hoisted(() => vi.fn(async (..._args: unknown[]): Promise<unknown> => ({ ok: false, message: 'cannot decode in tests' })));
vi.mock('../../src/io/decodeScan', () => ({ decodeScan }));
const { newProject, openNotes, openProjectFile } = await import('../../src/state/projectActions');
const { getScan, putScan } = await import('../../src/state/scanCache');
const { useSessionStore } = await import('../../src/state/sessionStore');
const { useScanChoiceStore } = await import('../../src/state/scanChoiceStore');

const other = new File([JSON.stringify(SAMPLE_SECTION)], 'other-section.json');
const confirm = vi.fn<(q: string) => boolean>();

describe('openProjectFile over unsaved changes', () => {
  beforeEach(() => {
    vi.stubGlobal('window', { confirm });
    confirm.mockReset();
    useDocStore.getState().replace(sampleDoc());
    useDocStore.getState().apply((d) => setProjectInfo(d, { title: 'Edited, not saved' }));
  });
  afterEach(() => vi.unstubAllGlobals());

  it('asks, and on Cancel leaves the document, the history and the dirty state as they were', async () => {
    confirm.mockReturnValue(false);
    const before = useDocStore.getState();
    expect(await openProjectFile(other)).toBe(false);
    expect(confirm).toHaveBeenCalledTimes(1);
    expect(confirm.mock.calls[0][0]).toMatch(/Discard the changes not saved.*other-section\.json/);
    const after = useDocStore.getState();
    expect(after.doc).toBe(before.doc);
    expect(after.past).toBe(before.past);
    expect([after.revision, after.savedRevision]).toEqual([before.revision, before.savedRevision]);
    expect(after.doc.title).toBe('Edited, not saved');
  });

  it('asks, and on OK opens the file', async () => {
    confirm.mockReturnValue(true);
    expect(await openProjectFile(other)).toBe(true);
    expect(confirm).toHaveBeenCalledTimes(1);
    expect(useDocStore.getState().doc.title).toBe('other-section');
  });

  it('does not ask for a file that cannot be opened (its message is enough), nor when all is saved', async () => {
    expect(await openProjectFile(new File(['{"format":"foldroot-project","version":1'], 'bad.json'))).toBe(false);
    expect(confirm).not.toHaveBeenCalled();
    useDocStore.getState().markSaved();
    expect(await openProjectFile(new File([serializeProject(sampleDoc(), null)], 'saved.json'))).toBe(true);
    expect(confirm).not.toHaveBeenCalled();
  });

  it('New asks the same question and keeps the document on Cancel', () => {
    confirm.mockReturnValue(false);
    const before = useDocStore.getState().doc;
    newProject();
    expect(confirm.mock.calls[0][0]).toMatch(/Discard the changes not saved/);
    expect(useDocStore.getState().doc).toBe(before);
  });
});

describe('openNotes', () => {
  const doc = { ...sampleDoc(), scan: { id: 'scan-kept', name: 'away.png', widthPx: 10, heightPx: 10, type: 'image/png' } };
  const notes = ['The scan "away.png" is not stored in this file; open the image again to see it.'];

  it('keeps "open the image again" when the scan is not in this browser', () => {
    expect(openNotes(notes, doc, false)).toEqual(notes);
  });

  it('says the scan shown is the one still open in this browser when it is cached under the same id', () => {
    putScan('scan-kept', { bitmap: {} as ImageBitmap, bytes: new Blob() });
    const said = openNotes(notes, doc, false).join(' ');
    expect(said).toMatch(/The file has no scan; showing "away\.png", still open in this browser/);
    expect(said).not.toMatch(/open the image again/);
    // A file that carries its scan needs no such note.
    expect(openNotes([], doc, true)).toEqual([]);
  });
});

describe('openProjectFile with a scan in the file', () => {
  const scanRef = { id: 'scan-saved', name: 'report.pdf', widthPx: 591, heightPx: 886, type: 'application/pdf', page: 1 };
  const bytes = Uint8Array.from([37, 80, 68, 70, 45]);
  const file = () => new File([serializeProject({ ...sampleDoc(), scan: scanRef }, { type: scanRef.type, name: scanRef.name, bytes })], 'saved.foldroot.json');
  const decodedAt = (widthPx: number, heightPx: number) => {
    const bitmap = { width: widthPx, height: heightPx, close: vi.fn() } as unknown as ImageBitmap;
    return { ok: true, bitmap, kind: 'pdf', widthPx, heightPx, mime: 'application/pdf', page: 1, pageCount: 2, dpi: 150 } satisfies DecodeResult;
  };

  beforeEach(() => {
    vi.stubGlobal('window', { confirm: () => true });
    useDocStore.getState().replace(sampleDoc());
    useSessionStore.getState().clearMessage();
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    decodeScan.mockReset();
  });

  it('decodes it at the saved page and size and asks nothing', async () => {
    decodeScan.mockResolvedValue(decodedAt(591, 886));
    expect(await openProjectFile(file())).toBe(true);
    expect(decodeScan).toHaveBeenCalledTimes(1);
    const [blob, ask, options] = decodeScan.mock.calls[0] as [Blob, AskScanChoice, unknown];
    expect(options).toEqual({ page: 1, widthPx: 591, heightPx: 886 });
    expect(new Uint8Array(await blob.arrayBuffer())).toEqual(bytes);
    // The function it was given to ask with does not ask: no page question is put to the user.
    expect(await ask({ kind: 'pdf', fileName: 'report.pdf', pageCount: 2, pageSize: async () => ({ widthPt: 1, heightPt: 1 }) })).toBeNull();
    expect(useScanChoiceStore.getState().request).toBeNull();
    expect(getScan('scan-saved')?.bitmap).not.toBeNull();
    expect(useSessionStore.getState().message).toMatchObject({ kind: 'info', text: 'Opened saved.foldroot.json.' });
  });

  it('opens the work with the scan kept but not shown when it decodes to another size, and says what differs', async () => {
    const wrong = decodedAt(591, 887);
    decodeScan.mockResolvedValue(wrong);
    expect(await openProjectFile(file())).toBe(true);
    expect(useDocStore.getState().doc.scan).toEqual(scanRef);
    expect(useDocStore.getState().doc.horizons).toHaveLength(3);
    const cached = getScan('scan-saved')!;
    expect(cached.bitmap).toBeNull();
    expect(new Uint8Array(await cached.bytes.arrayBuffer())).toEqual(bytes);
    expect((wrong.bitmap.close as ReturnType<typeof vi.fn>)).toHaveBeenCalled();
    const message = useSessionStore.getState().message!;
    expect(message.kind).toBe('error');
    expect(message.text).toContain('The scan "report.pdf" (page 2) now opens at 591 × 887 px, but the lines were digitised on it at 591 × 886 px, so they would not line up with it.');
    expect(message.text).toContain('The scan is not shown');
  });

  it('changes nothing when the scan cannot be decoded at all', async () => {
    decodeScan.mockResolvedValue({ ok: false, message: 'report.pdf looks like a PDF but could not be read' });
    const before = useDocStore.getState().doc;
    expect(await openProjectFile(file())).toBe(false);
    expect(useDocStore.getState().doc).toBe(before);
    expect(useSessionStore.getState().message?.text).toMatch(/cannot be shown \(report\.pdf looks like a PDF but could not be read\)\. Nothing was changed\./);
  });
});

describe('fitViewToDoc(doc) and New', () => {
  it('frames the box of every vertex of a long traced line without a scan (300,000 vertices)', async () => {
    // Our own check, worked by hand: u runs 10 … 300 009; v = 20 + k + (k mod 7) is lowest at k = 0 (20) and highest
    // at k = 299 998 (20 + 299 998 + 6 = 300 024), so the box is 300 000 × 300 005 px; margin 48 (fitViewToDoc's).
    const { fitViewToDoc } = await import('../../src/state/projectActions');
    const doc = sampleDoc();
    const line: [number, number][] = Array.from({ length: 300_000 }, (_, k) => [10 + k, 20 + (k % 7) + k]);
    const one = { ...doc, scan: null, horizons: [{ ...doc.horizons[0], pointsPx: line }] };
    fitViewToDoc(one);
    expect(useSessionStore.getState().fitted).toEqual({ u0: 10, v0: 20, width: 300_000, height: 300_005, margin: 48 });
  });

  it('New leaves the view unfitted, so a resize does not frame the previous project again', () => {
    vi.stubGlobal('window', { confirm: () => true });
    useSessionStore.getState().fitTo({ u0: 0, v0: 0, width: 2400, height: 1200, margin: 24 });
    newProject();
    expect(useSessionStore.getState().fitted).toBeNull();
    vi.unstubAllGlobals();
  });
});

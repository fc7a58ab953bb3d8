// Opening a file over unsaved changes asks first, as New does; "Cancel" changes nothing.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { setProjectInfo } from '../../src/core/model/commands/setProjectInfo';
import { serializeProject } from '../../src/io/projectFile';
import { useDocStore } from '../../src/state/docStore';
import { SAMPLE_SECTION, sampleDoc } from '../io/files/sampleDoc';

vi.mock('../../src/io/decodeScan', () => ({ decodeScan: async () => ({ ok: false, message: 'cannot decode in tests' }) }));
const { newProject, openNotes, openProjectFile } = await import('../../src/state/projectActions');
const { putScan } = await import('../../src/state/scanCache');

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

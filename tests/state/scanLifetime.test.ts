// Decoded scans live only while the open project shows them: a scan replaced by another is closed (bitmap
// and tiles), kept as bytes while the undo history can bring it back, decoded again when it does, and
// dropped once nothing can. Through the real document store; decoding is stubbed (it needs a browser).
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { setScan } from '../../src/core/model/commands/setScan';
import { emptyProjectDoc, type ScanRef } from '../../src/core/model/projectDoc';

const reopenScan = vi.hoisted(() => vi.fn());
vi.mock('../../src/io/reopenScan', () => ({ reopenScan }));
const { useDocStore } = await import('../../src/state/docStore');
const { getScan, heldScanIds, putScan, scanMemoryHeld } = await import('../../src/state/scanCache');
const { heldPyramidIds } = await import('../../src/state/scanTilesPyramid');
const { retainScansFor, startScanLifetime } = await import('../../src/state/scanLifetime');

function fakeBitmap(width = 40, height = 20) {
  return { width, height, close: vi.fn() } as unknown as ImageBitmap & { close: ReturnType<typeof vi.fn> };
}
const ref = (id: string): ScanRef => ({ id, name: `${id}.png`, widthPx: 40, heightPx: 20, type: 'image/png' });

/** Opens a scan as the app does: into the cache, then an undoable edit of the document. */
function openScan(id: string) {
  const bitmap = fakeBitmap();
  putScan(id, { bitmap, bytes: new Blob([id], { type: 'image/png' }) });
  useDocStore.getState().apply((d) => setScan(d, ref(id)));
  retainScansFor(useDocStore.getState());
  return bitmap;
}

describe('retainScansFor(doc store state)', () => {
  beforeEach(() => {
    reopenScan.mockReset();
    useDocStore.getState().replace(emptyProjectDoc());
    retainScansFor(useDocStore.getState());
  });

  it('closes the bitmap of a replaced scan but keeps its bytes while undo can bring it back', () => {
    const a = openScan('scan-a');
    const b = openScan('scan-b');
    expect(a.close).toHaveBeenCalledTimes(1);
    expect(b.close).not.toHaveBeenCalled();
    expect(getScan('scan-a')).toMatchObject({ bitmap: null, released: true });
    expect(getScan('scan-a')?.bytes.size).toBe('scan-a'.length);
    expect(getScan('scan-b')?.bitmap).toBe(b);
  });

  it('decodes a released scan again from its bytes when undo shows it', async () => {
    openScan('scan-a');
    const b = openScan('scan-b');
    const again = fakeBitmap();
    reopenScan.mockResolvedValue({ ok: true, bitmap: again });
    useDocStore.getState().undo();
    retainScansFor(useDocStore.getState());
    expect(b.close).toHaveBeenCalledTimes(1);
    await vi.waitFor(() => expect(getScan('scan-a')?.bitmap).toBe(again));
    expect(reopenScan.mock.calls[0][1]).toEqual(ref('scan-a'));
  });

  it('drops every scan that neither the document nor its history holds', () => {
    const a = openScan('scan-a');
    const b = openScan('scan-b');
    useDocStore.getState().replace({ ...emptyProjectDoc(), scan: null });
    retainScansFor(useDocStore.getState());
    expect(heldScanIds()).toEqual([]);
    expect(a.close).toHaveBeenCalledTimes(1);
    expect(b.close).toHaveBeenCalledTimes(1);
  });

  it('a new bitmap under the same id closes the old one a task later, once the view has let it go', async () => {
    const a = openScan('scan-a');
    const again = fakeBitmap();
    putScan('scan-a', { bitmap: again, bytes: new Blob(['scan-a'], { type: 'image/png' }) });
    expect(a.close).not.toHaveBeenCalled();
    await vi.waitFor(() => expect(a.close).toHaveBeenCalledTimes(1));
    expect(again.close).not.toHaveBeenCalled();
    expect(getScan('scan-a')?.bitmap).toBe(again);
  });

  it('scanMemoryHeld counts the decoded scans and their RGBA bytes; a released scan holds no pyramid', () => {
    openScan('scan-a');
    openScan('scan-b');
    // 40 × 20 px each; scan-a is kept as bytes only (undo can bring it back).
    expect(scanMemoryHeld()).toMatchObject({ decoded: 1, fullBytes: 40 * 20 * 4, tiles: 0, building: false });
    expect(heldPyramidIds()).toEqual(['scan-b']);
  });
});

describe('startScanLifetime', () => {
  it('closes a replaced scan only after the frame that shows its successor', async () => {
    useDocStore.getState().replace(emptyProjectDoc());
    retainScansFor(useDocStore.getState());
    const frames: FrameRequestCallback[] = [];
    vi.stubGlobal('requestAnimationFrame', (f: FrameRequestCallback) => frames.push(f));
    const stop = startScanLifetime();
    try {
      const a = fakeBitmap();
      putScan('scan-a', { bitmap: a, bytes: new Blob(['scan-a'], { type: 'image/png' }) });
      useDocStore.getState().apply((d) => setScan(d, ref('scan-a')));
      putScan('scan-b', { bitmap: fakeBitmap(), bytes: new Blob(['scan-b'], { type: 'image/png' }) });
      useDocStore.getState().apply((d) => setScan(d, ref('scan-b')));
      // Several tasks pass with no frame drawn: the replaced scan is still decoded.
      for (let k = 0; k < 5; k++) await new Promise((r) => setTimeout(r, 0));
      expect(a.close).not.toHaveBeenCalled();
      expect(frames.length).toBeGreaterThan(0);
      frames.splice(0).forEach((f) => f(0));
      await vi.waitFor(() => expect(a.close).toHaveBeenCalledTimes(1));
      expect(getScan('scan-a')).toMatchObject({ bitmap: null, released: true });
    } finally {
      stop();
      vi.unstubAllGlobals();
    }
  });
});

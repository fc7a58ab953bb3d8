// The scan's reduced views are made through scratch canvases of up to 2048 px a side (16 MB each as RGBA); those
// are given back once the build (or a figure's region read) is over, so a scan costs its bitmap and tiles only.
// OffscreenCanvas is a browser API: a stand-in records each canvas's size and the tiles made from it.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { TILE_PX, levelHeld, tileLevels } from '../../src/state/scanTiles';
import { SCAN_SHOWN_MARK, noteScanShown, pyramidRegion, pyramidsHeld, releaseTilePyramid, scratchesHeld, startTilePyramid } from '../../src/state/scanTilesPyramid';

class FakeCanvas {
  static made: FakeCanvas[] = [];
  /** Largest RGBA bytes held by scratch canvases (any over one tile) at once, sampled at each draw. */
  static peakScratchBytes = 0;
  constructor(public width: number, public height: number) {
    FakeCanvas.made.push(this);
  }
  getContext() {
    return {
      canvas: this,
      imageSmoothingQuality: 'low',
      clearRect: () => undefined,
      drawImage: () => {
        FakeCanvas.peakScratchBytes = Math.max(FakeCanvas.peakScratchBytes, scratchesHeld().bytes);
      },
    };
  }
  transferToImageBitmap() {
    return { width: this.width, height: this.height, close: vi.fn() };
  }
}

const bitmap = (width: number, height: number) => ({ width, height, close: vi.fn() }) as unknown as ImageBitmap;

describe('scan tile pyramid scratch canvases', () => {
  beforeEach(() => {
    FakeCanvas.made = [];
    FakeCanvas.peakScratchBytes = 0;
    vi.stubGlobal('OffscreenCanvas', FakeCanvas);
  });
  afterEach(() => {
    releaseTilePyramid('big');
    vi.unstubAllGlobals();
  });

  it('draws through scratch canvases while it builds and holds none once every level is made', async () => {
    // 9000 × 5000 px: levels 0 to 4; level 1 is not held, so level 2 is drawn through a 2048 px scratch.
    const pyramid = startTilePyramid('big', bitmap(9000, 5000));
    await pyramid.ready;
    expect(FakeCanvas.peakScratchBytes).toBeGreaterThanOrEqual(2 * TILE_PX * 2 * TILE_PX * 4);
    expect(scratchesHeld()).toEqual({ canvases: 0, bytes: 0 });
    expect(pyramidsHeld()).toMatchObject({ building: false, scratchBytes: 0 });
    // Every canvas over one tile's size was a scratch canvas, and each is now 0 × 0 (its pixels given back).
    const large = FakeCanvas.made.filter((c) => c.width * c.height > TILE_PX * TILE_PX);
    expect(large.every((c) => c.width === 0 && c.height === 0)).toBe(true);
    // The tiles themselves stay: every held level but the full bitmap, tile count from the level sizes.
    const levels = tileLevels(9000, 5000);
    const expected = levels.filter((lv) => lv.level > 0 && levelHeld(lv.level, levels.length)).reduce((n, lv) => n + lv.cols * lv.rows, 0);
    expect(pyramidsHeld().tiles).toBe(expected);
  });

  it('gives the scratch canvases back when the scan is released during the build', async () => {
    const pyramid = startTilePyramid('big', bitmap(9000, 5000));
    releaseTilePyramid('big');
    await pyramid.ready;
    expect(scratchesHeld().canvases).toBe(0);
    expect(pyramidsHeld()).toMatchObject({ tiles: 0, scratchBytes: 0 });
  });

  it('a figure region read before the levels are made draws through scratch canvases and gives them back', async () => {
    const pyramid = startTilePyramid('big', bitmap(9000, 5000));
    // Level 3 is not made yet (the build starts a task later): it is drawn from level 2, itself from the full bitmap.
    const region = await pyramidRegion(pyramid, 3, 0, 0, 1125, 625);
    expect([region.width, region.height]).toEqual([1125, 625]);
    expect(FakeCanvas.peakScratchBytes).toBeGreaterThan(0);
    await pyramid.ready;
    expect(scratchesHeld().canvases).toBe(0);
  });

  describe('in a page with a screen (requestAnimationFrame)', () => {
    beforeEach(() => {
      vi.stubGlobal('requestAnimationFrame', (f: FrameRequestCallback) => setTimeout(() => f(0), 0));
    });
    afterEach(() => {
      vi.useRealTimers();
      performance.clearMarks(SCAN_SHOWN_MARK);
    });

    it('makes no reduced level before the scan is shown, and makes them once it is', async () => {
      const full = bitmap(9000, 5000);
      const pyramid = startTilePyramid('big', full);
      // Many turns of the page pass: the first picture (the full bitmap) is not held up by a slice of tiles.
      for (let k = 0; k < 20; k++) await new Promise((r) => setTimeout(r, 0));
      expect(pyramidsHeld()).toMatchObject({ tiles: 0, building: true });
      expect(pyramid.tiles.every((t) => t === null)).toBe(true);
      noteScanShown(full, 'big.png');
      await pyramid.ready;
      expect(pyramidsHeld().building).toBe(false);
      expect(pyramidsHeld().tiles).toBeGreaterThan(0);
      expect(performance.getEntriesByName(SCAN_SHOWN_MARK).map((m) => (m as PerformanceMark).detail)).toEqual(['big.png']);
    });

    it('makes them anyway when nothing shows the scan (no view draws it)', async () => {
      vi.useFakeTimers();
      const pyramid = startTilePyramid('big', bitmap(9000, 5000));
      await vi.runAllTimersAsync();
      await pyramid.ready;
      expect(pyramidsHeld()).toMatchObject({ building: false });
      expect(pyramidsHeld().tiles).toBeGreaterThan(0);
    });

    it('a scan shown other than the one building starts nothing', async () => {
      const pyramid = startTilePyramid('big', bitmap(9000, 5000));
      noteScanShown(bitmap(9000, 5000), 'other.png');
      for (let k = 0; k < 20; k++) await new Promise((r) => setTimeout(r, 0));
      expect(pyramidsHeld()).toMatchObject({ tiles: 0, building: true });
      releaseTilePyramid('big');
      noteScanShown(pyramid.full, 'big.png');
      await pyramid.ready;
      expect(pyramidsHeld().tiles).toBe(0);
    });
  });
});

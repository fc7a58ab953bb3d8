import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { TILE_PX, chooseLevel, levelHeld, tileImageRect, tileLevels, visibleTiles } from '../../src/state/scanTiles';

describe('tileLevels', () => {
  it('tileLevels(10000, 10000) halves down to a level that fits in one tile', () => {
    const levels = tileLevels(10000, 10000);
    expect(levels.map((l) => [l.cols, l.rows])).toEqual([[10, 10], [5, 5], [3, 3], [2, 2], [1, 1]]);
    expect(levels.at(-1)!.widthPx).toBe(625);
  });
  it('tileLevels of a small image is one level of one tile; of an empty image, none', () => {
    expect(tileLevels(800, 600)).toHaveLength(1);
    expect(tileLevels(0, 600)).toEqual([]);
  });
});

describe('levelHeld', () => {
  it('levelHeld: level 0 always, level 1 only as the coarsest, every coarser level', () => {
    expect([0, 1, 2, 3, 4].map((k) => levelHeld(k, 5))).toEqual([true, false, true, true, true]);
    expect([0, 1].map((k) => levelHeld(k, 2))).toEqual([true, true]);
    expect(levelHeld(0, 1)).toBe(true);
    expect(levelHeld(5, 5)).toBe(false);
  });
});

describe('chooseLevel', () => {
  it('chooseLevel is 0 at 1:1 and when zoomed in, and coarser as the view zooms out', () => {
    expect(chooseLevel(1, 1, 5)).toBe(0);
    expect(chooseLevel(8, 1, 5)).toBe(0);
    expect(chooseLevel(0.125, 1, 5)).toBe(3);
    expect(chooseLevel(0.25, 1, 5)).toBe(2);
    expect(chooseLevel(0.001, 1, 5)).toBe(4);
  });
  it('chooseLevel skips level 1 where it is not held: level 0 down to 1/2, level 2 below', () => {
    expect(chooseLevel(0.5, 1, 5)).toBe(0);
    expect(chooseLevel(0.51, 1, 5)).toBe(0);
    expect(chooseLevel(0.49, 1, 5)).toBe(2);
    expect(chooseLevel(0.3, 1, 5)).toBe(2);
    // A scan of two levels holds its level 1 (the only reduced view it has).
    expect(chooseLevel(0.3, 1, 2)).toBe(1);
  });
  it('chooseLevel never returns a level the pyramid does not hold (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1e-4, max: 64, noNaN: true }), fc.integer({ min: 1, max: 9 }), (scale, count) =>
      levelHeld(chooseLevel(scale, 1, count), count)));
  });
  it('chooseLevel keeps full resolution on a high-density screen at 50%', () => {
    expect(chooseLevel(0.5, 2, 5)).toBe(0);
  });
});

describe('visibleTiles', () => {
  it('visibleTiles at 1:1 with the image origin at the view origin is the top-left block of tiles', () => {
    const { level, tiles } = visibleTiles({ scale: 1, x: 0, y: 0 }, 1400, 900, 10000, 10000);
    expect(level).toBe(0);
    expect(tiles.map((t) => t.key)).toEqual(['0/0/0', '0/1/0']);
  });
  it('visibleTiles is empty when the image is entirely off screen', () => {
    expect(visibleTiles({ scale: 1, x: -20000, y: 0 }, 1400, 900, 10000, 10000).tiles).toEqual([]);
    expect(visibleTiles({ scale: 1, x: 1500, y: 0 }, 1400, 900, 10000, 10000).tiles).toEqual([]);
  });
  it('visibleTiles at zoom-to-fit of a 100 MP scan draws the whole coarse level, few tiles', () => {
    const scale = 852 / 10000;
    const { level, tiles } = visibleTiles({ scale, x: 274, y: 24 }, 1400, 900, 10000, 10000);
    expect(level).toBe(3);
    expect(tiles).toHaveLength(4);
  });
  it('visibleTiles covers every screen pixel that shows the image, with no tile wholly off screen (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.005, max: 16, noNaN: true }),
        fc.double({ min: -30000, max: 2000, noNaN: true }),
        fc.double({ min: -30000, max: 2000, noNaN: true }),
        fc.integer({ min: 1, max: 20000 }),
        fc.integer({ min: 1, max: 20000 }),
        fc.integer({ min: 0, max: 1399 }),
        fc.integer({ min: 0, max: 899 }),
        (scale, x, y, w, h, sx, sy) => {
          const cam = { scale, x, y };
          const { level, tiles } = visibleTiles(cam, 1400, 900, w, h);
          const lv = tileLevels(w, h)[level];
          const rects = tiles.map((t) => tileImageRect(lv, t.col, t.row, w, h));
          // Every tile overlaps the view.
          for (const r of rects) {
            expect(r.x * scale + x).toBeLessThan(1400);
            expect((r.x + r.width) * scale + x).toBeGreaterThan(0);
            expect(r.y * scale + y).toBeLessThan(900);
            expect((r.y + r.height) * scale + y).toBeGreaterThan(0);
          }
          // The image pixel under a random screen pixel, if inside the image, lies in some tile.
          const u = (sx + 0.5 - x) / scale;
          const v = (sy + 0.5 - y) / scale;
          if (u >= 0 && u < w && v >= 0 && v < h) {
            expect(rects.some((r) => u >= r.x && u < r.x + r.width && v >= r.y && v < r.y + r.height)).toBe(true);
          }
        },
      ),
      { numRuns: 500 },
    );
  });
  it('visibleTiles draws a bounded number of tiles at any zoom (at most one tile column and row past the view)', () => {
    for (const scale of [0.01, 0.1, 0.37, 1, 3, 10]) {
      const { tiles } = visibleTiles({ scale, x: -123, y: -77 }, 1400, 900, 14142, 14142);
      expect(tiles.length).toBeLessThanOrEqual((Math.ceil(1400 / TILE_PX) + 2) * (Math.ceil(900 / TILE_PX) + 2));
    }
  });
});

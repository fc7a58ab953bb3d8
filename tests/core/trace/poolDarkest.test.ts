import { describe, expect, it } from 'vitest';
import { poolDarkest } from '../../../src/core/trace/poolDarkest';

// The darkest pixel of each block against the block mean (a box filter): a line one pixel wide fills one row of a
// block of 4 × 4 px, so the mean keeps a quarter of its darkness and the darkest pixel all of it, in its own colour
// (arithmetic on the drawn image, the truth here).
const W = 64;
const H = 30;
const paper = [240, 232, 214];
const ink = [30, 20, 60];

function scanWithRow(row: number): Uint8ClampedArray {
  const rgba = new Uint8ClampedArray(W * H * 4);
  for (let k = 0; k < W * H; k++) rgba.set([...(Math.floor(k / W) === row ? ink : paper), 255], k * 4);
  return rgba;
}

describe('poolDarkest (the darkest pixel of each block)', () => {
  it('keeps a one-pixel line in its own colour in every block it crosses', () => {
    const rgba = scanWithRow(9);
    const r = poolDarkest(rgba, W, H, 4);
    expect([r.w, r.h]).toEqual([16, 8]);
    // Row 9 lies in block row 2; the other blocks are paper.
    for (let i = 0; i < 16; i++) expect([...r.rgba.subarray((2 * 16 + i) * 4, (2 * 16 + i) * 4 + 3)]).toEqual(ink);
    for (let i = 0; i < 16; i++) expect([...r.rgba.subarray((5 * 16 + i) * 4, (5 * 16 + i) * 4 + 3)]).toEqual(paper);
  });

  it('reduces the last row of blocks from the rows left over', () => {
    const r = poolDarkest(scanWithRow(29), W, H, 4);
    // 30 rows in blocks of 4: 8 block rows, the last covering rows 28 and 29.
    expect(r.h).toBe(8);
    expect([...r.rgba.subarray((7 * 16) * 4, (7 * 16) * 4 + 3)]).toEqual(ink);
    expect([...r.rgba.subarray((6 * 16) * 4, (6 * 16) * 4 + 3)]).toEqual(paper);
  });

  it('keeps the pixel darkest by luminance, not by one channel', () => {
    // Rec. 601 luminance (common practice): (200, 40, 200) is 106.0, (60, 180, 60) is 130.4, though its red is lower.
    const rgba = new Uint8ClampedArray([60, 180, 60, 255, 200, 40, 200, 255, 240, 240, 240, 255, 240, 240, 240, 255]);
    expect([...poolDarkest(rgba, 2, 2, 2).rgba]).toEqual([200, 40, 200, 255]);
  });

  it('copies the image for a block of one pixel and gives nothing for an empty image', () => {
    const rgba = scanWithRow(3);
    const r = poolDarkest(rgba, W, H, 1);
    expect([r.w, r.h]).toEqual([W, H]);
    expect([...r.rgba]).toEqual([...rgba]);
    expect(poolDarkest(rgba, 0, 0, 4).rgba.length).toBe(0);
  });
});

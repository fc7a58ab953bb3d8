import { describe, expect, it } from 'vitest';
import { roughReduction } from '../../../src/core/trace/roughReduction';

// Sizes follow from the pixel budgets by arithmetic (the truth here).
describe('roughReduction', () => {
  it('reads a 3,000 px stretch window whole and reduces it by blocks to about the budget', () => {
    const r = roughReduction(3264, 427, 16_000, 4_000_000);
    expect([r.readW, r.readH]).toEqual([3264, 427]);
    // 1,393,728 px over 16,000 is 87.1: blocks of ⌈9.33⌉ = 10 px.
    expect(r.pool).toBe(10);
    expect([r.cw, r.ch]).toEqual([327, 43]);
    // Each reduced pixel is 10 image px a side.
    expect([r.sx, r.sy]).toEqual([10, 10]);
  });

  it('has the browser reduce a window past the read budget first, to about that budget', () => {
    const r = roughReduction(8000, 2000, 16_000, 4_000_000);
    expect([r.readW, r.readH]).toEqual([4000, 1000]);
    expect(r.pool).toBe(16);
    expect([r.cw, r.ch]).toEqual([250, 63]);
    // 16,000,000 px read as 4,000,000 halves each side: a block of 16 read px covers 32 image px.
    expect([r.sx, r.sy]).toEqual([32, 32]);
  });

  it('reduces a small window by 2 at least, and an empty one to one block', () => {
    expect(roughReduction(40, 30, 16_000, 4_000_000).pool).toBe(2);
    const empty = roughReduction(0, 0, 16_000, 4_000_000);
    expect([empty.cw, empty.ch]).toEqual([1, 1]);
  });
});

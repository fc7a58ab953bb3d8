import { describe, expect, it } from 'vitest';
import { roughReduction } from '../../../src/core/trace/roughReduction';

// Sizes follow from the pixel budgets by arithmetic (the truth here).
describe('roughReduction', () => {
  it('has the browser halve a 3,000 px stretch window, then reduces it by blocks to about the budget', () => {
    const r = roughReduction(3264, 427, 16_000, 400_000);
    // 1,393,728 px is past the read budget; halved, 1,632 × 214 (349,248 px) fits.
    expect([r.readW, r.readH, r.scale]).toEqual([1632, 214, 2]);
    // 349,248 px over 16,000 is 21.8: blocks of ⌈4.67⌉ = 5 read px.
    expect(r.pool).toBe(5);
    expect([r.cw, r.ch]).toEqual([327, 43]);
    // Each reduced pixel is 2 × 5 image px a side (427 / 214 down: the halving rounds).
    expect(r.sx).toBe(10);
    expect(r.sy).toBeCloseTo((427 / 214) * 5, 12);
  });

  it('halves again until the window fits the read budget', () => {
    const r = roughReduction(8000, 2000, 16_000, 400_000);
    // 16 MP → 4 MP → 1 MP → 250,000 px: three halvings.
    expect([r.readW, r.readH, r.scale]).toEqual([1000, 250, 8]);
    expect(r.pool).toBe(4);
    expect([r.cw, r.ch]).toEqual([250, 63]);
    expect([r.sx, r.sy]).toEqual([32, 32]);
  });

  it('reads a window within the budget whole, reduces a small one by 2 at least, and an empty one to one block', () => {
    const whole = roughReduction(1000, 300, 16_000, 400_000);
    expect([whole.readW, whole.readH, whole.scale, whole.pool]).toEqual([1000, 300, 1, 5]);
    expect(roughReduction(40, 30, 16_000, 400_000).pool).toBe(2);
    const empty = roughReduction(0, 0, 16_000, 400_000);
    expect([empty.cw, empty.ch]).toEqual([1, 1]);
  });
});

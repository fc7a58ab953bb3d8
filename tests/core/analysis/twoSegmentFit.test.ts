import { describe, expect, it } from 'vitest';
import { twoSegmentFit } from '../../../src/core/analysis/twoSegmentFit';
import { expectClose } from '../../expectClose';

// Synthetic two-detachment section (our own, from A = Σ Dₖ (zₖ − h), docs/method.md §Non-linear graphs):
// an upper detachment at 1500 m with D₁ = 500 m and a lower one at 3000 m with D₂ = 1000 m.
const depths = [250, 500, 750, 1000, 2000, 2250, 2500];
const areas = depths.map((h) => (h < 1500 ? 500 * (1500 - h) : 0) + 1000 * (3000 - h));

describe('twoSegmentFit(depths, areas, splitDepth, zref)', () => {
  it('recovers the upper detachment displacement from the difference in slopes', () => {
    const f = twoSegmentFit(depths, areas, 1500, 0);
    expectClose(f.upper.result!.slope, -1500, 1e-10);
    expectClose(f.lower.result!.slope, -1000, 1e-10);
    expectClose(f.upperDisplacement!, 500, 1e-9);
    expectClose(f.lower.result!.detachmentDepth!, 3000, 1e-10);
  });

  it('places the upper detachment where the two lines meet', () => {
    const f = twoSegmentFit(depths, areas, 1500, 100);
    expectClose(f.upperDetachmentDepth!, 1500, 1e-10);
    expectClose(f.upperDetachmentElevation!, 100 - 1500, 1e-10);
  });

  it('gives nulls and a note when one side has fewer than two horizons', () => {
    const f = twoSegmentFit(depths, areas, 300, 0);
    expect(f.upper.result).toBeNull();
    expect(f.upperDisplacement).toBeNull();
    expect(f.notes.some((n) => n.includes('above the split'))).toBe(true);
  });

  it('notes when the upper segment is not steeper', () => {
    const straight = depths.map((h) => 1000 * (3000 - h));
    const f = twoSegmentFit(depths, straight, 1500, 0);
    expectClose(f.upperDisplacement!, 0, 0, { abs: 1e-9 });
    expect(f.notes.some((n) => n.includes('no upper detachment'))).toBe(true);
  });
});

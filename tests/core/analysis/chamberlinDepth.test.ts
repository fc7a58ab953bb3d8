import { describe, expect, it } from 'vitest';
import { chamberlinDepth } from '../../../src/core/analysis/chamberlinDepth';
import { layerParallelStrain } from '../../../src/core/analysis/layerParallelStrain';

describe('chamberlinDepth(A, L, W)', () => {
  it('is A / (L − W)', () => {
    // Source: Chamberlin (1910), H = A / (L − W) (docs/method.md §Chamberlin depth).
    expect(chamberlinDepth(2e6, 11_000, 10_000)).toBe(2000);
  });
  it('is null when L ≤ W or an input is not finite', () => {
    expect(chamberlinDepth(1e6, 10_000, 10_000)).toBeNull();
    expect(chamberlinDepth(1e6, 9000, 10_000)).toBeNull();
    expect(chamberlinDepth(Number.NaN, 11_000, 10_000)).toBeNull();
  });
});

describe('layerParallelStrain(L, W, D)', () => {
  it('is L / (W + D) − 1, negative when the layer shortened', () => {
    // Source: Groshong (2006) §11.4.3.2, e = L/(W + D) − 1 (docs/method.md §Layer-parallel strain).
    expect(layerParallelStrain(10_450, 10_000, 1000)).toBe(10_450 / 11_000 - 1);
    expect(layerParallelStrain(11_000, 10_000, 1000)).toBe(0);
  });
  it('is null when W + D ≤ 0', () => {
    expect(layerParallelStrain(100, 50, -60)).toBeNull();
  });
});

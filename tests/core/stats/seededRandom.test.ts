import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/stats/seededRandom';

describe('seededRandom(seed)', () => {
  it('repeats the same sequence for the same seed and differs for another', () => {
    const a = seededRandom(42);
    const b = seededRandom(42);
    const c = seededRandom(43);
    const seqA = Array.from({ length: 50 }, () => a.next());
    const seqB = Array.from({ length: 50 }, () => b.next());
    const seqC = Array.from({ length: 50 }, () => c.next());
    expect(seqA).toEqual(seqB);
    expect(seqA).not.toEqual(seqC);
    const n1 = seededRandom(7);
    const n2 = seededRandom(7);
    expect(Array.from({ length: 21 }, () => n1.normal())).toEqual(Array.from({ length: 21 }, () => n2.normal()));
  });

  it('gives uniforms in [0, 1) with mean ½ and variance 1/12', () => {
    const rng = seededRandom(2024);
    const n = 100_000;
    let sum = 0;
    let sumSq = 0;
    for (let i = 0; i < n; i++) {
      const u = rng.next();
      expect(u >= 0 && u < 1).toBe(true);
      sum += u;
      sumSq += u * u;
    }
    const mean = sum / n;
    const variance = sumSq / n - mean * mean;
    // Uniform law: SE(mean) = √(1/12 / n) ≈ 9.1e-4; SE(variance) = √((1/80 − 1/144)/n) ≈ 2.4e-4. Six SEs.
    expect(Math.abs(mean - 0.5)).toBeLessThan(6 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(6 * Math.sqrt((1 / 80 - 1 / 144) / n));
  });

  it('gives normals with mean 0, variance 1 and normal tail shares', () => {
    const rng = seededRandom(99);
    const n = 100_000;
    let sum = 0;
    let sumSq = 0;
    let beyond196 = 0;
    for (let i = 0; i < n; i++) {
      const z = rng.normal();
      sum += z;
      sumSq += z * z;
      if (Math.abs(z) > 1.959963984540054) beyond196++;
    }
    const mean = sum / n;
    const variance = sumSq / n - mean * mean;
    // Normal law: SE(mean) = 1/√n ≈ 3.2e-3; SE(variance) = √(2/n) ≈ 4.5e-3; a two-sided 5% share has
    // SE √(0.05·0.95/n) ≈ 6.9e-4 (1.96 is the normal 97.5% point, common practice). Six SEs each.
    expect(Math.abs(mean)).toBeLessThan(6 / Math.sqrt(n));
    expect(Math.abs(variance - 1)).toBeLessThan(6 * Math.sqrt(2 / n));
    expect(Math.abs(beyond196 / n - 0.05)).toBeLessThan(6 * Math.sqrt((0.05 * 0.95) / n));
  });
});

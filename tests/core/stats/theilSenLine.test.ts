// Theil–Sen line (Theil 1950; Sen 1968): exact on a line, unmoved by a minority of wild points, degenerate cases.
import { describe, expect, it } from 'vitest';
import { theilSenLine } from '../../../src/core/stats/theilSenLine';

describe('theilSenLine', () => {
  it('recovers a line exactly and ignores a quarter of wild points (breakdown about 29 %, Sen 1968)', () => {
    const xs = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11];
    const zs = xs.map((x) => 3 - 0.5 * x);
    expect(theilSenLine(xs, zs)).toEqual({ slope: -0.5, intercept: 3 });
    const wild = zs.slice();
    wild[2] += 40; wild[7] -= 25; wild[11] += 90;
    const r = theilSenLine(xs, wild)!;
    // Analytic: with 3 of 12 points off the line, more than half of the 66 pairwise slopes are exact.
    expect(r.slope).toBeCloseTo(-0.5, 12);
    expect(r.intercept).toBeCloseTo(3, 12);
  });

  it('gives the median level for one point or points at one x, and null for none', () => {
    expect(theilSenLine([5], [7])).toEqual({ slope: 0, intercept: 7 });
    expect(theilSenLine([2, 2, 2], [1, 9, 4])).toEqual({ slope: 0, intercept: 4 });
    expect(theilSenLine([], [])).toBeNull();
    expect(theilSenLine([0, NaN], [1, 2])).toBeNull();
  });
});

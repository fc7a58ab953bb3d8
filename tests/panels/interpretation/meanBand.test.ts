import { describe, expect, it } from 'vitest';
import { leastSquares } from '../../../src/core/stats/leastSquares';
import { fiellerInterval } from '../../../src/core/stats/fiellerInterval';
import { linspace, meanBand } from '../../../src/panels/interpretation/meanBand';
import { minOf } from '../../../src/core/stats/minMax';

// Graybill & Iyer, Regression Analysis (1994), reaction-chamber example (docs/method.md §Check values).
const x = [0, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100];
const y = [206.36, 225.52, 252.18, 289.33, 318.11, 349.49, 383.03, 410.7, 444.4, 469.14, 501.16];

describe('meanBand(fit, xs, level)', () => {
  const fit = leastSquares(x, y)!;

  it('meets y0 = 400 at the ends of the published 99% interval (65.07, 68.03)', () => {
    // The band is the Fieller inequality read the other way: it crosses y0 where the interval ends.
    const [lo, hi] = meanBand(fit, [65.07, 68.03], 0.99)!;
    // Published interval ends are rounded to 0.01 in x, i.e. about 0.03 in y at slope 3.03.
    expect(Math.abs(lo.hi - 400)).toBeLessThan(0.04);
    expect(Math.abs(hi.lo - 400)).toBeLessThan(0.04);
  });

  it('meets y0 exactly at the ends of the computed Fieller interval', () => {
    const f = fiellerInterval(fit, 400, 0.95);
    if (f.kind !== 'bounded') throw new Error('expected a bounded interval');
    const [lo, hi] = meanBand(fit, [f.lo, f.hi], 0.95)!;
    expect(Math.abs(lo.hi - 400)).toBeLessThan(1e-9);
    expect(Math.abs(hi.lo - 400)).toBeLessThan(1e-9);
  });

  it('is narrowest at the mean of x and symmetric about the line', () => {
    const band = meanBand(fit, linspace(-50, 150, 41), 0.95)!;
    const widths = band.map((b) => b.hi - b.lo);
    const narrowest = band[widths.indexOf(minOf(widths))].x;
    expect(narrowest).toBe(50);
    for (const b of band) expect(Math.abs(b.hi - b.fit - (b.fit - b.lo))).toBeLessThan(1e-9);
  });

  it('returns null without degrees of freedom', () => {
    expect(meanBand(leastSquares([0, 1], [1, 2])!, [0.5])).toBeNull();
  });
});

import { describe, expect, it } from 'vitest';
import { leastSquares } from '../../../src/core/stats/leastSquares';
import { slopeInterval } from '../../../src/core/stats/slopeInterval';
import { expectClose } from '../../expectClose';

describe('slopeInterval(fit, level)', () => {
  const x = [0, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100];
  const y = [206.36, 225.52, 252.18, 289.33, 318.11, 349.49, 383.03, 410.7, 444.4, 469.14, 501.16];

  it('is b ± t(0.975, n − 2)·SE(b) with the handbook t value', () => {
    const fit = leastSquares(x, y);
    if (!fit) throw new Error('fit expected');
    const interval = slopeInterval(fit);
    expect(interval).not.toBeNull();
    if (!interval) return;
    // t(0.975, 9) = 2.262: NIST/SEMATECH e-Handbook §1.3.6.7.2 (docs/method.md §Check values), 3 decimals.
    expect(Math.abs((interval[1] - fit.slope) / fit.slopeSE - 2.262)).toBeLessThanOrEqual(0.0005);
    expectClose(interval[0] + interval[1], 2 * fit.slope, 1e-14);
  });

  it('widens with the level', () => {
    const fit = leastSquares(x, y);
    if (!fit) throw new Error('fit expected');
    const narrow = slopeInterval(fit, 0.8);
    const wide = slopeInterval(fit, 0.99);
    if (!narrow || !wide) throw new Error('intervals expected');
    expect(wide[0]).toBeLessThan(narrow[0]);
    expect(wide[1]).toBeGreaterThan(narrow[1]);
  });

  it('is null for df < 1 or a level outside (0, 1)', () => {
    const two = leastSquares([0, 1], [0, 2]);
    if (!two) throw new Error('fit expected');
    expect(slopeInterval(two)).toBeNull();
    const fit = leastSquares(x, y);
    if (!fit) throw new Error('fit expected');
    expect(slopeInterval(fit, 1)).toBeNull();
    expect(slopeInterval(fit, 0)).toBeNull();
  });
});

// Typed pins are refused when they would cross the other pin or lie far beyond the scan (1e99
// typed as the left pin once swapped the pins and lost the old one).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pinAllowedRange, pinValueProblem, PIN_EXTENT_FACTOR } from '../../../src/panels/workspace/pinValueProblem';

const scan: [number, number] = [0, 18_000];

describe('pinValueProblem(side, x, other, extent, unit)', () => {
  it('accepts a left pin left of the right pin inside the allowed range', () => {
    expect(pinValueProblem('left', 1000, 17_000, scan, 'm')).toBeNull();
    expect(pinValueProblem('right', 17_500, 1000, scan, 'm')).toBeNull();
  });

  it('refuses a left pin at or right of the right pin, naming the limit', () => {
    expect(pinValueProblem('left', 17_000, 17_000, scan, 'm')).toBe('the left pin must lie left of the right pin (x < 17000 m)');
    expect(pinValueProblem('left', 20_000, 17_000, scan, 'm')).toMatch(/left of the right pin/);
    expect(pinValueProblem('right', 500, 1000, scan, 'ft')).toBe('the right pin must lie right of the left pin (x > 1000 ft)');
    // The limit is shown as the field shows it: to 0.01 of the unit, no float noise, map-scale digits kept.
    expect(pinValueProblem('left', 9000, 8799.99931, scan, 'm')).toMatch(/\(x < 8800 m\)$/);
    expect(pinValueProblem('right', 512_000, 512_345.6712, [500_000, 530_000], 'm')).toMatch(/\(x > 512345.67 m\)$/);
  });

  it('refuses absurd values such as 1e99 and non-finite ones', () => {
    expect(pinValueProblem('right', 1e99, 1000, scan, 'm')).toMatch(/^x = 1e\+99 m is far outside the scan \(allowed −81000 to 99000 m\)$/);
    expect(pinValueProblem('left', -1e99, 17_000, scan, 'm')).toMatch(/far outside the scan/);
    expect(pinValueProblem('left', Number.NaN, 17_000, scan, 'm')).toMatch(/finite/);
    expect(pinValueProblem('left', Number.POSITIVE_INFINITY, null, null, 'px')).toMatch(/finite/);
  });

  it('without a scan extent only the order is checked', () => {
    expect(pinValueProblem('left', -1e12, 5, null, 'px')).toBeNull();
    expect(pinValueProblem('left', 6, 5, null, 'px')).not.toBeNull();
  });

  it('an accepted value always keeps left < right and lies within the range (property)', () => {
    let accepted = 0;
    fc.assert(fc.property(
      fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: 1, max: 1e5, noNaN: true }),
      fc.oneof(fc.double(), fc.double({ min: -2e6, max: 2e6, noNaN: true })), fc.double({ min: -2e6, max: 2e6, noNaN: true }), fc.boolean(),
      (lo, width, typed, other, left) => {
        const extent: [number, number] = [lo, lo + width];
        const range = pinAllowedRange(extent)!;
        const side = left ? 'left' : 'right';
        if (pinValueProblem(side, typed, other, extent, 'm') !== null) return;
        accepted++;
        expect(Number.isFinite(typed)).toBe(true);
        expect(left ? typed < other : typed > other).toBe(true);
        expect(typed).toBeGreaterThanOrEqual(range[0]);
        expect(typed).toBeLessThanOrEqual(range[1]);
      }), { verbose: true, numRuns: 500 });
    // The property is not vacuous: some values were accepted.
    expect(accepted).toBeGreaterThan(0);
  });
});

describe('pinAllowedRange(extent)', () => {
  it('widens the scan extent to ten times its width about its middle', () => {
    const [a, b] = pinAllowedRange([1000, 3000])!;
    expect(b - a).toBe(PIN_EXTENT_FACTOR * 2000);
    expect((a + b) / 2).toBe(2000);
    expect(pinAllowedRange(null)).toBeNull();
  });
});

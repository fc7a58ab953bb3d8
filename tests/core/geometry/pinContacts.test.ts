import { describe, expect, it } from 'vitest';
import { pinContacts } from '../../../src/core/geometry/pinContacts';

// Hand-worked lines against pins at x = 0 and x = 10 (the counting rule of docs/method.md §Pins, regional and excess area: each line
// must cross each pin exactly once; touches and runs along a pin are contacts too).
const at = (xs: number[]) => pinContacts(xs, xs.length, 0, 10);

describe('pinContacts(X, n, pL, pR)', () => {
  it('finds the clip of a line that crosses both pins once: segment and fraction at each end', () => {
    // Crosses x = 0 at 1/4 of segment 0 (−2 → 6) and x = 10 at 1/2 of segment 2 (8 → 12).
    const c = at([-2, 6, 8, 12]);
    expect(c).toMatchObject({ leftCount: 1, rightCount: 1, reversed: false, found: true, startSeg: 0, endSeg: 2 });
    expect(c.startT).toBeCloseTo(0.25, 15);
    expect(c.endT).toBeCloseTo(0.5, 15);
  });

  it('starts on the last vertex of a run along the left pin and ends on the first vertex on the right pin', () => {
    const c = at([-1, 0, 0, 5, 10, 11]);
    expect(c).toMatchObject({ leftCount: 1, rightCount: 1, found: true, startSeg: 2, startT: 0, endSeg: 3, endT: 1 });
  });

  it('counts a touch of the left pin and a fold back across the right pin as extra contacts', () => {
    expect(at([-1, 3, 0, 4, 12]).leftCount).toBe(2);
    expect(at([-1, 12, 8, 12]).rightCount).toBe(3);
  });

  it('flags a right-to-left line as reversed, and a line short of a pin as missing it', () => {
    expect(at([12, 5, -3]).reversed).toBe(true);
    expect(at([1, 5, 12])).toMatchObject({ leftCount: 0, rightCount: 1, found: false });
  });
});

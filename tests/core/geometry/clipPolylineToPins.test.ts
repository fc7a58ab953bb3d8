import { describe, expect, it } from 'vitest';
import { clipPolylineToPins } from '../../../src/core/geometry/clipPolylineToPins';

const arr = (c: Float64Array | Uint8Array | undefined) => (c ? Array.from(c) : null);

describe('clipPolylineToPins(xs, zs, pL, pR)', () => {
  it('cuts at the exact crossings with x = pL and x = pR', () => {
    // Analytic: the line z = x/2 + 5 meets x = 0 at z = 5 and x = 6 at z = 8.
    const c = clipPolylineToPins([-10, 2, 10], [0, 6, 10], 0, 6);
    expect(c.leftContacts).toBe(1);
    expect(c.rightContacts).toBe(1);
    expect(arr(c.clipped?.xs)).toEqual([0, 2, 6]);
    expect(arr(c.clipped?.zs)).toEqual([5, 6, 8]);
    expect(arr(c.clipped?.source)).toEqual([10 / 12, 1, 1.5]);
    expect(c.clipped?.reversed).toBe(false);
  });

  it('ignores vertices beyond the pins', () => {
    const c = clipPolylineToPins([-30, -20, -10, 5, 20, 30], [7, 9, 0, 3, 0, 50], 0, 10);
    expect(arr(c.clipped?.xs)).toEqual([0, 5, 10]);
    // Analytic: (-10, 0)-(5, 3) meets x = 0 at z = 2; (5, 3)-(20, 0) meets x = 10 at z = 2.
    expect(arr(c.clipped?.zs)).toEqual([2, 3, 2]);
  });

  it('reverses a right-to-left line, carrying projected flags and source positions', () => {
    // Segments of the input: 0: (12→8), 1: (8→4, projected), 2: (4→-2).
    const c = clipPolylineToPins([12, 8, 4, -2], [0, 10, 20, 20], 0, 10, [0, 1, 0]);
    expect(c.clipped?.reversed).toBe(true);
    expect(arr(c.clipped?.xs)).toEqual([0, 4, 8, 10]);
    expect(arr(c.clipped?.zs)).toEqual([20, 20, 10, 5]);
    expect(arr(c.clipped?.projected)).toEqual([0, 1, 0]);
    expect(arr(c.clipped?.source)).toEqual([8 / 3, 2, 1, 0.5]);
  });

  it('accepts a line that starts and ends exactly on the pins', () => {
    const c = clipPolylineToPins([0, 5, 10], [1, 2, 3], 0, 10);
    expect([c.leftContacts, c.rightContacts]).toEqual([1, 1]);
    expect(arr(c.clipped?.xs)).toEqual([0, 5, 10]);
  });

  it('reports 0 contacts for a line that does not reach a pin', () => {
    const c = clipPolylineToPins([1, 5, 12], [0, 0, 0], 0, 10);
    expect([c.leftContacts, c.rightContacts]).toEqual([0, 1]);
    expect(c.clipped).toBeNull();
  });

  it('reports 3 contacts for a line that folds back across a pin', () => {
    const c = clipPolylineToPins([-5, 5, -3, 4, 12], [0, 1, 2, 3, 4], 0, 10);
    expect([c.leftContacts, c.rightContacts]).toEqual([3, 1]);
    expect(c.clipped).toBeNull();
  });

  it('counts a touch of the pin from inside as a second contact', () => {
    const c = clipPolylineToPins([-5, 5, 0, 5, 12], [0, 1, 2, 3, 4], 0, 10);
    expect(c.leftContacts).toBe(2);
    expect(c.clipped).toBeNull();
  });

  it('counts a run of vertices along the pin as one contact and starts at its inner end', () => {
    const c = clipPolylineToPins([-5, 0, 0, 5, 12], [0, 1, 2, 3, 4], 0, 10);
    expect(c.leftContacts).toBe(1);
    expect(arr(c.clipped?.xs)).toEqual([0, 5, 10]);
    expect(c.clipped?.zs[0]).toBe(2);
  });

  it('returns no clip for fewer than two vertices', () => {
    expect(clipPolylineToPins([1], [1], 0, 10).clipped).toBeNull();
  });
});

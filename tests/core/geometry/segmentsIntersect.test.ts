import { describe, expect, it } from 'vitest';
import { segmentsIntersect } from '../../../src/core/geometry/segmentsIntersect';

describe('segmentsIntersect(a, b, c, d)', () => {
  it('is true for two crossing diagonals', () => {
    expect(segmentsIntersect(0, 0, 2, 2, 0, 2, 2, 0)).toBe(true);
  });
  it('is false for parallel segments', () => {
    expect(segmentsIntersect(0, 0, 2, 0, 0, 1, 2, 1)).toBe(false);
  });
  it('is true when an endpoint touches the other segment', () => {
    expect(segmentsIntersect(0, 0, 2, 0, 1, 0, 1, 5)).toBe(true);
  });
  it('is true for overlapping collinear segments and false for separate ones', () => {
    expect(segmentsIntersect(0, 0, 2, 0, 1, 0, 3, 0)).toBe(true);
    expect(segmentsIntersect(0, 0, 1, 0, 2, 0, 3, 0)).toBe(false);
  });
  it('is false when the lines cross outside the segments', () => {
    expect(segmentsIntersect(0, 0, 1, 1, 3, 0, 2, 1)).toBe(false);
  });
});

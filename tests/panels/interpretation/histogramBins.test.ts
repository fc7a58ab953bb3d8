// Histogram bins of the Monte Carlo pane: every finite value counted once, 1-2-5 widths (common practice for chart axes).
import { describe, expect, it } from 'vitest';
import { histogramBins } from '../../../src/panels/interpretation/histogramBins';

describe('histogramBins(values, target)', () => {
  it('counts every finite value once in bins of a 1-2-5 width', () => {
    const values = [3512, 3600, 3650, 3701, 3702, 3790, 3999, NaN, Infinity];
    const h = histogramBins(values, 5);
    expect(h.counts.reduce((s, c) => s + c, 0)).toBe(7);
    expect(h.edges).toHaveLength(h.counts.length + 1);
    expect(h.edges[1] - h.edges[0]).toBe(100);
    expect(h.edges[0]).toBeLessThanOrEqual(3512);
    expect(h.edges[h.edges.length - 1]).toBeGreaterThan(3999);
  });

  it('gives no bins for no finite values and one bin for equal values', () => {
    expect(histogramBins([NaN]).counts).toEqual([]);
    expect(histogramBins([5, 5, 5]).counts).toEqual([3]);
  });
});

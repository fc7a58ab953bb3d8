import { describe, expect, it } from 'vitest';
import { areaUnit, formatArea, formatLength, formatNumber, formatPercent } from '../../src/panels/interpretation/formatValue';
import { histogramBins } from '../../src/panels/interpretation/histogramBins';

describe('formatValue', () => {
  it('puts the number first, then the unit, with an ASCII minus and no "-0"', () => {
    expect(formatLength(-2500.4, 'm')).toBe('-2500 m');
    expect(formatLength(-0.2, 'm')).toBe('0 m');
    expect(formatLength(null, 'ft')).toBe('—');
    expect(formatNumber(0.99812, 4)).toBe('0.9981');
    expect(formatPercent(0.1234)).toBe('12.3 %');
  });

  it('shows large metre areas in km² and small ones in m²', () => {
    const u = areaUnit('m', 2.5e6);
    expect(formatArea(2.5e6, u)).toBe('2.500 km²');
    expect(areaUnit('m', 5000).label).toBe('m²');
    expect(areaUnit('ft', 3e7).label).toBe('10⁶ ft²');
  });
});

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

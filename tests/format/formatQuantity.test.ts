// The numbers of the results strip: the minus sign U+2212 throughout, and no "−0".
import { describe, expect, it } from 'vitest';
import { formatArea, formatLength, formatNumber, minusSign } from '../../src/format/formatQuantity';

describe('formatNumber(v, digits)', () => {
  it('writes negative values with the minus sign U+2212', () => {
    expect(formatNumber(-2590.4)).toBe('\u22122590');
    expect(formatLength(-43.48, 'm')).toBe('\u221243.48 m');
    expect(formatArea(-5e5, 'm')).toBe('\u22120.5 km²');
  });

  it('gives "0" for values that round to zero, never "−0"', () => {
    expect(formatNumber(-0)).toBe('0');
    expect(formatNumber(-1e-9)).toBe('0');
    expect(formatNumber(-0.0000004, 4)).toBe('0');
    expect(formatLength(-1e-12, 'ft')).toBe('0 ft');
    expect(formatArea(-1e-13, 'm')).toBe('0 m²');
  });
});

describe('minusSign(text)', () => {
  it('turns "-0", "-0.00" into "0" and a leading hyphen into U+2212', () => {
    expect(minusSign('-0')).toBe('0');
    expect(minusSign('-0.00')).toBe('0');
    expect(minusSign('-0.01')).toBe('\u22120.01');
    expect(minusSign('12')).toBe('12');
  });
});

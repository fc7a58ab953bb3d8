// The one rule for numbers a person reads (screen, figure, report, terminal): the minus sign U+2212
// (Unicode MINUS SIGN) throughout and no "−0"; about four significant figures, never rounding a whole
// number above its units digit; no thousands separators; one area unit per set of values; r² that never
// reads 1 for a fit with scatter; the exact-fit wording instead of a zero-width interval. Data files and
// the clipboard keep plain numbers. The expected texts are worked by hand from those rules.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  areaUnit, EXACT_FIT_TEXT, formatArea, formatAreaNumber, formatFixed, formatInterval, formatLength, formatNumber,
  formatMegapixels, formatPercent, formatR2, largestMagnitude, minusSign, plainNumber,
} from '../../src/format/formatQuantity';

describe('formatNumber(v, digits)', () => {
  it('writes negative values with the minus sign U+2212 and no thousands separators', () => {
    expect(formatNumber(-2590.4)).toBe('\u22122590');
    expect(formatNumber(-12_500)).toBe('\u221212500');
    expect(formatNumber(21_519.4)).toBe('21519');
    expect(formatLength(-43.48, 'm')).toBe('\u221243.48 m');
    expect(formatNumber(0.99812)).toBe('0.9981');
  });

  it('gives "0" for values that round to zero, never "−0", and "—" for missing ones', () => {
    expect(formatNumber(-0)).toBe('0');
    expect(formatNumber(-1e-9)).toBe('0');
    expect(formatNumber(-0.0000004, 4)).toBe('0');
    expect(formatLength(-1e-12, 'ft')).toBe('0 ft');
    expect(formatNumber(null)).toBe('—');
    expect(formatNumber(Number.NaN)).toBe('—');
    expect(formatLength(undefined, 'm')).toBe('—');
  });

  it('writes a magnitude of 10⁹ or more in exponent form', () => {
    expect(formatNumber(3.7e10)).toBe('3.7e10');
    expect(formatNumber(-1.23456e12)).toBe('\u22121.235e12');
  });
});

describe('areas: one unit per set of values', () => {
  it('chooses km² (10⁶ ft² in feet) from 10⁵ units², else units²', () => {
    expect(areaUnit('m', 99_999).label).toBe('m²');
    expect(areaUnit('m', 1e5)).toEqual({ factor: 1e-6, label: 'km²' });
    expect(areaUnit('ft', 3e7).label).toBe('10⁶ ft²');
    expect(largestMagnitude([3, -5e5, null, Number.NaN, 2])).toBe(5e5);
  });

  it('writes 5e4 m² the same whether alone or in a set whose largest is 8e4 m²', () => {
    expect(formatArea(5e4, 'm')).toBe('50000 m²');
    expect(formatArea(5e4, 'm', areaUnit('m', 8e4))).toBe('50000 m²');
    expect(formatArea(-5e5, 'm')).toBe('\u22120.5 km²');
    expect(formatAreaNumber(2.5e6, areaUnit('m', 3e6))).toBe('2.5');
    expect(formatArea(-1e-13, 'm')).toBe('0 m²');
  });
});

describe('fits and intervals', () => {
  it('shows r² with enough digits never to read 1 for a fit with scatter', () => {
    expect(formatR2(0.99812)).toBe('0.9981');
    expect(formatR2(0.999_97)).toBe('0.99997');
    expect(formatR2(1 - 4e-9)).toBe('0.999999996');
    expect(formatR2(1, true)).toBe('1');
    expect(formatR2(null)).toBe('—');
  });

  it('says "exact fit: no interval" for an exact fit, never a zero-width interval', () => {
    expect(EXACT_FIT_TEXT).toBe('exact fit: no interval');
    expect(formatInterval([1250, 1250], 'm', true)).toBe(EXACT_FIT_TEXT);
    expect(formatInterval([-1300, 1250.4], 'm')).toBe('\u22121300 to 1250 m');
  });

  it('writes a share as a percentage', () => {
    expect(formatPercent(0.1234)).toBe('12.3 %');
    expect(formatPercent(-0.0781)).toBe('\u22127.81 %');
    // The zoom readout: two figures, whole numbers kept.
    expect([2_880_000, 300e6, 64_000 * 64_000, 480_000].map(formatMegapixels)).toEqual(['2.9', '300', '4096', '0.48']);
    expect([0.354, 0.0468, 1.644, 12.5].map((s) => formatPercent(s, 2))).toEqual(['35 %', '4.7 %', '164 %', '1250 %']);
  });
});

describe('minusSign(text) and formatFixed(v, decimals)', () => {
  it('turns "-0", "-0.00" into "0" and a hyphen into U+2212', () => {
    expect(minusSign('-0')).toBe('0');
    expect(minusSign('-0.00')).toBe('0');
    expect(minusSign('-0.01')).toBe('\u22120.01');
    expect(minusSign('12')).toBe('12');
    expect(formatFixed(-1250.46, 1)).toBe('\u22121250.5');
    expect(formatFixed(-0.04, 1)).toBe('0.0');
  });
});

describe('plainNumber(v): data files and the clipboard', () => {
  it('keeps an ASCII minus, ten significant digits, and writes float noise as 0', () => {
    expect(plainNumber(-12_500)).toBe('-12500');
    expect(plainNumber(1 / 3)).toBe('0.3333333333');
    expect(plainNumber(-3e-12)).toBe('0');
    expect(plainNumber(null)).toBe('');
  });
});

// Every number a person reads goes through this module. The calls that write a number as text on their own
// (toFixed, toPrecision, toExponential, toLocaleString, Intl.NumberFormat) are allowed elsewhere only where
// the text is not read as a quantity: listed here per file with the count and the reason, so a new one fails.
const ALLOWED: Record<string, { count: number; why: string }> = {
  'src/format/niceTicks.ts': { count: 1, why: 'rounds a tick value (a number, not text) to drop float noise' },
  'src/io/cleanCoordinate.ts': { count: 1, why: 'rounds a coordinate written to a data file' },
  'src/io/exportTables.ts': { count: 1, why: 'numbers of the JSON data file (plain numbers)' },
  'src/io/renderSectionSvg.ts': { count: 13, why: 'SVG coordinates and the scan matrix (attributes, not text read)' },
  'src/io/sectionFigureAxes.ts': { count: 10, why: 'SVG coordinates of grid lines and labels (attributes)' },
  'src/panels/workspace/readNumberInput.ts': { count: 1, why: 'rounds a number put into an input field' },
  'src/tools/calibrate/calibrateTool.ts': { count: 1, why: 'rounds a suggested calibration value (a number the user edits)' },
  'src/core/model/digitisingResolution.ts': { count: 1, why: 'rounds the resolution value so the file and the analysis use one number' },
  'src/panels/FileMenu.tsx': { count: 2, why: 'a time of day in the reader\'s locale, not a quantity' },
  'src/panels/files/StorageBanner.tsx': { count: 1, why: 'a date and time in the reader\'s locale, not a quantity' },
  'src/state/autosave.ts': { count: 1, why: 'a date and time in the reader\'s locale, not a quantity' },
};

describe('no number written as text outside the formatter', () => {
  const root = join(import.meta.dirname, '..', '..');
  const sources = (dir: string): string[] => readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? sources(p) : /\.(ts|tsx)$/.test(name) ? [p] : [];
  });
  const CALLS = /\.(toFixed|toPrecision|toExponential|toLocaleString|toLocaleTimeString|toLocaleDateString)\(|Intl\.NumberFormat/g;

  it('finds only the listed calls, in the listed files', () => {
    const found: Record<string, number> = {};
    for (const f of sources(join(root, 'src'))) {
      const rel = relative(root, f).split(sep).join('/');
      if (rel === 'src/format/formatQuantity.ts' || rel === 'src/core/model/numberText.ts') continue;
      const n = (readFileSync(f, 'utf8').match(CALLS) ?? []).length;
      if (n > 0) found[rel] = n;
    }
    expect(found).toEqual(Object.fromEntries(Object.entries(ALLOWED).map(([f, a]) => [f, a.count])));
  });

  it('the search sees a call where one is written', () => {
    expect('x.toFixed(1); y.toLocaleString(); new Intl.NumberFormat()'.match(CALLS)).toHaveLength(3);
  });
});

// The engine's own messages write their numbers by the one rule the screen uses (src/core/model/numberText.ts,
// re-exported by src/format/formatQuantity.ts): the minus sign U+2212, exponent form for the very large and the
// very small, no "e+" and no "-0". Typesetting a negative number with the minus sign rather than a hyphen is
// common practice (ISO 80000-1 asks for it, recalled from memory).
import { describe, expect, it } from 'vitest';
import * as core from '../../../src/core/model/numberText';
import * as shown from '../../../src/format/formatQuantity';
import { coordinateProblem, extentProblem, fileTooLargeMessage } from '../../../src/core/model/limits';

const MiB = 1024 * 1024;

describe('numbers in the engine’s messages', () => {
  it('the screen’s formatter is the engine’s, not a copy', () => {
    expect(shown.formatNumber).toBe(core.formatNumber);
    expect(shown.minusSign).toBe(core.minusSign);
    expect(shown.formatSmallLength(2e-6, 'm')).toBe(`${core.formatSmallNumber(2e-6)} m`);
  });

  it('a coordinate out of range: exponent form with the minus sign, the range without "e+"', () => {
    expect(coordinateProblem(-1e160)).toBe('a coordinate is outside the range Foldroot computes in (\u22121e160; coordinates must lie within ±1e9 section units)');
    expect(coordinateProblem(1.2345e12)).toContain('(1.23e12;');
  });

  it('a section too small to measure: its span in exponent form, never rounded to 0', () => {
    expect(extentProblem(4e-300)).toBe('the section is too small to measure (it spans 4e\u2212300 units; the smallest is 0.001 units)');
    expect(extentProblem(2.5e-4)).toContain('it spans 2.5e\u22124 units');
  });

  it('a file too large: whole megabytes from 10 MB, one decimal below', () => {
    expect(fileTooLargeMessage(600 * MiB, 500 * MiB)).toBe('file too large (600 MB; the limit is 500 MB)');
    expect(fileTooLargeMessage(1.5 * MiB, 1 * MiB)).toBe('file too large (1.5 MB; the limit is 1 MB)');
  });

  it('small and large numbers by the rule', () => {
    expect(core.formatNumber(-4333.3333, 6)).toBe('\u22124333.33');
    expect(core.formatNumber(-1e-7, 3)).toBe('0');
    expect(core.formatNumber(-0.00001, 3)).toBe('\u22120.00001');
    expect(core.formatSmallNumber(-0.00001, 3)).toBe('\u22121e\u22125');
    expect(core.formatSmallNumber(0.0123, 3)).toBe('0.0123');
  });
});

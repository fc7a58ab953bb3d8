// What a typed number field commits or keeps: every refusal says what was typed and what was kept
// and the shown value carries no float noise or "−0".
import { describe, expect, it } from 'vitest';
import { parseNumber, readNumberInput, roundForField } from '../../../src/panels/workspace/readNumberInput';

describe('parseNumber(text)', () => {
  it('reads a decimal comma, spaces between digit groups and the minus sign U+2212', () => {
    expect(parseNumber('1 234,5')).toBe(1234.5);
    expect(parseNumber('\u221212')).toBe(-12);
    expect(parseNumber('1e3')).toBe(1000);
    expect(parseNumber('abc')).toBeNaN();
    expect(parseNumber('  ')).toBeNaN();
  });
});

describe('readNumberInput(text, current, check?, shown?)', () => {
  it('commits a new finite number', () => {
    expect(readNumberInput('1250', 1200)).toEqual({ kind: 'commit', value: 1250 });
    expect(readNumberInput('7', null)).toEqual({ kind: 'commit', value: 7 });
  });

  it('keeps the shown value of text that is not a number, and says so', () => {
    expect(readNumberInput('abc', 1200)).toEqual({ kind: 'keep', message: '“abc” is not a number — kept 1200' });
    expect(readNumberInput('12a', null)).toEqual({ kind: 'keep', message: '“12a” is not a number — the field is left empty' });
  });

  it('refuses infinite values (1e999, Infinity) and an emptied field with a message', () => {
    expect(readNumberInput('1e999', 5)).toEqual({ kind: 'keep', message: '“1e999” is too large to use — kept 5' });
    expect(readNumberInput('-Infinity', 5).kind).toBe('keep');
    expect(readNumberInput('', 5)).toEqual({ kind: 'keep', message: 'a number is needed — kept 5' });
  });

  it('commits a typed value equal to the shown (rounded) one, and keeps an empty field empty quietly', () => {
    // A clicked pin at 8799.9993 shows as 8800; typing 8800 means exactly 8800.
    expect(readNumberInput('8800', 8800)).toEqual({ kind: 'commit', value: 8800 });
    expect(readNumberInput(' ', null)).toEqual({ kind: 'keep', message: null });
  });

  it('passes the check reason on, formatting the kept value with `shown`', () => {
    const check = (v: number) => (v < 0 ? 'must not be negative' : null);
    expect(readNumberInput('-3', 2.5, check, (v) => v.toFixed(1))).toEqual({ kind: 'keep', message: 'must not be negative — kept 2.5' });
    expect(readNumberInput('3', 2.5, check)).toEqual({ kind: 'commit', value: 3 });
  });
});

describe('roundForField(v, decimals)', () => {
  it('drops float noise of a pixel round trip and keeps map-scale digits', () => {
    expect(roundForField(17000.000000000004)).toBe(17000);
    expect(String(roundForField(512345.6712))).toBe('512345.67');
    expect(roundForField(990.347)).toBe(990.35);
  });

  it('never gives −0', () => {
    expect(Object.is(roundForField(-0.001), 0)).toBe(true);
    expect(Object.is(roundForField(-0), 0)).toBe(true);
    expect(roundForField(Number.NaN)).toBeNaN();
  });
});

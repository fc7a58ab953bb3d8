// One rule for text sent to a spreadsheet (src/format/spreadsheetText.ts), by "Copy table" and by every CSV file,
// and a CSV export that reads back to the very same names. The formula-injection payloads are the classic ones
// (OWASP, CSV injection: common practice): =HYPERLINK(...), +1+1, @SUM(1,1), -2.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseSection } from '../../src/core/analysis/analyseSection';
import { fromSpreadsheetText, spreadsheetText } from '../../src/format/spreadsheetText';
import { parseHorizonsCsv, writeHorizonsCsv } from '../../src/io/csvHorizons';
import { CsvCommentLabel, csvField, parseCsvRows, parseCsvTable, toCsv } from '../../src/io/csvText';
import { resultsTsv } from '../../src/panels/interpretation/resultsTsv';
import { methodExample } from '../core/analysis/sections';

const PAYLOADS = ['=HYPERLINK("http://example.invalid","x")', '+1+1', '@SUM(1,1)', '-2', "'already quoted", "''twice", '\tTabbed', 'Plain name'];

describe('one rule for Copy table and CSV', () => {
  it('Copy table marks a horizon or scenario name that starts like a formula exactly as the CSV field does', () => {
    const s = methodExample();
    s.horizons.forEach((h, i) => (h.name = PAYLOADS[i]));
    const out = analyseSection(s);
    if (!out.ok) throw new Error('analysis failed');
    const rows = resultsTsv(out.analysis, '=HYPERLINK("http://example.invalid","scenario")').split('\n').map((l) => l.split('\t'));
    expect(rows[0][1]).toBe(spreadsheetText('=HYPERLINK("http://example.invalid","scenario")'));
    const header = rows.findIndex((r) => r[0] === 'Horizon');
    for (let i = 0; i < s.horizons.length; i++) {
      const cell = rows[header + 1 + i][0];
      // The clipboard cell is the CSV field's text (before CSV quoting): the same mark, from the same rule.
      expect(cell).toBe(parseCsvRows(csvField(PAYLOADS[i]))[0][0]);
      expect(cell).not.toMatch(/^[=+\-@]/);
    }
    // Numbers are not text: a negative number keeps its minus sign, unmarked.
    expect(rows.slice(header + 1).some((r) => /^-\d/.test(r[3] ?? '') || /^-\d/.test(r[5] ?? '') || r.some((c) => /^-\d/.test(c)))).toBe(true);
  });

  it('CSV export then import gives back every name exactly, formula payloads included', () => {
    const horizons = PAYLOADS.map((name, i) => ({ name, line: [[0, i], [1000, i + 0.5]] as [number, number][] }));
    const back = parseHorizonsCsv(writeHorizonsCsv(horizons, 'm'));
    expect(back.ok).toBe(true);
    if (back.ok) expect(back.horizons.map((h) => h.name).sort()).toEqual([...PAYLOADS].sort());
  });

  it('CSV export then import gives back a name that starts with "#" or has white space at an end, and keeps the file\'s comment lines', () => {
    // A '#' opening a row is the comment mark (common practice for CSV readers): "#2 coal" must not be read as one.
    const names = ['#2 coal', '# units: ft', ' leading', 'trailing ', '\t=tab', '\u00a0=nbsp', '\r=cr'];
    const horizons = names.map((name, i) => ({ name, line: [[0, i], [1000, i + 0.5]] as [number, number][] }));
    const back = parseHorizonsCsv(writeHorizonsCsv(horizons, 'm'));
    expect(back.ok).toBe(true);
    if (back.ok) {
      expect(back.horizons.map((h) => h.name)).toEqual(names);
      expect(back.units).toBe('m');
    }
    // A hand-written file: an unquoted '#' line is still a comment, and unquoted names are still trimmed.
    const hand = parseHorizonsCsv('# units: ft\nhorizon,x,z\n Top ,0,1\nTop,5,2\n');
    expect(hand.ok && hand.units === 'ft' && hand.horizons.map((h) => [h.name, h.line.length])).toEqual([['Top', 2]]);
  });

  it('CSV export then import gives back any name that is not blank (fast-check)', () => {
    const name = fc.string({ minLength: 1, maxLength: 40, unit: fc.constantFrom('#', "'", '=', '+', '-', '@', ' ', '\t', '\r', '\n', ',', '"', 'a', 'Z', '1', '\u00a0', 'é') })
      .filter((n) => n.trim() !== '');
    fc.assert(fc.property(fc.uniqueArray(name, { minLength: 1, maxLength: 5 }), (names) => {
      const back = parseHorizonsCsv(writeHorizonsCsv(names.map((n, i) => ({ name: n, line: [[0, i], [10, i]] as [number, number][] })), 'm'));
      return back.ok && JSON.stringify(back.horizons.map((h) => h.name)) === JSON.stringify(names);
    }), { numRuns: 300 });
  });

  it('fromSpreadsheetText undoes spreadsheetText for any text (fast-check)', () => {
    fc.assert(fc.property(fc.string(), (t) => fromSpreadsheetText(spreadsheetText(t)) === t));
  });

  it('writes a comment label unquoted and a name that starts with # quoted, so only the label reads as a comment', () => {
    // A '#' opening a row is the comment mark (common practice for CSV readers), as in the results CSV's '# caution' row.
    const text = toCsv([[new CsvCommentLabel('# caution'), 'Check against wells'], ['#2 coal', 1]]);
    expect(text.startsWith('# caution,')).toBe(true);
    const table = parseCsvTable(text);
    expect(table.quoted[0] & 1).toBe(0);
    expect(table.rows[1][0]).toBe('#2 coal');
    expect(table.quoted[1] & 1).toBe(1);
    expect(() => new CsvCommentLabel('#a,b')).toThrow();
    expect(() => new CsvCommentLabel('note')).toThrow();
  });
});

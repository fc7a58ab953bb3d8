// The CSV reader (src/io/csvText.ts) slices plain runs from the text and hands rows over one at a time; it must read
// exactly what a character-at-a-time reading of RFC 4180 reads (quoted fields, doubled quotes, CRLF, LF or CR line
// ends), with the same quoting marks, on any text, and give back every table toCsv writes.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { forEachCsvRow, parseCsvTable, toCsv } from '../../src/io/csvText';

/** RFC 4180 read one character at a time (section 2: fields, quotes, doubled quotes; common practice: lone CR or LF ends a row too). */
function referenceRead(text: string, maxRows = Infinity): { rows: string[][]; quoted: number[] } {
  const rows: string[][] = [];
  const quotedRows: number[] = [];
  let row: string[] = [];
  let mask = 0;
  let field = '';
  let inQuotes = false;
  const end = () => { row.push(field); rows.push(row); quotedRows.push(mask); row = []; mask = 0; field = ''; };
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  for (; i < text.length && rows.length < maxRows; i++) {
    const c = text[i];
    if (inQuotes) {
      if (c === '"') {
        if (text[i + 1] === '"') { field += '"'; i++; } else inQuotes = false;
      } else field += c;
    } else if (c === '"' && field === '') {
      inQuotes = true;
      if (row.length < 31) mask |= 1 << row.length;
    } else if (c === ',') { row.push(field); field = ''; }
    else if (c === '\n') end();
    else if (c === '\r') { if (text[i + 1] === '\n') i++; end(); }
    else field += c;
  }
  if (rows.length < maxRows && (field !== '' || row.length > 0)) end();
  return { rows, quoted: quotedRows };
}

const csvish = fc.string({ unit: fc.constantFrom('a', 'b', ' ', ',', '"', '\n', '\r', '#', 'é', '\uFEFF'), maxLength: 80 });

describe('CSV reader', () => {
  it('reads any text as the character-at-a-time reading does, rows and quoting marks', () => {
    fc.assert(fc.property(csvish, (text) => {
      expect(parseCsvTable(text)).toEqual(referenceRead(text));
    }), { numRuns: 3000 });
  });

  it('stops after the given number of rows, and when the visitor says so', () => {
    fc.assert(fc.property(csvish, fc.integer({ min: 1, max: 5 }), (text, max) => {
      expect(parseCsvTable(text, max)).toEqual(referenceRead(text, max));
      const seen: number[] = [];
      forEachCsvRow(text, (_row, _q, index) => { seen.push(index); return index < max - 1; });
      expect(seen).toEqual(referenceRead(text, max).rows.map((_r, k) => k));
    }), { numRuns: 1000 });
  });

  it('gives back every table toCsv writes (text that does not start like a formula)', () => {
    const cell = fc.string({ unit: fc.constantFrom('a', 'Z', ' ', ',', '"', '\n', '\r\n', '#', '1'), maxLength: 12 }).filter((s) => !/^[=+\-@\t\r']/.test(s));
    fc.assert(fc.property(fc.array(fc.array(cell, { minLength: 1, maxLength: 4 }), { minLength: 1, maxLength: 6 }), (table) => {
      // A row of one empty field writes an empty line, which reads as a row of one empty field too.
      expect(parseCsvTable(toCsv(table)).rows).toEqual(table);
    }));
  });
});

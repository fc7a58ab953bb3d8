// CSV reading and writing (RFC 4180: quoted fields, doubled quotes, CRLF or LF line ends).
import { spreadsheetText } from '../format/spreadsheetText';

/**
 * The rows of a CSV text as arrays of fields, and for each row which fields were quoted (bit k set: field k,
 * for the first 31 fields). A quoted field is taken exactly as written: readers trim only unquoted fields, and
 * only an unquoted '#' at the start of a line marks a comment, so a name written by csvField comes back whole.
 */
export interface CsvTable { rows: string[][]; quoted: number[] }

/** Returns the rows of CSV text with which fields were quoted; stops after `maxRows` rows. */
export function parseCsvTable(text: string, maxRows = 5_000_000): CsvTable {
  const rows: string[][] = [];
  const quotedRows: number[] = [];
  let row: string[] = [];
  let mask = 0;
  let field = '';
  let quoted = false;
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const endRow = () => {
    row.push(field);
    rows.push(row);
    quotedRows.push(mask);
    row = [];
    mask = 0;
    field = '';
  };
  for (; i < text.length && rows.length < maxRows; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"') {
        if (text[i + 1] === '"') { field += '"'; i++; } else quoted = false;
      } else field += c;
    } else if (c === '"' && field === '') {
      quoted = true;
      if (row.length < 31) mask |= 1 << row.length;
    } else if (c === ',') { row.push(field); field = ''; }
    else if (c === '\n') endRow();
    else if (c === '\r') { if (text[i + 1] === '\n') i++; endRow(); }
    else field += c;
  }
  if (field !== '' || row.length > 0) endRow();
  return { rows, quoted: quotedRows };
}

/** Returns the rows of CSV text as arrays of fields (parseCsvTable without the quoting). */
export function parseCsvRows(text: string, maxRows = 5_000_000): string[][] {
  return parseCsvTable(text, maxRows).rows;
}

/**
 * A comment label ('# project') that opens a row as written, unquoted, so that a reader which skips '#' lines skips
 * the row; a name or other text that starts with '#' is quoted instead (csvField), so it is never taken for one.
 */
export class CsvCommentLabel {
  constructor(readonly text: string) {
    if (!/^#[^",\r\n]*$/.test(text) || text !== text.trim()) throw new Error(`not a comment label: ${text}`);
  }
}

/**
 * Returns one CSV field; text that starts like a formula is marked by spreadsheetText (src/format/spreadsheetText.ts).
 * Quoted when it holds a comma, quote or line break, starts with '#' (else read as a comment line when it opens a
 * row) or has white space at either end (else trimmed on reading): every text comes back exactly.
 */
export function csvField(value: string | number | boolean | null | CsvCommentLabel): string {
  if (value === null) return '';
  if (value instanceof CsvCommentLabel) return value.text;
  if (typeof value !== 'string') return String(value);
  const safe = spreadsheetText(value);
  return /[",\r\n]|^#/.test(safe) || value !== value.trim() ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** Returns rows as CSV text with CRLF line ends. */
export function toCsv(rows: (string | number | boolean | null | CsvCommentLabel)[][]): string {
  return rows.map((r) => r.map(csvField).join(',')).join('\r\n') + '\r\n';
}

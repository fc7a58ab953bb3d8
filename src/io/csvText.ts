// CSV reading and writing (RFC 4180: quoted fields, doubled quotes, CRLF or LF line ends).
import { spreadsheetText } from '../format/spreadsheetText';

/**
 * The rows of a CSV text as arrays of fields, and for each row which fields were quoted (bit k set: field k,
 * for the first 31 fields). A quoted field is taken exactly as written: readers trim only unquoted fields, and
 * only an unquoted '#' at the start of a line marks a comment, so a name written by csvField comes back whole.
 */
export interface CsvTable { rows: string[][]; quoted: number[] }

const QUOTE = 34, COMMA = 44, LF = 10, CR = 13;

/**
 * Calls `visit` with each row of CSV text in order (its fields, which were quoted as in CsvTable, its index from 0),
 * keeping no row: a reader of a million rows holds only what it takes from them. Stops after `maxRows` rows, or
 * when `visit` returns false. Plain runs of a field are sliced from the text, not built a character at a time.
 */
export function forEachCsvRow(text: string, visit: (row: string[], quoted: number, index: number) => boolean | void, maxRows = 5_000_000): void {
  let row: string[] = [];
  let mask = 0;
  let field = '';
  let quoted = false;
  let count = 0;
  let going = true;
  const n = text.length;
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const endRow = () => {
    row.push(field);
    going = visit(row, mask, count++) !== false && count < maxRows;
    row = [];
    mask = 0;
    field = '';
  };
  while (i < n && going) {
    const c = text.charCodeAt(i);
    if (quoted) {
      // Inside quotes everything up to the next quote is the field's; a doubled quote is one quote.
      const q = text.indexOf('"', i);
      if (q < 0) { field += text.slice(i); i = n; break; }
      field += text.slice(i, q);
      if (text.charCodeAt(q + 1) === QUOTE) { field += '"'; i = q + 2; } else { quoted = false; i = q + 1; }
    } else if (c === QUOTE && field === '') {
      quoted = true;
      if (row.length < 31) mask |= 1 << row.length;
      i++;
    } else if (c === COMMA) { row.push(field); field = ''; i++; }
    else if (c === LF) { endRow(); i++; }
    else if (c === CR) { i += text.charCodeAt(i + 1) === LF ? 2 : 1; endRow(); }
    else {
      // A plain run up to the next separator or line end; the field is no longer empty, so a quote in it is literal.
      let j = i + 1;
      for (; j < n; j++) {
        const d = text.charCodeAt(j);
        if (d === COMMA || d === LF || d === CR) break;
      }
      field += text.slice(i, j);
      i = j;
    }
  }
  if (going && (field !== '' || row.length > 0)) endRow();
}

/** Returns the rows of CSV text with which fields were quoted; stops after `maxRows` rows. */
export function parseCsvTable(text: string, maxRows = 5_000_000): CsvTable {
  const rows: string[][] = [];
  const quoted: number[] = [];
  forEachCsvRow(text, (row, mask) => { rows.push(row); quoted.push(mask); }, maxRows);
  return { rows, quoted };
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

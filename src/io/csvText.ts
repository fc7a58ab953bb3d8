// CSV reading and writing (RFC 4180: quoted fields, doubled quotes, CRLF or LF line ends).
import { spreadsheetText } from '../format/spreadsheetText';

/** Returns the rows of CSV text as arrays of fields; a line starting with '#' is kept as one field (a comment). */
export function parseCsvRows(text: string, maxRows = 5_000_000): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  let i = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const endRow = () => {
    row.push(field);
    rows.push(row);
    row = [];
    field = '';
  };
  for (; i < text.length && rows.length < maxRows; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"') {
        if (text[i + 1] === '"') { field += '"'; i++; } else quoted = false;
      } else field += c;
    } else if (c === '"' && field === '') quoted = true;
    else if (c === ',') { row.push(field); field = ''; }
    else if (c === '\n') endRow();
    else if (c === '\r') { if (text[i + 1] === '\n') i++; endRow(); }
    else field += c;
  }
  if (field !== '' || row.length > 0) endRow();
  return rows;
}

/** Returns one CSV field: quoted when it holds a comma, quote or line break; text that starts like a formula is marked by spreadsheetText (src/format/spreadsheetText.ts). */
export function csvField(value: string | number | boolean | null): string {
  if (value === null) return '';
  if (typeof value !== 'string') return String(value);
  const safe = spreadsheetText(value);
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** Returns rows as CSV text with CRLF line ends. */
export function toCsv(rows: (string | number | boolean | null)[][]): string {
  return rows.map((r) => r.map(csvField).join(',')).join('\r\n') + '\r\n';
}

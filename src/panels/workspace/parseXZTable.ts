// Reads a horizon typed or pasted as a table of x, z (section units): one point per line, separated
// by tabs, commas, semicolons or spaces; a header line and blank lines are skipped.

export type ParsedTable = { ok: true; points: [number, number][]; skipped: number } | { ok: false; message: string };

/** Returns the (x, z) points of the text, or why it is not a table of at least two points. */
export function parseXZTable(text: string): ParsedTable {
  const points: [number, number][] = [];
  let skipped = 0;
  const lines = text.split(/\r?\n/);
  for (const raw of lines) {
    const line = raw.trim();
    if (line === '') continue;
    // With a semicolon or tab separator a comma may be the decimal mark.
    const decimalComma = /[;\t]/.test(line);
    const cells = line.split(decimalComma ? /[;\t]+/ : /[,\s]+/).map((c) => c.trim()).filter((c) => c !== '');
    const nums = cells.map((c) => Number((decimalComma ? c.replace(',', '.') : c).replace(/\u2212/g, '-')));
    if (nums.length >= 2 && Number.isFinite(nums[0]) && Number.isFinite(nums[1])) points.push([nums[0], nums[1]]);
    else skipped++;
  }
  if (points.length < 2) return { ok: false, message: 'Give at least two lines of x and z, e.g. "1200, -350".' };
  return { ok: true, points, skipped };
}

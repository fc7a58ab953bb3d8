// Horizons as CSV: a header, then one row per vertex (horizon name, x, z), vertices in file order.
// Two optional columns: "piece" (1, 2, … along a horizon cut by faults) and "kind" ("horizon" or "fault").
// Units come from the header ("x_m", "x (ft)", "x [m]") or a "# units: m" line; else the caller chooses.
import { fromSpreadsheetText } from '../format/spreadsheetText';
import { SECTION_CAUTION } from '../core/analysis/caution';
import type { ImportedFault, ImportedHorizon } from '../core/model/commands/importHorizons';
import type { LengthUnit, XZ } from '../core/model/section';
import { cleanCoordinate } from './cleanCoordinate';
import { forEachCsvRow, toCsv } from './csvText';
import { countLines, fileTooLargeMessage, lineCountProblem, LIMITS } from '../core/model/limits';
import { MAX_IMPORT_BYTES, pushProblem, readUnit, type HorizonImport, type RowProblem } from './importTypes';

const NAME_COLUMNS = ['horizon', 'name', 'horizon_name', 'horizon name', 'layer'];

function columnUnit(header: string): { base: string; unit: LengthUnit | null } {
  const m = /^\s*([a-z]+)\s*(?:[_\s]|\(|\[)\s*([a-z-]+)\s*[)\]]?\s*$/i.exec(header);
  if (m) return { base: m[1].toLowerCase(), unit: readUnit(m[2]) };
  return { base: header.trim().toLowerCase(), unit: null };
}

function parseNumber(s: string): number | null {
  const t = s.trim();
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) return null;
  const v = Number(t);
  return Number.isFinite(v) ? v : null;
}

/** Returns the horizons in a CSV text (section units), each bad row listed with its line number; never throws. */
export function parseHorizonsCsv(text: string): HorizonImport {
  const problems: RowProblem[] = [];
  if (text.length > MAX_IMPORT_BYTES) return { ok: false, message: `The CSV file cannot be imported: ${fileTooLargeMessage(text.length, MAX_IMPORT_BYTES)}.`, problems };
  // Rows are read one at a time (forEachCsvRow) and not kept: a file of a million rows holds only its vertices.
  let units: LengthUnit | null = null;
  let columns: { nameCol: number; xCol: number; zCol: number; pieceCol: number; kindCol: number } | null = null;
  let refused: HorizonImport | null = null;
  const byName = new Map<string, XZ[]>();
  const faultsByName = new Map<string, XZ[]>();
  const pieceStarts = new Map<string, { piece: string; starts: number[] }>();
  const counter = { n: 0 };
  forEachCsvRow(text, (row, quoted, r) => {
    // Only an unquoted '#' opens a comment: a quoted first field is data (a name that starts with '#').
    const skipped = row.join('').trim() === '' || ((quoted & 1) === 0 && row[0].trim().startsWith('#'));
    if (!columns) {
      if (skipped) {
        // The caution line (written by writeHorizonsCsv) is prose: never read a unit out of it.
        const m = /^\s*#\s*caution\b/i.test(row[0]) ? null : /units?\s*[:=]\s*([a-z-]+)/i.exec(row.join(','));
        if (m) units = readUnit(m[1]) ?? units;
        return;
      }
      const header = row.map(columnUnit);
      const nameCol = header.findIndex((h) => NAME_COLUMNS.includes(h.base));
      const xCol = header.findIndex((h) => h.base === 'x');
      const zCol = header.findIndex((h) => h.base === 'z' || h.base === 'elevation');
      if (nameCol < 0 || xCol < 0 || zCol < 0) {
        refused = { ok: false, message: 'The CSV header must name three columns: horizon (or name), x and z (e.g. "horizon,x_m,z_m").', problems };
        return false;
      }
      const headerUnits = [header[xCol].unit, header[zCol].unit].filter((u): u is LengthUnit => u !== null);
      if (headerUnits.length === 2 && headerUnits[0] !== headerUnits[1]) {
        refused = { ok: false, message: 'The x and z columns are in different units; convert them to one unit.', problems };
        return false;
      }
      units = headerUnits[0] ?? units;
      columns = { nameCol, xCol, zCol, pieceCol: header.findIndex((h) => h.base === 'piece'), kindCol: header.findIndex((h) => h.base === 'kind') };
      return;
    }
    if (skipped) return;
    const { nameCol, xCol, zCol, pieceCol, kindCol } = columns;
    const where = `line ${r + 1}`;
    // Names were written through spreadsheetText: its mark comes off, so a name comes back exactly. A quoted
    // name is taken as written (csvField quotes one with white space at an end); an unquoted one is trimmed.
    const cell = row[nameCol] ?? '';
    const name = nameCol < 31 && (quoted & (1 << nameCol)) !== 0 ? fromSpreadsheetText(cell) : fromSpreadsheetText(cell.trim()).trim();
    if (name.trim() === '') { pushProblem(problems, { where, message: 'no horizon name' }, counter); return; }
    if (name.length > LIMITS.nameLength) { pushProblem(problems, { where, message: `horizon name longer than ${LIMITS.nameLength} characters` }, counter); return; }
    const x = parseNumber(row[xCol] ?? '');
    const z = parseNumber(row[zCol] ?? '');
    if (x === null || z === null) {
      pushProblem(problems, { where, message: `${x === null ? 'x' : 'z'} is not a finite number (${JSON.stringify((row[x === null ? xCol : zCol] ?? '').slice(0, 40))})` }, counter);
      return;
    }
    const kind = kindCol >= 0 ? (row[kindCol] ?? '').trim().toLowerCase() : '';
    if (kind !== '' && kind !== 'horizon' && kind !== 'fault') { pushProblem(problems, { where, message: `kind must be "horizon" or "fault" (got ${JSON.stringify(kind.slice(0, 40))})` }, counter); return; }
    const into = kind === 'fault' ? faultsByName : byName;
    let pts = into.get(name);
    if (!pts) { pts = []; into.set(name, pts); }
    if (kind !== 'fault' && pieceCol >= 0) {
      // A new value in the piece column starts the next piece of the horizon.
      const piece = (row[pieceCol] ?? '').trim();
      const seen = pieceStarts.get(name);
      if (!seen) pieceStarts.set(name, { piece, starts: [0] });
      else if (seen.piece !== piece) { seen.piece = piece; seen.starts.push(pts.length); }
    }
    pts.push([x, z]);
  });
  if (refused) return refused;
  if (!columns) return { ok: false, message: 'The CSV file has no header row (expected columns horizon, x, z).', problems };
  const horizons: ImportedHorizon[] = [];
  for (const [name, pts] of byName) {
    if (pts.length < 2) { pushProblem(problems, { where: `horizon "${name}"`, message: 'has only one vertex; a horizon needs at least two' }, counter); continue; }
    const starts = pieceStarts.get(name)?.starts ?? [0];
    const cuts = [...starts, pts.length];
    const pieces = starts.map((from, k) => pts.slice(from, cuts[k + 1]));
    const short = pieces.findIndex((p) => p.length < 2);
    if (short >= 0) pushProblem(problems, { where: `horizon "${name}"`, message: `piece ${short + 1} has fewer than two vertices; a piece needs at least two` }, counter);
    else horizons.push(pieces.length > 1 ? { name, line: pts, pieces } : { name, line: pts });
  }
  const faults: ImportedFault[] = [];
  for (const [name, pts] of faultsByName) {
    if (pts.length < 2) pushProblem(problems, { where: `fault "${name}"`, message: 'has only one vertex; a fault needs at least two' }, counter);
    else faults.push({ name, line: pts });
  }
  if (horizons.length === 0 && faults.length === 0) return { ok: false, message: 'The CSV file holds no horizon with at least two valid vertices.', problems };
  const tooMany = lineCountProblem({ horizons: horizons.length, ...countLines(horizons.map((h) => h.line.length)) });
  if (tooMany) return { ok: false, message: `The CSV file holds ${tooMany}; thin the vertices or import the file in parts. Nothing was imported.`, problems };
  return { ok: true, horizons, units, problems, ...(faults.length ? { faults } : {}) };
}

/**
 * Returns horizons and faults (section units) as CSV text: a "# caution: …" comment line (DEVELOPERS.md §Project rules:
 * the caution in every export), then a "horizon,x_<unit>,z_<unit>" header, with ",piece,kind" when there are pieces or faults — piece 1, 2, … along a horizon
 * cut by faults, kind "horizon" or "fault" (a fault's rows carry its name in the horizon column and no piece);
 * coordinates rounded to 1e-6 unit (cleanCoordinate).
 */
export function writeHorizonsCsv(horizons: ImportedHorizon[], units: LengthUnit, faults: ImportedFault[] = []): string {
  // The two extra columns only when there is something to say in them: a plain file keeps the three columns.
  const faulted = faults.length > 0 || horizons.some((h) => h.pieces && h.pieces.length > 1);
  const rows: (string | number)[][] = [faulted ? ['horizon', `x_${units}`, `z_${units}`, 'piece', 'kind'] : ['horizon', `x_${units}`, `z_${units}`]];
  for (const h of horizons) {
    (h.pieces ?? [h.line]).forEach((p, k) => {
      for (const [x, z] of p) rows.push(faulted ? [h.name, cleanCoordinate(x), cleanCoordinate(z), k + 1, 'horizon'] : [h.name, cleanCoordinate(x), cleanCoordinate(z)]);
    });
  }
  for (const f of faults) for (const [x, z] of f.line) rows.push([f.name, cleanCoordinate(x), cleanCoordinate(z), '', 'fault']);
  // Written unquoted so the line starts with '#', the comment mark our parser (and most CSV readers) skip.
  return `# caution: ${SECTION_CAUTION.replace(/[\r\n]+/g, ' ')}\r\n${toCsv(rows)}`;
}

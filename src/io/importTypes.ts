// What every horizon importer (CSV, GeoJSON, SVG) returns: horizons in section units, per-row problems.
import type { ImportedFault, ImportedHorizon } from '../core/model/commands/importHorizons';
import type { LengthUnit } from '../core/model/section';
import { LIMITS } from '../core/model/limits';

/** One problem, located by row (CSV line), feature or path, in words the user can act on. */
export interface RowProblem { where: string; message: string }

export type HorizonImport =
  | { ok: true; horizons: ImportedHorizon[]; units: LengthUnit | null; problems: RowProblem[]; /** Said before importing (e.g. coordinates that look like longitude/latitude). */ warning?: string; faults?: ImportedFault[] }
  | { ok: false; message: string; problems: RowProblem[] };

/** Largest text file an importer reads, in bytes. */
export const MAX_IMPORT_BYTES = LIMITS.importBytes;
/** Problems listed in full; beyond this only a count is given. */
export const MAX_LISTED_PROBLEMS = 200;

/** Returns the unit named by a string ('m', 'metres', 'ft', 'feet' …) or null. */
export function readUnit(v: unknown): LengthUnit | null {
  if (typeof v !== 'string') return null;
  const s = v.trim().toLowerCase();
  if (['m', 'metre', 'metres', 'meter', 'meters'].includes(s)) return 'm';
  if (['ft', 'foot', 'feet', 'us-ft', 'ft-us'].includes(s)) return 'ft';
  return null;
}

/** Appends a problem, keeping the list to MAX_LISTED_PROBLEMS entries plus one summary line. */
export function pushProblem(list: RowProblem[], p: RowProblem, counter: { n: number }): void {
  counter.n += 1;
  if (list.length < MAX_LISTED_PROBLEMS) list.push(p);
  else if (list.length === MAX_LISTED_PROBLEMS) list.push({ where: '…', message: 'more problems not listed' });
}

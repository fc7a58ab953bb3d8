// The per-horizon columns, described once: every results table — the interpretation pane, the clipboard's
// "Copy table", the results CSV, the terminal table, the command line's JSON and the report — takes its
// columns, their order, labels, units and cell text from this list. A new quantity is one entry here.
// Screen text (pane, terminal, report) follows the one rule of formatQuantity.ts, with one area unit per
// table; data text (clipboard, CSV) and JSON keep plain numbers in section units (areas in units², shares
// as fractions). Per-cutoff columns list one value per cutoff pair, in order along the horizon, joined by
// "; " (docs/method.md §Faults and horizons in pieces); the JSON groups them under "cutoffs".
import type { Cutoff, HorizonResult, SectionAnalysis } from '../core/analysis/analyseSection';
import type { XZ } from '../core/model/section';
import { areaUnit, formatAreaNumber, formatChamberlin, formatNumber, largestMagnitude, plainNumber, type AreaUnit } from './formatQuantity';
import { STRAIN_SIGN_TEXT } from './chamberlinNote';

/** The six tables built from the column list. */
export type HorizonTableId = 'pane' | 'clipboard' | 'csv' | 'terminal' | 'json' | 'report';

/** What a column's numbers are: the header's unit and the cell's formatting follow from it. */
export type ColumnUnit = 'text' | 'yes-no' | 'count' | 'length' | 'area' | 'share';

interface ColumnBase {
  /** JSON key (inside "cutoffs" for a per-cutoff column); the CSV header is its snake_case form with the unit. */
  key: string;
  /** Header on screen and on the clipboard, without the unit. */
  label: string;
  /** A shorter header for the pane's narrow table (its hover text gives the full one). */
  short?: string;
  unit: ColumnUnit;
  /** Hover text of the pane's and the report's header. */
  title?: string;
  /** A short line under the pane's header, and the long one beside the report's. */
  note?: { short: string; long: string };
  /** Shown in the pane only under "All columns". */
  expanded: boolean;
  tables: readonly HorizonTableId[];
}

/** One value per horizon. */
export interface HorizonValueColumn extends ColumnBase {
  kind: 'horizon';
  value: (h: HorizonResult) => string | number | boolean | null;
  /** Screen text when the unit's rule is not enough (the Chamberlin depth's "not meaningful"). */
  screen?: (h: HorizonResult) => string;
}

/** One value per cutoff pair of the horizon. */
export interface CutoffColumn extends ColumnBase {
  kind: 'cutoff';
  value: (c: Cutoff) => string | number | XZ;
}

export type HorizonColumn = HorizonValueColumn | CutoffColumn;

const ALL: readonly HorizonTableId[] = ['pane', 'clipboard', 'csv', 'terminal', 'json', 'report'];
const NOT_PANE: readonly HorizonTableId[] = ['clipboard', 'csv', 'terminal', 'json', 'report'];

/** Every per-horizon column, in the order every table shows them. The pane's name cell carries the "in fit" box. */
export const HORIZON_COLUMNS: readonly HorizonColumn[] = [
  { kind: 'horizon', key: 'name', label: 'Horizon', unit: 'text', expanded: false, tables: ALL, value: (h) => h.name },
  { kind: 'horizon', key: 'included', label: 'In fit', unit: 'yes-no', expanded: false, tables: NOT_PANE, value: (h) => h.included },
  { kind: 'horizon', key: 'excessArea', label: 'Excess area', unit: 'area', expanded: false, tables: ALL, value: (h) => h.excessArea,
    title: 'Signed area between the horizon and its regional between the pins: positive above the regional' },
  { kind: 'horizon', key: 'regionalElevation', label: 'Regional elevation', short: 'Regional elev.', unit: 'length', expanded: false, tables: ALL, value: (h) => h.regionalElevation },
  { kind: 'horizon', key: 'depth', label: 'Depth', unit: 'length', expanded: false, tables: ALL, value: (h) => h.depth,
    title: 'Depth of the regional below the reference level' },
  { kind: 'horizon', key: 'chamberlinDepth', label: 'Chamberlin depth', unit: 'length', expanded: false, tables: ALL,
    value: (h) => h.chamberlinDepth, screen: formatChamberlin },
  { kind: 'horizon', key: 'lpsStrain', label: 'Layer-parallel strain', short: 'Layer strain', unit: 'share', expanded: false, tables: ALL, value: (h) => h.lpsStrain,
    title: `Layer-parallel strain e = L / (W + D) − 1; ${STRAIN_SIGN_TEXT}`, note: { short: '− = shortened', long: STRAIN_SIGN_TEXT } },
  { kind: 'horizon', key: 'pieces', label: 'Pieces', unit: 'count', expanded: true, tables: ALL, value: (h) => h.pieces,
    title: 'Pieces of the horizon between faults (1 for an unbroken line)' },
  { kind: 'horizon', key: 'bedLength', label: 'Bed length', unit: 'length', expanded: true, tables: ALL, value: (h) => h.bedLength },
  { kind: 'horizon', key: 'regionalLength', label: 'Regional length', unit: 'length', expanded: true, tables: ALL, value: (h) => h.regionalLength },
  { kind: 'horizon', key: 'projectedAreaShare', label: 'Projected share', unit: 'share', expanded: true, tables: ALL, value: (h) => h.projectedAreaShare,
    title: 'Share of the excess area over projected (eroded or interpreted) segments' },
  { kind: 'horizon', key: 'residual', label: 'Off the line', unit: 'area', expanded: true, tables: ALL, value: (h) => h.residual,
    title: 'Excess area minus the area–depth line at the horizon’s depth' },
  { kind: 'cutoff', key: 'fault', label: 'Cutoff faults', unit: 'text', expanded: true, tables: ALL, value: (c) => c.fault,
    title: 'The fault of each cutoff pair, in order along the horizon' },
  { kind: 'cutoff', key: 'from', label: 'Cutoff from', unit: 'length', expanded: true, tables: ['json'], value: (c) => c.from },
  { kind: 'cutoff', key: 'to', label: 'Cutoff to', unit: 'length', expanded: true, tables: ['json'], value: (c) => c.to },
  { kind: 'cutoff', key: 'slip', label: 'Slip', unit: 'length', expanded: true, tables: ALL, value: (c) => c.slip,
    title: 'Distance along the fault between the two cutoffs of each pair' },
  { kind: 'cutoff', key: 'heave', label: 'Heave', unit: 'length', expanded: true, tables: ALL, value: (c) => c.heave,
    title: 'Horizontal distance |Δx| between the cutoffs of each pair' },
  { kind: 'cutoff', key: 'throw', label: 'Throw', unit: 'length', expanded: true, tables: ALL, value: (c) => c.throw,
    title: 'Vertical distance |Δz| between the cutoffs of each pair' },
];

/** Returns the columns a table shows, in order; the pane's expanded ones only when `expanded`. */
export function columnsOf(table: HorizonTableId, expanded = true): HorizonColumn[] {
  return HORIZON_COLUMNS.filter((c) => c.tables.includes(table) && (expanded || !c.expanded || table !== 'pane'));
}

/** Returns the one area unit for a table of the analysis: chosen from the largest excess area or residual. */
export function tableAreaUnit(a: SectionAnalysis): AreaUnit {
  return areaUnit(a.units, largestMagnitude(a.horizons.flatMap((h) => [h.excessArea, h.residual])));
}

function unitText(c: HorizonColumn, units: string, area: AreaUnit | null): string {
  switch (c.unit) {
    case 'length': return units;
    case 'area': return area ? area.label : `${units}²`;
    case 'share': return area ? '%' : 'fraction';
    default: return '';
  }
}

/** Returns the header of a column on screen (`area` given: "Excess area (km²)") or on the clipboard (null: "Excess area (m²)"); `short` for the pane. */
export function columnHeader(c: HorizonColumn, units: string, area: AreaUnit | null, short = false): string {
  const u = unitText(c, units, area);
  const label = short && c.short ? c.short : c.label;
  return u ? `${label} (${u})` : label;
}

/** Returns the CSV header of a column: snake_case key, with "cutoff_" for a per-cutoff one and the unit ("excess_area_m2"). */
export function csvHeader(c: HorizonColumn, units: string): string {
  const stem = `${c.kind === 'cutoff' ? 'cutoff_' : ''}${c.key.replace(/[A-Z]/g, (m) => `_${m.toLowerCase()}`)}`;
  return c.unit === 'length' ? `${stem}_${units}` : c.unit === 'area' ? `${stem}_${units}2` : stem;
}

function screenValue(c: HorizonColumn, v: string | number | boolean | null | XZ, area: AreaUnit): string {
  if (typeof v === 'string') return v;
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  if (Array.isArray(v)) return `${formatNumber(v[0])}, ${formatNumber(v[1])}`;
  if (c.unit === 'area') return formatAreaNumber(v, area);
  if (c.unit === 'share') return formatNumber(v === null ? null : 100 * v);
  return formatNumber(v);
}

function dataValue(v: string | number | boolean | null | XZ): string {
  if (typeof v === 'string') return v;
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  if (Array.isArray(v)) return `${plainNumber(v[0])} ${plainNumber(v[1])}`;
  return plainNumber(v);
}

/** Returns a cell as a person reads it (pane, terminal, report): formatQuantity's rule, areas in `area`; cutoff values joined by "; ", "—" for none. */
export function screenCell(c: HorizonColumn, h: HorizonResult, area: AreaUnit): string {
  if (c.kind === 'horizon') return c.screen ? c.screen(h) : screenValue(c, c.value(h), area);
  return h.cutoffs.length === 0 ? '—' : h.cutoffs.map((k) => screenValue(c, c.value(k), area)).join('; ');
}

/** Returns a cell for the clipboard and the CSV: plain numbers in section units, shares as fractions; cutoff values joined by "; ", '' for none. */
export function dataCell(c: HorizonColumn, h: HorizonResult): string {
  if (c.kind === 'horizon') return dataValue(c.value(h));
  return h.cutoffs.map((k) => dataValue(c.value(k))).join('; ');
}

type JsonScalar = string | number | boolean | null;
/** One horizon of the JSON report: one key per horizon column, and "cutoffs", one object per cutoff pair. */
export type JsonHorizon = { [key: string]: JsonScalar | JsonCutoff[] } & { cutoffs: JsonCutoff[] };
/** One cutoff pair of the JSON report: one key per per-cutoff column. */
export type JsonCutoff = { [key: string]: string | number | XZ | null };

const jsonNumber = (v: number): number | null => (Number.isFinite(v) ? v : null);

/** Returns a horizon as the JSON report writes it: keys and order from the column list; non-finite numbers as null. */
export function jsonHorizon(h: HorizonResult): JsonHorizon {
  const cols = columnsOf('json');
  const out: { [key: string]: JsonScalar | JsonCutoff[] } = {};
  for (const c of cols) if (c.kind === 'horizon') { const v = c.value(h); out[c.key] = typeof v === 'number' ? jsonNumber(v) : v; }
  out.cutoffs = h.cutoffs.map((k) => {
    const o: JsonCutoff = {};
    for (const c of cols) if (c.kind === 'cutoff') { const v = c.value(k); o[c.key] = typeof v === 'number' ? jsonNumber(v) : v; }
    return o;
  });
  return out as JsonHorizon;
}

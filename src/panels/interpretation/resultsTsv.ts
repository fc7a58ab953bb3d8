import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import type { LeftOutHorizon } from '../../core/analysis/analyseDocSection';
import { leftOutText } from '../../format/leftOutText';
import { SECTION_CAUTION } from '../../core/analysis/caution';
import { plainNumber } from '../../format/formatQuantity';
import { spreadsheetText } from '../../format/spreadsheetText';
import { summaryRows } from './summaryRows';
import { columnHeader, columnsOf, dataCell } from '../../format/horizonColumns';

// The results table as tab-separated text for the clipboard (spreadsheets paste it into cells), so its
// numbers are plain, as in the data files (src/format plainNumber): ASCII minus, no unit in the cell.
// Columns from src/format/horizonColumns.ts: areas in the section unit squared, lengths in the section unit,
// shares as fractions; the caution travels with it (DEVELOPERS.md §Project rules).

/** A text cell: one line, marked by the same rule as the CSV files when a spreadsheet would take it for a formula. */
function clean(text: string): string {
  return spreadsheetText(text.replace(/[\t\r\n]+/g, ' '));
}

/** Tab-separated per-horizon table, the horizons left out of the analysis with the reason, summary and caution, lines joined by "\n". */
export function resultsTsv(a: SectionAnalysis, scenarioName: string, leftOut: readonly LeftOutHorizon[] = []): string {
  const u = a.units;
  const pct = (v: number | null) => plainNumber(v === null ? null : 100 * v);
  const lines: string[][] = [
    ['Scenario', clean(scenarioName)],
    [],
    columnsOf('clipboard').map((c) => columnHeader(c, u, null)),
    ...a.horizons.map((h) => columnsOf('clipboard').map((c) => (c.unit === 'text' ? clean(dataCell(c, h)) : dataCell(c, h).replace(/[\t\r\n]+/g, ' ')))),
    ...(leftOut.length ? [[], ...leftOut.map((h) => ['Left out', clean(leftOutText(h))])] : []),
    [],
    ['Summary', 'Value', 'Unit', 'Low 95%', 'High 95%', 'Note'],
    ...summaryRows(a).map((r) => [r.label, r.unit === '%' ? pct(r.value) : plainNumber(r.value), r.unit, plainNumber(r.low), plainNumber(r.high), r.low === null ? r.interval : '']),
    [],
    ['Caution', SECTION_CAUTION],
  ];
  return lines.map((l) => l.join('\t')).join('\n');
}

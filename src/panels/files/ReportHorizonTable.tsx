// The report's per-horizon results table: every column of src/format/horizonColumns.ts the report shows,
// in its order, with the one area unit of the table and each column's sign note beside its header.
import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { columnHeader, columnsOf, screenCell, tableAreaUnit } from '../../format/horizonColumns';

export function ReportHorizonTable({ analysis }: { analysis: SectionAnalysis }) {
  const area = tableAreaUnit(analysis);
  const cols = columnsOf('report');
  return (
    <table className="files-table report-horizons" data-testid="report-table">
      <thead>
        <tr>{cols.map((c) => <th key={c.key} title={c.title}>{columnHeader(c, analysis.units, area)}{c.note && ` (${c.note.long})`}</th>)}</tr>
      </thead>
      <tbody>
        {analysis.horizons.map((h, i) => <tr key={i}>{cols.map((c) => <td key={c.key}>{screenCell(c, h, area)}</td>)}</tr>)}
      </tbody>
    </table>
  );
}

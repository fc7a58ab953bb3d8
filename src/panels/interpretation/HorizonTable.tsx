// Per-horizon results and the summary; each row's box includes or leaves out that horizon; copy as TSV.
import { useState } from 'react';
import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { useSessionStore } from '../../state/sessionStore';
import { useDocStore } from '../../state/docStore';
import { selectAnalysis } from '../../state/selectors';
import { afterLinesChecked } from '../../state/linesChecked';
import { activeScenario } from '../../core/model/docToSection';
import { columnHeader, columnsOf, HORIZON_COLUMNS, screenCell, tableAreaUnit } from '../../format/horizonColumns';
import { resultsTsv } from './resultsTsv';
import { EXACT_FIT_TEXT } from '../../core/analysis/isExactFit';
import { summaryRows } from './summaryRows';
import { chamberlinNote, STRAIN_SIGN_TEXT } from '../../format/chamberlinNote';
import { chamberlinReasonText } from '../../format/chamberlinReasonText';

interface Props {
  analysis: SectionAnalysis;
  horizonIds: string[];
  flagged: Set<string>;
  onToggle: (horizonId: string, included: boolean) => void;
  /** Whether "All columns" starts ticked. */
  initialAll?: boolean;
}

export function HorizonTable({ analysis, horizonIds, flagged, onToggle, initialAll = false }: Props) {
  const [all, setAll] = useState(initialAll);
  const u = analysis.units;
  const note = chamberlinNote(analysis);
  const unit = tableAreaUnit(analysis);
  const copy = async () => {
    const { showMessage } = useSessionStore.getState();
    if (!navigator.clipboard) {
      showMessage('error', 'The clipboard is not available in this browser window.');
      return;
    }
    // The table as the pane shows it once every long line is checked for crossing itself (linesChecked.ts), read again then.
    if (!(await afterLinesChecked('Copying the table'))) return;
    const doc = useDocStore.getState().doc;
    const now = selectAnalysis(doc);
    if (!now.outcome?.ok) {
      showMessage('error', 'No results to copy: the section has input problems.');
      return;
    }
    const text = resultsTsv(now.outcome.analysis, activeScenario(doc).name, now.leftOut);
    navigator.clipboard.writeText(text).then(
      () => showMessage('info', 'Results table copied as tab-separated text (paste into a spreadsheet).'),
      () => showMessage('error', 'Could not copy to the clipboard: the browser refused. Allow clipboard access and try again.'),
    );
  };
  // The hover text of a row: its name, and the expanded columns the table hides until "All columns".
  const rowTitle = (h: SectionAnalysis['horizons'][number]) => [
    `${h.name}${h.included ? '' : ' (left out of the fit)'}`,
    ...HORIZON_COLUMNS.filter((c) => c.expanded && c.tables.includes('pane')).map((c) => `${columnHeader(c, u, unit)}: ${screenCell(c, h, unit)}`),
  ].join('\n');
  const columns = columnsOf('pane', all);
  return (
    <div>
      <div className="table-box" data-testid="horizon-table-box">
        <table className={`results-table horizons${all ? ' all' : ''}`} data-testid="horizon-table">
          <thead>
            <tr>
              {columns.map((c) => c.key === 'name'
                ? <th key={c.key} className="name-col" title="Tick to include the horizon in the area–depth fit">Horizon (in fit)</th>
                : <th key={c.key} title={c.title ?? columnHeader(c, u, unit)}>{columnHeader(c, u, unit, true)}{c.note && <span className="th-note" data-testid={`note-${c.key}`}>{c.note.short}</span>}</th>)}
            </tr>
          </thead>
          <tbody>
            {analysis.horizons.map((h, i) => (
              <tr key={horizonIds[i] ?? i} className={`${h.included ? '' : 'excluded'} ${flagged.has(horizonIds[i]) ? 'flagged' : ''}`} title={rowTitle(h)}>
                {columns.map((c) => c.key === 'name'
                  ? (
                    <td key={c.key} className="name-col">
                      <label>
                        <input type="checkbox" checked={h.included} aria-label={`Include ${h.name} in the fit`} data-testid={`include-${i}`}
                          onChange={(e) => onToggle(horizonIds[i], e.target.checked)} />
                        <span className="name-text">{h.name}</span>
                      </label>
                    </td>)
                  : <td key={c.key} title={c.key === 'chamberlinDepth' && h.chamberlinReason ? chamberlinReasonText(h.chamberlinReason, u) : undefined}>{screenCell(c, h, unit)}</td>)}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {note && <p className={`chamberlin-note${note.large ? ' large' : ''}`} data-testid="chamberlin-note">{note.text} Layer strain: {STRAIN_SIGN_TEXT}.</p>}
      <label className="check table-more"><input type="checkbox" checked={all} onChange={(e) => setAll(e.target.checked)} data-testid="horizon-table-all" />
        All columns (pieces, bed and regional length, projected share, distance off the line, and per cutoff pair its fault, slip, heave and throw); hover a row for them</label>
      <table className="summary-table" data-testid="summary-table">
        <tbody>
          {summaryRows(analysis).map((r) => (
            <tr key={r.key}>
              <th>{r.label}</th>
              <td>{r.text}</td>
              <td className="interval">{!r.interval ? '' : r.interval === EXACT_FIT_TEXT ? r.interval : `95%: ${r.interval}`}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="button-row">
        <button type="button" onClick={() => void copy()} data-testid="copy-table">Copy table (tab-separated)</button>
      </div>
    </div>
  );
}

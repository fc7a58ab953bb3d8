// Per-horizon results and the summary; each row's box includes or leaves out that horizon; copy as TSV.
import { useState } from 'react';
import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { useSessionStore } from '../../state/sessionStore';
import { useDocStore } from '../../state/docStore';
import { selectAnalysis } from '../../state/selectors';
import { afterLinesChecked } from '../../state/linesChecked';
import { activeScenario } from '../../core/model/docToSection';
import { columnHeader, columnsOf, HORIZON_COLUMNS, screenCell, tableAreaUnit, type HorizonColumn } from '../../format/horizonColumns';
import { resultsTsv } from './resultsTsv';
import { EXACT_FIT_TEXT } from '../../core/analysis/isExactFit';
import { summaryRowsOf } from './summaryRows';
import { liveScenarioAnalysis } from './useScenarioAnalysis';
import { LiveText, useLiveShape, type LiveRead } from '../liveText';
import type { ProjectDoc } from '../../core/model/projectDoc';
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

/** The active scenario's analysis of a document, or null. */
const analysisOf = (doc: ProjectDoc, gs: ProjectDoc | null) => liveScenarioAnalysis(doc, gs);

/** A column's header as the pane shows it. */
const headerRead = (c: HorizonColumn): LiveRead => (doc, gs) => {
  const a = analysisOf(doc, gs).analysis;
  return a && columnHeader(c, a.units, tableAreaUnit(a), true);
};

/** A horizon's cell, while row `i` is still that horizon's. */
const cellRead = (c: HorizonColumn, i: number, id: string | undefined): LiveRead => (doc, gs) => {
  const { analysis: a, horizonIds } = analysisOf(doc, gs);
  const h = a?.horizons[i];
  return a && h && horizonIds[i] === id ? screenCell(c, h, tableAreaUnit(a)) : null;
};

const summaryRead = (key: string, part: 'text' | 'interval'): LiveRead => (doc, gs) => {
  const a = analysisOf(doc, gs).analysis;
  const r = a && summaryRowsOf(a).find((k) => k.key === key);
  if (!r) return null;
  return part === 'text' ? r.text : !r.interval ? '' : r.interval === EXACT_FIT_TEXT ? r.interval : `95%: ${r.interval}`;
};

const noteRead: LiveRead = (doc, gs) => {
  const a = analysisOf(doc, gs).analysis;
  const note = a && chamberlinNote(a);
  return note && `${note.text} Layer strain: ${STRAIN_SIGN_TEXT}.`;
};

/** What the live texts cannot change: the rows, each row's horizon and inclusion, the summary's rows and the note's presence. */
function tableShape(doc: ProjectDoc, gs: ProjectDoc | null): string {
  const { analysis: a, horizonIds } = analysisOf(doc, gs);
  if (!a) return 'none';
  const note = chamberlinNote(a);
  return [
    a.horizons.map((h, i) => `${horizonIds[i]} ${h.name} ${h.included}`).join(','),
    summaryRowsOf(a).map((r) => r.key).join(','),
    note ? `note ${note.large}` : 'no note',
  ].join('\n');
}

export function HorizonTable({ analysis, horizonIds, flagged, onToggle, initialAll = false }: Props) {
  const [all, setAll] = useState(initialAll);
  useLiveShape(tableShape);
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
                : <th key={c.key} title={c.title ?? columnHeader(c, u, unit)}><LiveText read={headerRead(c)} />{c.note && <span className="th-note" data-testid={`note-${c.key}`}>{c.note.short}</span>}</th>)}
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
                  : <LiveText as="td" key={c.key} title={c.key === 'chamberlinDepth' && h.chamberlinReason ? chamberlinReasonText(h.chamberlinReason, u) : undefined} read={cellRead(c, i, horizonIds[i])} />)}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {note && <LiveText as="p" className={`chamberlin-note${note.large ? ' large' : ''}`} testId="chamberlin-note" read={noteRead} />}
      <label className="check table-more"><input type="checkbox" checked={all} onChange={(e) => setAll(e.target.checked)} data-testid="horizon-table-all" />
        All columns (pieces, bed and regional length, projected share, distance off the line, and per cutoff pair its fault, slip, heave and throw); hover a row for them</label>
      <table className="summary-table" data-testid="summary-table">
        <tbody>
          {summaryRowsOf(analysis).map((r) => (
            <tr key={r.key}>
              <th>{r.label}</th>
              <LiveText as="td" read={summaryRead(r.key, 'text')} />
              <LiveText as="td" className="interval" read={summaryRead(r.key, 'interval')} />
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

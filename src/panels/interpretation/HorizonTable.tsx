// Per-horizon results and the summary; each row's box includes or leaves out that horizon; copy as TSV.
import { useState } from 'react';
import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { useSessionStore } from '../../state/sessionStore';
import { areaUnit, formatNumber } from './formatValue';
import { resultsTsv } from './resultsTsv';
import { EXACT_FIT_TEXT } from '../../core/analysis/isExactFit';
import { SCREEN_FORMAT, withMinus } from './screenQuantity';
import { summaryRows } from './summaryRows';
import { maxOf } from '../../core/stats/minMax';
import { chamberlinNote, STRAIN_SIGN_TEXT } from '../../format/chamberlinNote';

interface Props {
  analysis: SectionAnalysis;
  horizonIds: string[];
  flagged: Set<string>;
  scenarioName: string;
  onToggle: (horizonId: string, included: boolean) => void;
}

export function HorizonTable({ analysis, horizonIds, flagged, scenarioName, onToggle }: Props) {
  const [all, setAll] = useState(false);
  const u = analysis.units;
  const note = chamberlinNote(analysis);
  const unit = areaUnit(u, maxOf(analysis.horizons.map((h) => Math.abs(h.excessArea)), 0));
  const copy = () => {
    const text = resultsTsv(analysis, scenarioName);
    const { showMessage } = useSessionStore.getState();
    if (!navigator.clipboard) {
      showMessage('error', 'The clipboard is not available in this browser window.');
      return;
    }
    navigator.clipboard.writeText(text).then(
      () => showMessage('info', 'Results table copied as tab-separated text (paste into a spreadsheet).'),
      () => showMessage('error', 'Could not copy to the clipboard: the browser refused. Allow clipboard access and try again.'),
    );
  };
  const rowTitle = (h: SectionAnalysis['horizons'][number]) => [
    `${h.name}${h.included ? '' : ' (left out of the fit)'}`,
    `bed length ${formatNumber(h.bedLength)} ${u}, regional length ${formatNumber(h.regionalLength)} ${u}`,
    `projected share ${formatNumber(100 * h.projectedAreaShare, 1)} %, off the line ${withMinus(formatNumber(h.residual === null ? null : h.residual * unit.factor, unit.decimals))} ${unit.label}`,
  ].join('\n');
  return (
    <div>
      <div className="table-box" data-testid="horizon-table-box">
        <table className={`results-table horizons${all ? ' all' : ''}`} data-testid="horizon-table">
          <thead>
            <tr>
              <th className="name-col" title="Tick to include the horizon in the area–depth fit">Horizon (in fit)</th>
              <th>Excess area ({unit.label})</th>
              <th>Regional elev. ({u})</th>
              <th title={`Depth of the regional below the reference, ${withMinus(formatNumber(analysis.referenceElevation))} ${u}`}>Depth ({u})</th>
              <th>Chamberlin depth ({u})</th>
              <th title={`Layer-parallel strain e = L / (W + D) − 1; ${STRAIN_SIGN_TEXT}`}>Layer strain (%)<span className="th-note" data-testid="strain-sign">− = shortened</span></th>
              {all && <>
                <th>Bed length ({u})</th>
                <th>Regional length ({u})</th>
                <th>Projected share (%)</th>
                <th>Off line ({unit.label})</th>
              </>}
            </tr>
          </thead>
          <tbody>
            {analysis.horizons.map((h, i) => (
              <tr key={horizonIds[i] ?? i} className={`${h.included ? '' : 'excluded'} ${flagged.has(horizonIds[i]) ? 'flagged' : ''}`} title={rowTitle(h)}>
                <td className="name-col">
                  <label>
                    <input type="checkbox" checked={h.included} aria-label={`Include ${h.name} in the fit`} data-testid={`include-${i}`}
                      onChange={(e) => onToggle(horizonIds[i], e.target.checked)} />
                    <span className="name-text">{h.name}</span>
                  </label>
                </td>
                <td>{withMinus(formatNumber(h.excessArea * unit.factor, unit.decimals))}</td>
                <td>{withMinus(formatNumber(h.regionalElevation))}</td>
                <td>{withMinus(formatNumber(h.depth))}</td>
                <td>{withMinus(formatNumber(h.chamberlinDepth))}</td>
                <td>{withMinus(formatNumber(h.lpsStrain === null ? null : 100 * h.lpsStrain, 1))}</td>
                {all && <>
                  <td>{withMinus(formatNumber(h.bedLength))}</td>
                  <td>{withMinus(formatNumber(h.regionalLength))}</td>
                  <td>{withMinus(formatNumber(100 * h.projectedAreaShare, 1))}</td>
                  <td>{withMinus(formatNumber(h.residual === null ? null : h.residual * unit.factor, unit.decimals))}</td>
                </>}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {note && <p className={`chamberlin-note${note.large ? ' large' : ''}`} data-testid="chamberlin-note">{note.text} Layer strain: {STRAIN_SIGN_TEXT}.</p>}
      <label className="check table-more"><input type="checkbox" checked={all} onChange={(e) => setAll(e.target.checked)} data-testid="horizon-table-all" />
        All columns (bed and regional length, projected share, distance off the line); hover a row for them</label>
      <table className="summary-table" data-testid="summary-table">
        <tbody>
          {summaryRows(analysis, SCREEN_FORMAT).map((r) => (
            <tr key={r.key}>
              <th>{r.label}</th>
              <td>{r.text}</td>
              <td className="interval">{!r.interval ? '' : r.interval === EXACT_FIT_TEXT ? r.interval : `95%: ${r.interval}`}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="button-row">
        <button type="button" onClick={copy} data-testid="copy-table">Copy table (tab-separated)</button>
      </div>
    </div>
  );
}

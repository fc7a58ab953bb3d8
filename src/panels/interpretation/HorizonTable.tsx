// Per-horizon results and the summary; each row's box includes or leaves out that horizon; copy as TSV.
import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { useSessionStore } from '../../state/sessionStore';
import { areaUnit, formatNumber } from './formatValue';
import { resultsTsv } from './resultsTsv';
import { summaryRows } from './summaryRows';

interface Props {
  analysis: SectionAnalysis;
  horizonIds: string[];
  flagged: Set<string>;
  scenarioName: string;
  onToggle: (horizonId: string, included: boolean) => void;
}

export function HorizonTable({ analysis, horizonIds, flagged, scenarioName, onToggle }: Props) {
  const u = analysis.units;
  const unit = areaUnit(u, Math.max(0, ...analysis.horizons.map((h) => Math.abs(h.excessArea))));
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
  return (
    <div>
      <div className="table-scroll">
        <table className="results-table" data-testid="horizon-table">
          <thead>
            <tr>
              <th title="Included in the area–depth fit">Fit</th>
              <th className="name-col">Horizon</th>
              <th>Excess area ({unit.label})</th>
              <th>Regional elev. ({u})</th>
              <th>Depth ({u})</th>
              <th>Bed length ({u})</th>
              <th>Regional length ({u})</th>
              <th>Chamberlin depth ({u})</th>
              <th>Layer-parallel strain (%)</th>
              <th>Projected share (%)</th>
              <th>Off line ({unit.label})</th>
            </tr>
          </thead>
          <tbody>
            {analysis.horizons.map((h, i) => (
              <tr key={horizonIds[i] ?? i} className={`${h.included ? '' : 'excluded'} ${flagged.has(horizonIds[i]) ? 'flagged' : ''}`}>
                <td>
                  <input type="checkbox" checked={h.included} aria-label={`Include ${h.name} in the fit`} data-testid={`include-${i}`}
                    onChange={(e) => onToggle(horizonIds[i], e.target.checked)} />
                </td>
                <td className="name-col" title={h.name}>{h.name}</td>
                <td>{formatNumber(h.excessArea * unit.factor, unit.decimals)}</td>
                <td>{formatNumber(h.regionalElevation)}</td>
                <td>{formatNumber(h.depth)}</td>
                <td>{formatNumber(h.bedLength)}</td>
                <td>{formatNumber(h.regionalLength)}</td>
                <td>{formatNumber(h.chamberlinDepth)}</td>
                <td>{formatNumber(h.lpsStrain === null ? null : 100 * h.lpsStrain, 1)}</td>
                <td>{formatNumber(100 * h.projectedAreaShare, 1)}</td>
                <td>{formatNumber(h.residual === null ? null : h.residual * unit.factor, unit.decimals)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <table className="summary-table" data-testid="summary-table">
        <tbody>
          {summaryRows(analysis).map((r) => (
            <tr key={r.key}>
              <th>{r.label}</th>
              <td>{r.text}</td>
              <td className="interval">{r.interval ? `95%: ${r.interval}` : ''}</td>
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

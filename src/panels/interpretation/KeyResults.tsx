// The headline numbers of the fit (number first, then the unit), with their 95% intervals.
import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { EXACT_FIT_TEXT } from '../../core/analysis/isExactFit';
import { formatPercent } from '../../format/formatQuantity';
import { regimeText } from './regimeText';
import { summaryRows } from './summaryRows';

const KEYS: [string, string][] = [
  ['detachment-elevation', 'Detachment elevation'],
  ['detachment-depth', 'Detachment depth'],
  ['displacement', 'Displacement'],
  ['r2', 'r²'],
];

export function KeyResults({ analysis }: { analysis: SectionAnalysis }) {
  const rows = summaryRows(analysis);
  const get = (k: string) => rows.find((r) => r.key === k)!;
  const n = get('n');
  const shortening = get('shortening');
  // Extension E / (W0 − E) = −D / (W0 + D): over the length before extension (E = −D; common practice for bulk strain).
  const extension = analysis.areaDepth?.regime === 'extension' && shortening.value !== null;
  return (
    <div className="key-results">
      {KEYS.map(([key, label]) => {
        const r = get(key);
        return (
          <div className="key-result" key={key}>
            <div className="key-label">{label}</div>
            <div className="key-value" data-testid={`result-${key}`}>{r.text}</div>
            {r.interval && <div className="key-interval" data-testid={`interval-${key}`}>{r.interval === EXACT_FIT_TEXT ? r.interval : `95%: ${r.interval}`}</div>}
          </div>
        );
      })}
      <div className="key-result small">
        <div className="key-label">Horizons in fit</div>
        <div className="key-value" data-testid="result-n">{n.text}</div>
      </div>
      <div className="key-result small">
        <div className="key-label">Regime</div>
        <div className="key-value" data-testid="result-regime">{regimeText(analysis.areaDepth, analysis.units)}</div>
      </div>
      <div className="key-result small">
        <div className="key-label">{extension ? 'Extension' : 'Shortening'}</div>
        <div className="key-value" data-testid="result-shortening">{extension ? formatPercent(-shortening.value!) : shortening.text}</div>
      </div>
    </div>
  );
}

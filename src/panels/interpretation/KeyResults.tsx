// The headline numbers of the fit (number first, then the unit), with their 95% intervals. Each is a live text
// (panels/liveText.tsx): it follows a drag without the pane rendering.
import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { EXACT_FIT_TEXT } from '../../core/analysis/isExactFit';
import type { ProjectDoc } from '../../core/model/projectDoc';
import { formatPercent } from '../../format/formatQuantity';
import { LiveText, type LiveRead } from '../liveText';
import { regimeText } from './regimeText';
import { summaryRowsOf } from './summaryRows';
import { liveScenarioAnalysis } from './useScenarioAnalysis';

const KEYS: [string, string][] = [
  ['detachment-elevation', 'Detachment elevation'],
  ['detachment-depth', 'Detachment depth'],
  ['displacement', 'Displacement'],
  ['r2', 'r²'],
];

/** The active scenario's analysis of a document, or null. */
const analysisOf = (doc: ProjectDoc, gs: ProjectDoc | null): SectionAnalysis | null => liveScenarioAnalysis(doc, gs).analysis;

/** A summary row's text, or its interval as shown ('' for none). */
const rowText = (key: string, part: 'text' | 'interval'): LiveRead => (doc, gs) => {
  const a = analysisOf(doc, gs);
  const r = a && summaryRowsOf(a).find((k) => k.key === key);
  if (!r) return null;
  return part === 'text' ? r.text : !r.interval ? '' : r.interval === EXACT_FIT_TEXT ? r.interval : `95%: ${r.interval}`;
};

/** Extension E / (W0 − E) = −D / (W0 + D): over the length before extension (E = −D; common practice for bulk strain). */
const isExtension = (a: SectionAnalysis) => a.areaDepth?.regime === 'extension' && summaryRowsOf(a).find((r) => r.key === 'shortening')!.value !== null;

const regimeRead: LiveRead = (doc, gs) => {
  const a = analysisOf(doc, gs);
  return a && regimeText(a.areaDepth, a.units);
};
const strainRead: LiveRead = (doc, gs) => {
  const a = analysisOf(doc, gs);
  if (!a) return null;
  const shortening = summaryRowsOf(a).find((r) => r.key === 'shortening')!;
  return isExtension(a) ? formatPercent(-shortening.value!) : shortening.text;
};

const strainLabel: LiveRead = (doc, gs) => {
  const a = analysisOf(doc, gs);
  return a && (isExtension(a) ? 'Extension' : 'Shortening');
};

// Every interval has its element, empty (and not shown, interpretation.css) when there is none: an interval that
// comes or goes during a drag (a section that balanced exactly no longer does) is a live text like the numbers.
export function KeyResults() {
  return (
    <div className="key-results">
      {KEYS.map(([key, label]) => (
        <div className="key-result" key={key}>
          <div className="key-label">{label}</div>
          <LiveText as="div" className="key-value" testId={`result-${key}`} read={rowText(key, 'text')} />
          <LiveText as="div" className="key-interval" testId={`interval-${key}`} read={rowText(key, 'interval')} />
        </div>
      ))}
      <div className="key-result small">
        <div className="key-label">Horizons in fit</div>
        <LiveText as="div" className="key-value" testId="result-n" read={rowText('n', 'text')} />
      </div>
      <div className="key-result small">
        <div className="key-label">Regime</div>
        <LiveText as="div" className="key-value" testId="result-regime" read={regimeRead} />
      </div>
      <div className="key-result small">
        <LiveText as="div" className="key-label" read={strainLabel} />
        <LiveText as="div" className="key-value" testId="result-shortening" read={strainRead} />
      </div>
    </div>
  );
}

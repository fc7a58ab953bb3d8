// The printable report (print to PDF from the browser): method in brief, results table, graph,
// uncertainty (last Monte Carlo run, amplification), the section figure, scenarios compared on one
// reference, assumptions, cautions and references.
import { useEffect, useMemo, useState } from 'react';
import { createPortal } from 'react-dom';
import { SECTION_CAUTION } from '../../core/analysis/caution';
import { currentFigureSvgBlob } from '../../state/currentFigureSvg';
import { formatInterval, formatNumber, formatR2 } from '../../format/formatQuantity';
import { chamberlinNote, STRAIN_SIGN_TEXT } from '../../format/chamberlinNote';
import { renderAreaDepthSvg } from '../../io/renderAreaDepthSvg';
import { useDocStore } from '../../state/docStore';
import { EXACT_FIT_TEXT, isExactFit } from '../../core/analysis/isExactFit';
import { selectAnalysis } from '../../state/selectors';
import { activeScenario } from '../../core/model/docToSection';
import { scenarioColour } from '../../core/model/horizonPalette';
import { useUncertaintyStore } from '../../state/uncertaintyStore';
import { uncertaintyReport } from '../../io/uncertaintyReport';
import { reportScenarioRows } from './reportScenarioRows';
import { ReportHorizonTable } from './ReportHorizonTable';
import { regimeText } from '../interpretation/regimeText';
import { tableAreaUnit } from '../../format/horizonColumns';
import { leftOutText } from '../../format/leftOutText';
import { analysisNotes } from '../../format/analysisNotes';
import { useCrossingChecks } from '../../state/crossingChecks';
import { afterLinesChecked } from '../../state/linesChecked';

function useSvgUrl(svg: string | Blob | null): string | null {
  const url = useMemo(() => (svg ? URL.createObjectURL(typeof svg === 'string' ? new Blob([svg], { type: 'image/svg+xml' }) : svg) : null), [svg]);
  useEffect(() => () => { if (url) URL.revokeObjectURL(url); }, [url]);
  return url;
}

const REFERENCES = [
  'Chamberlin, R. T. (1910). The Appalachian folds of central Pennsylvania. Journal of Geology 18, 228–251.',
  'Epard, J.-L. & Groshong, R. H. (1993). Excess area and depth to detachment. AAPG Bulletin 77(8), 1291–1302.',
  'Groshong, R. H. (2006). 3-D Structural Geology, 2nd edition. Springer, chapter 11.',
  'Groshong, R. H., Withjack, M. O., Schlische, R. W. & Hidayah, T. N. (2012). Bed length does not remain constant during deformation. Journal of Structural Geology 41, 86–97.',
  'Fieller, E. C. (1954). Some problems in interval estimation. Journal of the Royal Statistical Society B 16, 175–185.',
];

export function ReportPage({ onClose, onEditInfo }: { onClose: () => void; onEditInfo: () => void }) {
  const doc = useDocStore((s) => s.doc);
  // A self-crossing verdict changes the analysis of the same document: read it again when one comes back.
  const answered = useCrossingChecks((s) => s.answered);
  const analysis = selectAnalysis(doc);
  const result = analysis.outcome && analysis.outcome.ok ? analysis.outcome.analysis : null;
  const notes = result ? analysisNotes(result) : [];
  const [figure, setFigure] = useState<Blob | null>(null);
  useEffect(() => {
    let live = true;
    // The figure as a file (the scan embedded piece by piece): a scan of any size, never one long string.
    void currentFigureSvgBlob().then((svg) => live && setFigure(svg));
    return () => { live = false; };
  }, [doc, answered]);
  const figureUrl = useSvgUrl(figure);
  const scenario = activeScenario(doc);
  // The graph in the scenario's colour, as the pane and the figure draw it.
  const colour = scenarioColour(doc.scenarios.indexOf(scenario));
  const graphUrl = useSvgUrl(useMemo(() => renderAreaDepthSvg(result, colour), [result, colour]));
  const u = doc.units;
  const ad = result?.areaDepth ?? null;
  const runs = useUncertaintyStore((st) => st.byScenario);
  const uncertainty = uncertaintyReport(runs[scenario.id] ?? null, analysis.docSection.ok ? analysis.docSection.section : null, result);
  const compared = reportScenarioRows(doc, runs);
  const refText = result
    ? `${formatNumber(result.referenceElevation)} ${u} (${scenario.referenceElevation !== undefined ? 'set for this scenario' : 'the highest regional, by default'})`
    : '—';
  const range = (p: [number, number] | null, exact: boolean) => (exact ? EXACT_FIT_TEXT : p ? formatInterval(p, u) : '—');
  const area = result ? tableAreaUnit(result) : null;
  return createPortal(
    <div className="report-page" data-testid="report-page" role="dialog" aria-label="Report">
      <div className="report-tools no-print">
        <button type="button" className="primary" onClick={() => void afterLinesChecked('Printing the report', 'all').then((ok) => ok && window.print())} data-testid="report-print">Print or save as PDF</button>
        <button type="button" onClick={onEditInfo} data-testid="report-edit-info">Title and author…</button>
        <button type="button" onClick={onClose} data-testid="report-close">Close report</button>
      </div>
      <article className="report-sheet">
        <header>
          <h1 data-testid="report-title">{doc.title}</h1>
          <p data-testid="report-byline">Author: {doc.author || '—'} · Date: {new Date().toISOString().slice(0, 10)} · Scenario shown: {scenario.name}</p>
        </header>
        <p className="report-caution" data-testid="report-caution"><b>Caution.</b> {SECTION_CAUTION}</p>
        <h2>What was done</h2>
        <p>
          The horizons were traced on the section and converted to true-scale section coordinates through the calibration. Two pins bound the part of the
          section where the beds are back at their regional (their position before folding). For every horizon, the excess area is the signed area between
          the horizon and its regional between the pins: positive above the regional, negative below. Plotting each excess area against the depth of its
          regional gives the area–depth graph; above a single detachment the points fall on a straight line whose slope is the displacement and whose
          crossing of zero area is the depth of the detachment (Epard &amp; Groshong 1993). The 95% interval on that depth follows Fieller’s theorem. The
          Chamberlin depth of each horizon divides its excess area by its bed-length shortening (Chamberlin 1910), and the layer-parallel strain compares
          the bed length with the original length implied by the displacement (Groshong 2006).
        </p>
        <h2>Results ({u}{area ? `, ${area.label}` : ''})</h2>
        {result ? (
          <ReportHorizonTable analysis={result} />
        ) : (
          <p data-testid="report-no-results">No results yet: {analysis.docSection.ok ? 'the section has input problems or fewer than two horizons with regionals.' : analysis.docSection.message}</p>
        )}
        {analysis.leftOut.length > 0 && (
          <ul className="report-notes" data-testid="report-left-out">
            {analysis.leftOut.map((h) => <li key={h.id}>Left out of the analysis: {leftOutText(h)}</li>)}
          </ul>
        )}
        {result && chamberlinNote(result) && <p data-testid="report-chamberlin-note">{chamberlinNote(result)!.text} Layer-parallel strain: {STRAIN_SIGN_TEXT}.</p>}
        {result && <p data-testid="report-reference">Depths are measured below the reference level at elevation {refText}.</p>}
        {ad && (
          <p data-testid="report-summary">
            {ad.noDetachment
              ? 'The area–depth line does not reach zero area below the deepest horizon: there is no detachment below these horizons.'
              : `Detachment at elevation ${formatNumber(ad.detachmentElevation)} ${u}, ${formatNumber(ad.detachmentDepth)} ${u} below the reference level (elevation ${formatNumber(result!.referenceElevation)} ${u}); 95% interval on the depth ${isExactFit(ad) ? EXACT_FIT_TEXT : ad.detachmentDepthCI95 ? formatInterval(ad.detachmentDepthCI95, u) : ad.detachmentDepthInterval.kind === 'unbounded' ? 'unbounded (Fieller)' : 'not available'}. Displacement ${formatNumber(ad.displacement)} ${u}, ${regimeText(ad, u)}; r² = ${formatR2(ad.r2, isExactFit(ad))} over ${ad.n} horizons.`}
          </p>
        )}
        {doc.faults.length > 0 && (
          <p data-testid="report-faults">
            Faults ({doc.faults.length}): {doc.faults.map((f) => {
              const cut = doc.horizons.filter((h) => h.joins.some((j) => j.faultId === f.id)).length;
              return `${f.name} (cuts ${cut} horizon${cut === 1 ? '' : 's'}, ${f.pointsPx.length} vertices)`;
            }).join('; ')}. A horizon cut by a fault is measured along its pieces joined along the fault between its cutoffs;
            its bed length counts the pieces only, and the table gives each cutoff pair’s fault, slip (along the fault), heave and throw.
          </p>
        )}
        {notes.length > 0 && <ul className="report-notes">{notes.map((n, i) => <li key={i}>{n}</li>)}</ul>}
        <div className="report-figures">
          {graphUrl && <img src={graphUrl} alt="Area–depth graph" className="report-graph" />}
        </div>
        <h2>Uncertainty</h2>
        <div data-testid="report-uncertainty">
          <p>A single best-fit depth hides how much it depends on the interpretation: report the spread, not one number.</p>
          {uncertainty.amplificationText && <p data-testid="report-amplification">{uncertainty.amplificationText}</p>}
          <ul data-testid="report-monte-carlo" className={uncertainty.status === 'stale' ? 'report-stale' : undefined}>
            {uncertainty.lines.map((l, i) => <li key={i}>{l}</li>)}
          </ul>
        </div>
        <h2>The section</h2>
        {figureUrl ? <img src={figureUrl} alt="Annotated section" className="report-figure" data-testid="report-figure" /> : <p>Drawing the section…</p>}
        <h2>Scenarios compared</h2>
        <p data-testid="report-scenarios-note">
          {compared.common === null
            ? 'No scenario has results yet.'
            : `Compared on the detachment elevation, and on depths all below one common reference at elevation ${formatNumber(compared.common)} ${u} (the shown scenario's), not each scenario's own.`}
        </p>
        <table className="files-table report-scenarios" data-testid="report-scenarios">
          <thead><tr><th>Scenario</th><th>Horizons in fit</th><th>Displacement ({u})</th><th>Detachment elevation ({u})</th><th>95% interval, elevation</th><th>Depth below common reference ({u})</th><th>95% interval, depth</th><th>Its own reference ({u})</th><th>Monte Carlo elevation P10 to P90</th></tr></thead>
          <tbody>
            {compared.rows.map((r) => (
              <tr key={r.id}>
                <td>{r.name}{r.shown ? ' (shown)' : ''}</td>
                <td>{r.n ?? '—'}</td>
                <td>{formatNumber(r.displacement)}</td>
                <td>{r.noDetachment ? 'none' : formatNumber(r.elevation)}</td>
                <td>{range(r.elevationCI, r.exactFit)}</td>
                <td>{r.noDetachment ? 'none' : formatNumber(r.depthBelowCommon)}</td>
                <td>{range(r.depthCI, r.exactFit)}</td>
                <td>{formatNumber(r.ownReference)}</td>
                <td>{r.monteCarlo ? `${formatNumber(r.monteCarlo.p10)} to ${formatNumber(r.monteCarlo.p90)}${r.monteCarlo.stale ? ' (out of date)' : ''}` : 'no run'}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <h2>Assumptions</h2>
        <ul>
          <li>The section is parallel to the transport direction and deformation is plane strain: no material enters or leaves the plane.</li>
          <li>Area is conserved during folding; compaction and volume loss are ignored.</li>
          <li>The regionals are where the horizons were before folding; they are interpretations and the largest source of uncertainty (an error δ in the regionals moves the detachment by about δ·(1 + W₀/D)).</li>
          <li>The pins lie where the beds are back at their regional; each horizon crosses each pin once.</li>
          <li>The Chamberlin depth assumes bed length is conserved; layer-parallel strain makes it too deep.</li>
          <li>Projected (eroded or interpreted) segments count in areas and lengths and are flagged.</li>
        </ul>
        <h2>Cautions</h2>
        <p>{SECTION_CAUTION}</p>
        <h2>References</h2>
        <ol className="report-references">{REFERENCES.map((r) => <li key={r}>{r}</li>)}</ol>
      </article>
    </div>,
    document.body,
  );
}

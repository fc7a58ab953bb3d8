// Named scenarios (each its own regionals, pins and included horizons): switch, create, duplicate,
// rename, delete; a comparison table and every scenario's fit on one graph.
import { useMemo, useState } from 'react';
import { useDocStore } from '../../state/docStore';
import { selectLiveAnalysis } from '../../state/selectors';
import { useCrossingChecks } from '../../state/crossingChecks';
import { scenarioCreate } from '../../core/model/commands/scenarioCreate';
import { scenarioDelete } from '../../core/model/commands/scenarioDelete';
import { scenarioDuplicate } from '../../core/model/commands/scenarioDuplicate';
import { scenarioRename } from '../../core/model/commands/scenarioRename';
import { nameLengthProblem } from '../../core/model/limits';
import { useSessionStore } from '../../state/sessionStore';
import { scenarioSwitch } from '../../core/model/commands/scenarioSwitch';
import { AreaDepthGraph, type GraphSeriesSpec } from './AreaDepthGraph';
import { EXACT_FIT_TEXT, isExactFit } from '../../core/analysis/isExactFit';
import { areaDepthSeries } from './areaDepthSeries';
import { formatLength, formatNumber, formatR2 } from '../../format/formatQuantity';
import { scenarioAnalysisOf } from './useScenarioAnalysis';
import { scenarioColour } from './scenarioColour';

export function ScenarioPanel() {
  const doc = useDocStore((s) => s.doc);
  const gestureStart = useDocStore((s) => s.gestureStart);
  const apply = useDocStore((s) => s.apply);
  const [renaming, setRenaming] = useState<{ id: string; name: string } | null>(null);
  // A self-crossing verdict changes the analysis of the same document (crossingChecks.ts): read it again then.
  const answered = useCrossingChecks((s) => s.answered);
  const rows = useMemo(
    () => doc.scenarios.map((s, i) => ({ scenario: s, colour: scenarioColour(i), ...scenarioAnalysisOf(selectLiveAnalysis(doc, gestureStart, s.id)) })),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- `answered` stands for the verdicts selectLiveAnalysis reads
    [doc, gestureStart, answered],
  );
  // One reference for every scenario: the base case's (the first scenario that can be
  // analysed), normally its highest regional. Depths below each scenario's own reference differ by the
  // difference of the references and invite a wrong comparison; elevations compare as they are.
  const base = rows.find((r) => r.analysis);
  const commonRef = base?.analysis?.referenceElevation ?? null;
  const refText = base && commonRef !== null
    ? `${formatLength(commonRef, doc.units)}, ${base.scenario.referenceElevation !== undefined ? 'the reference set in' : 'the highest regional of'} ${base.scenario.name}`
    : '';
  const overlay: GraphSeriesSpec[] = rows.filter((r) => r.analysis).map((r) => ({
    key: r.scenario.id, label: r.scenario.name, colour: r.colour, series: areaDepthSeries(r.analysis!, r.horizonIds, commonRef ?? undefined),
  }));
  const active = doc.activeScenarioId;
  const finishRename = () => {
    const tooLong = renaming && nameLengthProblem(renaming.name.trim(), 'scenario name');
    if (tooLong) useSessionStore.getState().showMessage('error', `The name was not changed: ${tooLong}.`);
    else if (renaming) apply((d) => scenarioRename(d, renaming.id, renaming.name));
    setRenaming(null);
  };
  return (
    <div className="scenarios">
      <ul className="scenario-list" data-testid="scenario-list">
        {rows.map(({ scenario: s, colour }) => (
          <li key={s.id} className={s.id === active ? 'active' : ''}>
            <span className="swatch" style={{ background: colour }} />
            {renaming?.id === s.id ? (
              <input
                autoFocus
                value={renaming.name}
                aria-label="Scenario name"
                data-testid="scenario-name-input"
                onChange={(e) => setRenaming({ id: s.id, name: e.target.value })}
                onBlur={finishRename}
                onKeyDown={(e) => {
                  if (e.key === 'Enter') finishRename();
                  if (e.key === 'Escape') setRenaming(null);
                }}
              />
            ) : (
              <button type="button" className="scenario-name" data-testid={`scenario-${s.id}`} aria-pressed={s.id === active}
                onClick={() => apply((d) => scenarioSwitch(d, s.id))} onDoubleClick={() => setRenaming({ id: s.id, name: s.name })}>
                {s.name}
              </button>
            )}
          </li>
        ))}
      </ul>
      <div className="button-row">
        <button type="button" data-testid="scenario-new" onClick={() => apply((d) => scenarioCreate(d, 'New scenario'))} title="A new scenario with no pins or regionals">New</button>
        <button type="button" data-testid="scenario-duplicate" onClick={() => apply((d) => scenarioDuplicate(d, d.activeScenarioId))} title="Copy the active scenario's pins, regionals and included horizons">Duplicate</button>
        <button type="button" data-testid="scenario-rename" onClick={() => setRenaming({ id: active, name: doc.scenarios.find((s) => s.id === active)?.name ?? '' })}>Rename</button>
        <button type="button" data-testid="scenario-delete" disabled={doc.scenarios.length <= 1} onClick={() => apply((d) => scenarioDelete(d, d.activeScenarioId))} title="Delete the active scenario (undo brings it back)">Delete</button>
      </div>
      {commonRef !== null && <p className="hint" data-testid="scenario-reference">Compared on detachment elevation; depths below {refText}.</p>}
      <div className="table-box">
        <table className="results-table compare" data-testid="scenario-compare">
          <thead>
            <tr>
              <th className="name-col">Scenario</th>
              <th title="95% interval below each value">Detachment elevation ({doc.units})</th>
              <th title={commonRef !== null ? `Below ${refText}` : undefined}>Depth below {commonRef !== null ? formatLength(commonRef, doc.units) : 'ref.'}</th>
              <th>Displace&shy;ment ({doc.units})</th>
              <th title="Horizons in the fit">n</th>
            </tr>
          </thead>
          <tbody>
            {rows.map(({ scenario: s, analysis, docSection }) => {
              const ad = analysis?.areaDepth;
              const ok = ad && !ad.noDetachment && ad.detachmentElevation !== null;
              const f = ad?.detachmentDepthInterval;
              const zref = analysis?.referenceElevation ?? 0;
              const interval = !ok || !f ? '—' : isExactFit(ad) ? 'exact fit' : f.kind === 'bounded'
                ? `${formatNumber(zref - f.hi)} to ${formatNumber(zref - f.lo)}` : f.kind === 'unbounded' ? 'unbounded' : 'none';
              const title = ad ? `${s.name}: n = ${ad.n}, r² = ${formatR2(ad.r2, isExactFit(ad))}${isExactFit(ad) ? ` (${EXACT_FIT_TEXT})` : ''}; own reference ${formatLength(zref, doc.units)}` : s.name;
              return (
                <tr key={s.id} className={s.id === active ? 'active' : ''} title={title}>
                  <td className="name-col">{s.name}</td>
                  {!analysis ? (
                    <td colSpan={4} className="hint message" data-testid={`scenario-message-${s.id}`}>{docSection.ok ? 'not analysed: see the messages above' : docSection.message}</td>
                  ) : (
                    <>
                      <td>
                        <div className="primary" data-testid={`compare-elevation-${s.id}`}>{ok ? formatNumber(ad.detachmentElevation) : ad ? 'none' : '—'}</div>
                        {ok && <div className="interval">{interval === 'exact fit' || interval === 'unbounded' || interval === 'none' ? interval : `95%: ${interval}`}</div>}
                      </td>
                      <td>{ok && commonRef !== null ? formatNumber(commonRef - ad.detachmentElevation!) : '—'}</td>
                      <td>{ok ? formatNumber(ad.displacement) : '—'}</td>
                      <td>{ad?.n ?? 0}</td>
                    </>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {overlay.length > 0 && (
        <>
          <p className="hint">All scenarios' fits on one graph, depths below {refText}.</p>
          <AreaDepthGraph series={overlay} units={doc.units} dataOnly={false} testId="scenario-overlay" height={240}
            depthLabel={`Depth below ${formatLength(commonRef, doc.units)} (${doc.units})`} />
        </>
      )}
    </div>
  );
}

// Named scenarios (each its own regionals, pins and included horizons): switch, create, duplicate,
// rename, delete; a comparison table and every scenario's fit on one graph.
import { useMemo, useState } from 'react';
import { useDocStore } from '../../state/docStore';
import { selectLiveAnalysis } from '../../state/selectors';
import { scenarioCreate } from '../../core/model/commands/scenarioCreate';
import { scenarioDelete } from '../../core/model/commands/scenarioDelete';
import { scenarioDuplicate } from '../../core/model/commands/scenarioDuplicate';
import { scenarioRename } from '../../core/model/commands/scenarioRename';
import { scenarioSwitch } from '../../core/model/commands/scenarioSwitch';
import { AreaDepthGraph, type GraphSeriesSpec } from './AreaDepthGraph';
import { formatLength, formatNumber } from './formatValue';
import { scenarioAnalysisOf } from './useScenarioAnalysis';
import { scenarioColour } from './scenarioColour';

export function ScenarioPanel() {
  const doc = useDocStore((s) => s.doc);
  const gestureStart = useDocStore((s) => s.gestureStart);
  const apply = useDocStore((s) => s.apply);
  const [renaming, setRenaming] = useState<{ id: string; name: string } | null>(null);
  const rows = useMemo(
    () => doc.scenarios.map((s, i) => ({ scenario: s, colour: scenarioColour(i), ...scenarioAnalysisOf(selectLiveAnalysis(doc, gestureStart, s.id)) })),
    [doc, gestureStart],
  );
  const overlay: GraphSeriesSpec[] = rows.filter((r) => r.series).map((r) => ({ key: r.scenario.id, label: r.scenario.name, colour: r.colour, series: r.series! }));
  const active = doc.activeScenarioId;
  const finishRename = () => {
    if (renaming) apply((d) => scenarioRename(d, renaming.id, renaming.name));
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
      <div className="table-scroll">
        <table className="results-table compare" data-testid="scenario-compare">
          <thead>
            <tr>
              <th className="name-col">Scenario</th>
              <th>n</th>
              <th>Displacement ({doc.units})</th>
              <th>Detachment depth ({doc.units})</th>
              <th>Detachment elevation ({doc.units})</th>
              <th>95% depth interval ({doc.units})</th>
              <th>r²</th>
            </tr>
          </thead>
          <tbody>
            {rows.map(({ scenario: s, analysis, docSection }) => {
              const ad = analysis?.areaDepth;
              const ok = ad && !ad.noDetachment;
              const f = ad?.detachmentDepthInterval;
              return (
                <tr key={s.id} className={s.id === active ? 'active' : ''}>
                  <td className="name-col">{s.name}</td>
                  {!analysis ? (
                    <td colSpan={6} className="hint">{docSection.ok ? 'not analysed: see the messages above' : docSection.message}</td>
                  ) : (
                    <>
                      <td>{ad?.n ?? 0}</td>
                      <td>{ok ? formatNumber(ad.displacement) : '—'}</td>
                      <td>{ok ? formatNumber(ad.detachmentDepth) : ad ? 'none' : '—'}</td>
                      <td>{ok ? formatNumber(ad.detachmentElevation) : '—'}</td>
                      <td>{!ok || !f ? '—' : f.kind === 'bounded' ? `${formatNumber(f.lo)} to ${formatNumber(f.hi)}` : f.kind === 'unbounded' ? 'unbounded' : 'none'}</td>
                      <td>{formatNumber(ad?.r2, 4)}</td>
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
          <p className="hint">All scenarios' fits on one graph (depths below each scenario's reference, {formatLength(rows[0].analysis?.referenceElevation ?? null, doc.units)} for the first).</p>
          <AreaDepthGraph series={overlay} units={doc.units} dataOnly={false} testId="scenario-overlay" height={240} />
        </>
      )}
    </div>
  );
}

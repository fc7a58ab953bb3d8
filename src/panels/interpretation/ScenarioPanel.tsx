// Named scenarios (each its own regionals, pins and included horizons): switch, create, duplicate,
// rename, delete; a comparison table and every scenario's fit on one graph. During a drag the table's numbers
// are live texts (panels/liveText.tsx) and the graph is drawn again at the release.
import { useState } from 'react';
import { useDocStore } from '../../state/docStore';
import { useShownDoc } from '../../state/shownDoc';
import type { ProjectDoc, Scenario } from '../../core/model/projectDoc';
import { LiveText, useLiveShape, type LiveRead } from '../liveText';
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
import { liveScenarioAnalysis, type ScenarioAnalysis } from './useScenarioAnalysis';
import { scenarioColour } from '../../core/model/horizonPalette';

/** Every scenario's analysis and the one reference they are compared on, made once per document (the live texts read it). */
interface Compare {
  rows: ({ scenario: Scenario; colour: string } & ScenarioAnalysis)[];
  commonRef: number | null;
  refText: string;
}
const compared = new WeakMap<ProjectDoc, { gestureStart: ProjectDoc | null; compare: Compare }>();
function compareOf(doc: ProjectDoc, gestureStart: ProjectDoc | null): Compare {
  const hit = compared.get(doc);
  if (hit && hit.gestureStart === gestureStart && hit.compare.rows.every((r) => liveScenarioAnalysis(doc, gestureStart, r.scenario.id).outcome === r.outcome)) return hit.compare;
  const rows = doc.scenarios.map((s, i) => ({ scenario: s, colour: scenarioColour(i), ...liveScenarioAnalysis(doc, gestureStart, s.id) }));
  // One reference for every scenario: the base case's (the first scenario that can be
  // analysed), normally its highest regional. Depths below each scenario's own reference differ by the
  // difference of the references and invite a wrong comparison; elevations compare as they are.
  const base = rows.find((r) => r.analysis);
  const commonRef = base?.analysis?.referenceElevation ?? null;
  const refText = base && commonRef !== null
    ? `${formatLength(commonRef, doc.units)}, ${base.scenario.referenceElevation !== undefined ? 'the reference set in' : 'the highest regional of'} ${base.scenario.name}`
    : '';
  const compare = { rows, commonRef, refText };
  compared.set(doc, { gestureStart, compare });
  return compare;
}

/** A scenario's cells in the comparison table (elevation, its interval, depth below the common reference, displacement, n), or null when it has no fit. */
function cellsOf(c: Compare, id: string): { ok: boolean; elevation: string; interval: string; depth: string; displacement: string; n: string } | null {
  const row = c.rows.find((r) => r.scenario.id === id);
  const analysis = row?.analysis;
  if (!analysis) return null;
  const ad = analysis.areaDepth;
  const ok = Boolean(ad && !ad.noDetachment && ad.detachmentElevation !== null);
  const f = ad?.detachmentDepthInterval;
  const zref = analysis.referenceElevation;
  const interval = !ok || !f || !ad ? '—' : isExactFit(ad) ? 'exact fit' : f.kind === 'bounded'
    ? `${formatNumber(zref - f.hi)} to ${formatNumber(zref - f.lo)}` : f.kind === 'unbounded' ? 'unbounded' : 'none';
  return {
    ok,
    elevation: ok ? formatNumber(ad!.detachmentElevation) : ad ? 'none' : '—',
    interval: interval === 'exact fit' || interval === 'unbounded' || interval === 'none' ? interval : `95%: ${interval}`,
    depth: ok && c.commonRef !== null ? formatNumber(c.commonRef - ad!.detachmentElevation!) : '—',
    displacement: ok ? formatNumber(ad!.displacement) : '—',
    n: String(ad?.n ?? 0),
  };
}

const cellRead = (id: string, key: 'elevation' | 'interval' | 'depth' | 'displacement' | 'n'): LiveRead => (doc, gs) => cellsOf(compareOf(doc, gs), id)?.[key] ?? null;

/** The common reference as the comparison names it, and its elevation alone (a regional dragged above the others moves it). */
const refRead: LiveRead = (doc, gs) => compareOf(doc, gs).refText || null;
const refLevelRead: LiveRead = (doc, gs) => {
  const ref = compareOf(doc, gs).commonRef;
  return ref === null ? null : formatLength(ref, doc.units);
};

/**
 * What the comparison's live texts cannot change: the scenarios, which have a fit and an interval, whether there is a
 * common reference. The graph of every scenario's fit (and its wording, and the titles) is drawn again when the
 * gesture ends.
 */
function compareShape(doc: ProjectDoc, gs: ProjectDoc | null): string {
  const c = compareOf(doc, gs);
  return [c.commonRef !== null, ...c.rows.map((r) => `${r.scenario.id} ${Boolean(r.analysis)} ${r.docSection.ok ? '' : r.docSection.message} ${cellsOf(c, r.scenario.id)?.ok}`)].join('\n');
}

export function ScenarioPanel() {
  const { doc, gestureStart } = useShownDoc();
  const apply = useDocStore((s) => s.apply);
  const [renaming, setRenaming] = useState<{ id: string; name: string } | null>(null);
  // A self-crossing verdict changes the analysis of the same document (crossingChecks.ts): read it again then.
  useCrossingChecks((s) => s.answered);
  useLiveShape(compareShape);
  const { rows, commonRef, refText } = compareOf(doc, gestureStart);
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
      {commonRef !== null && <p className="hint" data-testid="scenario-reference">Compared on detachment elevation; depths below <LiveText read={refRead} />.</p>}
      <div className="table-box">
        <table className="results-table compare" data-testid="scenario-compare">
          <thead>
            <tr>
              <th className="name-col">Scenario</th>
              <th title="95% interval below each value">Detachment elevation ({doc.units})</th>
              <th title={commonRef !== null ? `Below ${refText}` : undefined}>Depth below {commonRef !== null ? <LiveText read={refLevelRead} /> : 'ref.'}</th>
              <th>Displace&shy;ment ({doc.units})</th>
              <th title="Horizons in the fit">n</th>
            </tr>
          </thead>
          <tbody>
            {rows.map(({ scenario: s, analysis, docSection }) => {
              const ad = analysis?.areaDepth;
              const zref = analysis?.referenceElevation ?? 0;
              const title = ad ? `${s.name}: n = ${ad.n}, r² = ${formatR2(ad.r2, isExactFit(ad))}${isExactFit(ad) ? ` (${EXACT_FIT_TEXT})` : ''}; own reference ${formatLength(zref, doc.units)}` : s.name;
              const cells = cellsOf({ rows, commonRef, refText }, s.id);
              return (
                <tr key={s.id} className={s.id === active ? 'active' : ''} title={title}>
                  <td className="name-col">{s.name}</td>
                  {!analysis ? (
                    <td colSpan={4} className="hint message" data-testid={`scenario-message-${s.id}`}>{docSection.ok ? 'not analysed: see the messages above' : docSection.message}</td>
                  ) : (
                    <>
                      <td>
                        <LiveText as="div" className="primary" testId={`compare-elevation-${s.id}`} read={cellRead(s.id, 'elevation')} />
                        {cells?.ok && <LiveText as="div" className="interval" read={cellRead(s.id, 'interval')} />}
                      </td>
                      <LiveText as="td" read={cellRead(s.id, 'depth')} />
                      <LiveText as="td" read={cellRead(s.id, 'displacement')} />
                      <LiveText as="td" read={cellRead(s.id, 'n')} />
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

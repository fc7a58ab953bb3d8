// The report's scenario comparison, like for like: detachment elevations, and depths all below one
// common reference (the shown scenario's, or the highest when it has no result), never each
// scenario's own reference (a tilted regional moves the reference too).
import type { ProjectDoc } from '../../core/model/projectDoc';
import { isExactFit } from '../../core/analysis/isExactFit';
import { selectAnalysis } from '../../state/selectors';
import { isStale } from '../../core/model/sectionKey';
import type { MonteCarloRecord } from '../../core/analysis/monteCarloRecord';
import { maxOf } from '../../core/stats/minMax';

export interface ScenarioRow {
  id: string; name: string; shown: boolean; n: number | null; displacement: number | null; noDetachment: boolean;
  elevation: number | null; elevationCI: [number, number] | null; ownReference: number | null;
  depthBelowCommon: number | null; depthCI: [number, number] | null;
  /** The points lie on the line (no scatter): no interval to give. */
  exactFit: boolean;
  /** Monte Carlo elevation P10 / P90 and whether the run is for an earlier state (null: no run). */
  monteCarlo: { p10: number; p90: number; stale: boolean } | null;
}

/** Returns one row per scenario with elevations and depths below `common` (the returned reference elevation, null when no scenario has results). */
export function reportScenarioRows(doc: ProjectDoc, runs: Record<string, MonteCarloRecord>): { common: number | null; rows: ScenarioRow[] } {
  const all = doc.scenarios.map((s) => {
    const a = selectAnalysis(doc, s.id);
    return { s, a, r: a.outcome && a.outcome.ok ? a.outcome.analysis : null };
  });
  const shown = all.find((x) => x.s.id === doc.activeScenarioId)?.r;
  const refs = all.flatMap((x) => (x.r ? [x.r.referenceElevation] : []));
  const common = shown ? shown.referenceElevation : refs.length ? maxOf(refs) : null;
  const rows = all.map(({ s, a, r }): ScenarioRow => {
    const ad = r?.areaDepth ?? null;
    const ok = Boolean(ad && !ad.noDetachment && ad.detachmentElevation !== null);
    const elevation = ok ? ad!.detachmentElevation : null;
    const ci = ok && ad!.detachmentDepthCI95 ? ad!.detachmentDepthCI95 : null;
    const elevationCI: [number, number] | null = ci && r ? [r.referenceElevation - ci[1], r.referenceElevation - ci[0]] : null;
    const run = runs[s.id];
    const mc = run?.elevation ? { p10: run.elevation.p10, p90: run.elevation.p90, stale: !a.docSection.ok || isStale(run, a.docSection.section) } : null;
    return {
      id: s.id, name: s.name, shown: s.id === doc.activeScenarioId, n: ad ? ad.n : null, displacement: ad ? ad.displacement : null,
      noDetachment: Boolean(ad?.noDetachment), elevation, elevationCI, ownReference: r ? r.referenceElevation : null,
      depthBelowCommon: elevation !== null && common !== null ? common - elevation : null,
      depthCI: elevationCI && common !== null ? [common - elevationCI[1], common - elevationCI[0]] : null,
      exactFit: isExactFit(ad),
      monteCarlo: mc,
    };
  });
  return { common, rows };
}

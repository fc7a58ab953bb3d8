// The active scenario's analysis from the memoised selector, and its graph series.
import { useMemo } from 'react';
import { useDocStore } from '../../state/docStore';
import { selectLiveAnalysis } from '../../state/selectors';
import { useCrossingChecks } from '../../state/crossingChecks';
import type { DocAnalysis } from '../../core/analysis/analyseDocSection';
import type { SectionAnalysis } from '../../core/analysis/analyseSection';
import { areaDepthSeries, type AreaDepthSeries } from './areaDepthSeries';

export interface ScenarioAnalysis extends DocAnalysis {
  analysis: SectionAnalysis | null;
  series: AreaDepthSeries | null;
  horizonIds: string[];
}

/** The analysis of the active (or given) scenario of the current document, recomputed only when the document changes (the fast path while a regional is dragged, the full analysis once the gesture ends). */
export function useScenarioAnalysis(scenarioId?: string): ScenarioAnalysis {
  const doc = useDocStore((s) => s.doc);
  const gestureStart = useDocStore((s) => s.gestureStart);
  // A self-crossing verdict changes the analysis of the same document (crossingChecks.ts): read it again then.
  const answered = useCrossingChecks((s) => s.answered);
  // eslint-disable-next-line react-hooks/exhaustive-deps -- `answered` stands for the verdicts selectLiveAnalysis reads
  return useMemo(() => scenarioAnalysisOf(selectLiveAnalysis(doc, gestureStart, scenarioId)), [doc, gestureStart, scenarioId, answered]);
}

/** The same, for a selector result already at hand. */
export function scenarioAnalysisOf(d: DocAnalysis): ScenarioAnalysis {
  const analysis = d.outcome?.ok ? d.outcome.analysis : null;
  const horizonIds = d.docSection.ok ? d.docSection.horizonIds : [];
  return { ...d, analysis, horizonIds, series: analysis ? areaDepthSeries(analysis, horizonIds) : null };
}

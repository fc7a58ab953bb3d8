// The active scenario's analysis from the memoised selector, and its graph series.
import { useMemo } from 'react';
import { useShallow } from 'zustand/react/shallow';
import { useDocStore } from '../../state/docStore';
import { useShownDoc } from '../../state/shownDoc';
import type { ProjectDoc } from '../../core/model/projectDoc';
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

/**
 * The analysis of the active (or given) scenario of the shown document (state/shownDoc.ts: held during a gesture,
 * while the pane's live texts follow the drag), recomputed only when it changes; with `live`, of the store's
 * document itself (the fast path while a regional is dragged, the full analysis once the gesture ends).
 */
export function useScenarioAnalysis(scenarioId?: string, live = false): ScenarioAnalysis {
  const shown = useShownDoc();
  const store = useDocStore(useShallow((s) => (live ? { doc: s.doc, gestureStart: s.gestureStart } : null)));
  const { doc, gestureStart } = store ?? shown;
  // A self-crossing verdict changes the analysis of the same document (crossingChecks.ts): read it again then.
  const answered = useCrossingChecks((s) => s.answered);
  // eslint-disable-next-line react-hooks/exhaustive-deps -- `answered` stands for the verdicts selectLiveAnalysis reads
  return useMemo(() => liveScenarioAnalysis(doc, gestureStart, scenarioId), [doc, gestureStart, scenarioId, answered]);
}

/** The scenario's analysis of a document as its live texts read it (panels/liveText.tsx). */
export function liveScenarioAnalysis(doc: ProjectDoc, gestureStart: ProjectDoc | null, scenarioId?: string): ScenarioAnalysis {
  return scenarioAnalysisOf(selectLiveAnalysis(doc, gestureStart, scenarioId));
}

const made = new WeakMap<DocAnalysis, ScenarioAnalysis>();

/** The same, for a selector result already at hand (made once per analysis: every live text of the pane reads it). */
export function scenarioAnalysisOf(d: DocAnalysis): ScenarioAnalysis {
  const hit = made.get(d);
  if (hit) return hit;
  const sa = scenarioAnalysisOfNew(d);
  made.set(d, sa);
  return sa;
}

function scenarioAnalysisOfNew(d: DocAnalysis): ScenarioAnalysis {
  const analysis = d.outcome?.ok ? d.outcome.analysis : null;
  const horizonIds = d.docSection.ok ? d.docSection.horizonIds : [];
  return { ...d, analysis, horizonIds, series: analysis ? areaDepthSeries(analysis, horizonIds) : null };
}

// Derived results, computed from the document on demand and memoised by document identity; never stored.
import { analyseSection, type AnalysisOutcome } from '../core/analysis/analyseSection';
import { docToSection, type DocSection } from '../core/model/docToSection';
import type { ProjectDoc } from '../core/model/projectDoc';

export interface DocAnalysis {
  docSection: DocSection;
  /** Null when the document is not yet ready to analyse (no calibration, no pins, no regionals). */
  outcome: AnalysisOutcome | null;
}

const cache = new WeakMap<ProjectDoc, Map<string, DocAnalysis>>();

/** Returns the analysis of the document's active (or given) scenario, memoised per document object. */
export function selectAnalysis(doc: ProjectDoc, scenarioId?: string): DocAnalysis {
  const key = scenarioId ?? doc.activeScenarioId;
  let perDoc = cache.get(doc);
  if (!perDoc) {
    perDoc = new Map();
    cache.set(doc, perDoc);
  }
  const hit = perDoc.get(key);
  if (hit) return hit;
  const docSection = docToSection(doc, key);
  const outcome = docSection.ok && docSection.section.horizons.length > 0 ? analyseSection(docSection.section) : null;
  const result = { docSection, outcome };
  perDoc.set(key, result);
  return result;
}

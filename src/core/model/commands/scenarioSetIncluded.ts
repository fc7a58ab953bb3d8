import type { ProjectDoc } from '../projectDoc';

/** Returns the document with the horizon included in (or excluded from) the area–depth fit of the active (or given) scenario; unchanged if already so. */
export function scenarioSetIncluded(doc: ProjectDoc, horizonId: string, included: boolean, scenarioId = doc.activeScenarioId): ProjectDoc {
  const target = doc.scenarios.find((s) => s.id === scenarioId);
  if (!target) return doc;
  const isExcluded = target.excluded.includes(horizonId);
  if (isExcluded === !included) return doc;
  const excluded = included ? target.excluded.filter((h) => h !== horizonId) : [...target.excluded, horizonId];
  return { ...doc, scenarios: doc.scenarios.map((s) => (s.id === scenarioId ? { ...s, excluded } : s)) };
}

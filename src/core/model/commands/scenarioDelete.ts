import type { ProjectDoc } from '../projectDoc';

/** Returns the document without scenario `id`; the next (else previous) one becomes active if it was; unchanged for the last scenario or an unknown id. */
export function scenarioDelete(doc: ProjectDoc, id: string): ProjectDoc {
  const index = doc.scenarios.findIndex((s) => s.id === id);
  if (index < 0 || doc.scenarios.length <= 1) return doc;
  const scenarios = doc.scenarios.filter((s) => s.id !== id);
  const activeScenarioId = doc.activeScenarioId === id ? scenarios[Math.min(index, scenarios.length - 1)].id : doc.activeScenarioId;
  return { ...doc, scenarios, activeScenarioId };
}

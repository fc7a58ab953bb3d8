import type { ProjectDoc } from '../projectDoc';

/** Returns the document with scenario `id` active; unchanged for an unknown id or the one already active. */
export function scenarioSwitch(doc: ProjectDoc, id: string): ProjectDoc {
  if (doc.activeScenarioId === id || !doc.scenarios.some((s) => s.id === id)) return doc;
  return { ...doc, activeScenarioId: id };
}

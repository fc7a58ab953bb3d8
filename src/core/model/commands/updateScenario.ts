import type { ProjectDoc, Scenario } from '../projectDoc';

/** Returns the document with the active (or given) scenario replaced by `change(scenario)`; the same document when nothing changed. */
export function updateScenario(doc: ProjectDoc, change: (s: Scenario) => Scenario, scenarioId?: string): ProjectDoc {
  const id = scenarioId ?? doc.activeScenarioId;
  const i = Math.max(0, doc.scenarios.findIndex((s) => s.id === id));
  const current = doc.scenarios[i];
  if (!current) return doc;
  const next = change(current);
  if (next === current) return doc;
  const scenarios = doc.scenarios.slice();
  scenarios[i] = next;
  return { ...doc, scenarios };
}

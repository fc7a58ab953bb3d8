import { nameWithSuffix } from '../limits';
import type { ProjectDoc, Scenario } from '../projectDoc';
import { scenarioNextId } from './scenarioNextId';
import { scenarioUniqueName } from './scenarioUniqueName';

/** Returns the document with a deep copy of scenario `sourceId` (pins, regionals, exclusions) inserted after it and made active; unchanged if no such scenario. */
export function scenarioDuplicate(doc: ProjectDoc, sourceId: string, name?: string): ProjectDoc {
  const index = doc.scenarios.findIndex((s) => s.id === sourceId);
  if (index < 0) return doc;
  const source = doc.scenarios[index];
  const id = scenarioNextId(doc);
  // A JSON deep copy: the document is plain JSON (DEVELOPERS.md §Code style), and the copy must share no arrays.
  const copy: Scenario = { ...(JSON.parse(JSON.stringify(source)) as Scenario), id, name: scenarioUniqueName(doc, name ?? nameWithSuffix(source.name, ' copy')) };
  const scenarios = [...doc.scenarios.slice(0, index + 1), copy, ...doc.scenarios.slice(index + 1)];
  return { ...doc, scenarios, activeScenarioId: id };
}

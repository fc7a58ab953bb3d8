import type { ProjectDoc } from '../projectDoc';
import { scenarioNextId } from './scenarioNextId';
import { scenarioUniqueName } from './scenarioUniqueName';

/** Returns the document with a new empty scenario (no pins, no regionals) added after the others and made active. */
export function scenarioCreate(doc: ProjectDoc, name: string): ProjectDoc {
  const id = scenarioNextId(doc);
  const scenario = { id, name: scenarioUniqueName(doc, name), pinsPx: null, regionals: {}, excluded: [] };
  return { ...doc, scenarios: [...doc.scenarios, scenario], activeScenarioId: id };
}

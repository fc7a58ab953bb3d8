import { nameLengthProblem } from '../limits';
import type { ProjectDoc } from '../projectDoc';
import { scenarioUniqueName } from './scenarioUniqueName';

/** Returns the document with scenario `id` renamed (trimmed, made unique); unchanged for an unknown id, the same name, or one over the name length limit (nameLengthProblem says why). */
export function scenarioRename(doc: ProjectDoc, id: string, name: string): ProjectDoc {
  const target = doc.scenarios.find((s) => s.id === id);
  if (!target || nameLengthProblem(name.trim())) return doc;
  const unique = scenarioUniqueName(doc, name, id);
  if (unique === target.name) return doc;
  return { ...doc, scenarios: doc.scenarios.map((s) => (s.id === id ? { ...s, name: unique } : s)) };
}

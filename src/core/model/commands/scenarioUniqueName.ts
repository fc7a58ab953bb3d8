import { nameWithSuffix } from '../limits';
import type { ProjectDoc } from '../projectDoc';

/** Returns the trimmed name, or with " (2)", " (3)" … appended when another scenario already has it; "Scenario" when blank. */
export function scenarioUniqueName(doc: ProjectDoc, name: string, exceptId?: string): string {
  const base = nameWithSuffix(name.trim() || 'Scenario', '');
  const taken = new Set(doc.scenarios.filter((s) => s.id !== exceptId).map((s) => s.name));
  if (!taken.has(base)) return base;
  let n = 2;
  while (taken.has(nameWithSuffix(base, ` (${n})`))) n++;
  return nameWithSuffix(base, ` (${n})`);
}

import type { ProjectDoc } from '../projectDoc';

/** Returns an unused scenario id of the form "scenario-N" (N one more than the largest in use). */
export function scenarioNextId(doc: ProjectDoc): string {
  let max = 0;
  for (const s of doc.scenarios) {
    const m = /^scenario-(\d+)$/.exec(s.id);
    if (m) max = Math.max(max, Number(m[1]));
  }
  let n = max + 1;
  while (doc.scenarios.some((s) => s.id === `scenario-${n}`)) n++;
  return `scenario-${n}`;
}

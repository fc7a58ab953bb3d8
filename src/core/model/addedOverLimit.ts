import { LIMITS, tooManyMessage } from './limits';
import type { ProjectDoc } from './projectDoc';

// The counted limits of core/model/limits.ts (horizons, faults, scenarios) held where the user makes a line or a
// scenario — a button, a key, a drawing tool, a duplicate, an import — not only when the work is kept: an edit that
// adds one beyond its limit is refused where it is made, in the shared words. Only additions are refused, so an
// edit that deletes or changes never is.

/** Returns the message for an edit from `before` to `after` that adds a horizon, fault or scenario beyond its limit ("No scenario was added: …"), or null. */
export function addedOverLimit(before: ProjectDoc, after: ProjectDoc): string | null {
  const counts: [string, string, number, number, number][] = [
    ['horizon', 'horizons', before.horizons.length, after.horizons.length, LIMITS.horizons],
    ['fault', 'faults', (before.faults ?? []).length, (after.faults ?? []).length, LIMITS.faults],
    ['scenario', 'scenarios', before.scenarios.length, after.scenarios.length, LIMITS.scenarios],
  ];
  for (const [one, many, was, now, limit] of counts) {
    if (now > was && now > limit) {
      return `No ${one} was added: there would be ${tooManyMessage(many, now, limit)}. Delete a ${one} first.`;
    }
  }
  return null;
}

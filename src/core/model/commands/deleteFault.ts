import type { DocHorizon, ProjectDoc } from '../projectDoc';

/** Returns the horizons joined on the fault (in document order); empty for an unknown fault or one no horizon is joined on. */
export function horizonsJoinedOn(doc: ProjectDoc, faultId: string): DocHorizon[] {
  return doc.horizons.filter((h) => h.joins.some((j) => j.faultId === faultId));
}

/**
 * Returns the document without the fault; horizons joined on it lose those joins (their pieces either side
 * become one line, the two cutoffs joined straight) — the vertices stay where they are, so undoing or
 * joining again on a redrawn fault restores them. Unchanged for an unknown fault.
 */
export function deleteFault(doc: ProjectDoc, faultId: string): ProjectDoc {
  if (!doc.faults.some((f) => f.id === faultId)) return doc;
  const users = new Set(horizonsJoinedOn(doc, faultId).map((h) => h.id));
  return {
    ...doc,
    faults: doc.faults.filter((f) => f.id !== faultId),
    horizons: users.size === 0 ? doc.horizons : doc.horizons.map((h) => (users.has(h.id) ? { ...h, joins: h.joins.filter((j) => j.faultId !== faultId) } : h)),
  };
}
